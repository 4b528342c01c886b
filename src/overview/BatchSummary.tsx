import { DateTime } from 'luxon';
import type { TemperatureUnit } from '../../shared/schemas/common';
import { formatTemperature } from '../charts/displayUnits';
import type { OverviewBatch } from './queries';

const hours = (h: number) => `${h < 10 ? h.toFixed(1) : Math.round(h)} h`;

/** A stored batch's worst exposure so far and its callus progress, in one or two short lines. */
export function BatchSummary({ batch, unit, timeZone }: { batch: OverviewBatch; unit: TemperatureUnit; timeZone: string }) {
  const w = batch.worst;
  const risks = w
    ? [
        w.freezeHours > 0 && `${hours(w.freezeHours)} below freezing limit`,
        w.belowHours > 0 && `${hours(w.belowHours)} below band`,
        w.aboveHours > 0 && `${hours(w.aboveHours)} above band`,
      ].filter(Boolean)
    : [];
  const callus = batch.callusPct === null ? null : `callus ${Math.min(100, Math.round(batch.callusPct))} %`;
  const ready = batch.fullCallusAt && batch.callusPct !== null && batch.callusPct < 100 ? `, full about ${DateTime.fromISO(batch.fullCallusAt, { zone: timeZone }).toFormat('d LLL')}` : '';
  return (
    <li className="border-t border-frost-deep pt-2">
      <p>
        <span className="font-mono font-semibold">{batch.code}</span> {batch.speciesName} · {batch.scionCultivar} · {batch.count} grafts
      </p>
      <p className="text-sm text-ink-soft">
        {w && w.minC !== null && w.maxC !== null ? `${formatTemperature(w.minC, unit)} to ${formatTemperature(w.maxC, unit)}` : 'No readings yet'}
        {risks.length ? `; ${risks.join(', ')}` : w ? '; never outside its band' : ''}
        {callus && `; ${callus}${ready}`}
      </p>
    </li>
  );
}
