// Invented past seasons for the demo nursery: batches, where they were stored, when they were planted out, and how
// many took. Storage figures are made up per room (no readings are stored for past seasons) and frozen into the
// planting rows exactly as a real planting would freeze them. Deterministic, so every start agrees.
import { DateTime } from 'luxon';
import { callusRate } from '../../shared/exposure/callusRate';
import type { ExposureReport } from '../../shared/exposure/types';
import type { BatchDescription, ExposureSnapshot } from '../../shared/season/types';
import { getSpeciesProfile } from '../../shared/species/profiles';
import type { SpeciesProfile } from '../../shared/species/schema';
import { seededRandom } from './demoClimate';

const HOUR = 3_600_000;

export type DemoRoom = 'Root cellar' | 'North garage' | 'Callus room';

/** How a room treats a batch, per hour stored: time and depth below and above the species' band. */
interface RoomCharacter {
  belowShare: number;
  belowDepthC: number;
  freezeShareOfBelow: number;
  aboveShare: number;
  aboveDepthC: number;
  missingShare: number;
  meanC: number;
  minC: number;
  maxC: number;
}

interface Stay {
  room: DemoRoom;
  from: number;
  to: number;
  character: RoomCharacter;
}

export interface DemoPlanting {
  plantedOn: string;
  through: Date;
  count: number;
  location: string;
  snapshot: ExposureSnapshot;
}

export interface DemoBatch extends Omit<BatchDescription, 'code' | 'species'> {
  speciesKey: string;
  storageMedium: string;
  stays: { room: DemoRoom; from: Date; to: Date }[];
  plantings: DemoPlanting[];
  assessments: { assessedOn: string; grown: number }[];
}

interface Kind {
  speciesKey: string;
  share: number;
  cultivars: string[];
  rootstocks: string[];
  methods: string[];
  counts: [number, number];
  /** Grafting days, as day-of-year ranges in the season's spring. */
  graftedBetween: [string, string];
  /** Take under good storage, before the room and the hand that grafted it. */
  baseTake: number;
  warm: boolean;
}

// Invented cultivar names; rootstock designations are the trade's public ones.
const KINDS: Kind[] = [
  { speciesKey: 'apple', share: 0.5, cultivars: ['Ridgeback Russet', 'Winter Lantern', 'Cobble Gold', 'Early Tallow'], rootstocks: ['M.26', 'MM.106', 'B.9'], methods: ['whip-and-tongue', 'whip-and-tongue', 'cleft'], counts: [60, 220], graftedBetween: ['01-08', '03-05'], baseTake: 0.93, warm: false },
  { speciesKey: 'pear', share: 0.2, cultivars: ['Sable Bell', 'Marrow Pear'], rootstocks: ['Quince A', 'Pyrus seedling'], methods: ['whip-and-tongue', 'cleft'], counts: [40, 140], graftedBetween: ['01-15', '03-01'], baseTake: 0.89, warm: false },
  { speciesKey: 'plum', share: 0.1, cultivars: ['Dusk Damson'], rootstocks: ['Myrobalan seedling'], methods: ['whip-and-tongue', 'chip bud'], counts: [30, 80], graftedBetween: ['02-20', '03-20'], baseTake: 0.78, warm: true },
  { speciesKey: 'walnut', share: 0.12, cultivars: ['Larchmere'], rootstocks: ['J. nigra seedling'], methods: ['omega', 'side-veneer'], counts: [20, 60], graftedBetween: ['03-01', '03-25'], baseTake: 0.7, warm: true },
  { speciesKey: 'chestnut', share: 0.08, cultivars: ['Hollin Sweet'], rootstocks: ['C. sativa seedling'], methods: ['cleft', 'whip-and-tongue'], counts: [20, 50], graftedBetween: ['03-10', '03-30'], baseTake: 0.8, warm: true },
];

const GRAFTERS = ['Wren', 'Tamsin', 'Tobias'];
const BEDS = ['Bed 1', 'Bed 2', 'Bed 3', 'Bed 4', 'Bed 5', 'Bed 6', 'Lower field', 'Orchard strip'];
const MEDIA = ['moist sawdust', 'wood shavings', 'peat'];

type Random = () => number;
const between = (random: Random, low: number, high: number) => low + (high - low) * random();
const pick = <T>(random: Random, list: readonly T[]): T => list[Math.floor(random() * list.length)];
const whole = (random: Random, low: number, high: number) => Math.round(between(random, low, high));

function roomCharacter(room: DemoRoom, random: Random): RoomCharacter {
  const missingShare = random() < 0.3 ? between(random, 0.002, 0.02) : 0;
  if (room === 'Root cellar') {
    const warmSpell = random() < 0.3;
    return { belowShare: 0, belowDepthC: 0, freezeShareOfBelow: 0, aboveShare: warmSpell ? between(random, 0.002, 0.01) : 0, aboveDepthC: 0.4, missingShare, meanC: between(random, 3.3, 3.9), minC: between(random, 2.6, 3.0), maxC: warmSpell ? 7.8 : between(random, 4.3, 4.9) };
  }
  if (room === 'North garage') {
    const belowShare = between(random, 0.1, 0.32);
    const freezeShareOfBelow = random() < 0.25 ? 0 : between(random, 0.02, 0.25);
    return { belowShare, belowDepthC: between(random, 0.6, 1.8), freezeShareOfBelow, aboveShare: between(random, 0, 0.015), aboveDepthC: 0.6, missingShare, meanC: between(random, 1.1, 2.0), minC: freezeShareOfBelow > 0 ? between(random, -7, -2.2) : between(random, -1.9, -0.4), maxC: between(random, 7.4, 9.5) };
  }
  // The heated room: inside the warm species' bands unless the heater failed for a night or two.
  const failed = random() < 0.3;
  return { belowShare: failed ? between(random, 0.005, 0.03) : 0, belowDepthC: 2.5, freezeShareOfBelow: 0, aboveShare: 0, aboveDepthC: 0, missingShare, meanC: between(random, 25.8, 26.2), minC: failed ? between(random, 19.5, 22.5) : 25.7, maxC: 26.3 };
}

/** The figures of the stays up to `through`, in the shape the exposure engine reports. */
function exposureThrough(stays: readonly Stay[], profile: SpeciesProfile, through: number): ExposureReport | null {
  let covered = 0, missing = 0, integral = 0, belowH = 0, belowDH = 0, aboveH = 0, aboveDH = 0, freezeH = 0, callusH = 0;
  let minC = Infinity, maxC = -Infinity;
  for (const stay of stays) {
    const hours = (Math.min(stay.to, through) - stay.from) / HOUR;
    if (hours <= 0) continue;
    const c = stay.character;
    const seen = hours * (1 - c.missingShare);
    covered += seen;
    missing += hours - seen;
    integral += seen * c.meanC;
    belowH += seen * c.belowShare;
    belowDH += seen * c.belowShare * c.belowDepthC;
    aboveH += seen * c.aboveShare;
    aboveDH += seen * c.aboveShare * c.aboveDepthC;
    freezeH += seen * c.belowShare * c.freezeShareOfBelow;
    callusH += seen * callusRate(profile.callus, c.meanC);
    minC = Math.min(minC, c.minC);
    maxC = Math.max(maxC, c.maxC);
  }
  if (covered === 0) return null;
  return {
    hoursCovered: covered,
    hoursMissing: missing,
    minC,
    maxC,
    meanC: integral / covered,
    below: { limitC: profile.band.minC, hours: belowH, degreeHours: belowDH },
    above: { limitC: profile.band.maxC, hours: aboveH, degreeHours: aboveDH },
    freeze: { limitC: profile.freezeC, hours: freezeH, degreeHours: freezeH * 0.9 },
    callus: { optimumEquivalentHours: callusH, hoursAtOptimum: profile.callus.hoursAtOptimum, progressPct: (100 * callusH) / profile.callus.hoursAtOptimum },
  };
}

function snapshotThrough(stays: readonly Stay[], profile: SpeciesProfile, through: number, roomIds: ReadonlyMap<DemoRoom, number>): ExposureSnapshot {
  const hours = new Map<DemoRoom, number>();
  for (const s of stays) {
    const h = (Math.min(s.to, through) - s.from) / HOUR;
    if (h > 0) hours.set(s.room, (hours.get(s.room) ?? 0) + h);
  }
  return {
    through: new Date(through).toISOString(),
    exposure: exposureThrough(stays, profile, through),
    rooms: [...hours].map(([room, h]) => ({ roomId: roomIds.get(room)!, roomName: room, hours: h })),
  };
}

/** How many of `n` grafts take with probability p each: a binomial draw. */
function taken(random: Random, n: number, p: number): number {
  let grown = 0;
  for (let i = 0; i < n; i++) if (random() < p) grown += 1;
  return grown;
}

function kindFor(random: Random): Kind {
  let r = random();
  for (const kind of KINDS) {
    r -= kind.share;
    if (r < 0) return kind;
  }
  return KINDS[0];
}

/**
 * Cold-stored batches sit in the cellar or the garage (some move from garage to cellar after a cold spell);
 * warm-callused ones in the heated room. The take falls with freeze hours and time outside the band, a little
 * with cleft grafts of apple and with the newest grafter, and rises with omega grafts of walnut.
 */
function planBatch(kind: Kind, season: number, zone: string, random: Random, roomIds: ReadonlyMap<DemoRoom, number>): DemoBatch {
  const profile = getSpeciesProfile(kind.speciesKey)!;
  const [fromDay, toDay] = kind.graftedBetween.map((md) => DateTime.fromISO(`${season}-${md}`, { zone }));
  const grafted = fromDay.plus({ days: Math.floor(random() * (toDay.diff(fromDay, 'days').days + 1)) });
  const storedFrom = grafted.set({ hour: 16 }).toMillis();
  const plantDay = kind.warm ? grafted.plus({ days: whole(random, 34, 48) }) : DateTime.fromISO(`${season}-04-${String(whole(random, 8, 28)).padStart(2, '0')}`, { zone });
  const lastThrough = plantDay.startOf('day').toMillis();

  const rooms: DemoRoom[] = kind.warm ? ['Callus room'] : random() < 0.55 ? ['Root cellar'] : random() < 0.6 ? ['North garage'] : ['North garage', 'Root cellar'];
  const moveAt = storedFrom + (lastThrough - storedFrom) * between(random, 0.3, 0.6);
  const stays: Stay[] = rooms.map((room, i) => ({
    room,
    from: i === 0 ? storedFrom : Math.round(moveAt),
    to: i === rooms.length - 1 ? lastThrough : Math.round(moveAt),
    character: roomCharacter(room, random),
  }));

  const count = whole(random, ...kind.counts);
  const method = pick(random, kind.methods);
  const grafter = pick(random, GRAFTERS);
  const inParts = random() < 0.2;
  const firstPart = inParts ? Math.round(count * between(random, 0.4, 0.7)) : count;
  const earlyDay = plantDay.minus({ days: whole(random, 4, 9) });
  const parts = inParts ? [{ day: earlyDay, count: firstPart }, { day: plantDay, count: count - firstPart }] : [{ day: plantDay, count }];
  const plantings: DemoPlanting[] = parts.map((part) => {
    const through = part.day.startOf('day').toMillis();
    return { plantedOn: part.day.toISODate()!, through: new Date(through), count: part.count, location: pick(random, BEDS), snapshot: snapshotThrough(stays, profile, through, roomIds) };
  });

  const final = exposureThrough(stays, profile, lastThrough)!;
  const outsideDH = final.below.degreeHours + final.above.degreeHours;
  const handicap =
    Math.min(0.25, 0.008 * final.freeze.hours) + Math.min(0.15, 0.0004 * outsideDH) +
    (kind.speciesKey === 'apple' && method === 'cleft' ? 0.03 : 0) + (grafter === 'Tobias' ? 0.06 : 0) - (method === 'omega' ? 0.06 : 0);
  const p = Math.max(0.2, Math.min(0.98, kind.baseTake - handicap + between(random, -0.03, 0.03)));
  const grown = taken(random, count, p);
  const lastPlanting = parts.at(-1)!.day;
  const early = Math.min(count, grown + whole(random, 0, Math.max(1, Math.round(count * 0.04))));
  return {
    speciesKey: kind.speciesKey,
    cultivar: pick(random, kind.cultivars),
    rootstock: pick(random, kind.rootstocks),
    method,
    grafter,
    graftedOn: grafted.toISODate()!,
    count,
    storageMedium: pick(random, MEDIA),
    stays: stays.map((s) => ({ room: s.room, from: new Date(s.from), to: new Date(s.to) })),
    plantings,
    assessments: [
      { assessedOn: lastPlanting.plus({ days: whole(random, 35, 45) }).toISODate()!, grown: early },
      { assessedOn: `${season}-08-${String(whole(random, 10, 24)).padStart(2, '0')}`, grown },
    ],
  };
}

/** The batches of one past season (grafted in its spring), planted out and assessed. */
export function planDemoSeason(season: number, batchCount: number, zone: string, roomIds: ReadonlyMap<DemoRoom, number>): DemoBatch[] {
  const random = seededRandom(season * 7919);
  const batches: DemoBatch[] = [];
  for (let i = 0; i < batchCount; i++) batches.push(planBatch(kindFor(random), season, zone, random, roomIds));
  return batches.sort((a, b) => (a.graftedOn < b.graftedOn ? -1 : a.graftedOn > b.graftedOn ? 1 : 0));
}
