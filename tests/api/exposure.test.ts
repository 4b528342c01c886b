// Batch exposure through the API against readings written straight into the readings table, as the importer would.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { computeExposure, worstOf, type Exposure, type Reading } from '../../shared/exposure';
import { getSpeciesProfile } from '../../shared/species/profiles';
import { Import } from '../../server/imports/import.model';
import { sqlInstant } from '../../server/readings/readingStore';
import { signIn, startTestApp, type TestApp } from '../support/testApp';

type Agent = Awaited<ReturnType<typeof signIn>>;
const HOUR = 3_600_000;
const iso = (t: number) => new Date(t).toISOString();
const APPLE = getSpeciesProfile('apple')!;
const APPLE_OPTIONS = { band: APPLE.band, freezeC: APPLE.freezeC, callus: APPLE.callus };
const report = ({ integralCH: _i, ...rest }: Exposure) => rest;

/** Every number of an exposure report equal to 1e-9 (relative above 1), nulls alike. */
function expectClose(actual: unknown, expected: unknown, path = 'exposure'): void {
  if (typeof expected === 'number') {
    expect(typeof actual, path).toBe('number');
    expect(Math.abs((actual as number) - expected), path).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(expected)));
  } else if (expected && typeof expected === 'object') {
    expect(Object.keys(actual as object).sort(), path).toEqual(Object.keys(expected).sort());
    for (const [k, v] of Object.entries(expected)) expectClose((actual as Record<string, unknown>)[k], v, `${path}.${k}`);
  } else expect(actual, path).toEqual(expected);
}

/** The readings of a straight line through the given points at hourly-or-finer steps, clipped to [from, to]. */
function clipped(readings: Reading[], from: number, to: number): Reading[] {
  const at = (t: number) => {
    const i = readings.findIndex((r) => r.t >= t);
    const a = readings[i - 1];
    const b = readings[i];
    return b.t === t ? b.c : a.c + ((b.c - a.c) * (t - a.t)) / (b.t - a.t);
  };
  return [{ t: from, c: at(from) }, ...readings.filter((r) => r.t > from && r.t < to), { t: to, c: at(to) }];
}

describe('batch exposure: placements summed exactly, worst logger per room, callus outlook, cache', () => {
  let t: TestApp;
  let owner: Agent;
  let staff: Agent;
  let nurseryId: number;
  /** Every series here starts on this hour, twelve days back; all placements are in the past unless noted. */
  const T0 = Math.floor((Date.now() - 12 * 24 * HOUR) / HOUR) * HOUR;
  const h = (hours: number) => T0 + hours * HOUR;
  const graftedOn = new Date(T0 - 24 * HOUR).toISOString().slice(0, 10);

  async function room(name: string) {
    return (await staff.post('/api/rooms').send({ name, kind: 'other' })).body.id as number;
  }
  async function loggerIn(label: string, roomId: number, from: number) {
    const id = (await staff.post('/api/loggers').send({ label })).body.id as number;
    expect((await staff.post(`/api/loggers/${id}/move`).send({ roomId, at: iso(from) })).status).toBe(200);
    return id;
  }
  /** Stores readings for a logger under a completed import, as an import does. */
  async function store(loggerId: number, readings: Reading[]) {
    const record = await Import.create({
      nurseryId, loggerId, userId: null, tokenId: null, fileName: `test-${loggerId}.csv`, fileSha256: `${loggerId}-${readings[0].t}`.padEnd(64, '0'),
      fileBytes: 0, status: 'running', startedAt: new Date(),
    });
    await t.pool.batch(
      'INSERT INTO readings (logger_id, t, c, rh, import_id) VALUES (?, ?, ?, NULL, ?)',
      readings.map((r) => [loggerId, sqlInstant(r.t), r.c.toFixed(4), record.id]),
    );
    await record.update({ status: 'completed', finishedAt: new Date() });
  }
  async function batch(code: string, roomId: number, from: number, species = 'apple') {
    const res = await staff.post('/api/batches').send({
      code, species, scionCultivar: 'Court Pendu Plat', rootstock: 'MM.106', method: 'whip-and-tongue', count: 20, graftedOn, roomId, placedAt: iso(from),
    });
    expect(res.status).toBe(201);
    return res.body.id as number;
  }
  const exposureOf = async (id: number) => {
    const res = await staff.get(`/api/batches/${id}/exposure`);
    expect(res.status).toBe(200);
    return res.body;
  };

  beforeAll(async () => {
    t = await startTestApp();
    owner = await signIn(t.app, 'owner@example.com');
    staff = await signIn(t.app, 'staff@example.com');
    nurseryId = (await owner.get('/api/nursery')).body.id;
  });
  afterAll(() => t.close());

  describe('a batch moved from one room to another', () => {
    // Room A holds 2 °C with one cold dip to −4 °C at hour 10; room B holds 5 °C. Hourly readings over two days.
    const seriesA: Reading[] = Array.from({ length: 49 }, (_, i) => ({ t: h(i), c: i === 10 ? -4 : 2 }));
    const seriesB: Reading[] = Array.from({ length: 49 }, (_, i) => ({ t: h(i), c: 5 }));
    const [placedAt, movedAt, plantedAt] = [h(2.5), h(20.25), h(30.5)];
    let body: Awaited<ReturnType<typeof exposureOf>>;

    beforeAll(async () => {
      const [a, b] = [await room('Exposure room A'), await room('Exposure room B')];
      await store(await loggerIn('EA-1', a, h(0)), seriesA);
      await store(await loggerIn('EB-1', b, h(0)), seriesB);
      const id = await batch('EXP-MOVE', a, placedAt);
      expect((await staff.post(`/api/batches/${id}/move`).send({ roomId: b, at: iso(movedAt) })).status).toBe(200);
      expect((await staff.post(`/api/batches/${id}/plant-out`).send({ at: iso(plantedAt) })).status).toBe(200);
      body = await exposureOf(id);
    });

    it('matches figures worked out by hand (apple: band 0–7.2 °C, freeze −2 °C, callus rate T/13 between 0 and 13 °C)', () => {
      const { headline } = body;
      // Room A, 17.75 h: the dip from 2 °C at 9 h to −4 °C at 10 h and back is below 0 °C for 2 × 2/3 h, a triangle
      // 4 °C deep (8/3 °C·h), and below −2 °C for 2 × 1/3 h, 2 °C deep (2/3 °C·h). ∫T = 2 × 17.75 − 6 = 29.5.
      // Room B, 10.25 h at 5 °C: ∫T = 51.25. Mean = 80.75 / 28.
      expect(headline.hoursCovered).toBeCloseTo(28, 12);
      expect(headline.hoursMissing).toBeCloseTo(0, 12);
      expect(headline.meanC).toBeCloseTo(80.75 / 28, 12);
      expect([headline.minC, headline.maxC]).toEqual([-4, 5]);
      expect(headline.below.hours).toBeCloseTo(4 / 3, 12);
      expect(headline.below.degreeHours).toBeCloseTo(8 / 3, 12);
      expect(headline.freeze.hours).toBeCloseTo(2 / 3, 12);
      expect(headline.freeze.degreeHours).toBeCloseTo(2 / 3, 12);
      expect(headline.above).toEqual({ limitC: APPLE.band.maxC, hours: 0, degreeHours: 0 });
      // Callus: ∫max(T, 0) dt / 13 = (2 × 15.75 + 2 × 1/3 × 1 + 51.25) / 13 optimum-equivalent hours, of 336.
      const equivalent = (31.5 + 2 / 3 + 51.25) / 13;
      expect(body.progress.optimumEquivalentHours).toBeCloseTo(equivalent, 12);
      expect(body.progress.progressPct).toBeCloseTo((100 * equivalent) / 336, 12);
      expect(body.progress.outlook).toMatchObject({ status: 'none', reason: 'not_in_storage' });
    });

    it('equals the engine run over the two clipped series joined end to end, to 1e-9', () => {
      const joined = [...clipped(seriesA, placedAt, movedAt), ...clipped(seriesB, movedAt, plantedAt)];
      const expected = computeExposure(joined, { ...APPLE_OPTIONS, from: placedAt, to: plantedAt });
      expectClose(body.headline, report(expected));
      expect(body.placements.map((p: { from: string; to: string }) => [p.from, p.to])).toEqual([[iso(placedAt), iso(movedAt)], [iso(movedAt), iso(plantedAt)]]);
      expectClose(body.placements[0].headline, report(computeExposure(seriesA, { ...APPLE_OPTIONS, from: placedAt, to: movedAt })));
      expectClose(body.placements[1].loggers[0].exposure, report(computeExposure(seriesB, { ...APPLE_OPTIONS, from: movedAt, to: plantedAt })));
    });
  });

  describe('two loggers in one room', () => {
    // A cold corner (1 °C, dipping to −3 °C at hour 6) watched all along; a warm shelf (6 °C, rising to 9 °C at hour 30)
    // placed in the room only from hour 12. Batch in the room from hour 1 to hour 40.
    const cold: Reading[] = Array.from({ length: 49 }, (_, i) => ({ t: h(i), c: i === 6 ? -3 : 1 }));
    const warm: Reading[] = Array.from({ length: 49 }, (_, i) => ({ t: h(i), c: i === 30 ? 9 : 6 }));
    let body: Awaited<ReturnType<typeof exposureOf>>;
    let coldId: number;
    let warmId: number;

    beforeAll(async () => {
      const c = await room('Two-logger room');
      coldId = await loggerIn('TL-cold', c, h(0));
      warmId = await loggerIn('TL-warm', c, h(12));
      await store(coldId, cold);
      await store(warmId, warm);
      const id = await batch('EXP-TWO', c, h(1));
      await staff.post(`/api/batches/${id}/discard`).send({ at: iso(h(40)) });
      body = await exposureOf(id);
    });

    it('keeps each logger\'s own figures over the time it watched', () => {
      const [first, second] = body.placements[0].loggers;
      expect([first.label, second.label]).toEqual(['TL-cold', 'TL-warm']);
      expectClose(first.exposure, report(computeExposure(cold, { ...APPLE_OPTIONS, from: h(1), to: h(40) })));
      expectClose(second.exposure, report(computeExposure(warm, { ...APPLE_OPTIONS, from: h(12), to: h(40) })));
      expect(second.spans).toEqual([{ from: iso(h(12)), to: iso(h(40)) }]);
    });

    it('heads with the worst of them while both watched, never an average (shared worstOf), and the cold corner alone before', () => {
      const before = computeExposure(cold, { ...APPLE_OPTIONS, from: h(1), to: h(12) });
      const both = worstOf([
        computeExposure(cold, { ...APPLE_OPTIONS, from: h(12), to: h(40) }),
        computeExposure(warm, { ...APPLE_OPTIONS, from: h(12), to: h(40) }),
      ]);
      const { headline } = body;
      expect(headline.freeze.hours).toBeCloseTo(before.freeze.hours, 12);
      expect(headline.freeze.hours).toBeGreaterThan(0);
      expect(headline.above.hours).toBeCloseTo(both.above.hours, 12);
      expect(headline.above.hours).toBeGreaterThan(0);
      expect([headline.minC, headline.maxC]).toEqual([-3, 9]);
      expect(headline.hoursCovered).toBeCloseTo(39, 12);
      // Callus: the slower (colder) logger's thermal time while both watched.
      expect(body.progress.optimumEquivalentHours).toBeCloseTo(before.callus!.optimumEquivalentHours + both.callus!.optimumEquivalentHours, 12);
    });
  });

  describe('a batch still in storage', () => {
    // 15 °C is inside apple's callus optimum (13–18 °C): every covered hour is an hour at optimum.
    const steady: Reading[] = Array.from({ length: 49 }, (_, i) => ({ t: h(i), c: 15 }));
    let id: number;
    let loggerId: number;
    let roomId: number;

    beforeAll(async () => {
      roomId = await room('Callus bench');
      loggerId = await loggerIn('CB-1', roomId, h(0));
      await store(loggerId, steady);
      id = await batch('EXP-OPEN', roomId, h(0));
    });

    it('counts the time since the last reading as missing, and estimates full callus from the last 72 h mean', async () => {
      const body = await exposureOf(id);
      expect(body.headline.hoursCovered).toBeCloseTo(48, 12);
      expect(body.headline.hoursMissing).toBeCloseTo((Date.parse(body.asOf) - h(48)) / HOUR, 9);
      expect(body.placements[0].until).toBe(body.asOf);
      expect(body.progress.optimumEquivalentHours).toBeCloseTo(48, 12);
      // 288 of 336 h to go at rate 1 (15 °C), counted from the newest reading.
      expect(body.progress.outlook).toMatchObject({ status: 'estimated', fullCallusAt: iso(h(48 + 288)), reason: null });
      expect(body.progress.outlook.basis).toMatchObject({ loggerLabel: 'CB-1', from: iso(h(0)), to: iso(h(48)), meanC: 15, rate: 1 });
    });

    it('serves the stored figures until an input changes, moving only the missing time forward', async () => {
      const first = await exposureOf(id);
      await new Promise((r) => setTimeout(r, 30));
      const again = await exposureOf(id);
      expect(again.computedAt).toBe(first.computedAt);
      expect(again.headline.hoursMissing).toBeCloseTo((Date.parse(again.asOf) - h(48)) / HOUR, 9);
      expect(again.headline.hoursMissing).toBeGreaterThan(first.headline.hoursMissing);
    });

    it('recomputes after new readings arrive', async () => {
      const before = await exposureOf(id);
      await store(loggerId, Array.from({ length: 24 }, (_, i) => ({ t: h(49 + i), c: 15 })));
      const after = await exposureOf(id);
      expect(after.computedAt).not.toBe(before.computedAt);
      expect(after.headline.hoursCovered).toBeCloseTo(72, 12);
      expect(after.progress.optimumEquivalentHours).toBeCloseTo(72, 12);
    });

    it('recomputes after a move, and after an edit of the profile it uses', async () => {
      const copy = await owner.post('/api/profiles').send({ from: 'apple', key: 'apple-bench', name: 'Apple on the bench' });
      expect(copy.status).toBe(201);
      await staff.patch(`/api/batches/${id}`).send({ species: 'apple-bench' });
      const before = await exposureOf(id);
      expect(before.progress.hoursAtOptimum).toBe(336);
      expect((await owner.patch('/api/profiles/apple-bench').send({ callus: { hoursAtOptimum: 144 } })).status).toBe(200);
      const edited = await exposureOf(id);
      expect(edited.computedAt).not.toBe(before.computedAt);
      expect(edited.progress.progressPct).toBeCloseTo((100 * 72) / 144, 12);

      const elsewhere = await room('Unwatched corner');
      expect((await staff.post(`/api/batches/${id}/move`).send({ roomId: elsewhere, at: iso(h(60)) })).status).toBe(200);
      const moved = await exposureOf(id);
      expect(moved.computedAt).not.toBe(edited.computedAt);
      expect(moved.placements.length).toBe(2);
      // Nobody watches the new room: all its time is missing, and there is no outlook without readings there.
      expect(moved.placements[1].unwatchedHours).toBeCloseTo((Date.parse(moved.asOf) - h(60)) / HOUR, 9);
      expect(moved.headline.hoursCovered).toBeCloseTo(60, 12);
      expect(moved.progress.outlook).toMatchObject({ status: 'none', reason: 'no_recent_readings' });
    });

    it('recomputes when a logger is moved into the room', async () => {
      const before = await exposureOf(id);
      const current = before.placements[1].roomId;
      expect((await staff.post(`/api/loggers/${loggerId}/move`).send({ roomId: current, at: iso(h(66)) })).status).toBe(200);
      const after = await exposureOf(id);
      expect(after.computedAt).not.toBe(before.computedAt);
      expect(after.placements[1].loggers.map((l: { label: string }) => l.label)).toEqual(['CB-1']);
      expect(after.headline.hoursCovered).toBeCloseTo(60 + 6, 12);
    });

    it('lists it in the nursery table with the same headline as its own page', async () => {
      const table = await staff.get('/api/exposure/batches');
      expect(table.status).toBe(200);
      const row = table.body.rows.find((r: { code: string }) => r.code === 'EXP-OPEN');
      const page = await exposureOf(id);
      expect(row).toMatchObject({ batchId: id, species: 'apple-bench', speciesName: 'Apple on the bench', roomName: 'Unwatched corner' });
      const { hoursMissing: _a, ...rowFigures } = row.headline;
      const { hoursMissing: _b, ...pageFigures } = page.headline;
      expectClose(rowFigures, pageFigures);
      expect(row.progress.progressPct).toBeCloseTo(page.progress.progressPct, 12);
      // Batches that left storage are not in the table.
      expect(table.body.rows.map((r: { code: string }) => r.code)).not.toContain('EXP-MOVE');
    });
  });
});
