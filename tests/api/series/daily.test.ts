// The day table beside the chart: lowest and highest per day of the nursery's calendar. A zone a quarter hour off a
// half hour (UTC+05:45) puts each local midnight inside a 30-minute block; the days are checked against luxon's own calendar grouping.
import { DateTime } from 'luxon';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from '../../support/testApp';
import { roomWithLogger, storeReadings, type Row } from './storedReadings';

const MINUTE = 60_000;
const DAY = 24 * 60 * MINUTE;
const START = Date.UTC(2026, 0, 5);
const ZONE = 'Asia/Kathmandu';
const iso = (t: number) => new Date(t).toISOString();
/** Ten-minute readings with repeats, so ties must resolve to the earliest reading. */
const reading = (i: number): Row => ({ t: START + i * 10 * MINUTE, c: ((i * 7919) % 113) / 10 - 3 });
const COUNT = 3 * 144;

describe(`daily extremes in ${ZONE}`, () => {
  let t: TestApp;
  let owner: ReturnType<typeof request.agent>;
  let roomId: number;
  beforeAll(async () => {
    t = await startTestApp({ seed: false });
    owner = request.agent(t.app);
    const signup = await owner.post('/api/auth/signup').send({ nurseryName: 'Quarter Hour Grafts', name: 'Ravi Menon', email: 'ravi@example.org', password: 'a-long-passphrase', timeZone: ZONE });
    const placed = await roomWithLogger(owner, new Date(START));
    roomId = placed.roomId;
    await storeReadings(t.pool, signup.body.nursery.id, placed.loggerId, COUNT, reading);
  });
  afterAll(() => t.close());

  it('match a grouping of the readings by local calendar day', async () => {
    const expected = new Map<string, { min: Row; max: Row }>();
    for (let i = 0; i < COUNT; i++) {
      const r = reading(i);
      const day = DateTime.fromMillis(r.t, { zone: ZONE }).toISODate()!;
      const e = expected.get(day);
      if (!e) expected.set(day, { min: r, max: r });
      else {
        if (r.c < e.min.c) e.min = r;
        if (r.c > e.max.c) e.max = r;
      }
    }
    const res = await owner.get(`/api/rooms/${roomId}/daily`).query({ from: iso(START), to: iso(START + 3 * DAY - 1) });
    expect(res.status).toBe(200);
    expect(res.body.timeZone).toBe(ZONE);
    expect(res.body.days.map((d: { date: string }) => d.date)).toEqual(['2026-01-05', '2026-01-06', '2026-01-07', '2026-01-08']);
    for (const day of res.body.days) {
      const e = expected.get(day.date)!;
      expect(day.loggers).toEqual([
        { id: expect.any(Number), label: expect.any(String), min: { t: iso(e.min.t), c: Number(e.min.c.toFixed(4)) }, max: { t: iso(e.max.t), c: Number(e.max.c.toFixed(4)) } },
      ]);
    }
  });

  it('list days without readings with no loggers', async () => {
    const res = await owner.get(`/api/rooms/${roomId}/daily`).query({ from: iso(START - 2 * DAY), to: iso(START - 1) });
    expect(res.body.days.map((d: { loggers: unknown[] }) => d.loggers)).toEqual([[], [], []]);
  });
});
