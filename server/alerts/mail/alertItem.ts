// One alert as a block of a message: a heading, facts, what to check, links. Rendered to text and HTML elsewhere.
import { describeBatches, describeCondition, describeLatest, describeSince } from '../../../shared/alerts/describeAlert';
import * as fmt from '../../../shared/alerts/readerFormat';
import { RULE_TITLES } from '../../../shared/alerts/rules';
import type { AlertView } from '../alertView';
import { ADVICE, HEATING_CAUTIONS } from './advice';

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

/** Heat helps only against cold: the cautions come with freeze risk and with time below the band. */
function wantsHeat(a: AlertView): boolean {
  return a.rule === 'freeze_risk' || (a.rule === 'out_of_band' && (a.detail.hoursBelow ?? 0) > (a.detail.hoursAbove ?? 0));
}

export function describeAlert(kind: NoticeKind, a: AlertView, c: ItemContext): MailItem {
  const r = c.reader;
  const facts: [string, string][] = [['What', describeCondition(a, r, c.now)], ['Where', a.subjectName]];
  if (a.since) facts.push(['Since', describeSince(a.since, a.detail, r)]);
  const latest = describeLatest(a.detail, r);
  if (latest && kind !== 'resolved') facts.push(['Latest', latest]);
  const batches = describeBatches(a.detail);
  if (batches) facts.push(['At stake', batches]);
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
