// The season report: take by storage room, by exposure band and by how the grafts were made, each figure with
// the grafts behind it and its Wilson 95 % interval.
import { celsiusIntervalToFahrenheit } from '../units';
import type { TemperatureUnit } from '../schemas/common';
import { FREEZE_BANDS, QUARTILE_KEYS, freezeBand, quartileCuts, quartileOf } from './exposureBands';
import { strongestDifferences, type Finding } from './findings';
import { seasonDates, seasonLabel } from './seasonOf';
import { isAssessed, takeByGroup, takeFigure, type GroupOf } from './takeFigure';
import type { BatchOutcome, TakeFigure, TakeGroup } from './types';

export const DIMENSION_KEYS = ['room', 'freeze', 'degreeHours', 'species', 'cultivar', 'rootstock', 'method', 'grafter'] as const;
export type DimensionKey = (typeof DIMENSION_KEYS)[number];

export interface ReportDimension {
  key: DimensionKey;
  title: string;
  /** How batches were put in groups, said on the page and in the printout. */
  note: string;
  groups: TakeGroup[];
}

export interface SeasonReport {
  season: number;
  label: string;
  /** First and last grafting dates of the season. */
  from: string;
  to: string;
  /** Unit of every degree-hour figure in the report (batches, cut points, labels). */
  unit: TemperatureUnit;
  counts: {
    batches: number;
    grafts: number;
    plantedBatches: number;
    plantedGrafts: number;
    assessedBatches: number;
    /** Planted, not yet assessed: left out of every take figure. */
    awaitingAssessment: number;
  };
  overall: TakeFigure | null;
  /** 25th, 50th and 75th percentiles of degree-hours outside the band over the season's measured, assessed batches. */
  degreeHourCuts: [number, number, number] | null;
  dimensions: ReportDimension[];
  findings: Finding[];
  batches: BatchOutcome[];
}

const NOT_RECORDED = { key: '', label: 'Not recorded', catchAll: true } as const;
const NOT_MEASURED = { key: 'unmeasured', label: 'No logger record', catchAll: true } as const;
const NO_ROOM = { key: 'none', label: 'No room recorded', catchAll: true } as const;
const AS_RECORDED = 'As recorded on the batch; spellings that differ only in capitals or spaces count together.';

/** Free-text fields group case- and spacing-insensitively ("M.26" and "m.26 "), under the first spelling met. */
function byText(pick: (b: BatchOutcome) => string): GroupOf {
  return (b) => {
    const label = pick(b).trim().replace(/\s+/g, ' ');
    return label ? { key: label.toLowerCase(), label } : NOT_RECORDED;
  };
}

/** Groups in label order, "not recorded" and "not measured" last, so tables line up from season to season. */
function labelOrder(batches: readonly BatchOutcome[], groupOf: GroupOf): string[] {
  const labels = new Map<string, string>();
  for (const b of batches) {
    const g = groupOf(b);
    if (g && !labels.has(g.key)) labels.set(g.key, g.label);
  }
  const last = new Set<string>([NOT_RECORDED.key, NOT_MEASURED.key, NO_ROOM.key]);
  const named = [...labels].filter(([key]) => !last.has(key)).sort((a, b) => a[1].localeCompare(b[1], 'en', { numeric: true }));
  return [...named.map(([key]) => key), ...[...last].filter((k) => labels.has(k))];
}

function formatDegreeHours(value: number, unit: TemperatureUnit): string {
  return `${value === 0 ? '0' : value.toFixed(value < 10 ? 1 : 0)} °${unit}·h`;
}

function quartileLabels(cuts: [number, number, number], unit: TemperatureUnit): Record<string, string> {
  const [a, b, c] = cuts.map((v) => formatDegreeHours(v, unit));
  return {
    q1: cuts[0] === 0 ? 'Lowest quarter (none outside the band)' : `Lowest quarter (up to ${a})`,
    q2: `Second quarter (${a} to ${b})`,
    q3: `Third quarter (${b} to ${c})`,
    q4: `Highest quarter (over ${c})`,
  };
}

/** Degree-hours are temperature intervals × time, so °F·h = °C·h × 9/5 with no offset (NIST SP 811 B.9). */
function inUnit(batch: BatchOutcome, unit: TemperatureUnit): BatchOutcome {
  if (unit === 'C' || !batch.exposure) return batch;
  const e = batch.exposure;
  return {
    ...batch,
    exposure: {
      ...e,
      belowDegreeHours: celsiusIntervalToFahrenheit(e.belowDegreeHours),
      aboveDegreeHours: celsiusIntervalToFahrenheit(e.aboveDegreeHours),
      outsideDegreeHours: celsiusIntervalToFahrenheit(e.outsideDegreeHours),
    },
  };
}

function dimension(key: DimensionKey, title: string, note: string, batches: readonly BatchOutcome[], groupOf: GroupOf, order?: string[]): ReportDimension {
  return { key, title, note, groups: takeByGroup(batches, groupOf, order ?? labelOrder(batches, groupOf)) };
}

/** Builds the report for one season from its batches' outcomes (°C inside; `unit` chooses the report's unit). */
export function buildSeasonReport(season: number, outcomes: readonly BatchOutcome[], unit: TemperatureUnit = 'C'): SeasonReport {
  const { from, to } = seasonDates(season);
  const batches = outcomes.map((b) => inUnit(b, unit));
  const assessed = batches.filter(isAssessed);
  const cuts = quartileCuts(assessed.flatMap((b) => (b.exposure ? [b.exposure.outsideDegreeHours] : [])));

  const freezeLabels = new Map<string, string>(FREEZE_BANDS.map((band) => [band.key, band.label]));
  const freezeGroup: GroupOf = (b) => {
    if (!b.exposure) return NOT_MEASURED;
    const key = freezeBand(b.exposure.freezeHours);
    return { key, label: freezeLabels.get(key)! };
  };
  const labels = cuts ? quartileLabels(cuts, unit) : {};
  const quartileGroup: GroupOf = (b) => {
    if (!b.exposure || !cuts) return NOT_MEASURED;
    const key = quartileOf(b.exposure.outsideDegreeHours, cuts);
    return { key, label: labels[key] };
  };
  const roomGroup: GroupOf = (b) => (b.room ? { key: `room-${b.room.id}`, label: b.room.name } : NO_ROOM);

  const dimensions = [
    dimension('room', 'Storage room', 'Each batch counts under the room where it spent the most storage hours before its last planting.', batches, roomGroup),
    dimension(
      'freeze', 'Freeze hours',
      'Hours below the species\' freeze limit, per graft planted: batches planted in parts average their parts, weighted by grafts.',
      batches, freezeGroup, [...FREEZE_BANDS.map((band) => band.key), NOT_MEASURED.key],
    ),
    dimension(
      'degreeHours', 'Degree-hours outside the band',
      'Degree-hours below plus above the species\' storage band, per graft planted. Quarters are cut at the quartiles of this season\'s assessed batches (each batch counts once); batches tied at a cut stay together, so quarters may hold unequal numbers of batches.',
      batches, quartileGroup, [...QUARTILE_KEYS, NOT_MEASURED.key],
    ),
    dimension('species', 'Species', AS_RECORDED, batches, byText((b) => b.species)),
    dimension('cultivar', 'Cultivar', AS_RECORDED, batches, byText((b) => b.cultivar)),
    dimension('rootstock', 'Rootstock', AS_RECORDED, batches, byText((b) => b.rootstock)),
    dimension('method', 'Grafting method', AS_RECORDED, batches, byText((b) => b.method)),
    dimension('grafter', 'Grafter', AS_RECORDED, batches, byText((b) => b.grafter)),
  ];
  const planted = batches.filter((b) => b.planted > 0);
  return {
    season,
    label: seasonLabel(season),
    from,
    to,
    unit,
    counts: {
      batches: batches.length,
      grafts: batches.reduce((sum, b) => sum + b.count, 0),
      plantedBatches: planted.length,
      plantedGrafts: planted.reduce((sum, b) => sum + b.planted, 0),
      assessedBatches: assessed.length,
      awaitingAssessment: planted.length - assessed.length,
    },
    overall: takeFigure(batches),
    degreeHourCuts: cuts,
    dimensions,
    findings: strongestDifferences(dimensions),
    batches,
  };
}
