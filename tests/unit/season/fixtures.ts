// Small hand-made records for the season tests.
import type { ExposureReport } from '../../../shared/exposure/types';
import type { BatchOutcome, PlantedExposure } from '../../../shared/season/types';

/** An exposure report with only the figures the season code reads set; the rest are plausible fillers. */
export function exposureReport(f: { freezeHours?: number; belowHours?: number; belowDH?: number; aboveHours?: number; aboveDH?: number; callusPct?: number; hoursCovered?: number }): ExposureReport {
  const report: ExposureReport = {
    hoursCovered: f.hoursCovered ?? 1000,
    hoursMissing: 0,
    minC: -1,
    maxC: 9,
    meanC: 3,
    below: { limitC: 0, hours: f.belowHours ?? 0, degreeHours: f.belowDH ?? 0 },
    above: { limitC: 7.2, hours: f.aboveHours ?? 0, degreeHours: f.aboveDH ?? 0 },
    freeze: { limitC: -2, hours: f.freezeHours ?? 0, degreeHours: 0 },
  };
  if (f.callusPct !== undefined) report.callus = { optimumEquivalentHours: (f.callusPct * 336) / 100, hoursAtOptimum: 336, progressPct: f.callusPct };
  return report;
}

export function plantedExposureOf(f: { freezeHours: number; belowDH: number; aboveDH: number }): PlantedExposure {
  return {
    hoursCovered: 1000,
    freezeHours: f.freezeHours,
    belowHours: f.belowDH / 2,
    belowDegreeHours: f.belowDH,
    aboveHours: f.aboveDH / 2,
    aboveDegreeHours: f.aboveDH,
    outsideDegreeHours: f.belowDH + f.aboveDH,
    callusPct: 50,
  };
}

let nextId = 1;
export function outcome(o: Partial<BatchOutcome> & { planted: number; grown: number | null }): BatchOutcome {
  const id = nextId++;
  return {
    batchId: id,
    code: `T-${id}`,
    species: 'Apple',
    cultivar: 'Gala',
    rootstock: 'M.26',
    method: 'whip-and-tongue',
    grafter: 'Ana',
    graftedOn: '2026-02-10',
    count: o.planted,
    firstPlantedOn: o.planted > 0 ? '2026-04-20' : null,
    lastPlantedOn: o.planted > 0 ? '2026-04-20' : null,
    locations: o.planted > 0 ? ['Bed 1'] : [],
    assessedOn: o.grown === null ? null : '2026-07-15',
    room: null,
    exposure: null,
    ...o,
  };
}

const CELLAR = { id: 1, name: 'Cellar', hours: 2000 };
const GARAGE = { id: 2, name: 'Garage', hours: 1800 };

/**
 * Seven batches of season 2026 whose every figure was worked out by hand in seasonReport.test.ts: two rooms, all
 * four freeze bands, a batch without logger record or grafter, one planted but not assessed, one not planted.
 */
export function seasonFixture(): BatchOutcome[] {
  return [
    outcome({ planted: 100, grown: 90, room: CELLAR, exposure: plantedExposureOf({ freezeHours: 0, belowDH: 0, aboveDH: 10 }) }),
    outcome({ planted: 50, grown: 40, cultivar: 'gala ', rootstock: 'm.26', method: 'cleft', grafter: 'ana', room: CELLAR, exposure: plantedExposureOf({ freezeHours: 0.5, belowDH: 5, aboveDH: 5 }) }),
    outcome({ planted: 40, grown: 20, species: 'Pear', cultivar: 'Conference', rootstock: 'Quince A', grafter: 'Ben', room: GARAGE, exposure: plantedExposureOf({ freezeHours: 3, belowDH: 30, aboveDH: 0 }) }),
    outcome({ planted: 60, grown: 30, rootstock: 'M.9', grafter: 'Ben', room: GARAGE, exposure: plantedExposureOf({ freezeHours: 8, belowDH: 60, aboveDH: 0 }) }),
    outcome({ planted: 10, grown: 10, count: 12, species: 'Pear', cultivar: 'Conference', rootstock: 'Quince A', method: 'cleft', grafter: '' }),
    outcome({ planted: 20, grown: null, count: 30, room: CELLAR, exposure: plantedExposureOf({ freezeHours: 20, belowDH: 100, aboveDH: 0 }) }),
    outcome({ planted: 0, grown: null, count: 25 }),
  ];
}
