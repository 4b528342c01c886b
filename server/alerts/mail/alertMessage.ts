// The grouped message one recipient gets from one evaluation: what opened, what is still open, what ended.
import { RULE_TITLES } from '../../../shared/alerts/rules';
import type { AlertView } from '../alertView';
import { describeAlert, type ItemContext, type NoticeKind } from './alertItem';
import { renderHtml, renderText, type MailDocument, type MailSection } from './mailDocument';

export interface Notice {
  kind: NoticeKind;
  alert: AlertView;
}

export interface MessageContext extends ItemContext {
  nurseryName: string;
  recipientName: string;
}

const ORDER: Record<NoticeKind, number> = { opened: 0, reminder: 1, resolved: 2 };

/** Opened before reminders before resolved; within each, critical first. */
export function sortNotices(notices: readonly Notice[]): Notice[] {
  return [...notices].sort(
    (a, b) => ORDER[a.kind] - ORDER[b.kind] || (a.alert.severity === b.alert.severity ? a.alert.id - b.alert.id : a.alert.severity === 'critical' ? -1 : 1),
  );
}

function subjectLine(sorted: Notice[], nurseryName: string): string {
  const [first] = sorted;
  const lead =
    first.kind === 'opened' ? `${RULE_TITLES[first.alert.rule]}: ${first.alert.subjectName}`
    : first.kind === 'reminder' ? `Still open: ${RULE_TITLES[first.alert.rule].toLowerCase()}, ${first.alert.subjectName}`
    : `Resolved: ${RULE_TITLES[first.alert.rule].toLowerCase()}, ${first.alert.subjectName}`;
  const more = sorted.length > 1 ? ` (+${sorted.length - 1} more)` : '';
  return `${lead}${more} · ${nurseryName}`;
}

function countsLine(sorted: Notice[]): string {
  const count = (k: NoticeKind) => sorted.filter((n) => n.kind === k).length;
  const opened = count('opened');
  const parts = [
    opened && `${opened} new alert${opened > 1 ? 's' : ''}`,
    count('reminder') && `${count('reminder')} still open and not acknowledged`,
    count('resolved') && `${count('resolved')} resolved`,
  ].filter(Boolean);
  return `${parts.join(', ')}.`.replace(/^./, (c) => c.toUpperCase());
}

export function composeAlertMessage(notices: readonly Notice[], c: MessageContext): { subject: string; text: string; html: string } {
  const sorted = sortNotices(notices);
  const sections: MailSection[] = sorted.map((n) => {
    const item = describeAlert(n.kind, n.alert, c);
    const lists = [];
    if (item.steps.length) lists.push({ title: 'What to check', items: item.steps });
    if (item.cautions.length) lists.push({ title: 'Cautions if you add heat', items: item.cautions });
    return { heading: item.heading, tag: item.tag, facts: item.facts, lists, links: item.links };
  });
  const doc: MailDocument = {
    title: `Alerts at ${c.nurseryName}`,
    intro: [`Hello ${c.recipientName},`, countsLine(sorted)],
    sections,
    footer: [
      'Acknowledging an alert on its page stops the reminders; you will still hear when it ends.',
      `Choose what you receive under Alerts › Settings: ${c.appOrigin}/alerts/settings`,
    ],
  };
  return { subject: subjectLine(sorted, c.nurseryName), text: renderText(doc), html: renderHtml(doc) };
}
