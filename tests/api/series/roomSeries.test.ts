// The room chart endpoint: gaps drawn as breaks, loggers that move, humidity, stored blocks kept current by later
// imports, species bands and batch moves, validation, and other nurseries kept out.
import { DateTime } from 'luxon';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { unpackLine, type PackedLine } from '../../../shared/series/packedLine';
import { signIn, startTestApp, type TestApp } from '../../support/testApp';
import { roomWithLogger, storeReadings } from './storedReadings';

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
const DAY = 24 * HOUR;
const START = Date.UTC(2026, 0, 5);
const iso = (t: number) => new Date(t).toISOString();

let t: TestApp;
let owner: Awaited<ReturnType<typeof signIn>>;
let nurseryId: number;

beforeAll(async () => {
  t = await startTestApp();
  owner = await signIn(t.app, 'owner@example.com');
  nurseryId = (await owner.get('/api/auth/me')).body.nursery.id;
});
afterAll(() => t.close());

async function chart(roomId: number, from: number, to: number, width: number) {
  const res = await owner.get(`/api/rooms/${roomId}/series`).query({ from: iso(from), to: iso(to), width });
  expect(res.status).toBe(200);
  return res.body;
}
const line = (packed: PackedLine) => unpackLine(packed);
const breaks = (packed: PackedLine) => line(packed).filter((p) => p.v === null);

describe('gaps longer than 180 minutes', () => {
  // 60 days of 10-minute readings; a 4 h hole on day 20 (longer than the limit) and a 2 h hole on day 40 (shorter).
  const hole = (i: number) => {
    const t = START + i * 10 * MINUTE;
    return (t >= START + 20 * DAY && t < START + 20 * DAY + 4 * HOUR) || (t >= START + 40 * DAY && t < START + 40 * DAY + 2 * HOUR);
  };
  let roomId: number;
  beforeAll(async () => {
    const placed = await roomWithLogger(owner, new Date(START));
    roomId = placed.roomId;
    const kept = Array.from({ length: 60 * 144 }, (_, i) => i).filter((i) => !hole(i));
    await storeReadings(t.pool, nurseryId, placed.loggerId, kept.length, (k) => ({ t: START + kept[k] * 10 * MINUTE, c: 3 + (kept[k] % 7) / 10 }));
  });

  it('break the line once on a short range drawn from the readings', async () => {
    const body = await chart(roomId, START + 19 * DAY, START + 21 * DAY, 600);
    expect(body.blockMinutes).toBeNull();
    expect(breaks(body.loggers[0].temperature)).toEqual([{ t: START + 20 * DAY + 2 * HOUR - 5 * MINUTE, v: null }]);
  });

  it('break the line once on the whole range drawn from stored blocks, and bridge the 2 h hole', async () => {
    const body = await chart(roomId, START, START + 60 * DAY - 1, 300);
    expect(body.blockMinutes).not.toBeNull();
    expect(body.maxGapMinutes).toBe(180);
    expect(breaks(body.loggers[0].temperature)).toEqual([{ t: START + 20 * DAY + 2 * HOUR - 5 * MINUTE, v: null }]);
  });
});

describe('a logger that moves between rooms', () => {
  it('appears in each room only for its time there', async () => {
    const { roomId: first, loggerId } = await roomWithLogger(owner, new Date(START));
    const second = (await owner.post('/api/rooms').send({ name: `moved-to-${Date.now()}`, kind: 'cellar' })).body.id;
    expect((await owner.post(`/api/loggers/${loggerId}/move`).send({ roomId: second, at: iso(START + DAY) })).status).toBe(200);
    await storeReadings(t.pool, nurseryId, loggerId, 2 * 144, (i) => ({ t: START + i * 10 * MINUTE, c: i < 144 ? 1 : 9 }));

    const a = await chart(first, START, START + 2 * DAY - 1, 200);
    const b = await chart(second, START, START + 2 * DAY - 1, 200);
    expect(a.loggers[0].windows).toEqual([{ from: iso(START), to: iso(START + DAY - 1) }]);
    expect(b.loggers[0].windows).toEqual([{ from: iso(START + DAY), to: iso(START + 2 * DAY - 1) }]);
    expect(new Set(line(a.loggers[0].temperature).map((p) => p.v))).toEqual(new Set([1]));
    expect(new Set(line(b.loggers[0].temperature).map((p) => p.v))).toEqual(new Set([9]));
  });
});

describe('humidity and later imports', () => {
  let roomId: number;
  let loggerId: number;
  beforeAll(async () => {
    ({ roomId, loggerId } = await roomWithLogger(owner, new Date(START)));
    await storeReadings(t.pool, nurseryId, loggerId, 90 * 144, (i) => ({ t: START + i * 10 * MINUTE, c: 2 + (i % 5) / 10, rh: 85 + (i % 9) }));
  });

  it('humidity gets its own M4 line, with its own extremes', async () => {
    const body = await chart(roomId, START, START + 90 * DAY - 1, 400);
    const rh = line(body.loggers[0].humidity);
    expect(Math.min(...rh.map((p) => p.v!))).toBe(85);
    expect(Math.max(...rh.map((p) => p.v!))).toBe(93);
  });

  it('a reading imported later into an already charted stretch shows at once', async () => {
    const before = await chart(roomId, START, START + 90 * DAY - 1, 400);
    expect(Math.min(...line(before.loggers[0].temperature).map((p) => p.v!))).toBe(2);
    const late = START + 45 * DAY + 5 * MINUTE;
    await storeReadings(t.pool, nurseryId, loggerId, 1, () => ({ t: late, c: -6.5 }));
    const after = await chart(roomId, START, START + 90 * DAY - 1, 400);
    const lowest = line(after.loggers[0].temperature).reduce((a, b) => (b.v! < a.v! ? b : a));
    expect(lowest).toEqual({ t: late, v: -6.5 });
  });
});

describe('species bands and batch moves', () => {
  it('lists the species of batches in the room over their stays, and arrivals and departures in range', async () => {
    const now = Date.now();
    const { roomId } = await roomWithLogger(owner, new Date(now - 3 * DAY));
    const other = (await owner.post('/api/rooms').send({ name: `elsewhere-${now}`, kind: 'fridge' })).body.id;
    const batch = await owner.post('/api/batches').send({
      species: 'apple', scionCultivar: 'Test Pippin', rootstock: 'M.111', method: 'cleft', count: 20, roomId,
      graftedOn: DateTime.fromMillis(now - 3 * DAY).toISODate(), placedAt: iso(now - 2 * DAY),
    });
    expect(batch.status).toBe(201);
    expect((await owner.post(`/api/batches/${batch.body.id}/move`).send({ roomId: other, at: iso(now - DAY) })).status).toBe(200);

    const body = await chart(roomId, now - 3 * DAY, now, 300);
    expect(body.species).toEqual([
      { key: 'apple', name: expect.any(String), freezeC: -2, band: { minC: 0, maxC: expect.closeTo(7.222, 3) }, spans: [{ from: iso(now - 2 * DAY), to: iso(now - DAY) }] },
    ]);
    expect(body.moves).toEqual([
      { t: iso(now - 2 * DAY), batchId: batch.body.id, code: batch.body.code, direction: 'in' },
      { t: iso(now - DAY), batchId: batch.body.id, code: batch.body.code, direction: 'out' },
    ]);
  });
});

describe('requests', () => {
  it('reject a reversed range, a tiny width and a range of decades', async () => {
    const roomId = (await owner.get('/api/rooms')).body[0].id;
    const ask = (query: Record<string, string | number>) => owner.get(`/api/rooms/${roomId}/series`).query(query);
    for (const res of [
      await ask({ from: iso(START + DAY), to: iso(START), width: 300 }),
      await ask({ from: iso(START), to: iso(START + DAY), width: 3 }),
      await ask({ from: iso(START), to: iso(START + 20 * 365 * DAY), width: 300 }),
      await ask({ from: 'yesterday', to: iso(START), width: 300 }),
    ]) {
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('validation_failed');
    }
  });

  it('answer 404 for a room of another nursery, on the chart and on the day table alike', async () => {
    const intruder = request.agent(t.app);
    await intruder.post('/api/auth/signup').send({ nurseryName: 'Elsewhere Grafts', name: 'Ona Pike', email: `ona-${Date.now()}@example.org`, password: 'a-long-passphrase', timeZone: 'Europe/Berlin' });
    const roomId = (await owner.get('/api/rooms')).body[0].id;
    const range = { from: iso(START), to: iso(START + DAY) };
    const series = await intruder.get(`/api/rooms/${roomId}/series`).query({ ...range, width: 300 });
    const daily = await intruder.get(`/api/rooms/${roomId}/daily`).query(range);
    for (const res of [series, daily]) expect([res.status, res.body.error.code]).toEqual([404, 'not_found']);
  });
});
