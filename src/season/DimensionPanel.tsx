import type { ReportDimension } from '../../shared/season/seasonReport';
import { EmptyState } from '../ui/EmptyState';
import { Panel } from '../ui/Panel';
import { TakeChart } from './TakeChart';
import { TakeTable } from './TakeTable';

/** One grouping of the report: what it groups by, a bar chart with intervals, and the table of figures. */
export function DimensionPanel({ dimension }: { dimension: ReportDimension }) {
  return (
    <Panel title={`Take by ${dimension.title.toLowerCase()}`} description={dimension.note}>
      {dimension.groups.length === 0 ? (
        <EmptyState title="Nothing assessed yet">Figures appear once batches are planted out and assessed.</EmptyState>
      ) : (
        <div className="space-y-4">
          <TakeChart groups={dimension.groups} title={`Take by ${dimension.title.toLowerCase()}`} />
          <TakeTable groups={dimension.groups} caption={`Take by ${dimension.title.toLowerCase()}`} />
        </div>
      )}
    </Panel>
  );
}
