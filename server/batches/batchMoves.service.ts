import type { Sequelize, Transaction } from 'sequelize';
import type { BatchStatus } from '../../shared/schemas/batches';
import { conflict } from '../http/errors';
import { findRoom } from '../rooms/rooms.service';
import { findBatch, getBatch } from './batches.service';
import { BatchPlacement } from './batchPlacement.model';
import { checkNotFuture } from './placementTime';

/**
 * The batch's open placement, read after the caller locked the batch row (so two moves at once queue up instead of
 * both closing it, and without the gap-lock deadlock two inserts into the placement index would risk); `at` must
 * come after it began, so placements never overlap.
 */
async function lockOpenPlacement(id: number, at: Date, transaction: Transaction): Promise<BatchPlacement> {
  const latest = await BatchPlacement.findOne({ where: { batchId: id }, order: [['placedFrom', 'DESC']], lock: transaction.LOCK.UPDATE, transaction });
  if (!latest || latest.placedTo !== null) throw conflict('not_in_storage', 'This batch is no longer in storage.');
  if (at.getTime() <= latest.placedFrom.getTime()) {
    throw conflict('move_before_last', "A move must come after the batch's current placement began.");
  }
  return latest;
}

/** Closes the open placement at `at` and opens the next one in `roomId` at the same instant. */
export async function moveBatch(sequelize: Sequelize, nurseryId: number, id: number, roomId: number, at = new Date()) {
  checkNotFuture(at);
  await findRoom(nurseryId, roomId);
  await sequelize.transaction(async (transaction) => {
    await findBatch(nurseryId, id, transaction);
    const open = await lockOpenPlacement(id, at, transaction);
    if (open.roomId === roomId) throw conflict('already_there', 'The batch is already in that room.');
    await open.update({ placedTo: at }, { transaction });
    await BatchPlacement.create({ batchId: id, roomId, placedFrom: at }, { transaction });
  });
  return getBatch(nurseryId, id);
}

/**
 * Planted out or discarded: the open placement closes at `at` and the status records why. Planting records come
 * later; until then this is all "planted out" means.
 */
export async function leaveStorage(sequelize: Sequelize, nurseryId: number, id: number, status: Exclude<BatchStatus, 'in_storage'>, at = new Date(), note = '') {
  checkNotFuture(at);
  await sequelize.transaction(async (transaction) => {
    const batch = await findBatch(nurseryId, id, transaction);
    const open = await lockOpenPlacement(id, at, transaction);
    await open.update({ placedTo: at }, { transaction });
    await batch.update({ status, leftAt: at, leftNote: note }, { transaction });
  });
  return getBatch(nurseryId, id);
}
