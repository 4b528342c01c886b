// The export: one row per batch of the season with its storage figures and its outcome, numbers unformatted so a
// spreadsheet reads them as numbers.
import { FREEZE_BANDS, freezeBand, quartileOf } from './exposureBands';
import { toCsv, type CsvCell } from './csv';
import type { SeasonReport } from './seasonReport';
import { takeFigure } from './takeFigure';
import type { BatchOutcome } from './types';

const round1 = (value: number | null | undefined): number | null => (value === null || value === undefined ? null : Math.round(value * 10) / 10);

export function seasonCsv(report: SeasonReport): string {
  const dh = `°${report.unit}·h`;
  const header = [
    'Season', 'Batch', 'Species', 'Cultivar', 'Rootstock', 'Method', 'Grafter', 'Grafted on', 'Grafts in batch',
    'Planted', 'First planted on', 'Last planted on', 'Planted where', 'Storage room (most hours)', 'Hours in that room',
    'Hours logged', 'Freeze hours', 'Freeze band', 'Hours below band', `Below band (${dh})`, 'Hours above band',
    `Above band (${dh})`, `Outside band (${dh})`, 'Degree-hour quarter', 'Callus progress (%)', 'Last assessed on', 'Grown',
    'Take (%)', 'Take 95 % low (%)', 'Take 95 % high (%)',
  ];
  const bandLabel = new Map<string, string>(FREEZE_BANDS.map((b) => [b.key, b.label]));
  const cuts = report.degreeHourCuts;
  const row = (b: BatchOutcome): CsvCell[] => {
    const e = b.exposure;
    const take = takeFigure([b]);
    return [
      report.season, b.code, b.species, b.cultivar, b.rootstock, b.method, b.grafter, b.graftedOn, b.count,
      b.planted, b.firstPlantedOn, b.lastPlantedOn, b.locations.join('; '), b.room?.name ?? null, round1(b.room?.hours),
      round1(e?.hoursCovered), round1(e?.freezeHours), e ? bandLabel.get(freezeBand(e.freezeHours))! : null, round1(e?.belowHours),
      round1(e?.belowDegreeHours), round1(e?.aboveHours), round1(e?.aboveDegreeHours), round1(e?.outsideDegreeHours),
      e && cuts ? quartileOf(e.outsideDegreeHours, cuts).toUpperCase() : null, round1(e?.callusPct), b.assessedOn, b.grown,
      round1(take?.takePct), round1(take?.lowPct), round1(take?.highPct),
    ];
  };
  return toCsv(header, report.batches.map(row));
}
