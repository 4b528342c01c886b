import { compareSeasons, type ComparedRow } from '../../shared/season/compareSeasons';
import { percent } from '../../shared/season/formatTake';
import type { SeasonReport } from '../../shared/season/seasonReport';
import type { TakeFigure } from '../../shared/season/types';
import { Panel } from '../ui/Panel';
import { Table } from '../ui/Table';

const figure = (f: TakeFigure | null) => (f ? `${percent(f.takePct)} (${f.grown}/${f.planted}; ${Math.round(f.lowPct)}–${percent(f.highPct)})` : '—');

/** This season beside the one before, group by group; a dash where a season had no such group assessed. */
export function SeasonComparison({ current, previous }: { current: SeasonReport; previous: SeasonReport }) {
  const comparison = compareSeasons(current, previous);
  const columns = [
    { header: 'Group', cell: (r: ComparedRow) => r.label },
    { header: current.label, cell: (r: ComparedRow) => figure(r.current), figure: true },
    { header: previous.label, cell: (r: ComparedRow) => figure(r.previous), figure: true },
  ];
  return (
    <Panel
      title={`${current.label} beside ${previous.label}`}
      description="Take (grown/planted; 95 % interval) in each group for both seasons. Degree-hour quarters are each season's own, so those rows compare the easier and harder quarters, not fixed amounts."
    >
      <div className="space-y-6">
        <p>
          Overall: <strong>{figure(comparison.overall.current)}</strong> in {current.label}, against <strong>{figure(comparison.overall.previous)}</strong> in{' '}
          {previous.label}.
        </p>
        {comparison.dimensions
          .filter((d) => d.rows.length > 0)
          .map((d) => (
            <section key={d.key} className="break-inside-avoid">
              <h3 className="mb-2 font-semibold text-slate-deep">{d.title}</h3>
              <Table<ComparedRow> caption={`${d.title}: ${current.label} beside ${previous.label}`} rows={d.rows} rowKey={(r) => r.key} columns={columns} />
            </section>
          ))}
      </div>
    </Panel>
  );
}
