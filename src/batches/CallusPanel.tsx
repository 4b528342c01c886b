import type { TemperatureUnit } from '../../shared/schemas/common';
import { formatTemperature } from '../charts/displayUnits';
import { formatInstant } from '../time/nurseryTime';
import { Panel } from '../ui/Panel';
import type { BatchExposure, CallusProgress } from './queries';

const NO_OUTLOOK: Record<NonNullable<CallusProgress['outlook']['reason']>, string> = {
  not_in_storage: 'No estimate: the batch has left storage.',
  no_recent_readings: 'No estimate: no logger in its room has readings to take a recent mean from.',
  rate_zero: 'No estimate: at the recent mean temperature this species makes no callus at all.',
};

function Outlook({ progress, unit, zone }: { progress: CallusProgress; unit: TemperatureUnit; zone: string }) {
  const { outlook } = progress;
  if (outlook.status === 'complete') return <p className="font-semibold text-moss-deep">Full callus reached by the model’s count.</p>;
  const basis = outlook.basis && (
    <>
      {' '}Mean {formatTemperature(outlook.basis.meanC, unit)} over the 72 h to {formatInstant(outlook.basis.to, zone)}
      {outlook.basis.loggerLabel ? ` (logger ${outlook.basis.loggerLabel})` : ''}, a rate of {Math.round(outlook.basis.rate * 100)} % of the optimum.
    </>
  );
  if (outlook.status === 'estimated') {
    return (
      <p>
        <span className="font-semibold">Full callus about {formatInstant(outlook.fullCallusAt!, zone)}</span> if the room stays as it was.{basis}
      </p>
    );
  }
  return (
    <p>
      {NO_OUTLOOK[outlook.reason!]}
      {basis}
    </p>
  );
}

/** Progress as a bar and in words, the estimate, and what the model leaves out, stated every time it is shown. */
export function CallusPanel({ exposure, unit, zone }: { exposure: BatchExposure; unit: TemperatureUnit; zone: string }) {
  const { progress, profile } = exposure;
  const c = profile.callus;
  return (
    <Panel title="Callus progress" description={`${profile.name} profile`}>
      {progress ? (
        <div className="flex flex-col gap-3">
          <div>
            <div className="flex items-baseline justify-between gap-2">
              <span className="text-2xl font-bold text-callus">{Math.min(100, progress.progressPct).toFixed(0)} %</span>
              <span className="font-mono text-sm text-ink-soft">
                {progress.optimumEquivalentHours.toFixed(0)} of {progress.hoursAtOptimum} h at optimum
              </span>
            </div>
            <div
              role="progressbar"
              aria-label="Callus progress"
              aria-valuemin={0}
              aria-valuemax={100}
              aria-valuenow={Math.round(Math.min(100, progress.progressPct))}
              className="mt-1 h-3 overflow-hidden rounded-full bg-callus-light"
            >
              <div className="h-full bg-callus" style={{ width: `${Math.min(100, progress.progressPct)}%` }} />
            </div>
          </div>
          <Outlook progress={progress} unit={unit} zone={zone} />
        </div>
      ) : (
        <p>No readings cover this batch yet, so there is no progress to show.</p>
      )}
      <details className="mt-4 text-sm text-ink-soft">
        <summary className="cursor-pointer font-semibold text-slate">How this is worked out, and what it leaves out</summary>
        <div className="mt-2 flex max-w-prose flex-col gap-2">
          <p>
            Each logged hour counts as part of an hour at the optimum: none at or below {formatTemperature(c.baseC, unit)}, rising evenly to a full hour
            at {formatTemperature(c.optLowC, unit)}, a full hour up to {formatTemperature(c.optHighC, unit)}, falling to none at{' '}
            {formatTemperature(c.upperC, unit)}. Between readings the temperature is taken as the straight line joining them; readings more than three
            hours apart are not joined, and that time counts nothing. Full callus is {c.hoursAtOptimum} such hours. Where several loggers watch a room,
            the slowest one counts.
          </p>
          <p>
            The estimate assumes the room keeps the mean of its last 72 hours of readings. The curve and the hours are practice figures for the species
            (see the profile’s sources), not measurements of these grafts: wood quality, moisture, the graft method and the cultivar are not in it.
            Check a few unions by hand before moving grafts on the strength of this number.
          </p>
        </div>
      </details>
    </Panel>
  );
}
