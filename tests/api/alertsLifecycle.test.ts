// Acceptance: a garage cooling toward freezing gives one grouped e-mail before it crosses the limit, one reminder
// after 12 h when nobody acknowledges, and one "resolved" when it recovers. Mail goes through nodemailer to the
// SMTP capture server on loopback.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Alert } from '../../server/alerts/alert.model';
import { addBatch, addReadings, deliver, HOUR, mailTo, MIN, outboxRows, T0, startAlertWorld, type AlertWorld } from './alertsFixture';

/** Steady at 6 °C, cooling 0.5 °C/h from T0 (crossing the apple limit of −2 °C at T0 + 16 h), −3 °C until T0 + 20 h, then warming 2 °C/h to 5 °C. */
const garage = (t: number) => {
  const h = (t - T0) / HOUR;
  if (h <= 0) return 6;
  if (h <= 18) return 6 - 0.5 * h;
  if (h <= 20) return -3;
  return Math.min(5, -3 + 2 * (h - 20));
};

/** Feeds readings every 10 min up to each step and evaluates, as a live logger and the 10-minute schedule would. */
async function run(w: AlertWorld, loggerId: number, from: number, to: number, stepMin: number, curve: (t: number) => number, fedUpTo: { t: number }) {
  for (let now = from; now <= to; now += stepMin * MIN) {
    const fresh = [];
    for (let t = fedUpTo.t + 10 * MIN; t <= now; t += 10 * MIN) fresh.push({ t, c: curve(t) });
    await addReadings(w.t, loggerId, fresh);
    if (fresh.length) fedUpTo.t = fresh[fresh.length - 1].t;
    w.clock.now = now;
    await w.evaluate(w.nurseryId, new Date(now));
    await deliver(w.sender);
  }
}

describe('a garage cooling toward freezing', () => {
  let w: AlertWorld;
  beforeAll(async () => {
    w = await startAlertWorld();
    // Six hours below 0 °C would also raise "outside the band" for the apple batch (alertsRules covers it); a full
    // day's allowance in this room keeps this test to the freeze story.
    await w.owner.patch(`/api/alert-settings/rooms/${w.garageId}`).send({ set: { outOfBandHours: 24 } }).expect(200);
    await addBatch(w, w.garageId, T0 - 48 * HOUR);
    await addReadings(w.t, w.loggerId, Array.from({ length: 12 * 6 + 1 }, (_, i) => ({ t: T0 - 12 * HOUR + i * 10 * MIN, c: 6 })));
    await run(w, w.loggerId, T0, T0 + 26 * HOUR, 20, garage, { t: T0 });
  }, 240_000);
  afterAll(() => w.close());

  it('tells each person three times: opened (before the crossing), one reminder, resolved', async () => {
    for (const email of Object.values(w.emails)) {
      const mine = mailTo(w.t.mail.messages, email);
      expect(mine.map((m) => m.subject)).toEqual([
        'Freeze risk: East garage · Hollowmere Grafts',
        'Still open: freeze risk, East garage · Hollowmere Grafts',
        'Resolved: freeze risk, East garage · Hollowmere Grafts',
      ]);
    }
    const rows = await outboxRows(w.nurseryId);
    const [opened, reminder, resolved] = rows.filter((r) => r.toAddress === w.emails.owner);
    // Sent (on the test's clock) hours before the room reached −2 °C at T0 + 16 h.
    expect(opened.sentAt!.getTime()).toBeLessThan(T0 + 16 * HOUR - 3 * HOUR);
    expect(reminder.sentAt!.getTime() - opened.sentAt!.getTime()).toBe(12 * HOUR);
    expect(resolved.sentAt!.getTime()).toBeGreaterThan(T0 + 20 * HOUR);
    expect(rows.every((r) => r.status === 'sent' && r.attempts === 1)).toBe(true);
  });

  it('the alert opened as a trend warning, escalated to critical at the crossing, and ended cleared', async () => {
    const alerts = await Alert.findAll({ where: { nurseryId: w.nurseryId } });
    expect(alerts).toHaveLength(1);
    const [alert] = alerts;
    expect(alert).toMatchObject({ rule: 'freeze_risk', subjectKind: 'room', subjectId: w.garageId, severity: 'critical', status: 'resolved', resolution: 'cleared', remindersSent: 1 });
  });

  it('the first message says what, where, since when, the value and trend, the batch at stake, what to check, with a room link and heating cautions', () => {
    const [first] = mailTo(w.t.mail.messages, w.emails.owner);
    for (const part of [first.text, first.html]) {
      expect(part).toMatch(/The trend of the last 6\.0 h reaches the freeze limit of −2\.0 °C around/);
      expect(part).toContain('East garage');
      expect(part).toMatch(/Since/);
      expect(part).toMatch(/falling 0\.5 °C per hour/);
      expect(part).toMatch(/Apple, 240 grafts/);
      expect(part).toContain('What to check');
      expect(part).toContain(`${w.t.config.appOrigin}/rooms/${w.garageId}`);
      expect(part).toMatch(/rated for the space/);
      expect(part).toMatch(/unvented fuel-burning heater/);
      expect(part).toMatch(/carbon monoxide/);
      expect(part).toMatch(/local electrical and fire codes/);
    }
  });
});
