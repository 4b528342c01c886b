import type { TemperatureUnit } from '../../shared/schemas/common';
import { formatTemperature } from '../charts/displayUnits';
import { formatInstant } from '../time/nurseryTime';
import { DetailList } from '../ui/DetailList';
import { Panel } from '../ui/Panel';
import { hoursText, limitText, rangeText } from './exposureText';
import { ExposureTable, type ExposureRow } from './ExposureTable';
import type { BatchExposure } from './queries';

type Placement = BatchExposure['placements'][number];

function placementRows(p: Placement): ExposureRow[] {
  const loggers = p.loggers.map((l) => ({ key: `${p.placementId}-${l.loggerId}`, label: `Logger ${l.label ?? l.loggerId}`, figures: l.exposure }));
  if (loggers.length === 1 && p.unwatchedHours === 0) return loggers;
  const label = loggers.length > 1 ? 'Worst of the loggers' : 'Whole stay';
  return [{ key: `${p.placementId}-head`, label, figures: p.headline, headline: true }, ...loggers];
}

function PlacementFigures({ p, unit, zone }: { p: Placement; unit: TemperatureUnit; zone: string }) {
  return (
    <section className="flex flex-col gap-2">
      <h3 className="font-semibold text-slate-deep">
        {p.roomName ?? `Room ${p.roomId}`}: {formatInstant(p.from, zone)} to {p.to ? formatInstant(p.to, zone) : 'now'}
      </h3>
      {p.unwatchedHours > 0 && (
        <p className="text-sm text-ink-soft">
          No logger watched this room for {hoursText(p.unwatchedHours)} of the stay; that time counts as missing.
        </p>
      )}
      {p.loggers.length > 0 ? (
        <ExposureTable caption={`Exposure in ${p.roomName ?? 'the room'}`} rows={placementRows(p)} unit={unit} />
      ) : (
        <p>No logger was in this room during the stay.</p>
      )}
    </section>
  );
}

/**
 * The batch's exposure over all its stays (summed), then stay by stay with each logger's own figures. Where
 * several loggers watched at once the stay is headed by the worst of them, never by their average.
 */
export function BatchExposurePanel({ exposure, unit, zone }: { exposure: BatchExposure; unit: TemperatureUnit; zone: string }) {
  const h = exposure.headline;
  const { profile } = exposure;
  return (
    <Panel
      title="Exposure in storage"
      description={`Against the ${profile.name} profile: band ${formatTemperature(profile.band.minC, unit)} to ${formatTemperature(profile.band.maxC, unit)}, freeze limit ${formatTemperature(profile.freezeC, unit)}. As of ${formatInstant(exposure.asOf, zone)}.`}
    >
      {h ? (
        <div className="flex flex-col gap-6">
          <DetailList
            items={[
              { label: 'Below the freeze limit', value: limitText(h.freeze, unit), figure: true },
              { label: 'Below the band', value: limitText(h.below, unit), figure: true },
              { label: 'Above the band', value: limitText(h.above, unit), figure: true },
              { label: 'Range', value: rangeText(h.minC, h.maxC, unit), figure: true },
              { label: 'Logged', value: `${hoursText(h.hoursCovered)} with readings, ${hoursText(h.hoursMissing)} without`, figure: true },
            ]}
          />
          {exposure.placements.map((p) => (
            <PlacementFigures key={p.placementId} p={p} unit={unit} zone={zone} />
          ))}
        </div>
      ) : (
        <p>The batch has not been in a room yet.</p>
      )}
    </Panel>
  );
}
