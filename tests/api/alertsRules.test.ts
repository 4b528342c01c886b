// Each rule fires and clears through the real evaluator, database and SMTP capture server. Every test gets a room,
// a logger and a batch of its own, on days of its own, and leaves them empty afterwards.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AlertRule } from '../../shared/alerts/rules';
import { Alert } from '../../server/alerts/alert.model';
import { addBatch, addReadings, deliver, HOUR, MIN, series, T0, startAlertWorld, type AlertWorld } from './alertsFixture';

let w: AlertWorld;
let day = 0;

interface Scene {
  base: number;
  roomId: number;
  roomName: string;
  loggerId: number;
  batchId: number;
}

async function scene(): Promise<Scene> {
  const base = T0 + ++day * 10 * 24 * HOUR;
  const roomName = `Rule room ${day}`;
  const roomId = (await w.owner.post('/api/rooms').send({ name: roomName, kind: 'cellar' })).body.id as number;
  const loggerId = (await w.owner.post('/api/loggers').send({ label: `RR-${day}` })).body.id as number;
  await w.owner.post(`/api/loggers/${loggerId}/move`).send({ roomId, at: new Date(base - 5 * 24 * HOUR).toISOString() }).expect(200);
  const batchId = await addBatch(w, roomId, base - 2 * 24 * HOUR);
  return { base, roomId, roomName, loggerId, batchId };
}

/** Empties the scene's room so nothing of it lingers into the next test's days. */
async function leave(s: Scene, at: number) {
  await w.owner.post(`/api/batches/${s.batchId}/plant-out`).send({ at: new Date(at).toISOString() }).expect(200);
  await w.owner.post(`/api/loggers/${s.loggerId}/move`).send({ roomId: null, at: new Date(at).toISOString() }).expect(200);
  await evaluateAt(at + MIN);
}

async function evaluateAt(now: number) {
  w.clock.now = now;
  await w.evaluate(w.nurseryId, new Date(now));
  await deliver(w.sender);
}

const alertOf = (rule: AlertRule, subjectKind: string, subjectId: number) =>
  Alert.findAll({ where: { nurseryId: w.nurseryId, rule, subjectKind, subjectId }, order: [['id', 'ASC']] });

/** Sections of captured mail to one person that are about this heading ("Freeze risk: Rule room 1"). */
const sectionsFor = (email: string, heading: string) =>
  w.t.mail.messages.filter((m) => m.to.includes(email) && m.text.includes(heading)).map((m) => {
    const start = m.text.indexOf(heading);
    return m.text.slice(start, start + heading.length + 60).split('\n')[0];
  });

beforeAll(async () => {
  w = await startAlertWorld();
  // The fixture's garage logger is not part of these scenes.
  await w.owner.post(`/api/loggers/${w.loggerId}/move`).send({ roomId: null, at: new Date(T0).toISOString() }).expect(200);
}, 120_000);
afterAll(() => w.close());

describe('rules fire and clear', () => {
  it('freeze risk: −3 °C for an hour fires (critical, everyone told, viewer included); back to +3 °C clears it', async () => {
    const s = await scene();
    await addReadings(w.t, s.loggerId, series(s.base - 12 * HOUR, s.base, () => 3));
    await addReadings(w.t, s.loggerId, series(s.base + 10 * MIN, s.base + HOUR, () => -3));
    await evaluateAt(s.base + HOUR);
    const [alert] = await alertOf('freeze_risk', 'room', s.roomId);
    expect(alert).toMatchObject({ status: 'open', severity: 'critical', since: new Date(s.base + 10 * MIN) });
    for (const email of Object.values(w.emails)) expect(sectionsFor(email, `Freeze risk: ${s.roomName}`)).toHaveLength(1);

    await addReadings(w.t, s.loggerId, series(s.base + HOUR + 10 * MIN, s.base + 7 * HOUR, () => 3));
    await evaluateAt(s.base + 7 * HOUR);
    await alert.reload();
    expect(alert).toMatchObject({ status: 'resolved', resolution: 'cleared' });
    expect(w.t.mail.messages.filter((m) => m.to.includes(w.emails.viewer) && m.subject.startsWith(`Resolved: freeze risk, ${s.roomName}`))).toHaveLength(1);
    await leave(s, s.base + 8 * HOUR);
  });

  it('outside the band: 8 h at 9 °C (above apple\'s 7.2 °C) fires for the batch, not for the viewer; 6 h in the window clears it', async () => {
    const s = await scene();
    await addReadings(w.t, s.loggerId, series(s.base - 12 * HOUR, s.base, () => 4));
    await addReadings(w.t, s.loggerId, series(s.base + 10 * MIN, s.base + 8 * HOUR, () => 9));
    await evaluateAt(s.base + 8 * HOUR);
    const [alert] = await alertOf('out_of_band', 'batch', s.batchId);
    expect(alert.status).toBe('open');
    expect(alert.detail.hoursAbove).toBeGreaterThan(6);
    const heading = `Outside the band: ${(await w.owner.get(`/api/batches/${s.batchId}`)).body.code}`;
    expect(sectionsFor(w.emails.owner, heading)).toHaveLength(1);
    expect(sectionsFor(w.emails.viewer, heading)).toHaveLength(0);

    // 20 h later the last 24 h hold under 6 h above the band (the joined line leaves it 5 min after the last 4 °C reading).
    await addReadings(w.t, s.loggerId, series(s.base + 8 * HOUR + 10 * MIN, s.base + 28 * HOUR, () => 4));
    await evaluateAt(s.base + 28 * HOUR);
    await alert.reload();
    expect(alert.status).toBe('resolved');
    await leave(s, s.base + 29 * HOUR);
  });

  it('too warm for cold storage: fires after 2 h above apple\'s 10 °C limit, clears 15 min after it is back under', async () => {
    const s = await scene();
    await addReadings(w.t, s.loggerId, series(s.base - 12 * HOUR, s.base, () => 5));
    await addReadings(w.t, s.loggerId, series(s.base + 10 * MIN, s.base + 3 * HOUR, () => 11));
    await evaluateAt(s.base + 90 * MIN);
    expect(await alertOf('storage_warm', 'room', s.roomId)).toHaveLength(0);
    await evaluateAt(s.base + 3 * HOUR);
    const [alert] = await alertOf('storage_warm', 'room', s.roomId);
    expect(alert).toMatchObject({ status: 'open', severity: 'warning', since: new Date(s.base + 10 * MIN) });
    expect(sectionsFor(w.emails.staff, `Too warm for cold storage: ${s.roomName}`)).toHaveLength(1);

    await addReadings(w.t, s.loggerId, series(s.base + 3 * HOUR + 10 * MIN, s.base + 3 * HOUR + 30 * MIN, () => 5));
    await evaluateAt(s.base + 3 * HOUR + 30 * MIN);
    await alert.reload();
    expect(alert.status).toBe('resolved');
    await leave(s, s.base + 4 * HOUR);
  });

  it('silent logger: no reading for more than 26 h fires; the next reading clears it', async () => {
    const s = await scene();
    await addReadings(w.t, s.loggerId, series(s.base - 12 * HOUR, s.base, () => 3));
    await evaluateAt(s.base + 26 * HOUR);
    expect(await alertOf('silent_logger', 'logger', s.loggerId)).toHaveLength(0);
    await evaluateAt(s.base + 27 * HOUR);
    const [alert] = await alertOf('silent_logger', 'logger', s.loggerId);
    expect(alert).toMatchObject({ status: 'open', since: new Date(s.base + 26 * HOUR) });
    expect(sectionsFor(w.emails.owner, `Logger silent: RR-${day} in ${s.roomName}`)).toHaveLength(1);

    await addReadings(w.t, s.loggerId, [{ t: s.base + 27 * HOUR + 30 * MIN, c: 3 }]);
    await evaluateAt(s.base + 27 * HOUR + 40 * MIN);
    await alert.reload();
    expect(alert.status).toBe('resolved');
    await leave(s, s.base + 28 * HOUR);
  });

  it('exposure budget: off until the owner sets one; 11.85 °C·h below the band against 10 fires; raising it to 50 clears it', async () => {
    const s = await scene();
    await addReadings(w.t, s.loggerId, series(s.base - 12 * HOUR, s.base, () => 3));
    // The joined line runs from 3 °C to −1 °C over the first 10 min, crossing 0 °C after 7.5 min: a 2.5-min triangle
    // 1 °C deep (1/48 °C·h), then 11 h 50 min at −1 °C: 11.854 °C·h below apple's band (the area, REFERENCES §4b).
    await addReadings(w.t, s.loggerId, series(s.base + 10 * MIN, s.base + 12 * HOUR, () => -1));
    await evaluateAt(s.base + 12 * HOUR);
    expect(await alertOf('exposure_budget', 'batch', s.batchId)).toHaveLength(0);

    await w.owner.patch('/api/alert-settings').send({ set: { exposureBudgetDegreeHours: 10 } }).expect(200);
    await evaluateAt(s.base + 12 * HOUR + 10 * MIN);
    const [alert] = await alertOf('exposure_budget', 'batch', s.batchId);
    expect(alert.status).toBe('open');
    expect(alert.detail.degreeHours).toBeCloseTo(11 + 50 / 60 + 1 / 48, 6);

    await w.owner.patch('/api/alert-settings').send({ set: { exposureBudgetDegreeHours: 50 } }).expect(200);
    await evaluateAt(s.base + 12 * HOUR + 20 * MIN);
    await alert.reload();
    expect(alert).toMatchObject({ status: 'resolved', resolution: 'cleared' });
    await w.owner.patch('/api/alert-settings').send({ reset: ['exposureBudgetDegreeHours'] }).expect(200);
    await leave(s, s.base + 13 * HOUR);
  });

  it('a subject no longer watched ends its alert as such: planting the batch out resolves its open band alert', async () => {
    const s = await scene();
    await addReadings(w.t, s.loggerId, series(s.base - 12 * HOUR, s.base + 8 * HOUR, (t) => (t > s.base ? 9 : 4)));
    await evaluateAt(s.base + 8 * HOUR);
    const [alert] = await alertOf('out_of_band', 'batch', s.batchId);
    expect(alert.status).toBe('open');
    await leave(s, s.base + 9 * HOUR);
    await alert.reload();
    expect(alert).toMatchObject({ status: 'resolved', resolution: 'unwatched' });
  });
});
