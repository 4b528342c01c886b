// The season report, its CSV export, and the list of seasons.
import { DateTime } from 'luxon';
import type { TemperatureUnit } from '../../shared/schemas/common';
import { seasonCsv } from '../../shared/season/seasonCsv';
import { seasonLabel, seasonOf } from '../../shared/season/seasonOf';
import { buildSeasonReport } from '../../shared/season/seasonReport';
import { Batch } from '../batches/batch.model';
import { Nursery } from '../nurseries/nursery.model';
import { Planting } from './planting.model';
import { seasonOutcomes } from './seasonOutcomes';
import { TakeAssessment } from './takeAssessment.model';

export async function seasonReport(nurseryId: number, season: number, unit: TemperatureUnit) {
  return buildSeasonReport(season, await seasonOutcomes(nurseryId, season), unit);
}

export async function seasonExport(nurseryId: number, season: number, unit: TemperatureUnit) {
  return seasonCsv(await seasonReport(nurseryId, season, unit));
}

/**
 * Every season the nursery has batches in, newest first, with how far its outcomes are recorded; the current
 * season (by today's date on the nursery's calendar) is always listed.
 */
export async function listSeasons(nurseryId: number) {
  const [nursery, batches, planted, assessed] = await Promise.all([
    Nursery.findByPk(nurseryId),
    Batch.findAll({ where: { nurseryId }, attributes: ['id', 'graftedOn'] }),
    Planting.findAll({ where: { nurseryId }, attributes: ['batchId'], group: ['batchId'] }),
    TakeAssessment.findAll({ where: { nurseryId }, attributes: ['batchId'], group: ['batchId'] }),
  ]);
  const current = seasonOf(DateTime.now().setZone(nursery!.timeZone).toISODate()!);
  const plantedIds = new Set(planted.map((p) => p.batchId));
  const assessedIds = new Set(assessed.map((a) => a.batchId));
  const seasons = new Map<number, { batches: number; planted: number; assessed: number }>([[current, { batches: 0, planted: 0, assessed: 0 }]]);
  for (const b of batches) {
    const season = seasonOf(b.graftedOn);
    const entry = seasons.get(season) ?? { batches: 0, planted: 0, assessed: 0 };
    entry.batches += 1;
    if (plantedIds.has(b.id)) entry.planted += 1;
    if (assessedIds.has(b.id)) entry.assessed += 1;
    seasons.set(season, entry);
  }
  return {
    current,
    seasons: [...seasons].sort((a, b) => b[0] - a[0]).map(([season, counts]) => ({ season, label: seasonLabel(season), current: season === current, ...counts })),
  };
}
