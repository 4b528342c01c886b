// Delivery that loses nothing and sends nothing twice: SMTP down then back, the app restarted in between, two app
// instances on one database. Real SMTP capture servers on loopback; the outbox and its claims in MariaDB.
import { spawn } from 'node:child_process';
import { once } from 'node:events';
import { join } from 'node:path';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { createAlertEvaluator } from '../../server/alerts/evaluate';
import { OutboxMessage } from '../../server/alerts/outboxMessage.model';
import { createOutboxSender } from '../../server/alerts/outboxSender';
import { startAlertSchedule } from '../../server/alerts/scheduler';
import { openDatabase } from '../../server/db/database';
import { initModels } from '../../server/db/models';
import { startCaptureServer, type CaptureServer } from '../../server/mail/captureServer';
import { User } from '../../server/users/user.model';
import { createMailer, type Mailer } from '../../server/mail/mailer';
import { addBatch, addReadings, deliver, HOUR, makeUser, MIN, series, T0, startAlertWorld, type AlertWorld } from './alertsFixture';

let w: AlertWorld;
let step = 0;
let previous: { batchId: number; loggerId: number } | null = null;

/** A second app instance in this process: its own Sequelize and connector pools, evaluator and sender. */
function openInstance(smtpUrl: string, clock: { now: number }) {
  const db = openDatabase(w.t.config.databaseUrl);
  const mailer = createMailer(smtpUrl, 'Coldknit <alerts@coldknit.invalid>');
  return {
    db,
    mailer,
    evaluate: createAlertEvaluator({ sequelize: db.sequelize, pool: db.pool, appOrigin: w.t.config.appOrigin }),
    sender: createOutboxSender({ sequelize: db.sequelize, mailer, clock: () => new Date(clock.now), log: () => {} }),
    async close() {
      mailer.close();
      await db.close();
    },
  };
}

/**
 * A fresh freezing room: the next evaluation opens one alert and writes one message per person. The previous room
 * is emptied first (so its logger does not fall silent); its alert's end goes into the same grouped message.
 */
async function freezingRoom() {
  const base = T0 + ++step * 10 * 24 * HOUR;
  if (previous) {
    const at = new Date(base - 4 * 24 * HOUR).toISOString();
    await w.owner.post(`/api/batches/${previous.batchId}/plant-out`).send({ at }).expect(200);
    await w.owner.post(`/api/loggers/${previous.loggerId}/move`).send({ roomId: null, at }).expect(200);
  }
  const roomId = (await w.owner.post('/api/rooms').send({ name: `Outage room ${step}`, kind: 'garage' })).body.id as number;
  const loggerId = (await w.owner.post('/api/loggers').send({ label: `OR-${step}` })).body.id as number;
  await w.owner.post(`/api/loggers/${loggerId}/move`).send({ roomId, at: new Date(base - 5 * 24 * HOUR).toISOString() }).expect(200);
  const batchId = await addBatch(w, roomId, base - 2 * 24 * HOUR);
  await addReadings(w.t, loggerId, series(base - 6 * HOUR, base + HOUR, (t) => (t > base ? -4 : 2)));
  previous = { batchId, loggerId };
  return { now: base + HOUR, roomId };
}

/** A fresh freezing room, evaluated: a clock at that moment and one message per person waiting in the outbox. */
async function evaluatedFreeze() {
  const room = await freezingRoom();
  await w.evaluate(w.nurseryId, new Date(room.now));
  return { now: room.now };
}

const pendingOrSent = async () => OutboxMessage.findAll({ where: { nurseryId: w.nurseryId }, order: [['id', 'ASC']] });

beforeAll(async () => {
  w = await startAlertWorld();
  await w.owner.post(`/api/loggers/${w.loggerId}/move`).send({ roomId: null, at: new Date(T0).toISOString() }).expect(200);
}, 120_000);
// Opening another instance binds the models to its Sequelize; put them back on the test app's after each test.
beforeEach(() => initModels(w.t.sequelize));
afterAll(async () => {
  initModels(w.t.sequelize);
  await w.close();
});

describe('SMTP down for a while, then back', () => {
  it('retries with backoff (30 s, 1 min, 2 min) and delivers each message exactly once', async () => {
    const smtp = await startCaptureServer();
    const port = smtp.port;
    await smtp.close();
    const mailer = createMailer(`smtp://127.0.0.1:${port}`, 'Coldknit <alerts@coldknit.invalid>');
    const clock = { now: 0 };
    const sender = createOutboxSender({ sequelize: w.t.sequelize, mailer, clock: () => new Date(clock.now), log: () => {} });

    const room = await freezingRoom();
    clock.now = room.now;
    await w.evaluate(w.nurseryId, new Date(room.now));
    const before = (await pendingOrSent()).filter((r) => r.status === 'pending');
    expect(before).toHaveLength(3);

    expect(await sender.runOnce()).toMatchObject({ sent: 0, retrying: 3 });
    expect(await sender.runOnce()).toMatchObject({ sent: 0, retrying: 0 }); // nothing due until the backoff ends
    for (const waitMs of [30_000, 60_000]) {
      clock.now += waitMs;
      expect(await sender.runOnce()).toMatchObject({ sent: 0, retrying: 3 });
    }
    const failing = await OutboxMessage.findAll({ where: { id: before.map((r) => r.id) } });
    expect(failing.map((r) => [r.status, r.attempts, r.nextAttemptAt.getTime() - clock.now])).toEqual(Array(3).fill(['pending', 3, 120_000]));
    expect(failing[0].lastError).toMatch(/ECONNREFUSED/);

    const back: CaptureServer = await startCaptureServer({ port });
    try {
      clock.now += 120_000;
      expect(await deliver(sender)).toBe(3);
      clock.now += 24 * HOUR;
      expect(await deliver(sender)).toBe(0);
      expect(back.messages.map((m) => m.to[0]).sort()).toEqual(Object.values(w.emails).sort());
      const after = await OutboxMessage.findAll({ where: { id: before.map((r) => r.id) } });
      expect(after.map((r) => [r.status, r.attempts])).toEqual(Array(3).fill(['sent', 4]));
    } finally {
      mailer.close();
      await back.close();
    }
  });

  it('a permanent refusal (5xx) is not retried: the row ends as failed with the server\'s answer', async () => {
    const refusing: Mailer = {
      send: async () => {
        throw Object.assign(new Error('550 5.1.1 mailbox unavailable'), { responseCode: 550 });
      },
      close: () => {},
    };
    const clock = await evaluatedFreeze();
    const sender = createOutboxSender({ sequelize: w.t.sequelize, mailer: refusing, clock: () => new Date(clock.now), log: () => {} });
    expect(await sender.runOnce()).toMatchObject({ failed: 3, retrying: 0 });
    const rows = (await pendingOrSent()).slice(-3);
    expect(rows.map((r) => [r.status, r.lastError])).toEqual(Array(3).fill(['failed', '550 5.1.1 mailbox unavailable']));
  });
});

describe('the app restarted in between', () => {
  it('messages written before a restart (SMTP down) are sent once by the restarted app', async () => {
    const smtp = await startCaptureServer();
    const port = smtp.port;
    await smtp.close();
    const clock = { now: 0 };
    const room = await freezingRoom();
    clock.now = room.now;

    const first = openInstance(`smtp://127.0.0.1:${port}`, clock);
    await first.evaluate(w.nurseryId, new Date(clock.now));
    expect(await first.sender.runOnce()).toMatchObject({ retrying: 3 });
    await first.close();

    const back = await startCaptureServer({ port });
    const second = openInstance(`smtp://127.0.0.1:${port}`, clock);
    try {
      // The restarted app evaluates again: the alert is already open, so nothing new is written.
      clock.now += 10 * MIN;
      expect(await second.evaluate(w.nurseryId, new Date(clock.now))).toMatchObject({ opened: [], messages: 0 });
      expect(await deliver(second.sender)).toBe(3);
      expect(back.messages.map((m) => m.to[0]).sort()).toEqual(Object.values(w.emails).sort());
    } finally {
      await second.close();
      await back.close();
    }
  });

  it('a sender that died mid-send keeps its row only until the lease runs out; then it is sent once', async () => {
    const smtp = await startCaptureServer();
    const clock = await evaluatedFreeze();

    // The first instance claims a row and hangs before SMTP accepts anything (a crash at that point).
    const first = openInstance(smtp.url, clock);
    let claimed: () => void;
    const inSend = new Promise<void>((resolve) => (claimed = resolve));
    const hanging = createOutboxSender({
      sequelize: first.db.sequelize, clock: () => new Date(clock.now), log: () => {},
      mailer: { send: () => (claimed(), new Promise(() => {})), close: () => {} },
    });
    void hanging.runOnce();
    await inSend;

    const second = openInstance(smtp.url, clock);
    try {
      expect(await deliver(second.sender)).toBe(2);
      clock.now += 15 * MIN + 1;
      expect(await deliver(second.sender)).toBe(1);
      expect(smtp.messages.map((m) => m.to[0]).sort()).toEqual(Object.values(w.emails).sort());
    } finally {
      await second.close();
      await smtp.close();
      await first.close();
    }
  });

  it('the at-least-once window: sent, then died before marking it — the resend carries the same Message-ID', async () => {
    const smtp = await startCaptureServer();
    const clock = await evaluatedFreeze();
    const rows = (await pendingOrSent()).filter((r) => r.status === 'pending');
    const real = createMailer(smtp.url, 'Coldknit <alerts@coldknit.invalid>');
    const headers: string[] = [];
    let delivered: () => void;
    const sentOne = new Promise<void>((resolve) => (delivered = resolve));
    const dying = createOutboxSender({
      sequelize: w.t.sequelize, clock: () => new Date(clock.now), log: () => {},
      mailer: {
        send: async (mail) => {
          headers.push((await real.send(mail)).messageId);
          delivered();
          return new Promise(() => {});
        },
        close: () => {},
      },
    });
    void dying.runOnce();
    await sentOne;
    clock.now += 15 * MIN + 1;
    const restarted = createOutboxSender({
      sequelize: w.t.sequelize, clock: () => new Date(clock.now), log: () => {},
      mailer: { send: async (mail) => (headers.push((await real.send(mail)).messageId), { messageId: mail.messageId! }), close: () => {} },
    });
    try {
      expect(await deliver(restarted)).toBe(3);
      // Two copies of the first row reached SMTP, both under the row's own Message-ID; the others once each.
      expect(headers).toEqual([rows[0].messageId, rows[0].messageId, rows[1].messageId, rows[2].messageId]);
      expect(smtp.messages).toHaveLength(4);
    } finally {
      real.close();
      await smtp.close();
    }
  });
});

describe('two app instances against one database', () => {
  it('evaluating at the same moment opens one alert and writes one message per person', async () => {
    const clock = { now: 0 };
    const room = await freezingRoom();
    clock.now = room.now;
    const a = openInstance(w.t.mail.url, clock);
    const b = openInstance(w.t.mail.url, clock);
    try {
      const before = (await pendingOrSent()).length;
      const outcomes = await Promise.all([a.evaluate(w.nurseryId, new Date(clock.now)), b.evaluate(w.nurseryId, new Date(clock.now))]);
      expect(outcomes.map((o) => o!.opened.length).sort()).toEqual([0, 1]);
      expect((await pendingOrSent()).length - before).toBe(3);
      await Promise.all([deliver(a.sender), deliver(b.sender)]);
    } finally {
      await a.close();
      await b.close();
    }
  });

  it('two senders racing over 15 messages deliver each exactly once', async () => {
    for (let i = 0; i < 12; i++) await makeUser(w.nurseryId, 'staff', `crew-${step}-${i}@example.com`);
    const smtp = await startCaptureServer();
    const clock = { now: 0 };
    const room = await freezingRoom();
    clock.now = room.now;
    const a = openInstance(smtp.url, clock);
    const b = openInstance(smtp.url, clock);
    try {
      await a.evaluate(w.nurseryId, new Date(clock.now));
      const rows = (await pendingOrSent()).filter((r) => r.status === 'pending');
      expect(rows).toHaveLength(15);
      const [sentA, sentB] = await Promise.all([deliver(a.sender), deliver(b.sender)]);
      expect(sentA + sentB).toBe(15);
      const recipients = smtp.messages.map((m) => m.to[0]);
      expect(recipients).toHaveLength(15);
      expect(new Set(recipients).size).toBe(15);
      expect((await OutboxMessage.findAll({ where: { id: rows.map((r) => r.id) } })).every((r) => r.status === 'sent' && r.attempts === 1)).toBe(true);
    } finally {
      await a.close();
      await b.close();
      await smtp.close();
    }
  });

  it('a second instance in its own process, started at the same moment: one alert, one message per person, each once', async () => {
    // Everyone in the nursery gets a message: the three of the fixture and the crew the test above added.
    const people = await User.count({ where: { nurseryId: w.nurseryId } });
    const smtp = await startCaptureServer();
    const room = await freezingRoom();
    const before = (await pendingOrSent()).length;
    const child = spawn(process.execPath, ['--import', 'tsx', join(import.meta.dirname, 'alertsInstance.ts'), w.t.config.databaseUrl, smtp.url, w.t.config.appOrigin, String(w.nurseryId), String(room.now)], {
      stdio: ['pipe', 'pipe', 'inherit'],
    });
    const lines: string[] = [];
    const exited = once(child, 'exit');
    const ready = new Promise<void>((resolve) => child.stdout.on('data', (chunk: Buffer) => {
      lines.push(...chunk.toString().split('\n').filter(Boolean));
      if (lines.includes('ready')) resolve();
    }));
    await ready;
    const mailer = createMailer(smtp.url, 'Coldknit <alerts@coldknit.invalid>');
    const sender = createOutboxSender({ sequelize: w.t.sequelize, mailer, clock: () => new Date(room.now), log: () => {} });
    try {
      child.stdin.end('go\n');
      const here = await w.evaluate(w.nurseryId, new Date(room.now));
      const sentHere = await deliver(sender);
      await exited;
      const there = JSON.parse(lines.at(-1)!) as { opened: number; messages: number; sent: number };
      expect(here!.opened.length + there.opened).toBe(1);
      expect(here!.messages + there.messages).toBe(people);
      expect(sentHere + there.sent).toBe(people);
      expect((await pendingOrSent()).length - before).toBe(people);
      const recipients = smtp.messages.map((m) => m.to[0]);
      expect(recipients).toHaveLength(people);
      expect(new Set(recipients).size).toBe(people);
    } finally {
      mailer.close();
      await smtp.close();
    }
  });

  it('only one instance runs a scheduled tick at a time (GET_LOCK without waiting)', async () => {
    const a = openInstance(w.t.mail.url, { now: T0 });
    const b = openInstance(w.t.mail.url, { now: T0 });
    let release: () => void;
    const gate = new Promise<void>((resolve) => (release = resolve));
    let entered: () => void;
    const inside = new Promise<void>((resolve) => (entered = resolve));
    const calls: string[] = [];
    const never = '0 0 1 1 *';
    const scheduleA = startAlertSchedule({ pool: a.db.pool, pattern: never, queueDigest: async () => {}, evaluate: async () => (calls.push('a'), entered(), gate) });
    const scheduleB = startAlertSchedule({ pool: b.db.pool, pattern: never, queueDigest: async () => {}, evaluate: async () => void calls.push('b') });
    try {
      const tickA = scheduleA.tick();
      await inside;
      expect(await scheduleB.tick()).toBe(false);
      release!();
      expect(await tickA).toBe(true);
      expect(calls.every((c) => c === 'a')).toBe(true);
      expect(await scheduleB.tick()).toBe(true);
    } finally {
      scheduleA.stop();
      scheduleB.stop();
      await a.close();
      await b.close();
    }
  });
});
