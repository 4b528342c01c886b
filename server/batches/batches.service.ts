import { Op, UniqueConstraintError, type Sequelize, type Transaction, type WhereOptions } from 'sequelize';
import type { z } from 'zod';
import type { batchBody, batchListQuery, batchPatch, bulkBatchBody } from '../../shared/schemas/batches';
import { conflict, notFound } from '../http/errors';
import { findProfile } from '../profiles/profiles.service';
import { Room } from '../rooms/room.model';
import { findRoom } from '../rooms/rooms.service';
import { Batch } from './batch.model';
import { codePrefix, nextCode } from './batchCode';
import { BatchPlacement } from './batchPlacement.model';
import { checkPlacementTime } from './placementTime';

type WithPlacements = Batch & { placements: BatchPlacement[] };

function present(batch: Batch, placements: BatchPlacement[]) {
  const current = placements.find((p) => p.placedTo === null) ?? null;
  return {
    id: batch.id,
    code: batch.code,
    species: batch.speciesKey,
    scionCultivar: batch.scionCultivar,
    rootstock: batch.rootstock,
    method: batch.method,
    count: batch.graftCount,
    graftedOn: batch.graftedOn,
    grafter: batch.grafter,
    storageMedium: batch.storageMedium,
    notes: batch.notes,
    status: batch.status,
    leftAt: batch.leftAt,
    leftNote: batch.leftNote,
    roomId: current?.roomId ?? null,
    placements: placements.map((p) => ({ id: p.id, roomId: p.roomId, from: p.placedFrom, to: p.placedTo })),
  };
}
export type PresentedBatch = ReturnType<typeof present>;

/**
 * Every lookup carries the nursery: another nursery's batch is a 404 exactly like a missing one. Inside a
 * transaction the row is locked, which serialises changes to one batch's placements.
 */
export async function findBatch(nurseryId: number, id: number, transaction?: Transaction) {
  const batch = await Batch.findOne({ where: { id, nurseryId }, transaction, lock: transaction?.LOCK.UPDATE });
  if (!batch) throw notFound('That batch');
  return batch;
}

export async function getBatch(nurseryId: number, id: number) {
  const batch = await findBatch(nurseryId, id);
  const placements = await BatchPlacement.findAll({ where: { batchId: id }, order: [['placedFrom', 'ASC']] });
  return present(batch, placements);
}

const escapeLike = (s: string) => s.replace(/[\\%_]/g, (ch) => `\\${ch}`);

type SortKey = z.output<typeof batchListQuery>['sort'];
const compareText = (a: string, b: string) => a.localeCompare(b, 'en', { numeric: true, sensitivity: 'base' });

/** Filters run in SQL; the current room and the sort by room name need the placements, so sorting happens here. */
export async function listBatches(nurseryId: number, query: z.output<typeof batchListQuery>) {
  const where: WhereOptions<Batch> & Record<string | symbol, unknown> = { nurseryId };
  if (query.species) where.speciesKey = query.species;
  if (query.status) where.status = query.status;
  if (query.cultivar) {
    const like = `%${escapeLike(query.cultivar)}%`;
    where[Op.or] = [{ scionCultivar: { [Op.like]: like } }, { rootstock: { [Op.like]: like } }];
  }
  if (query.graftedFrom || query.graftedTo) {
    where.graftedOn = {
      ...(query.graftedFrom && { [Op.gte]: query.graftedFrom }),
      ...(query.graftedTo && { [Op.lte]: query.graftedTo }),
    };
  }
  const [batches, rooms] = await Promise.all([
    Batch.findAll({ where, include: [{ model: BatchPlacement, as: 'placements' }], order: [[{ model: BatchPlacement, as: 'placements' }, 'placedFrom', 'ASC']] }),
    Room.findAll({ where: { nurseryId }, attributes: ['id', 'name'] }),
  ]);
  const roomNames = new Map(rooms.map((r) => [r.id, r.name]));
  let rows = (batches as WithPlacements[]).map((b) => present(b, b.placements));
  if (query.roomId) rows = rows.filter((r) => r.roomId === query.roomId);
  const sortValue: Record<SortKey, (r: PresentedBatch) => string | number> = {
    code: (r) => r.code,
    graftedOn: (r) => r.graftedOn,
    species: (r) => r.species,
    scionCultivar: (r) => r.scionCultivar,
    rootstock: (r) => r.rootstock,
    count: (r) => r.count,
    status: (r) => r.status,
    room: (r) => (r.roomId === null ? '' : (roomNames.get(r.roomId) ?? '')),
  };
  const value = sortValue[query.sort];
  const direction = query.order === 'asc' ? 1 : -1;
  return rows.sort((a, b) => {
    const va = value(a);
    const vb = value(b);
    const primary = typeof va === 'number' && typeof vb === 'number' ? va - vb : compareText(String(va), String(vb));
    return direction * (primary || compareText(a.code, b.code));
  });
}

/** Codes already used in this nursery with the given prefixes, to number new batches after them. */
async function usedCodes(nurseryId: number, prefixes: string[], transaction: Transaction): Promise<Set<string>> {
  if (prefixes.length === 0) return new Set();
  const rows = await Batch.findAll({
    where: { nurseryId, [Op.or]: prefixes.map((p) => ({ code: { [Op.like]: `${escapeLike(p)}%` } })) },
    attributes: ['code'],
    transaction,
  });
  return new Set(rows.map((r) => r.code));
}

type NewBatch = Omit<z.output<typeof batchBody>, 'roomId' | 'placedAt'>;

/**
 * Makes the batches of one grafting day (or just one) in one transaction, each placed in `roomId` from `placedAt`.
 * Empty codes are numbered after the highest code of the same year and species letters.
 */
async function insertBatches(sequelize: Sequelize, nurseryId: number, rows: NewBatch[], roomId: number, placedAt: Date | undefined) {
  await findRoom(nurseryId, roomId);
  for (const species of new Set(rows.map((r) => r.species))) await findProfile(nurseryId, species);
  const at = placedAt ?? new Date();
  for (const graftedOn of new Set(rows.map((r) => r.graftedOn))) await checkPlacementTime(nurseryId, graftedOn, at);
  const given = rows.map((r) => r.code).filter(Boolean);
  const repeated = given.find((code, i) => given.indexOf(code) !== i);
  if (repeated) throw conflict('code_taken', `The code ${repeated} appears twice.`);
  const existing = given.length ? await Batch.findOne({ where: { nurseryId, code: given }, attributes: ['code'] }) : null;
  if (existing) throw conflict('code_taken', `Another batch already has the code ${existing.code}; choose another or leave it empty to number it.`);
  try {
    return await sequelize.transaction(async (transaction) => {
      const prefixes = [...new Set(rows.filter((r) => !r.code).map((r) => codePrefix(r.graftedOn, r.species)))];
      const used = await usedCodes(nurseryId, prefixes, transaction);
      for (const code of given) used.add(code);
      const ids: number[] = [];
      for (const { count, species, ...row } of rows) {
        const code = row.code || nextCode(codePrefix(row.graftedOn, species), used);
        used.add(code);
        const batch = await Batch.create({ ...row, nurseryId, code, speciesKey: species, graftCount: count }, { transaction });
        await BatchPlacement.create({ batchId: batch.id, roomId, placedFrom: at }, { transaction });
        ids.push(batch.id);
      }
      return ids;
    });
  } catch (err) {
    // Another request took a code between the check and the insert.
    if (err instanceof UniqueConstraintError) throw conflict('code_taken', 'Another batch took one of these codes just now; try again.');
    throw err;
  }
}

export async function createBatch(sequelize: Sequelize, nurseryId: number, input: z.output<typeof batchBody>) {
  const { roomId, placedAt, ...row } = input;
  const [id] = await insertBatches(sequelize, nurseryId, [row], roomId, placedAt);
  return getBatch(nurseryId, id);
}

export async function createBatchDay(sequelize: Sequelize, nurseryId: number, day: z.output<typeof bulkBatchBody>) {
  const rows = day.rows.map((r) => ({
    ...r,
    graftedOn: day.graftedOn,
    grafter: day.grafter,
    method: r.method || day.method,
    storageMedium: r.storageMedium || day.storageMedium,
  }));
  const ids = await insertBatches(sequelize, nurseryId, rows, day.roomId, day.placedAt);
  const placements = await BatchPlacement.findAll({ where: { batchId: ids }, order: [['placedFrom', 'ASC']] });
  const batches = await Batch.findAll({ where: { id: ids, nurseryId }, order: [['id', 'ASC']] });
  return batches.map((b) => present(b, placements.filter((p) => p.batchId === b.id)));
}

export async function updateBatch(nurseryId: number, id: number, patch: z.output<typeof batchPatch>) {
  const batch = await findBatch(nurseryId, id);
  const { species, count, ...rest } = patch;
  if (species !== undefined) await findProfile(nurseryId, species);
  if (patch.graftedOn !== undefined) {
    const first = await BatchPlacement.findOne({ where: { batchId: id }, order: [['placedFrom', 'ASC']] });
    if (first) await checkPlacementTime(nurseryId, patch.graftedOn, first.placedFrom);
  }
  try {
    await batch.update({ ...rest, ...(species !== undefined && { speciesKey: species }), ...(count !== undefined && { graftCount: count }) });
  } catch (err) {
    if (err instanceof UniqueConstraintError) throw conflict('code_taken', `Another batch already has the code ${patch.code}.`);
    throw err;
  }
  return getBatch(nurseryId, id);
}
