import { useCurrentSession } from '../auth/useCurrentSession';
import { NotFoundPage } from '../layout/NotFoundPage';
import { formatInstant } from '../time/nurseryTime';
import { DetailList } from '../ui/DetailList';
import { ErrorNotice } from '../ui/ErrorNotice';
import { PageHeader } from '../ui/PageHeader';
import { Panel } from '../ui/Panel';
import { QueryResult } from '../ui/QueryResult';
import { useIdParam } from '../ui/useIdParam';
import { DetectionSummary } from './DetectionSummary';
import { ImportStatus } from './ImportStatus';
import { LineNotes } from './LineNotes';
import { useImport } from './queries';
import { RowCountsLine } from './RowCountsLine';

export function ImportPage() {
  const id = useIdParam();
  return id === null ? <NotFoundPage what="import" /> : <ImportDetailView id={id} />;
}

function ImportDetailView({ id }: { id: number }) {
  const record = useImport(id);
  const { nursery } = useCurrentSession();
  const when = (t: string | null) => (t ? formatInstant(t, nursery.timeZone) : '—');
  return (
    <QueryResult query={record} loading="Loading the import…" failed="Could not load this import">
      {(i) => (
        <>
          <PageHeader title={`Import #${i.id}`} description={i.fileName} back={{ to: '/imports', label: 'Imports' }} />
          <div className="space-y-6">
            <Panel title="What happened">
              <div className="space-y-4">
                <DetailList
                  items={[
                    { label: 'Status', value: <ImportStatus status={i.status} /> },
                    { label: 'Logger', value: i.loggerLabel ?? '—' },
                    { label: 'Started', value: when(i.startedAt), figure: true },
                    { label: 'Finished', value: when(i.finishedAt), figure: true },
                    { label: 'Readings from', value: `${when(i.span.first)} to ${when(i.span.last)}`, figure: true },
                    { label: 'File size', value: `${i.fileBytes.toLocaleString()} bytes`, figure: true },
                  ]}
                />
                <RowCountsLine rows={i.rows} acceptedLabel="stored" />
                {i.error && <ErrorNotice title="Why it failed" error={new Error(i.error.message)} />}
                <LineNotes title="Rejected lines" notes={i.rejectedLines} total={i.rows.rejected} />
                <LineNotes title="Conflicting lines" notes={i.conflictLines} total={i.rows.conflicts} />
              </div>
            </Panel>
            {i.detected && (
              <Panel title="What was detected">
                <DetectionSummary detected={i.detected} />
              </Panel>
            )}
          </div>
        </>
      )}
    </QueryResult>
  );
}
