// Take assessments: how many of a batch's planted grafts were found growing on a day; the latest gives its take.
import type { Sequelize, Transaction } from 'sequelize';
import type { z } from 'zod';
import type { assessmentBody, assessmentPatch } from '../../shared/season/schemas';
import { badRequest, conflict, notFound } from '../http/errors';
import { lockBatch } from './batchLock';
import { plantedSoFar } from './plantings.service';
import { Planting } from './planting.model';
import { TakeAssessment } from './takeAssessment.model';

export async function findAssessment(nurseryId: number, id: number) {
  const assessment = await TakeAssessment.findOne({ where: { id, nurseryId } });
  if (!assessment) throw notFound('That assessment');
  return assessment;
}

/**
 * An assessment counts grafts already in the ground: on or after the first planting, and at most as many as were
 * planted by then (the whole planted count, since parts planted later may be counted too).
 */
async function checkAssessment(batchId: number, assessedOn: string, grown: number, transaction: Transaction) {
  const first = (await Planting.min('plantedOn', { where: { batchId }, transaction })) as string | null;
  if (first === null) throw conflict('not_planted', 'Record the planting out first; an assessment counts grafts in the ground.');
  if (assessedOn < first) throw badRequest('before_planting', `The batch was first planted out on ${first}; an assessment cannot come before that.`);
  const planted = await plantedSoFar(batchId, transaction);
  if (grown > planted) throw conflict('more_than_planted', `${grown} grafts growing is more than the ${planted} planted out.`);
}

export async function createAssessment(sequelize: Sequelize, nurseryId: number, batchId: number, input: z.output<typeof assessmentBody>) {
  const assessment = await sequelize.transaction(async (transaction) => {
    await lockBatch(nurseryId, batchId, transaction);
    await checkAssessment(batchId, input.assessedOn, input.grown, transaction);
    return TakeAssessment.create({ nurseryId, batchId, ...input }, { transaction });
  });
  return assessment.toPublic();
}

export async function updateAssessment(sequelize: Sequelize, nurseryId: number, id: number, patch: z.output<typeof assessmentPatch>) {
  const assessment = await findAssessment(nurseryId, id);
  await sequelize.transaction(async (transaction) => {
    await lockBatch(nurseryId, assessment.batchId, transaction);
    await checkAssessment(assessment.batchId, patch.assessedOn ?? assessment.assessedOn, patch.grown ?? assessment.grown, transaction);
    await assessment.update(patch, { transaction });
  });
  return assessment.toPublic();
}

export async function deleteAssessment(nurseryId: number, id: number) {
  await (await findAssessment(nurseryId, id)).destroy();
}

export async function listAssessments(nurseryId: number, batchId: number) {
  const rows = await TakeAssessment.findAll({ where: { batchId, nurseryId }, order: [['assessedOn', 'ASC'], ['id', 'ASC']] });
  return rows.map((r) => r.toPublic());
}
