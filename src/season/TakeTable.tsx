import { percent } from '../../shared/season/formatTake';
import type { TakeGroup } from '../../shared/season/types';
import { Table } from '../ui/Table';

/** The figures behind a chart: every take with the grafts behind it and its interval. */
export function TakeTable({ groups, caption }: { groups: TakeGroup[]; caption: string }) {
  return (
    <Table<TakeGroup>
      caption={caption}
      rows={groups}
      rowKey={(g) => g.key}
      columns={[
        { header: 'Group', cell: (g) => g.label },
        { header: 'Take', cell: (g) => percent(g.takePct), figure: true },
        { header: '95 % interval', cell: (g) => `${Math.round(g.lowPct)}–${percent(g.highPct)}`, figure: true },
        { header: 'Grown of planted', cell: (g) => `${g.grown} of ${g.planted}`, figure: true },
        { header: 'Batches', cell: (g) => g.batches, figure: true },
      ]}
    />
  );
}
