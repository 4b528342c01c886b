import type { Pool } from 'mariadb';
import { toExposureReport, type Exposure } from '../../shared/exposure';
import { findBatch } from '../batches/batches.service';
import { advanceFigures, type BatchFigures } from './batchFigures';
import type { CallusOutlook } from './callusOutlook';
import { isFresh, readCache, stampOf, stampParts, writeCache, type CacheView } from './exposureCache';
import { computeFigures } from './exposureCompute';
import { loadExposureInputs, type BatchScope, type ExposureInputs } from './exposureInputs';

const iso = (t: number | null) => (t === null ? null : new Date(t).toISOString());
const report = (e: Exposure | null) => (e === null ? null : toExposureReport(e));

/** Cached figures where the stamp still matches, fresh ones (computed together, then stored) for the rest. */
async function figuresFor(pool: Pool, nurseryId: number, scope: BatchScope, view: CacheView, now: number) {
  const inputs = await loadExposureInputs(pool, nurseryId, scope);
  const cached = await readCache(pool, nurseryId, view, scope === 'in_storage' ? undefined : scope.batchId);
  const figures = new Map<number, BatchFigures>();
  const parts = stampParts(inputs);
  const stale = [];
  for (const batch of inputs.batches) {
    const hit = cached.get(batch.id);
    if (isFresh(hit, stampOf(batch, parts), now)) figures.set(batch.id, advanceFigures(hit.figures, now));
    else stale.push(batch);
  }
  if (stale.length) {
    const entries = await computeFigures(pool, stale, inputs, parts, now);
    await writeCache(pool, nurseryId, entries, view);
    for (const e of entries) figures.set(e.batchId, e.figures);
  }
  return { inputs, figures };
}

async function namesOf(pool: Pool, nurseryId: number) {
  const [rooms, loggers] = await Promise.all([
    pool.query({ sql: 'SELECT id, name FROM rooms WHERE nursery_id = ?', rowsAsArray: true }, [nurseryId]) as Promise<[number, string][]>,
    pool.query({ sql: 'SELECT id, label FROM loggers WHERE nursery_id = ?', rowsAsArray: true }, [nurseryId]) as Promise<[number, string][]>,
  ]);
  return { rooms: new Map(rooms), loggers: new Map(loggers) };
}

function presentOutlook(outlook: CallusOutlook, loggerLabels: Map<number, string>) {
  if (outlook.status === 'complete') return { status: outlook.status, fullCallusAt: null, reason: null, basis: null };
  const basis = outlook.basis && {
    loggerId: outlook.basis.loggerId,
    loggerLabel: loggerLabels.get(outlook.basis.loggerId) ?? null,
    from: iso(outlook.basis.from),
    to: iso(outlook.basis.to),
    meanC: outlook.basis.meanC,
    rate: outlook.basis.rate,
  };
  return outlook.status === 'estimated'
    ? { status: outlook.status, fullCallusAt: iso(outlook.fullCallusAt), reason: null, basis }
    : { status: outlook.status, fullCallusAt: null, reason: outlook.reason, basis };
}

function presentProgress(figures: BatchFigures, loggerLabels: Map<number, string>) {
  const callus = figures.exposure?.callus;
  if (!callus) return null;
  return { ...callus, outlook: presentOutlook(figures.outlook, loggerLabels) };
}

const profileView = (inputs: ExposureInputs, key: string) => {
  const p = inputs.profiles.get(key)!;
  return { key: p.key, name: p.name, freezeC: p.freezeC, band: p.band, storageMaxC: p.storageMaxC, callus: p.callus };
};

/** One batch: per placement, per logger within it, the headline, and callus progress with its outlook. */
export async function batchExposure(pool: Pool, nurseryId: number, batchId: number, now = Date.now()) {
  await findBatch(nurseryId, batchId);
  const [{ inputs, figures }, names] = await Promise.all([figuresFor(pool, nurseryId, { batchId }, 'detail', now), namesOf(pool, nurseryId)]);
  const batch = inputs.batches[0];
  const f = figures.get(batchId)!;
  return {
    batchId,
    code: batch.code,
    status: batch.status,
    asOf: iso(now),
    computedAt: iso(f.computedAt),
    profile: profileView(inputs, batch.speciesKey),
    headline: report(f.exposure),
    placements: f.placements.map((p) => ({
      placementId: p.placementId,
      roomId: p.roomId,
      roomName: names.rooms.get(p.roomId) ?? null,
      from: iso(p.from),
      to: iso(p.to),
      until: iso(p.until),
      headline: report(p.exposure),
      unwatchedHours: p.unwatchedHours,
      loggers: p.loggers.map((l) => ({
        loggerId: l.loggerId,
        label: names.loggers.get(l.loggerId) ?? null,
        spans: l.spans.map((s) => ({ from: iso(s.from), to: iso(s.to) })),
        exposure: report(l.exposure),
      })),
    })),
    progress: presentProgress(f, names.loggers),
  };
}

/** Every batch in storage with its headline exposure and callus progress: the nursery-wide table. */
export async function nurseryExposure(pool: Pool, nurseryId: number, now = Date.now()) {
  const [{ inputs, figures }, names] = await Promise.all([figuresFor(pool, nurseryId, 'in_storage', 'summary', now), namesOf(pool, nurseryId)]);
  return {
    asOf: iso(now),
    rows: inputs.batches.map((b) => {
      const f = figures.get(b.id)!;
      const current = b.placements.at(-1);
      return {
        batchId: b.id,
        code: b.code,
        species: b.speciesKey,
        speciesName: inputs.profiles.get(b.speciesKey)?.name ?? b.speciesKey,
        scionCultivar: b.scionCultivar,
        rootstock: b.rootstock,
        count: b.count,
        graftedOn: b.graftedOn,
        roomId: current?.roomId ?? null,
        roomName: current ? (names.rooms.get(current.roomId) ?? null) : null,
        since: iso(current?.from ?? null),
        computedAt: iso(f.computedAt),
        headline: report(f.exposure),
        progress: presentProgress(f, names.loggers),
      };
    }),
  };
}
