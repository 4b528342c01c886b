// Planting rows: a batch goes out in one or more parts; when the last graft is planted the batch leaves storage.
import { DateTime } from 'luxon';
import type { Pool } from 'mariadb';
import type { Sequelize, Transaction } from 'sequelize';
import type { z } from 'zod';
import type { plantingBody, plantingPatch } from '../../shared/season/schemas';
import { leaveStorage } from '../batches/batchMoves.service';
import { findBatch } from '../batches/batches.service';
import { badRequest, conflict, notFound } from '../http/errors';
import { Nursery } from '../nurseries/nursery.model';
import { lockBatch } from './batchLock';
import { exposureSnapshot, plantingInstant } from './exposureSnapshot';
import { Planting } from './planting.model';
import { TakeAssessment } from './takeAssessment.model';

export async function findPlanting(nurseryId: number, id: number) {
  const planting = await Planting.findOne({ where: { id, nurseryId } });
  if (!planting) throw notFound('That planting');
  return planting;
}

export async function plantedSoFar(batchId: number, transaction: Transaction, except?: number): Promise<number> {
  const rows = await Planting.findAll({ where: { batchId }, attributes: ['id', 'graftCount'], transaction });
  return rows.filter((r) => r.id !== except).reduce((sum, r) => sum + r.graftCount, 0);
}

function checkWithinBatch(planted: number, batchCount: number) {
  if (planted > batchCount) {
    throw conflict('more_than_batch', `That would make ${planted} grafts planted out of a batch of ${batchCount}.`);
  }
}

/** Planted counts may not fall below what an assessment already found growing. */
async function checkNotBelowGrown(batchId: number, planted: number, transaction: Transaction) {
  const most = (await TakeAssessment.max('grown', { where: { batchId }, transaction })) as number | null;
  if (most !== null && planted < most) {
    throw conflict('below_grown', `An assessment already counts ${most} grafts growing; the batch cannot have fewer than that planted.`);
  }
}

async function checkPlantingDay(nurseryId: number, graftedOn: string, plantedOn: string) {
  const nursery = await Nursery.findByPk(nurseryId);
  const today = DateTime.now().setZone(nursery!.timeZone).toISODate()!;
  if (plantedOn > today) throw badRequest('in_future', 'That day is still to come; record a planting once it has happened.');
  if (plantedOn < graftedOn) throw badRequest('before_grafting', `The batch was grafted on ${graftedOn}; it cannot be planted out before that.`);
  return nursery!.timeZone;
}

export async function listPlantings(nurseryId: number, batchId: number) {
  await findBatch(nurseryId, batchId);
  const rows = await Planting.findAll({ where: { batchId, nurseryId }, order: [['plantedOn', 'ASC'], ['id', 'ASC']] });
  return rows.map((r) => r.toPublic());
}

/**
 * Records a part planted out with its storage frozen up to that day. When it completes the batch's count and the
 * batch is still in storage, the batches service closes its placement on that day and marks it planted out; if that
 * fails (say a move recorded later that day) the planting is taken back, so the two never disagree.
 */
export async function createPlanting(sequelize: Sequelize, pool: Pool, nurseryId: number, batchId: number, input: z.output<typeof plantingBody>) {
  const batch = await findBatch(nurseryId, batchId);
  if (batch.status === 'discarded') throw conflict('batch_discarded', 'This batch was discarded; it cannot be planted out.');
  const timeZone = await checkPlantingDay(nurseryId, batch.graftedOn, input.plantedOn);
  const through = plantingInstant(input.plantedOn, timeZone);
  const snapshot = await exposureSnapshot(pool, nurseryId, batchId, through);

  const { planting, planted } = await sequelize.transaction(async (transaction) => {
    const locked = await lockBatch(nurseryId, batchId, transaction);
    const planted = (await plantedSoFar(batchId, transaction)) + input.count;
    checkWithinBatch(planted, locked.graftCount);
    const planting = await Planting.create(
      { nurseryId, batchId, plantedOn: input.plantedOn, graftCount: input.count, location: input.location, notes: input.notes, exposureSnapshot: snapshot },
      { transaction },
    );
    return { planting, planted };
  });

  if (planted === batch.graftCount && batch.status === 'in_storage') {
    try {
      await leaveStorage(sequelize, nurseryId, batchId, 'planted_out', through, `Planted out: ${input.location}`);
    } catch (err) {
      await planting.destroy();
      throw err;
    }
  }
  return planting.toPublic();
}

/** Count, place and notes can be corrected; the day cannot (it decided the frozen figures). */
export async function updatePlanting(sequelize: Sequelize, nurseryId: number, id: number, patch: z.output<typeof plantingPatch>) {
  const planting = await findPlanting(nurseryId, id);
  await sequelize.transaction(async (transaction) => {
    const batch = await lockBatch(nurseryId, planting.batchId, transaction);
    if (patch.count !== undefined) {
      const planted = (await plantedSoFar(planting.batchId, transaction, id)) + patch.count;
      checkWithinBatch(planted, batch.graftCount);
      await checkNotBelowGrown(planting.batchId, planted, transaction);
    }
    const { count, ...rest } = patch;
    await planting.update(count === undefined ? rest : { ...rest, graftCount: count }, { transaction });
  });
  return planting.toPublic();
}

/** The batch keeps its status: leaving storage is undone through the batch's own record, not by removing a row. */
export async function deletePlanting(sequelize: Sequelize, nurseryId: number, id: number) {
  const planting = await findPlanting(nurseryId, id);
  await sequelize.transaction(async (transaction) => {
    await lockBatch(nurseryId, planting.batchId, transaction);
    await checkNotBelowGrown(planting.batchId, await plantedSoFar(planting.batchId, transaction, id), transaction);
    await planting.destroy({ transaction });
  });
}
