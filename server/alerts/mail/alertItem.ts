// One alert as a block of a message: a heading, facts, what to check, links. Rendered to text and HTML elsewhere.
import { RULE_TITLES } from '../../../shared/alerts/rules';
import type { FindingDetail } from '../../../shared/alerts/types';
import type { AlertView } from '../alertView';
import { ADVICE, HEATING_CAUTIONS } from './advice';
import * as fmt from './readerFormat';

export type NoticeKind = 'opened' | 'reminder' | 'resolved';

export interface MailItem {
  heading: string;
  tag: string;
  facts: [label: string, value: string][];
  steps: string[];
  cautions: string[];
  links: { label: string; href: string }[];
}

export interface ItemContext {
  reader: fmt.Reader;
  appOrigin: string;
  /** The evaluation's clock, for "in 7.5 h". */
  now: number;
}

const TAGS: Record<NoticeKind, string> = { opened: 'New', reminder: 'Still open, not yet acknowledged', resolved: 'Resolved' };

function reachesWhen(at: number, c: ItemContext): string {
  const relative = fmt.fromNow(at, c.now);
  return relative ? `${fmt.instant(at, c.reader)} (${relative})` : fmt.instant(at, c.reader);
}

function what(a: AlertView, c: ItemContext): string {
  const d = a.detail;
  const r = c.reader;
  switch (a.rule) {
    case 'freeze_risk':
      return d.cause === 'at_or_below'
        ? `A reading of ${fmt.temperature(d.valueC!, r)} is at or below the freeze limit of ${fmt.temperature(d.limitC!, r)}.`
        : `The trend of the last ${fmt.hours(d.windowHours ?? 6)} reaches the freeze limit of ${fmt.temperature(d.limitC!, r)} around ` +
            `${d.reachesAt ? reachesWhen(d.reachesAt, c) : 'soon'}.`;
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

function current(d: FindingDetail, r: fmt.Reader): string | null {
  if (d.valueC === undefined || d.valueC === null) return null;
  const parts = [fmt.temperature(d.valueC, r)];
  if (d.readingAt) parts.push(`at ${fmt.instant(d.readingAt, r)}`);
  if (d.loggerLabel) parts.push(`(logger ${d.loggerLabel})`);
  if (d.trendCPerHour !== undefined && d.trendCPerHour !== null) parts.push(`, ${fmt.trend(d.trendCPerHour, r)}`);
  return parts.join(' ').replace(' ,', ',');
}

/** Heat helps only against cold: the cautions come with freeze risk and with time below the band. */
function wantsHeat(a: AlertView): boolean {
  return a.rule === 'freeze_risk' || (a.rule === 'out_of_band' && (a.detail.hoursBelow ?? 0) > (a.detail.hoursAbove ?? 0));
}

export function describeAlert(kind: NoticeKind, a: AlertView, c: ItemContext): MailItem {
  const r = c.reader;
  const facts: [string, string][] = [['What', what(a, c)], ['Where', a.subjectName]];
  if (a.since) facts.push(['Since', fmt.instant(a.since, r)]);
  const now = current(a.detail, r);
  if (now && kind !== 'resolved') facts.push(['Latest', now]);
  const batches = a.detail.batches ?? [];
  if (batches.length) facts.push(['At stake', batches.map((b) => `${b.code}: ${b.species}, ${b.count} grafts`).join('; ')]);
  if (kind === 'resolved') {
    facts.push(['Ended', `${fmt.instant(a.resolvedAt!, r)}, ${a.resolution === 'unwatched' ? 'no longer watched (nothing at stake there now)' : 'the condition cleared'}`]);
  }
  const links = [{ label: 'Acknowledge or see the alert', href: `${c.appOrigin}/alerts/${a.id}` }];
  if (a.roomId) links.unshift({ label: 'Room page', href: `${c.appOrigin}/rooms/${a.roomId}` });
  return {
    heading: `${RULE_TITLES[a.rule]}: ${a.subjectName}`,
    tag: kind === 'resolved' ? TAGS.resolved : `${TAGS[kind]} · ${a.severity === 'critical' ? 'act now' : 'look today'}`,
    facts,
    steps: kind === 'resolved' ? [] : ADVICE[a.rule],
    cautions: kind !== 'resolved' && wantsHeat(a) ? HEATING_CAUTIONS : [],
    links: kind === 'resolved' ? links.slice(0, 1) : links,
  };
}
