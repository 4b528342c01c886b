// One batch's planting out and take, as its page shows them.
import { seasonOf } from '../../shared/season/seasonOf';
import { takeFigure } from '../../shared/season/takeFigure';
import { findBatch } from '../batches/batches.service';
import { listAssessments } from './assessments.service';
import { listPlantings } from './plantings.service';
import { batchOutcome } from './seasonOutcomes';

/** Planting rows (each with its frozen storage figures), assessments, and the take so far with its interval. */
export async function getBatchOutcome(nurseryId: number, batchId: number) {
  const batch = await findBatch(nurseryId, batchId);
  const [outcome, plantings, assessments] = await Promise.all([batchOutcome(nurseryId, batchId), listPlantings(nurseryId, batchId), listAssessments(nurseryId, batchId)]);
  return {
    batchId,
    status: batch.status,
    season: seasonOf(batch.graftedOn),
    count: batch.graftCount,
    outcome: outcome!,
    take: takeFigure([outcome!]),
    plantings,
    assessments,
  };
}
