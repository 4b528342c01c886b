// The alerts API (list, filters, history of a room, summary, acknowledge), thresholds and subscriptions, grouping
// of one evaluation's alerts per recipient, the daily digest, and evaluation after an import.
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startAlerting } from '../../server/alerts/alerting';
import { queueDigestIfDue } from '../../server/alerts/dailyDigest';
import { addBatch, addReadings, deliver, HOUR, MIN, series, T0, startAlertWorld, type AlertWorld } from './alertsFixture';

let w: AlertWorld;
let step = 0;
let placed: { batchId: number; loggerId: number }[] = [];

/** Empties the rooms earlier tests filled, so their loggers do not fall silent into later tests' days. */
async function emptyRooms(at: number) {
  if (!placed.length) return;
  for (const p of placed) {
    await w.owner.post(`/api/batches/${p.batchId}/plant-out`).send({ at: new Date(at).toISOString() }).expect(200);
    await w.owner.post(`/api/loggers/${p.loggerId}/move`).send({ roomId: null, at: new Date(at).toISOString() }).expect(200);
  }
  placed = [];
  await evaluateAt(at + MIN);
}

async function evaluateAt(now: number) {
  w.clock.now = now;
  const outcome = await w.evaluate(w.nurseryId, new Date(now));
  await deliver(w.sender);
  return outcome!;
}

/** A room with its own logger and an apple batch: 3 °C, then `curve` (of hours after the base instant of its days). */
async function room(name: string, curve: (hours: number) => number, hours = 1, keepOthers = false) {
  const base = T0 + ++step * 10 * 24 * HOUR;
  if (!keepOthers) await emptyRooms(base - 4 * 24 * HOUR);
  const roomId = (await w.owner.post('/api/rooms').send({ name, kind: 'garage' })).body.id as number;
  const loggerId = (await w.owner.post('/api/loggers').send({ label: `API-${step}` })).body.id as number;
  await w.owner.post(`/api/loggers/${loggerId}/move`).send({ roomId, at: new Date(base - 5 * 24 * HOUR).toISOString() }).expect(200);
  const batchId = await addBatch(w, roomId, base - 2 * 24 * HOUR);
  placed.push({ batchId, loggerId });
  await addReadings(w.t, loggerId, series(base - 6 * HOUR, base + hours * HOUR, (t) => (t > base ? curve((t - base) / HOUR) : 3)));
  return { base, roomId, loggerId, batchId };
}

const newMail = (since: number, email: string) => w.t.mail.messages.slice(since).filter((m) => m.to.includes(email));

beforeAll(async () => {
  w = await startAlertWorld();
  await w.owner.post(`/api/loggers/${w.loggerId}/move`).send({ roomId: null, at: new Date(T0).toISOString() }).expect(200);
  // Hours below 0 °C would also put the apple batches outside their band; that rule has its own tests (alertsRules).
  await w.owner.patch('/api/alert-settings').send({ set: { outOfBandHours: 24 } }).expect(200);
}, 120_000);
afterAll(() => w.close());

describe('one evaluation, one message per person', () => {
  it('two rooms freezing at once reach each person in a single message naming both', async () => {
    const a = await room('Shed A', () => -4);
    const b = await room('Shed B', () => -4, 1, true);
    // Room A's days lie earlier: bring its logger up to B's time so both freeze in the same evaluation.
    await addReadings(w.t, a.loggerId, series(b.base - HOUR, b.base + HOUR, () => -4));
    const mark = w.t.mail.messages.length;
    const outcome = await evaluateAt(b.base + HOUR);
    expect(outcome.opened).toHaveLength(2);
    for (const email of Object.values(w.emails)) {
      const [only, ...rest] = newMail(mark, email);
      expect(rest).toHaveLength(0);
      expect(only.subject).toMatch(/^Freeze risk: Shed [AB] \(\+1 more\) · Hollowmere Grafts$/);
      expect(only.text).toContain('Freeze risk: Shed A');
      expect(only.text).toContain('Freeze risk: Shed B');
      expect(only.text).toContain('2 new alerts.');
    }
  });
});

describe('alerts API', () => {
  it('lists with filters, a room\'s history, the open count, and acknowledgement by staff', async () => {
    const summary = (await w.viewer.get('/api/alerts/summary').expect(200)).body;
    expect(summary).toEqual({ open: 2 });
    const open = (await w.viewer.get('/api/alerts?status=open&rule=freeze_risk').expect(200)).body;
    expect(open.alerts).toHaveLength(2);
    const shedA = open.alerts.find((a: { subjectName: string }) => a.subjectName === 'Shed A');
    const history = (await w.viewer.get(`/api/alerts?roomId=${shedA.roomId}`).expect(200)).body;
    expect(history.alerts.map((a: { id: number }) => a.id)).toEqual([shedA.id]);

    const acked = (await w.staff.post(`/api/alerts/${shedA.id}/acknowledge`).expect(200)).body;
    expect(acked).toMatchObject({ status: 'acknowledged', acknowledgedByName: 'Wren Staff' });
    expect((await w.viewer.get('/api/alerts/summary')).body).toEqual({ open: 1 });
    // Twice is harmless; the first name and time stay.
    expect((await w.owner.post(`/api/alerts/${shedA.id}/acknowledge`).expect(200)).body.acknowledgedAt).toBe(acked.acknowledgedAt);
    expect((await w.viewer.get('/api/alerts?status=acknowledged')).body.alerts.map((a: { id: number }) => a.id)).toEqual([shedA.id]);
  });

  it('pages back through history and refuses bad filters', async () => {
    const page = (await w.viewer.get('/api/alerts?limit=1').expect(200)).body;
    expect(page.alerts).toHaveLength(1);
    const next = (await w.viewer.get(`/api/alerts?limit=1&before=${page.nextBefore}`).expect(200)).body;
    expect(next.alerts[0].id).toBeLessThan(page.alerts[0].id);
    expect((await w.viewer.get('/api/alerts?status=sleeping').expect(400)).body.error.code).toBe('validation_failed');
    expect((await w.viewer.get('/api/alerts/999999').expect(404)).body.error.code).toBe('not_found');
  });

  it('an acknowledged alert gets no reminder, but everyone told still hears when it ends; a resolved one cannot be acknowledged', async () => {
    const { alerts } = (await w.viewer.get('/api/alerts?rule=freeze_risk&status=acknowledged')).body;
    const [acked] = alerts;
    const open = (await w.viewer.get('/api/alerts?status=open')).body.alerts[0];
    const mark = w.t.mail.messages.length;
    // 12 h later both rooms are still freezing: one reminder, for the unacknowledged room only.
    const latest = w.clock.now + 12 * HOUR;
    for (const a of [acked, open]) {
      const loggerId = Number((await w.owner.get('/api/loggers')).body.find((l: { roomId: number | null }) => l.roomId === a.roomId).id);
      await addReadings(w.t, loggerId, series(latest - 12 * HOUR + 10 * MIN, latest, () => -4));
    }
    expect((await evaluateAt(latest)).reminded).toEqual([open.id]);
    const [reminder] = newMail(mark, w.emails.owner);
    expect(reminder.subject).toBe(`Still open: freeze risk, ${open.subjectName} · Hollowmere Grafts`);
    expect(reminder.text).not.toContain(`Freeze risk: ${acked.subjectName}`);
    // Warm again: both end, one grouped "resolved" message each.
    for (const a of [acked, open]) {
      const loggerId = Number((await w.owner.get('/api/loggers')).body.find((l: { roomId: number | null }) => l.roomId === a.roomId).id);
      await addReadings(w.t, loggerId, series(latest + 10 * MIN, latest + 7 * HOUR, () => 4));
    }
    const mark2 = w.t.mail.messages.length;
    expect((await evaluateAt(latest + 7 * HOUR)).resolved.sort()).toEqual([acked.id, open.id].sort());
    for (const email of Object.values(w.emails)) expect(newMail(mark2, email).map((m) => m.text.includes('2 resolved.'))).toEqual([true]);
    expect((await w.staff.post(`/api/alerts/${acked.id}/acknowledge`).expect(409)).body.error.code).toBe('alert_resolved');
  });
});

describe('another nursery', () => {
  it('sees none of these alerts and reaches none of them, nor this nursery\'s room thresholds', async () => {
    const other = request.agent(w.t.app);
    await other.post('/api/auth/signup')
      .send({ nurseryName: 'Other Hollow', name: 'Pell', email: `pell-${Date.now()}@example.org`, password: 'a-long-passphrase', timeZone: 'Europe/Berlin' })
      .expect(201);
    const [mine] = (await w.owner.get('/api/alerts')).body.alerts;
    expect((await other.get('/api/alerts')).body.alerts).toEqual([]);
    expect((await other.get('/api/alerts/summary')).body).toEqual({ open: 0 });
    for (const res of [
      await other.get(`/api/alerts/${mine.id}`),
      await other.post(`/api/alerts/${mine.id}/acknowledge`),
      await other.patch(`/api/alert-settings/rooms/${mine.roomId}`).send({ set: { holdMinutes: 1 } }),
      await other.delete(`/api/alert-settings/rooms/${mine.roomId}`),
    ]) {
      expect(res.status).toBe(404);
      expect(res.body.error.code).toBe('not_found');
    }
  });
});

describe('thresholds', () => {
  it('owner sets nursery values and room overrides; reset and delete return to what is inherited; bad values are refused', async () => {
    const first = (await w.owner.patch('/api/alert-settings').send({ set: { holdMinutes: 30, reminderHours: 6 } }).expect(200)).body;
    expect(first.effective).toMatchObject({ holdMinutes: 30, reminderHours: 6, silentHours: 26 });
    const roomId = (await w.owner.get('/api/rooms')).body[0].id;
    const withRoom = (await w.owner.patch(`/api/alert-settings/rooms/${roomId}`).send({ set: { holdMinutes: 5 } }).expect(200)).body;
    expect(withRoom.rooms).toEqual([{ roomId, thresholds: { holdMinutes: 5 } }]);
    const reset = (await w.owner.patch('/api/alert-settings').send({ reset: ['holdMinutes', 'reminderHours'] }).expect(200)).body;
    expect(reset.nursery).toEqual({ outOfBandHours: 24 });
    expect(reset.effective.holdMinutes).toBe(15);
    await w.owner.delete(`/api/alert-settings/rooms/${roomId}`).expect(204);
    expect((await w.viewer.get('/api/alert-settings').expect(200)).body.rooms).toEqual([]);
    expect((await w.owner.patch('/api/alert-settings').send({ set: { holdMinutes: -5 } }).expect(400)).body.error.code).toBe('validation_failed');
    expect((await w.owner.patch('/api/alert-settings/rooms/999999').send({ set: { holdMinutes: 5 } }).expect(404)).body.error.code).toBe('not_found');
  });
});

describe('subscriptions', () => {
  it('defaults by role; a person who takes only critical freeze alerts hears of a forecast only once it is at the limit', async () => {
    expect((await w.viewer.get('/api/alert-subscriptions').expect(200)).body.levels).toMatchObject({ freeze_risk: 'all', out_of_band: 'off', daily_digest: 'off' });
    expect((await w.staff.get('/api/alert-subscriptions').expect(200)).body.levels).toMatchObject({ freeze_risk: 'all', silent_logger: 'all' });
    await w.staff.patch('/api/alert-subscriptions').send({ freeze_risk: 'critical' }).expect(200);
    expect((await w.staff.patch('/api/alert-subscriptions').send({ daily_digest: 'critical' }).expect(400)).body.error.code).toBe('validation_failed');

    // Cooling 0.5 °C/h from 2 °C: the trend warns hours before −2 °C is reached at base + 8 h.
    const r = await room('Cold frame', (h) => 2 - 0.5 * h, 0);
    const mark = w.t.mail.messages.length;
    let warnedAt = 0;
    for (let now = r.base + 10 * MIN; now <= r.base + 9 * HOUR; now += 20 * MIN) {
      await addReadings(w.t, r.loggerId, series(now - 10 * MIN, now, (t) => 2 - 0.5 * ((t - r.base) / HOUR)).slice(1));
      await evaluateAt(now);
      if (!warnedAt && newMail(mark, w.emails.owner).length) warnedAt = now;
    }
    const ownerMail = newMail(mark, w.emails.owner);
    const staffMail = newMail(mark, w.emails.staff);
    expect(ownerMail).toHaveLength(1);
    expect(warnedAt).toBeLessThan(r.base + 8 * HOUR);
    expect(staffMail).toHaveLength(1);
    expect(staffMail[0].text).toMatch(/A reading of −\d\.\d °C is at or below the freeze limit/);
    await w.staff.patch('/api/alert-subscriptions').send({ freeze_risk: 'all' }).expect(200);
  });

  it('a reader who chose °F reads °F, and °F per hour as an interval', async () => {
    await w.owner.patch('/api/auth/preferences').send({ unit: 'F' }).expect(200);
    const r = await room('Porch', (h) => 3 - 0.5 * h, 7);
    const mark = w.t.mail.messages.length;
    await evaluateAt(r.base + 7 * HOUR);
    const [mail] = newMail(mark, w.emails.owner);
    // −2 °C = 28.4 °F; 0.5 °C per hour = 0.9 °F per hour (NIST SP 811 B.9: an interval of 1 °C is 1.8 °F).
    expect(mail.text).toContain('freeze limit of 28.4 °F');
    expect(mail.text).toContain('falling 0.9 °F per hour');
    await w.owner.patch('/api/auth/preferences').send({ unit: 'C' }).expect(200);
  });
});

describe('daily digest', () => {
  it('goes once per local day at or after 07:00 to those who asked, with rooms, open alerts and batches nearing full callus', async () => {
    await w.owner.patch('/api/alert-subscriptions').send({ daily_digest: 'all' }).expect(200);
    const deps = { sequelize: w.t.sequelize, pool: w.t.pool, appOrigin: w.t.config.appOrigin };
    // America/Chicago is UTC−6 in January: 12:30 UTC is 06:30 there, 13:10 UTC is 07:10.
    const day = Date.UTC(2026, 0, 20);
    const at = day + 13 * HOUR + 10 * MIN;
    // A bench held at 15 °C, inside apple's callus optimum of 13–18 °C (REFERENCES §1a, gb-online 2013), so each
    // hour counts fully: 312 of the 336 hours to full callus is 92.9 %.
    const benchId = (await w.owner.post('/api/rooms').send({ name: 'Callus bench', kind: 'back room' })).body.id as number;
    const loggerId = (await w.owner.post('/api/loggers').send({ label: 'CB-1' })).body.id as number;
    await w.owner.post(`/api/loggers/${loggerId}/move`).send({ roomId: benchId, at: new Date(at - 14 * 24 * HOUR).toISOString() }).expect(200);
    const batchId = await addBatch(w, benchId, at - 312 * HOUR);
    await addReadings(w.t, loggerId, series(at - 313 * HOUR, at, () => 15));
    const code = (await w.owner.get(`/api/batches/${batchId}`)).body.code as string;

    expect(await queueDigestIfDue(deps, w.nurseryId, new Date(day + 12.5 * HOUR))).toBe(0);
    expect(await queueDigestIfDue(deps, w.nurseryId, new Date(at))).toBe(1);
    expect(await queueDigestIfDue(deps, w.nurseryId, new Date(day + 20 * HOUR))).toBe(0);
    const mark = w.t.mail.messages.length;
    w.clock.now = at;
    await deliver(w.sender);
    const [digest] = newMail(mark, w.emails.owner);
    expect(digest.subject).toBe('Daily digest 2026-01-20 · Hollowmere Grafts');
    expect(digest.text).toMatch(/Callus bench +15\.0 °C +15\.0 °C +15\.0 °C/);
    expect(digest.text).toMatch(new RegExp(`${code} +Apple +240 +Callus bench +93 %`));
    expect(digest.text).toContain('Freeze risk: Porch');
    for (const heading of ['Rooms, last 24 hours', 'Open alerts', 'Batches nearing full callus']) expect(digest.html).toContain(heading);
    expect(newMail(mark, w.emails.staff)).toHaveLength(0);
    expect(await queueDigestIfDue(deps, w.nurseryId, new Date(at + 24 * HOUR))).toBe(1);
    await w.owner.patch('/api/alert-subscriptions').send({ daily_digest: 'off' }).expect(200);
    placed.push({ batchId, loggerId });
  });
});

describe('evaluation after an import', () => {
  it('an uploaded file of freezing readings opens the alert before the upload answers, and the sender mails it', async () => {
    const now = Date.now();
    await emptyRooms(now - 4 * HOUR);
    const alerting = startAlerting({ sequelize: w.t.sequelize, pool: w.t.pool, mailer: w.mailer, appOrigin: w.t.config.appOrigin, schedule: '0 0 1 1 *' });
    try {
      const roomId = (await w.owner.post('/api/rooms').send({ name: 'Import shed', kind: 'garage' })).body.id as number;
      const loggerId = (await w.owner.post('/api/loggers').send({ label: 'IMP-A' }).expect(201)).body.id;
      await w.owner.post(`/api/loggers/${loggerId}/move`).send({ roomId, at: new Date(now - 3 * HOUR).toISOString() }).expect(200);
      await addBatch(w, roomId, now - 3 * 24 * HOUR);
      const rows = Array.from({ length: 13 }, (_, i) => `${new Date(now - (12 - i) * 10 * MIN).toISOString()},${i < 6 ? '3.0' : '-4.0'}`);
      const mark = w.t.mail.messages.length;
      await w.staff.post('/api/imports').field('logger', 'IMP-A').attach('file', Buffer.from(['Time,Temperature (°C)', ...rows].join('\n')), 'shed.csv').expect(201);
      const open = (await w.viewer.get(`/api/alerts?roomId=${roomId}&status=open`)).body.alerts;
      expect(open).toMatchObject([{ rule: 'freeze_risk', severity: 'critical' }]);
      for (let i = 0; i < 50 && !newMail(mark, w.emails.viewer).length; i++) await new Promise((r) => setTimeout(r, 100));
      expect(newMail(mark, w.emails.viewer).map((m) => m.subject)).toEqual(['Freeze risk: Import shed · Hollowmere Grafts']);
    } finally {
      await alerting.stop();
    }
  });
});
