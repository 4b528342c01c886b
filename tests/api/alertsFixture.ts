// A nursery of its own for alert tests: people of each role, a garage with a logger, a clock the test moves,
// an evaluator and an outbox sender delivering to the loopback capture server.
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { createAlertEvaluator, type AlertEvaluator } from '../../server/alerts/evaluate';
import { createOutboxSender, type OutboxSender } from '../../server/alerts/outboxSender';
import { OutboxMessage } from '../../server/alerts/outboxMessage.model';
import { hashPassword } from '../../server/auth/password';
import type { CapturedMail } from '../../server/mail/captureServer';
import { createMailer, type Mailer } from '../../server/mail/mailer';
import { sqlInstant } from '../../server/readings/readingStore';
import { User } from '../../server/users/user.model';
import { signIn, startTestApp, type TestApp } from '../support/testApp';

export const MIN = 60_000;
export const HOUR = 60 * MIN;
/** An invented winter evening in the nursery's zone (America/Chicago, UTC−6): 18:00 UTC is noon there. */
export const T0 = Date.UTC(2025, 0, 14, 18);
export const PASSWORD = 'alert-test-password';

export type Agent = TestAgent | ReturnType<typeof request.agent>;

export interface AlertWorld {
  t: TestApp;
  owner: Agent;
  staff: Agent;
  viewer: Agent;
  emails: { owner: string; staff: string; viewer: string };
  nurseryId: number;
  garageId: number;
  loggerId: number;
  /** The test's clock: evaluations and the sender read it. */
  clock: { now: number };
  mailer: Mailer;
  evaluate: AlertEvaluator;
  sender: OutboxSender;
  close(): Promise<void>;
}

let counter = 0;
let passwordHash: Promise<string> | null = null;

export async function makeUser(nurseryId: number, role: 'staff' | 'viewer', email: string, unit: 'C' | 'F' = 'C') {
  passwordHash ??= hashPassword(PASSWORD);
  await User.create({ nurseryId, email, name: role === 'staff' ? 'Wren Staff' : 'Ida Viewer', role, passwordHash: await passwordHash, unit });
}

/** A fresh nursery (signed up through the API, so the owner is made the real way) with a garage and one logger in it. */
export async function startAlertWorld(): Promise<AlertWorld> {
  const t = await startTestApp({ seed: false });
  const tag = `${Date.now().toString(36)}${++counter}`;
  const emails = { owner: `owner-${tag}@example.com`, staff: `staff-${tag}@example.com`, viewer: `viewer-${tag}@example.com` };
  const signup = await request(t.app).post('/api/auth/signup')
    .send({ nurseryName: 'Hollowmere Grafts', name: 'Olive Owner', email: emails.owner, password: PASSWORD, timeZone: 'America/Chicago' });
  if (signup.status !== 201) throw new Error(`signup failed: ${signup.status} ${JSON.stringify(signup.body)}`);
  const { nurseryId } = (await User.findOne({ where: { email: emails.owner } }))!;
  await makeUser(nurseryId, 'staff', emails.staff);
  await makeUser(nurseryId, 'viewer', emails.viewer);
  const [owner, staff, viewer] = await Promise.all([signIn(t.app, emails.owner, PASSWORD), signIn(t.app, emails.staff, PASSWORD), signIn(t.app, emails.viewer, PASSWORD)]);

  const garageId = (await owner.post('/api/rooms').send({ name: 'East garage', kind: 'garage' })).body.id as number;
  const loggerId = (await owner.post('/api/loggers').send({ label: 'EG-1', serial: 'HM-0001' })).body.id as number;
  await owner.post(`/api/loggers/${loggerId}/move`).send({ roomId: garageId, at: new Date(T0 - 10 * 24 * HOUR).toISOString() }).expect(200);

  const clock = { now: T0 };
  const mailer = createMailer(t.mail.url, t.config.mailFrom);
  const evaluate = createAlertEvaluator({ sequelize: t.sequelize, pool: t.pool, appOrigin: t.config.appOrigin });
  const sender = createOutboxSender({ sequelize: t.sequelize, mailer, clock: () => new Date(clock.now), log: () => {} });
  return {
    t, owner, staff, viewer, emails, nurseryId, garageId, loggerId, clock, mailer, evaluate, sender,
    async close() {
      mailer.close();
      await t.close();
    },
  };
}

/** Readings written as an import would store them (import 0: these tests feed readings without a file). */
export async function addReadings(t: TestApp, loggerId: number, readings: { t: number; c: number }[]) {
  if (!readings.length) return;
  await t.pool.batch(
    'INSERT INTO readings (logger_id, t, c, rh, import_id) VALUES (?, ?, ?, NULL, 0)',
    readings.map((r) => [loggerId, sqlInstant(r.t), r.c.toFixed(4)]),
  );
}

/** Every `stepMin` minutes from `from` to `to` inclusive. */
export function series(from: number, to: number, c: (t: number) => number, stepMin = 10) {
  const out: { t: number; c: number }[] = [];
  for (let t = from; t <= to; t += stepMin * MIN) out.push({ t, c: c(t) });
  return out;
}

/** A batch of apple grafts placed in a room at `at` (the grafting day is that day, UTC). */
export async function addBatch(w: AlertWorld, roomId: number, at: number, species = 'apple', count = 240) {
  const res = await w.owner.post('/api/batches').send({
    species, scionCultivar: 'Quillon Russet', rootstock: 'M.111', method: 'whip-and-tongue', count,
    graftedOn: new Date(at - 6 * HOUR).toISOString().slice(0, 10), roomId, placedAt: new Date(at).toISOString(),
  });
  if (res.status !== 201) throw new Error(`batch failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.id as number;
}

/** Runs sender rounds until none sends anything (a round sends at most one batch of rows). */
export async function deliver(sender: OutboxSender) {
  let total = 0;
  for (;;) {
    const round = await sender.runOnce();
    total += round.sent;
    if (round.sent === 0) return total;
  }
}

export const mailTo = (messages: CapturedMail[], email: string) => messages.filter((m) => m.to.includes(email));

export async function outboxRows(nurseryId: number) {
  return OutboxMessage.findAll({ where: { nurseryId }, order: [['id', 'ASC']] });
}
