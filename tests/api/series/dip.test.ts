// The promise of M4 on the room chart: a five-minute dip below freezing in a year of one-minute readings is on a
// 1,200-pixel chart, at its true minute (Jugel et al., PVLDB 7(10), 2014: per column first/min/max/last).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { unpackLine } from '../../../shared/series/packedLine';
import { signIn, startTestApp, type TestApp } from '../../support/testApp';
import { roomWithLogger, storeReadings } from './storedReadings';

const MINUTE = 60_000;
const YEAR_MINUTES = 525_600;
const START = Date.UTC(2025, 10, 1);
/** Readings of the dip, minute by minute; the rest of the year stays between 2 and 6 °C. */
const DIP = [-0.4, -1.3, -2.15, -1.1, -0.3];
const DIP_AT = 1 + Math.floor(Math.random() * (YEAR_MINUTES - DIP.length - 1));

const calm = (i: number) => 4 + 2 * Math.sin((2 * Math.PI * i) / 1440);

describe(`a year of one-minute readings with a 5-minute dip at minute ${DIP_AT}`, () => {
  let t: TestApp;
  let owner: Awaited<ReturnType<typeof signIn>>;
  let roomId: number;
  beforeAll(async () => {
    t = await startTestApp();
    owner = await signIn(t.app, 'owner@example.com');
    const nurseryId = (await owner.get('/api/auth/me')).body.nursery.id;
    const placed = await roomWithLogger(owner, new Date(START));
    roomId = placed.roomId;
    await storeReadings(t.pool, nurseryId, placed.loggerId, YEAR_MINUTES, (i) => {
      const k = i - DIP_AT;
      return { t: START + i * MINUTE, c: k >= 0 && k < DIP.length ? DIP[k] : calm(i) };
    });
  });
  afterAll(() => t.close());

  const chart = async (from: number, to: number, width: number) => {
    const res = await owner.get(`/api/rooms/${roomId}/series`).query({ from: new Date(from).toISOString(), to: new Date(to).toISOString(), width });
    expect(res.status).toBe(200);
    return res.body;
  };

  it('the whole year on 1,200 px keeps the lowest reading at its true instant, in at most 4 × 1,200 points', async () => {
    const body = await chart(START, START + YEAR_MINUTES * MINUTE - 1, 1200);
    expect(body.loggers).toHaveLength(1);
    const line = unpackLine(body.loggers[0].temperature);
    expect(line.length).toBeLessThanOrEqual(4 * 1200);
    const lowest = line.reduce((a, b) => (b.v! < a.v! ? b : a));
    expect(lowest).toEqual({ t: START + (DIP_AT + 2) * MINUTE, v: -2.15 });
    // Nothing was made up: every point is a stored reading at its own minute.
    expect(line.every((p) => p.v !== null && (p.t - START) % MINUTE === 0)).toBe(true);
    expect(body.loggers[0].humidity).toBeNull();
  });

  it('a second request answers the same from the stored blocks', async () => {
    const [a, b] = [await chart(START, START + YEAR_MINUTES * MINUTE - 1, 1200), await chart(START, START + YEAR_MINUTES * MINUTE - 1, 1200)];
    expect(b.loggers[0].temperature).toEqual(a.loggers[0].temperature);
  });

  it('the day around the dip on 1,200 px shows each of its five readings', async () => {
    const dipStart = START + DIP_AT * MINUTE;
    const body = await chart(dipStart - 12 * 60 * MINUTE, dipStart + 12 * 60 * MINUTE - 1, 1200);
    const line = unpackLine(body.loggers[0].temperature);
    const below = line.filter((p) => p.v! < 0);
    expect(below).toEqual(DIP.map((v, k) => ({ t: dipStart + k * MINUTE, v })));
  });
});
