import type { Transaction } from 'sequelize';
import { Batch } from '../batches/batch.model';
import { notFound } from '../http/errors';

/**
 * Locks the batch row first thing in the transaction: plantings and assessments of one batch then take turns, and
 * the reads after the lock see what the previous turn committed (InnoDB takes its snapshot at the first plain read).
 */
export async function lockBatch(nurseryId: number, batchId: number, transaction: Transaction): Promise<Batch> {
  const batch = await Batch.findOne({ where: { id: batchId, nurseryId }, lock: transaction.LOCK.UPDATE, transaction });
  if (!batch) throw notFound('That batch');
  return batch;
}
