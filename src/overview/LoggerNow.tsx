import type { TemperatureUnit } from '../../shared/schemas/common';
import { isStale } from '../../shared/series/freshness';
import { formatTemperature } from '../charts/displayUnits';
import { formatAge } from './formatAge';
import type { OverviewLogger } from './queries';

/** One logger's latest reading, large enough to read at arm's length, with its age and a stale mark when it is old. */
export function LoggerNow({ logger, unit, now }: { logger: OverviewLogger; unit: TemperatureUnit; now: number }) {
  const { latest } = logger;
  if (!latest) {
    return (
      <p>
        <span className="font-semibold">{logger.label}</span> <span className="text-ink-soft">has no readings yet</span>
      </p>
    );
  }
  const taken = Date.parse(latest.t);
  const stale = isStale(taken, logger.intervalMinutes === null ? null : logger.intervalMinutes * 60_000, now);
  return (
    <p className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
      <span className="font-semibold">{logger.label}</span>
      <span className={`font-mono text-2xl font-semibold ${stale ? 'text-ink-soft line-through decoration-1' : 'text-slate-deep'}`}>{formatTemperature(latest.c, unit)}</span>
      {latest.rh !== null && <span className="font-mono text-ink-soft">{latest.rh.toFixed(0)} % RH</span>}
      <span className={stale ? 'font-semibold text-ember' : 'text-ink-soft'}>
        {formatAge(now - taken)}
        {stale && ' · stale'}
      </span>
    </p>
  );
}
