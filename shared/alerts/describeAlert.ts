// Plain sentences about an alert, for the e-mails and the alerts page alike.
import * as fmt from './readerFormat';
import type { AlertRule } from './rules';
import type { FindingDetail } from './types';

export interface AlertFacts {
  rule: AlertRule;
  detail: FindingDetail;
}

function reachesWhen(at: number, r: fmt.Reader, now: number): string {
  const relative = fmt.fromNow(at, now);
  return relative ? `${fmt.instant(at, r)} (${relative})` : fmt.instant(at, r);
}

/** What is wrong, in one sentence with the figures that decided it. `now` makes "in 7.5 h" relative to it. */
export function describeCondition(a: AlertFacts, r: fmt.Reader, now: number): string {
  const d = a.detail;
  switch (a.rule) {
    case 'freeze_risk':
      return d.cause === 'at_or_below'
        ? `A reading of ${fmt.temperature(d.valueC!, r)} is at or below the freeze limit of ${fmt.temperature(d.limitC!, r)}.`
        : `The trend of the last ${fmt.hours(d.windowHours ?? 6)} reaches the freeze limit of ${fmt.temperature(d.limitC!, r)} around ` +
            `${d.reachesAt ? reachesWhen(d.reachesAt, r, now) : 'soon'}.`;
    case 'out_of_band': {
      const band = `${fmt.temperature(d.band!.minC, r)} to ${fmt.temperature(d.band!.maxC, r)}`;
      const side = (d.hoursBelow ?? 0) >= (d.hoursAbove ?? 0) ? `${fmt.hours(d.hoursBelow!)} below` : `${fmt.hours(d.hoursAbove!)} above`;
      return `${side} its band (${band}) in the last ${fmt.hours(d.windowHours!)}; the allowance is ${fmt.hours(d.allowedHours!)}.`;
    }
    case 'storage_warm':
      return `Warmer than the cold-storage limit of ${fmt.temperature(d.limitC!, r)}.`;
    case 'silent_logger':
      return d.lastReadingAt
        ? `No reading from ${d.loggerLabel} since ${fmt.instant(d.lastReadingAt, r)}: more than ${fmt.hours(d.maxAgeHours!)}.`
        : `${d.loggerLabel} has sent no reading at all for more than ${fmt.hours(d.maxAgeHours!)}.`;
    case 'exposure_budget':
      return `${fmt.degreeHours(d.degreeHours!, r)} outside its band so far; the budget is ${fmt.degreeHours(d.budgetDegreeHours!, r)}.`;
  }
}

/** The reading that decided it, with its logger and trend; null for rules that do not rest on one reading. */
export function describeLatest(d: FindingDetail, r: fmt.Reader): string | null {
  if (d.valueC === undefined || d.valueC === null) return null;
  const parts = [fmt.temperature(d.valueC, r)];
  if (d.readingAt) parts.push(`at ${fmt.instant(d.readingAt, r)}`);
  if (d.loggerLabel) parts.push(`(logger ${d.loggerLabel})`);
  const text = parts.join(' ');
  return d.trendCPerHour !== undefined && d.trendCPerHour !== null ? `${text}, ${fmt.trend(d.trendCPerHour, r)}` : text;
}

export function describeBatches(d: FindingDetail): string | null {
  const batches = d.batches ?? [];
  return batches.length ? batches.map((b) => `${b.code}: ${b.species}, ${b.count} grafts`).join('; ') : null;
}

/** When the condition began, or "… or earlier" when it began before the stretch the rules trace back. */
export function describeSince(since: number, d: FindingDetail, r: fmt.Reader): string {
  return d.sinceCapped ? `${fmt.instant(since, r)} or earlier` : fmt.instant(since, r);
}
