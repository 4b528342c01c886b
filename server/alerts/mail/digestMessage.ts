// The daily digest: the last 24 hours per room, what is still open, and which batches are nearly callused.
import { RULE_TITLES } from '../../../shared/alerts/rules';
import type { DigestData } from '../digestData';
import { renderHtml, renderText, type MailDocument, type MailSection } from './mailDocument';
import * as fmt from '../../../shared/alerts/readerFormat';

export interface DigestContext {
  nurseryName: string;
  recipientName: string;
  reader: fmt.Reader;
  appOrigin: string;
  /** The nursery's calendar day the digest is for. */
  day: string;
}

const orDash = (c: number | null, r: fmt.Reader) => (c === null ? '—' : fmt.temperature(c, r));

export function composeDigest(data: DigestData, c: DigestContext): { subject: string; text: string; html: string } {
  const r = c.reader;
  const sections: MailSection[] = [
    {
      heading: 'Rooms, last 24 hours',
      table: {
        caption: 'Lowest, highest and mean reading per room',
        columns: ['Room', 'Lowest', 'Highest', 'Mean'],
        rows: data.rooms.map((room) => [room.name, orDash(room.minC, r), orDash(room.maxC, r), orDash(room.meanC, r)]),
      },
      links: [{ label: 'Rooms', href: `${c.appOrigin}/rooms` }],
    },
    {
      heading: 'Open alerts',
      lists: [
        {
          title: data.alerts.length ? `${data.alerts.length} not yet resolved` : 'None',
          items: data.alerts.map(
            (a) =>
              `${RULE_TITLES[a.rule]}: ${a.subjectName}, since ${fmt.instant(a.since ?? a.openedAt, r)}` +
              (a.status === 'acknowledged' ? ' (acknowledged)' : ''),
          ),
        },
      ],
      links: [{ label: 'Alerts', href: `${c.appOrigin}/alerts` }],
    },
    {
      heading: 'Batches nearing full callus',
      ...(data.nearing.length
        ? {
            table: {
              caption: 'At least 80 % callused, or full callus expected within three days',
              columns: ['Batch', 'Species', 'Grafts', 'Room', 'Progress', 'Full callus'],
              rows: data.nearing.map((b) => [
                b.code, b.speciesName, String(b.count), b.roomName ?? '—', `${Math.min(100, b.progressPct).toFixed(0)} %`,
                b.progressPct >= 100 ? 'reached' : b.fullCallusAt ? fmt.instant(b.fullCallusAt, r) : 'no estimate',
              ]),
            },
          }
        : { lists: [{ title: 'None yet', items: [] }] }),
    },
  ];
  const doc: MailDocument = {
    title: `${c.nurseryName}: the day in the cold rooms`,
    intro: [`Hello ${c.recipientName},`, `Your daily digest for ${c.day}.`],
    sections,
    footer: [`You asked for this digest. Turn it off under Alerts › Settings: ${c.appOrigin}/alerts/settings`],
  };
  return { subject: `Daily digest ${c.day} · ${c.nurseryName}`, text: renderText(doc), html: renderHtml(doc) };
}
