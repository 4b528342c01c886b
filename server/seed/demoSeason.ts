import type { Transaction } from 'sequelize';
import { Batch } from '../batches/batch.model';
import { codePrefix, nextCode } from '../batches/batchCode';
import { BatchPlacement } from '../batches/batchPlacement.model';
import type { Room } from '../rooms/room.model';
import { Planting } from '../season/planting.model';
import { TakeAssessment } from '../season/takeAssessment.model';
import { planDemoSeason, type DemoRoom } from './demoSeasonPlan';

/** The two grafting seasons before the demo's current one, so the season report has outcomes to show and compare. */
const PAST_SEASONS = [
  { season: 2025, batches: 22 },
  { season: 2026, batches: 30 },
];

/** Past-season batches with placements, planting rows (storage figures frozen in them) and assessments. */
export async function seedDemoSeasons(nurseryId: number, timeZone: string, rooms: ReadonlyMap<string, Room>, transaction: Transaction): Promise<void> {
  const roomIds = new Map<DemoRoom, number>((['Root cellar', 'North garage', 'Callus room'] as const).map((name) => [name, rooms.get(name)!.id]));
  const codes = (await Batch.findAll({ where: { nurseryId }, attributes: ['code'], transaction })).map((b) => b.code);
  for (const { season, batches } of PAST_SEASONS) {
    for (const plan of planDemoSeason(season, batches, timeZone, roomIds)) {
      const code = nextCode(codePrefix(plan.graftedOn, plan.speciesKey), codes);
      codes.push(code);
      const last = plan.plantings.at(-1)!;
      const batch = await Batch.create(
        {
          nurseryId, code, speciesKey: plan.speciesKey, scionCultivar: plan.cultivar, rootstock: plan.rootstock, method: plan.method,
          graftCount: plan.count, graftedOn: plan.graftedOn, grafter: plan.grafter, storageMedium: plan.storageMedium, notes: '',
          status: 'planted_out', leftAt: last.through, leftNote: `Planted out: ${last.location}`,
        },
        { transaction },
      );
      for (const stay of plan.stays) {
        await BatchPlacement.create({ batchId: batch.id, roomId: roomIds.get(stay.room)!, placedFrom: stay.from, placedTo: stay.to }, { transaction });
      }
      for (const p of plan.plantings) {
        await Planting.create(
          { nurseryId, batchId: batch.id, plantedOn: p.plantedOn, graftCount: p.count, location: p.location, exposureSnapshot: p.snapshot },
          { transaction },
        );
      }
      for (const a of plan.assessments) await TakeAssessment.create({ nurseryId, batchId: batch.id, ...a }, { transaction });
    }
  }
}
