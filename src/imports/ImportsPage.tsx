import { useState } from 'react';
import { Link } from 'react-router-dom';
import { useCurrentSession, useRoleAtLeast } from '../auth/useCurrentSession';
import { formatInstant } from '../time/nurseryTime';
import { EmptyState } from '../ui/EmptyState';
import { PageHeader } from '../ui/PageHeader';
import { Panel } from '../ui/Panel';
import { QueryResult } from '../ui/QueryResult';
import { Table } from '../ui/Table';
import { DropZone } from './DropZone';
import { ImportFileCard } from './ImportFileCard';
import { useImports, type ImportRecord } from './queries';
import { ImportStatus } from './ImportStatus';

const link = 'font-semibold text-slate underline underline-offset-4 hover:text-slate-deep';
let fileSeq = 0;

export function ImportsPage() {
  const canImport = useRoleAtLeast('staff');
  const { nursery } = useCurrentSession();
  const imports = useImports();
  const [files, setFiles] = useState<{ key: number; file: File }[]>([]);
  return (
    <>
      <PageHeader title="Imports" description="Logger files brought in by hand, by upload or by the nightly coldknit import." />
      <div className="space-y-6">
        {canImport && (
          <Panel title="Bring in logger files" description="Each file is read first and shown to you; readings are stored only when you confirm. Re-importing an overlapping file adds only what is new.">
            <div className="space-y-4">
              <DropZone onFiles={(list) => setFiles((prev) => [...prev, ...list.map((file) => ({ key: ++fileSeq, file }))])} />
              {files.map(({ key, file }) => (
                <ImportFileCard key={key} file={file} onDismiss={() => setFiles((prev) => prev.filter((f) => f.key !== key))} />
              ))}
            </div>
          </Panel>
        )}
        <Panel title="Recent imports">
          <QueryResult query={imports} loading="Loading imports…" failed="Could not load the imports">
            {(list) =>
              list.length === 0 ? (
                <EmptyState title="No imports yet">Files you import, and nightly imports, appear here with what became of every row.</EmptyState>
              ) : (
                <Table<ImportRecord>
                  caption="Recent imports"
                  rows={list}
                  rowKey={(i) => i.id}
                  columns={[
                    { header: 'When', cell: (i) => <Link className={link} to={`/imports/${i.id}`}>{formatInstant(i.startedAt, nursery.timeZone)}</Link>, figure: true },
                    { header: 'File', cell: (i) => <span className="font-mono text-sm break-all">{i.fileName}</span> },
                    { header: 'Logger', cell: (i) => i.loggerLabel ?? '—' },
                    { header: 'Status', cell: (i) => <ImportStatus status={i.status} /> },
                    { header: 'New', cell: (i) => i.rows.accepted.toLocaleString(), figure: true },
                    { header: 'Rejected', cell: (i) => i.rows.rejected.toLocaleString(), figure: true },
                    { header: 'Conflicts', cell: (i) => i.rows.conflicts.toLocaleString(), figure: true },
                  ]}
                />
              )
            }
          </QueryResult>
        </Panel>
      </div>
    </>
  );
}
