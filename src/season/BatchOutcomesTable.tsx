import { Link } from 'react-router-dom';
import { percent } from '../../shared/season/formatTake';
import { takeFigure } from '../../shared/season/takeFigure';
import type { SeasonReport } from '../../shared/season/seasonReport';
import type { BatchOutcome } from '../../shared/season/types';
import { Table } from '../ui/Table';

const link = 'font-semibold text-slate underline underline-offset-4 hover:text-slate-deep';
const oneDecimal = (v: number | undefined) => (v === undefined ? '—' : v.toFixed(1));

function takeCell(b: BatchOutcome): string {
  const take = takeFigure([b]);
  return take ? `${take.grown} grown: ${percent(take.takePct)} (${Math.round(take.lowPct)}–${percent(take.highPct)})` : 'not assessed';
}

/** Every batch of the season with its storage figures (per graft planted) and its outcome, as the export has them. */
export function BatchOutcomesTable({ report, linkBatches = true }: { report: SeasonReport; linkBatches?: boolean }) {
  return (
    <Table<BatchOutcome>
      caption={`Batches of ${report.label}`}
      rows={report.batches}
      rowKey={(b) => b.batchId}
      columns={[
        { header: 'Batch', cell: (b) => (linkBatches ? <Link className={link} to={`/batches/${b.batchId}`}>{b.code}</Link> : b.code), figure: true },
        { header: 'Grafts', cell: (b) => `${b.species}, ${b.cultivar} on ${b.rootstock}` },
        { header: 'Room (most hours)', cell: (b) => b.room?.name ?? '—' },
        { header: 'Freeze h', cell: (b) => oneDecimal(b.exposure?.freezeHours), figure: true },
        { header: `Outside band °${report.unit}·h`, cell: (b) => oneDecimal(b.exposure?.outsideDegreeHours), figure: true },
        { header: 'Planted', cell: (b) => `${b.planted} of ${b.count}`, figure: true },
        { header: 'Take (95 % interval)', cell: takeCell, figure: true },
      ]}
    />
  );
}
