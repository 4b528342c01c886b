// The overview in one call: rooms needing attention first, latest readings with their age limit, the last day's low
// and high, a week's sparkline, and stored batches with their headline exposure and callus progress.
import { DateTime } from 'luxon';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { unpackLine } from '../../../shared/series/packedLine';
import { startTestApp, type TestApp } from '../../support/testApp';
import { roomWithLogger, storeReadings } from './storedReadings';

const MINUTE = 60_000;
const DAY = 24 * 60 * MINUTE;
const STEP = 10 * MINUTE;
const iso = (t: number) => new Date(t).toISOString();

describe('overview of a nursery', () => {
  let t: TestApp;
  let owner: ReturnType<typeof request.agent>;
  let body: {
    rooms: {
      name: string; attention: string; concerns: { level: string; message: string }[];
      loggers: { latest: { t: string; c: number } | null; intervalMinutes: number | null; staleAfterMinutes: number }[];
      last24h: { low: { t: string; c: number; logger: string } | null; high: { c: number } | null };
      sparkline: { label: string; temperature: { dt: number[]; v: (number | null)[] } }[];
      batches: { code: string; worst: { minC: number | null } | null; callusPct: number | null }[];
    }[];
  };
  const last = Math.floor(Date.now() / STEP) * STEP - STEP;
  const room = (name: string) => body.rooms.find((r) => r.name === name)!;

  beforeAll(async () => {
    t = await startTestApp({ seed: false });
    owner = request.agent(t.app);
    const signup = await owner.post('/api/auth/signup').send({ nurseryName: 'Overview Grafts', name: 'Ada Quill', email: 'ada@example.org', password: 'a-long-passphrase', timeZone: 'Europe/Berlin' });
    const nurseryId = signup.body.nursery.id;
    const since = new Date(last - 8 * DAY);
    const named = async (name: string) => {
      const placed = await roomWithLogger(owner, since);
      await owner.patch(`/api/rooms/${placed.roomId}`).send({ name });
      return placed;
    };
    const twoDays = 2 * 144;
    // Icy: the latest reading is −3 °C, below the −2 °C freeze limit.
    const icy = await named('Icy');
    await storeReadings(t.pool, nurseryId, icy.loggerId, twoDays, (i) => ({ t: last - (twoDays - 1 - i) * STEP, c: i === twoDays - 1 ? -3 : 1.5 }));
    // Quiet: nothing for three days.
    const quiet = await named('Quiet');
    await storeReadings(t.pool, nurseryId, quiet.loggerId, 144, (i) => ({ t: last - 3 * DAY - (143 - i) * STEP, c: 2 }));
    // Warm: a steady 5 °C with a batch of apple grafts inside its band.
    const warm = await named('Warm');
    await storeReadings(t.pool, nurseryId, warm.loggerId, twoDays, (i) => ({ t: last - (twoDays - 1 - i) * STEP, c: 5 }));
    const batch = await owner.post('/api/batches').send({
      species: 'apple', scionCultivar: 'Test Russet', rootstock: 'M.106', method: 'whip-and-tongue', count: 40, roomId: warm.roomId,
      graftedOn: DateTime.fromMillis(last - 2 * DAY).toISODate(), placedAt: iso(last - DAY),
    });
    expect(batch.status).toBe(201);
    await owner.post('/api/rooms').send({ name: 'Empty', kind: 'other' });

    const res = await owner.get('/api/overview');
    expect(res.status).toBe(200);
    body = res.body;
  });
  afterAll(() => t.close());

  it('puts the rooms needing attention first: freezing, then silent, then fine, then unused', () => {
    expect(body.rooms.map((r) => [r.name, r.attention])).toEqual([['Icy', 'alarm'], ['Quiet', 'warn'], ['Warm', 'ok'], ['Empty', 'idle']]);
    expect(room('Icy').concerns[0].message).toMatch(/-3\.0 °C, below the freeze limit of -2\.0 °C/);
  });

  it('gives each logger its latest reading, its interval and when it counts as stale', () => {
    expect(room('Icy').loggers).toEqual([{ id: expect.any(Number), label: expect.any(String), latest: { t: iso(last), c: -3, rh: null }, intervalMinutes: 10, staleAfterMinutes: 26 * 60 }]);
    expect(room('Quiet').loggers[0].latest!.t).toBe(iso(last - 3 * DAY));
    expect(room('Empty').loggers).toEqual([]);
  });

  it("gives the last 24 h low and high with when and where, and a week's sparkline keeping the low", () => {
    expect(room('Icy').last24h.low).toEqual({ t: iso(last), c: -3, logger: expect.any(String) });
    expect(room('Icy').last24h.high!.c).toBe(1.5);
    expect(room('Quiet').last24h).toEqual({ low: null, high: null });
    const spark = unpackLine(room('Icy').sparkline[0].temperature);
    expect(spark.length).toBeLessThanOrEqual(4 * 150);
    expect(spark.at(-1)).toEqual({ t: last, v: -3 });
  });

  it('lists batches stored in a room with their worst exposure and callus progress', () => {
    const [batch] = room('Warm').batches;
    expect(batch.code).toEqual(expect.any(String));
    expect(batch.worst!.minC).toBe(5);
    expect(batch.callusPct).toBeGreaterThan(0);
    expect(room('Icy').batches).toEqual([]);
  });
});
