// Our messages: the text part and the HTML part carry the same content, and names typed by people are escaped.
import { describe, expect, it } from 'vitest';
import { composeAlertMessage, sortNotices, type Notice } from '../../../server/alerts/mail/alertMessage';
import type { AlertView } from '../../../server/alerts/alertView';

const base: AlertView = {
  id: 7, rule: 'freeze_risk', severity: 'warning', status: 'open', subjectKind: 'room', subjectId: 3, subjectName: 'Barn <loft>',
  roomId: 3, since: Date.UTC(2025, 0, 15, 2), openedAt: Date.UTC(2025, 0, 15, 3), acknowledgedAt: null, acknowledgedBy: null,
  resolvedAt: null, resolution: null, remindersSent: 0,
  detail: { cause: 'at_or_below', valueC: -3, limitC: -2, batches: [{ id: 1, code: 'B&1', species: 'Apple', count: 10 }] },
};
const ctx = { nurseryName: 'Hollowmere Grafts', recipientName: 'Olive', reader: { unit: 'C' as const, timeZone: 'UTC' }, appOrigin: 'https://ck.example', now: Date.UTC(2025, 0, 15, 4) };

describe('composeAlertMessage', () => {
  it('orders new before still-open before resolved, critical first within each', () => {
    const n = (kind: Notice['kind'], id: number, severity: AlertView['severity']): Notice => ({ kind, alert: { ...base, id, severity } });
    expect(sortNotices([n('resolved', 1, 'critical'), n('opened', 2, 'warning'), n('reminder', 3, 'warning'), n('opened', 4, 'critical')]).map((x) => x.alert.id)).toEqual([4, 2, 3, 1]);
  });

  it('escapes names in HTML, keeps them plain in text, and links the room page in both', () => {
    const { subject, text, html } = composeAlertMessage([{ kind: 'opened', alert: base }], ctx);
    expect(subject).toBe('Freeze risk: Barn <loft> · Hollowmere Grafts');
    expect(text).toContain('Where:     Barn <loft>');
    expect(html).toContain('Barn &lt;loft&gt;');
    expect(html).not.toContain('<loft>');
    expect(html).toContain('B&amp;1: Apple, 10 grafts');
    for (const part of [text, html]) expect(part).toContain('https://ck.example/rooms/3');
  });

  it('a resolved notice says when and why it ended, without advice', () => {
    const { text } = composeAlertMessage([{ kind: 'resolved', alert: { ...base, status: 'resolved', resolvedAt: Date.UTC(2025, 0, 15, 9), resolution: 'cleared' } }], ctx);
    expect(text).toContain('Ended:     Wed 15 Jan, 09:00 UTC, the condition cleared');
    expect(text).not.toContain('What to check');
    expect(text).toContain('1 resolved.');
  });
});
