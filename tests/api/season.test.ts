import { parse } from 'csv-parse/sync';
import { DateTime } from 'luxon';
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { SeasonReport } from '../../shared/season/seasonReport';
import { signIn, startTestApp, type TestApp } from '../support/testApp';

const ZONE = 'America/Chicago';
const dayAgo = (days: number) => DateTime.now().setZone(ZONE).minus({ days }).toISODate()!;

let t: TestApp;
let owner: TestAgent;
let staff: TestAgent;
let cellarId: number;

beforeAll(async () => {
  t = await startTestApp();
  owner = await signIn(t.app, 'owner@example.com');
  staff = await signIn(t.app, 'staff@example.com');
  const rooms = (await owner.get('/api/rooms')).body as { id: number; name: string }[];
  cellarId = rooms.find((r) => r.name === 'Root cellar')!.id;
});
afterAll(() => t.close());

/** A batch of `count` apple grafts grafted ten days ago, in the root cellar (which has a logger and readings) for nine. */
async function newBatch(count: number, cultivar = 'Test Russet') {
  const res = await staff.post('/api/batches').send({
    species: 'apple', scionCultivar: cultivar, rootstock: 'M.26', method: 'whip-and-tongue', count, roomId: cellarId,
    graftedOn: dayAgo(10), placedAt: DateTime.now().minus({ days: 9 }).toUTC().toISO(),
  });
  expect(res.status).toBe(201);
  return res.body.id as number;
}

describe('planting out and take assessments', () => {
  it('records parts, freezes the storage figures of each, and marks the batch planted out with the last graft', async () => {
    const id = await newBatch(50);
    const first = await staff.post(`/api/batches/${id}/plantings`).send({ plantedOn: dayAgo(2), count: 20, location: 'Bed 9' });
    expect(first.status).toBe(201);
    // Storage counted from the placement (nine days ago) to the start of the planting day in the nursery's zone.
    const through = DateTime.fromISO(dayAgo(2), { zone: ZONE }).startOf('day');
    expect(first.body.snapshot.through).toBe(through.toUTC().toISO());
    const [stay] = first.body.snapshot.rooms;
    expect(stay).toMatchObject({ roomId: cellarId, roomName: 'Root cellar' });
    expect(stay.hours).toBeGreaterThan(6 * 24);
    expect(stay.hours).toBeLessThan(8 * 24);
    expect(first.body.snapshot.exposure.hoursCovered).toBeGreaterThan(0);
    expect((await staff.get(`/api/batches/${id}`)).body.status).toBe('in_storage');

    const tooMany = await staff.post(`/api/batches/${id}/plantings`).send({ plantedOn: dayAgo(1), count: 31, location: 'Bed 9' });
    expect(tooMany.status).toBe(409);
    expect(tooMany.body.error.code).toBe('more_than_batch');

    const rest = await staff.post(`/api/batches/${id}/plantings`).send({ plantedOn: dayAgo(1), count: 30, location: 'Lower field' });
    expect(rest.status).toBe(201);
    const batch = (await staff.get(`/api/batches/${id}`)).body;
    expect(batch.status).toBe('planted_out');
    const lastThrough = DateTime.fromISO(dayAgo(1), { zone: ZONE }).startOf('day').toUTC().toISO();
    expect(new Date(batch.leftAt).toISOString()).toBe(lastThrough);
    expect(new Date(batch.placements.at(-1).to).toISOString()).toBe(lastThrough);
    // The second part stayed a day longer in storage than the first.
    expect(rest.body.snapshot.rooms[0].hours - stay.hours).toBeCloseTo(24, 0);
    // The batch left storage where the last part's figures stop, so the batch page's live figures are the frozen ones.
    const live = (await staff.get(`/api/batches/${id}/exposure`)).body.headline;
    const frozen = rest.body.snapshot.exposure;
    for (const key of ['hoursCovered', 'hoursMissing', 'minC', 'maxC', 'meanC'] as const) expect(frozen[key], key).toBeCloseTo(live[key], 9);
    for (const limit of ['below', 'above', 'freeze'] as const) expect(frozen[limit].degreeHours, limit).toBeCloseTo(live[limit].degreeHours, 9);
    expect(frozen.callus.progressPct).toBeCloseTo(live.callus.progressPct, 9);
  });

  it('takes the latest assessment over the planted count, with its Wilson interval', async () => {
    const id = await newBatch(40);
    const early = await staff.post(`/api/batches/${id}/assessments`).send({ assessedOn: dayAgo(1), grown: 3 });
    expect(early.status).toBe(409);
    expect(early.body.error.code).toBe('not_planted');
    await staff.post(`/api/batches/${id}/plantings`).send({ plantedOn: dayAgo(3), count: 40, location: 'Bed 2' }).expect(201);
    await staff.post(`/api/batches/${id}/assessments`).send({ assessedOn: dayAgo(2), grown: 39 }).expect(201);
    const latest = await staff.post(`/api/batches/${id}/assessments`).send({ assessedOn: dayAgo(1), grown: 36, notes: 'three lost to voles' });
    expect(latest.status).toBe(201);
    const over = await staff.post(`/api/batches/${id}/assessments`).send({ assessedOn: dayAgo(1), grown: 41 });
    expect(over.body.error.code).toBe('more_than_planted');
    const before = await staff.post(`/api/batches/${id}/assessments`).send({ assessedOn: dayAgo(4), grown: 10 });
    expect(before.body.error.code).toBe('before_planting');

    const outcome = (await staff.get(`/api/batches/${id}/outcome`)).body;
    expect(outcome.outcome).toMatchObject({ planted: 40, grown: 36, assessedOn: dayAgo(1), locations: ['Bed 2'] });
    // Wilson 36/40: centre (0.9 + z²/80)/(1 + z²/40), hand-computed bounds 0.7695 and 0.9604.
    expect(outcome.take.takePct).toBeCloseTo(90, 10);
    expect(outcome.take.lowPct).toBeCloseTo(76.95, 1);
    expect(outcome.take.highPct).toBeCloseTo(96.04, 1);
    expect(outcome.assessments.map((a: { grown: number }) => a.grown)).toEqual([39, 36]);
  });

  it('keeps planted counts at or above what was found growing', async () => {
    const id = await newBatch(30);
    const planting = (await staff.post(`/api/batches/${id}/plantings`).send({ plantedOn: dayAgo(3), count: 30, location: 'Bed 4' })).body;
    const assessment = (await staff.post(`/api/batches/${id}/assessments`).send({ assessedOn: dayAgo(1), grown: 25 })).body;
    expect((await staff.patch(`/api/plantings/${planting.id}`).send({ count: 20 })).body.error.code).toBe('below_grown');
    expect((await staff.delete(`/api/plantings/${planting.id}`)).body.error.code).toBe('below_grown');
    const moved = await staff.patch(`/api/plantings/${planting.id}`).send({ location: 'Bed 5', count: 28 });
    expect(moved.body).toMatchObject({ location: 'Bed 5', count: 28, notes: '' });
    await staff.patch(`/api/assessments/${assessment.id}`).send({ grown: 20 }).expect(200);
    await staff.delete(`/api/assessments/${assessment.id}`).expect(204);
    await staff.delete(`/api/plantings/${planting.id}`).expect(204);
    // Leaving storage is the batch's own record: removing the planting row does not put the grafts back.
    expect((await staff.get(`/api/batches/${id}`)).body.status).toBe('planted_out');
  });

  it('refuses days in the future or before grafting, and discarded batches', async () => {
    const id = await newBatch(10);
    const future = await staff.post(`/api/batches/${id}/plantings`).send({ plantedOn: dayAgo(-2), count: 5, location: 'Bed 1' });
    expect([future.status, future.body.error.code]).toEqual([400, 'in_future']);
    const early = await staff.post(`/api/batches/${id}/plantings`).send({ plantedOn: dayAgo(11), count: 5, location: 'Bed 1' });
    expect([early.status, early.body.error.code]).toEqual([400, 'before_grafting']);
    await staff.post(`/api/batches/${id}/discard`).send({}).expect(200);
    const discarded = await staff.post(`/api/batches/${id}/plantings`).send({ plantedOn: dayAgo(1), count: 5, location: 'Bed 1' });
    expect([discarded.status, discarded.body.error.code]).toEqual([409, 'batch_discarded']);
  });

  it('treats another nursery\'s batches, plantings and assessments as missing', async () => {
    const id = await newBatch(12);
    const planting = (await staff.post(`/api/batches/${id}/plantings`).send({ plantedOn: dayAgo(2), count: 12, location: 'Bed 1' })).body;
    const assessment = (await staff.post(`/api/batches/${id}/assessments`).send({ assessedOn: dayAgo(1), grown: 11 })).body;
    const other = request.agent(t.app);
    await other.post('/api/auth/signup').send({ nurseryName: 'Other Season Nursery', name: 'O', email: 'season-other@example.com', password: 'long-enough-pass', timeZone: 'Europe/Berlin' }).expect(201);
    expect((await other.get(`/api/batches/${id}/outcome`)).status).toBe(404);
    expect((await other.post(`/api/batches/${id}/plantings`).send({ plantedOn: dayAgo(1), count: 1, location: 'x' })).status).toBe(404);
    expect((await other.patch(`/api/plantings/${planting.id}`).send({ location: 'x' })).status).toBe(404);
    expect((await other.delete(`/api/assessments/${assessment.id}`)).status).toBe(404);
    const theirSeasons = (await other.get('/api/seasons')).body.seasons as { batches: number }[];
    expect(theirSeasons.every((s) => s.batches === 0)).toBe(true);
  });
});

describe('season report on the demo nursery', () => {
  let report: SeasonReport;
  beforeAll(async () => {
    report = (await owner.get('/api/seasons/2026/report')).body;
  });

  it('lists the demo\'s past seasons and the current one', async () => {
    const { current, seasons } = (await owner.get('/api/seasons')).body;
    const byYear = new Map(seasons.map((s: { season: number }) => [s.season, s]));
    expect(byYear.get(2026)).toMatchObject({ label: '2025–26', batches: 30, planted: 30, assessed: 30 });
    expect(byYear.get(2025)).toMatchObject({ batches: 22, assessed: 22 });
    expect(byYear.get(current)).toMatchObject({ current: true });
  });

  it('gives every percentage with its grafts and interval, and every grouping accounts for every assessed graft', () => {
    expect(report.counts).toMatchObject({ batches: 30, assessedBatches: 30, awaitingAssessment: 0 });
    expect(report.overall!.planted).toBe(report.counts.plantedGrafts);
    for (const d of report.dimensions) {
      expect(d.groups.length, d.key).toBeGreaterThan(0);
      expect(d.groups.reduce((sum, g) => sum + g.planted, 0), d.key).toBe(report.overall!.planted);
      expect(d.groups.reduce((sum, g) => sum + g.grown, 0), d.key).toBe(report.overall!.grown);
      for (const g of d.groups) {
        expect(g.planted).toBeGreaterThan(0);
        expect(g.lowPct).toBeLessThanOrEqual(g.takePct);
        expect(g.highPct).toBeGreaterThanOrEqual(g.takePct);
      }
    }
    expect(report.findings.length).toBeGreaterThan(0);
    expect(report.findings[0].text).toMatch(/\d+ % \(\d+ of \d+ grafts; 95 % interval \d+–\d+ %\)/);
  });

  it('comes from the frozen planting records: no readings exist for the demo\'s past seasons', () => {
    const measured = report.batches.filter((b) => b.exposure);
    expect(measured).toHaveLength(30);
    expect(report.dimensions.find((d) => d.key === 'room')!.groups.map((g) => g.label).sort()).toEqual(['Callus room', 'North garage', 'Root cellar']);
  });

  it('exports a CSV (RFC 4180, with BOM) that a spreadsheet reads to the same numbers', async () => {
    const res = await owner.get('/api/seasons/2026/export');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toContain('coldknit-season-2026.csv');
    expect(res.text.startsWith('\uFEFF')).toBe(true);
    expect(res.text.endsWith('\r\n')).toBe(true);
    const rows = parse(res.text, { bom: true, columns: true, record_delimiter: '\r\n' }) as Record<string, string>[];
    expect(rows).toHaveLength(30);
    const sum = (column: string) => rows.reduce((s, r) => s + Number(r[column]), 0);
    expect(sum('Planted')).toBe(report.overall!.planted);
    expect(sum('Grown')).toBe(report.overall!.grown);
    for (const [i, row] of rows.entries()) {
      const b = report.batches[i];
      expect(row.Batch).toBe(b.code);
      expect(Number(row['Take (%)'])).toBeCloseTo((100 * b.grown!) / b.planted, 1);
      expect(Number(row['Freeze hours'])).toBeCloseTo(b.exposure!.freezeHours, 1);
    }
  });

  it('reports and exports in °F when asked, with degree-hours ×9/5', async () => {
    const inF: SeasonReport = (await owner.get('/api/seasons/2026/report?unit=F')).body;
    expect(inF.degreeHourCuts![2]).toBeCloseTo(report.degreeHourCuts![2] * 1.8, 9);
    const csv = (await owner.get('/api/seasons/2026/export?unit=F')).text;
    expect(csv.split('\r\n')[0]).toContain('Outside band (°F·h)');
  });

  it('answers an empty season with counts and no figures, and refuses a season that is not a year', async () => {
    const empty = (await owner.get('/api/seasons/2031/report')).body;
    expect(empty).toMatchObject({ season: 2031, overall: null, findings: [], counts: { batches: 0 } });
    expect((await owner.get('/api/seasons/abc/report')).status).toBe(400);
  });
});
