// The demo nursery's grafts: invented cultivars on common rootstock types, made in the first weeks of the season,
// warm-callused species kept in the heated room (one out for two nights while its heater was serviced), apples
// and pears in cold storage, one moved out of the garage before a cold night, one lost.
import type { Sequelize } from 'sequelize';
import type { BatchStatus } from '../../shared/schemas/batches';
import { Batch } from '../batches/batch.model';
import { codePrefix, nextCode } from '../batches/batchCode';
import { BatchPlacement } from '../batches/batchPlacement.model';
import { Room } from '../rooms/room.model';
import { DEMO_SEASON_START } from './demoData';

const HOUR = 3_600_000;
/** The season starts at local midnight in the demo's zone: `day` and `hour` below are on the nursery's clock. */
const at = (day: number, hour: number) => new Date(DEMO_SEASON_START.getTime() + (day * 24 + hour) * HOUR);
const dayOf = (day: number) => at(day, 12).toISOString().slice(0, 10);

interface DemoBatch {
  species: string;
  scion: string;
  rootstock: string;
  method: string;
  count: number;
  graftedDay: number;
  grafter: string;
  medium: string;
  notes?: string;
  /** Rooms in order, each from [day, hour]; the last one is where it is now unless it left storage. */
  stays: { room: string; day: number; hour: number }[];
  left?: { status: Exclude<BatchStatus, 'in_storage'>; day: number; hour: number; note: string };
}

const WREN = 'Wren Halloway';
const TAMSIN = 'Tamsin Orcutt';
const JORY = 'Jory Pellam';

export const DEMO_BATCHES: DemoBatch[] = [
  { species: 'apple', scion: 'Hollowmere Russet', rootstock: 'M.111', method: 'whip-and-tongue', count: 60, graftedDay: 1, grafter: WREN, medium: 'moist sawdust', stays: [{ room: 'Root cellar', day: 1, hour: 17 }] },
  { species: 'apple', scion: 'Candle Pippin', rootstock: 'MM.106', method: 'whip-and-tongue', count: 45, graftedDay: 1, grafter: WREN, medium: 'moist sawdust', stays: [{ room: 'Root cellar', day: 1, hour: 17 }] },
  {
    species: 'apple', scion: 'Larkfield Sweet', rootstock: 'M.111', method: 'cleft', count: 30, graftedDay: 3, grafter: TAMSIN, medium: 'wood shavings',
    notes: 'Overflow in the garage until the cellar bench was cleared; moved before the cold front.',
    stays: [{ room: 'North garage', day: 3, hour: 16 }, { room: 'Root cellar', day: 12, hour: 15 }],
  },
  { species: 'pear', scion: 'Winter Blush', rootstock: 'pear seedling', method: 'cleft', count: 25, graftedDay: 3, grafter: TAMSIN, medium: 'wood shavings', stays: [{ room: 'Root cellar', day: 3, hour: 16 }] },
  { species: 'pear', scion: 'Osier Butter', rootstock: 'quince seedling', method: 'whip-and-tongue', count: 22, graftedDay: 5, grafter: JORY, medium: 'plastic bag', notes: 'Still in the garage: watch the freeze figures.', stays: [{ room: 'North garage', day: 5, hour: 18 }] },
  {
    species: 'apple', scion: 'Hollowmere Russet', rootstock: 'M.26', method: 'chip bud', count: 10, graftedDay: 5, grafter: JORY, medium: 'plastic bag',
    stays: [{ room: 'North garage', day: 5, hour: 18 }],
    left: { status: 'discarded', day: 20, hour: 9, note: 'Unions black after the hard freeze by the door.' },
  },
  {
    species: 'plum', scion: 'Greyfield Gage', rootstock: 'plum seedling', method: 'whip-and-tongue', count: 28, graftedDay: 4, grafter: WREN, medium: 'moist sawdust',
    stays: [{ room: 'Callus room', day: 4, hour: 15 }],
  },
  {
    species: 'plum', scion: 'Dusk Damson', rootstock: 'plum seedling', method: 'saddle', count: 18, graftedDay: 6, grafter: TAMSIN, medium: 'moist sawdust',
    stays: [{ room: 'Callus room', day: 6, hour: 14 }],
  },
  { species: 'peach', scion: 'Ember Cling', rootstock: 'peach seedling', method: 'chip bud', count: 12, graftedDay: 8, grafter: WREN, medium: 'peat', stays: [{ room: 'Callus room', day: 8, hour: 13 }] },
  {
    species: 'walnut', scion: 'Broadleaf Thinshell', rootstock: 'walnut seedling', method: 'omega', count: 20, graftedDay: 2, grafter: JORY, medium: 'peat',
    stays: [{ room: 'Callus room', day: 2, hour: 16 }],
  },
  {
    species: 'walnut', scion: 'Tallow Ridge', rootstock: 'walnut seedling', method: 'side-veneer', count: 15, graftedDay: 10, grafter: JORY, medium: 'peat',
    notes: 'Waited two days in the cellar until the hot-callus box was free.',
    stays: [{ room: 'Root cellar', day: 10, hour: 16 }, { room: 'Callus room', day: 12, hour: 10 }],
  },
  {
    species: 'chestnut', scion: 'Marrowfield', rootstock: 'chestnut seedling', method: 'cleft', count: 20, graftedDay: 6, grafter: WREN, medium: 'wood shavings',
    notes: 'Out of the callus room while the heater was serviced; two nights in the garage.',
    stays: [{ room: 'Callus room', day: 6, hour: 17 }, { room: 'North garage', day: 22, hour: 8 }, { room: 'Callus room', day: 24, hour: 9 }],
  },
  { species: 'chestnut', scion: 'Copper Burr', rootstock: 'chestnut seedling', method: 'cleft', count: 14, graftedDay: 13, grafter: TAMSIN, medium: 'wood shavings', stays: [{ room: 'Callus room', day: 13, hour: 15 }] },
];

/** Adds the current season's batches to a freshly made demo nursery, numbered after the codes it already has. */
export async function seedDemoBatches(sequelize: Sequelize, nurseryId: number): Promise<void> {
  const rooms = new Map((await Room.findAll({ where: { nurseryId } })).map((r) => [r.name, r.id]));
  await sequelize.transaction(async (transaction) => {
    const codes = (await Batch.findAll({ where: { nurseryId }, attributes: ['code'], transaction })).map((b) => b.code);
    for (const b of DEMO_BATCHES) {
      const code = nextCode(codePrefix(dayOf(b.graftedDay), b.species), codes);
      codes.push(code);
      const leftAt = b.left ? at(b.left.day, b.left.hour) : null;
      const batch = await Batch.create(
        {
          nurseryId, code, speciesKey: b.species, scionCultivar: b.scion, rootstock: b.rootstock, method: b.method, graftCount: b.count,
          graftedOn: dayOf(b.graftedDay), grafter: b.grafter, storageMedium: b.medium, notes: b.notes ?? '',
          status: b.left?.status ?? 'in_storage', leftAt, leftNote: b.left?.note ?? '',
        },
        { transaction },
      );
      for (const [i, stay] of b.stays.entries()) {
        const next = b.stays[i + 1];
        await BatchPlacement.create(
          { batchId: batch.id, roomId: rooms.get(stay.room)!, placedFrom: at(stay.day, stay.hour), placedTo: next ? at(next.day, next.hour) : leftAt },
          { transaction },
        );
      }
    }
  });
}
