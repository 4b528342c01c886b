// Loads batches with their plantings and assessments and turns them into outcomes for the report and batch pages.
import { Op, type WhereOptions } from 'sequelize';
import { toBatchOutcome } from '../../shared/season/batchOutcome';
import { seasonDates } from '../../shared/season/seasonOf';
import type { BatchOutcome } from '../../shared/season/types';
import { Batch } from '../batches/batch.model';
import { profilesOf } from '../profiles/profiles.service';
import { Planting } from './planting.model';
import { TakeAssessment } from './takeAssessment.model';

function groupByBatch<T extends { batchId: number }>(rows: T[]): Map<number, T[]> {
  const map = new Map<number, T[]>();
  for (const row of rows) map.set(row.batchId, [...(map.get(row.batchId) ?? []), row]);
  return map;
}

async function outcomesWhere(nurseryId: number, where: WhereOptions<Batch>): Promise<BatchOutcome[]> {
  const batches = await Batch.findAll({ where: { ...where, nurseryId }, order: [['graftedOn', 'ASC'], ['code', 'ASC']] });
  const ids = batches.map((b) => b.id);
  if (ids.length === 0) return [];
  const [plantings, assessments, profiles] = await Promise.all([
    Planting.findAll({ where: { nurseryId, batchId: ids } }),
    TakeAssessment.findAll({ where: { nurseryId, batchId: ids } }),
    profilesOf(nurseryId),
  ]);
  const plantingsOf = groupByBatch(plantings);
  const assessmentsOf = groupByBatch(assessments);
  return batches.map((b) =>
    toBatchOutcome(
      {
        id: b.id,
        code: b.code,
        species: profiles.get(b.speciesKey)?.name ?? b.speciesKey,
        cultivar: b.scionCultivar,
        rootstock: b.rootstock,
        method: b.method,
        grafter: b.grafter,
        graftedOn: b.graftedOn,
        count: b.graftCount,
      },
      (plantingsOf.get(b.id) ?? []).map((p) => ({ id: p.id, plantedOn: p.plantedOn, count: p.graftCount, location: p.location, snapshot: p.exposureSnapshot })),
      (assessmentsOf.get(b.id) ?? []).map((a) => ({ id: a.id, assessedOn: a.assessedOn, grown: a.grown })),
    ),
  );
}

/** Every batch grafted in the season (1 July of N−1 to 30 June of N), planted or not. */
export function seasonOutcomes(nurseryId: number, season: number): Promise<BatchOutcome[]> {
  const { from, to } = seasonDates(season);
  return outcomesWhere(nurseryId, { graftedOn: { [Op.between]: [from, to] } });
}

export async function batchOutcome(nurseryId: number, batchId: number): Promise<BatchOutcome | null> {
  const [outcome] = await outcomesWhere(nurseryId, { id: batchId });
  return outcome ?? null;
}
