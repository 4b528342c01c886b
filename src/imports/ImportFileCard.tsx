import { useEffect, useState } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '../ui/Button';
import { ErrorNotice } from '../ui/ErrorNotice';
import { DetectionSummary } from './DetectionSummary';
import { ImportChoicesForm } from './ImportChoicesForm';
import { LineNotes } from './LineNotes';
import { PreviewRows } from './PreviewRows';
import { useCommitImport, usePreviewImport, type ImportChoices, type ImportOutcome } from './queries';
import { RowCountsLine } from './RowCountsLine';

const NO_CHOICES: ImportChoices = { logger: '', tz: '', unit: '', dateOrder: '' };

function Progress({ fraction, label }: { fraction: number; label: string }) {
  return (
    <div>
      <p className="text-sm text-ink-soft">{label}</p>
      <progress className="h-2 w-full accent-moss" value={Math.round(fraction * 100)} max={100} aria-label={label} />
    </div>
  );
}

/**
 * One dropped file: it is read once as a preview (nothing stored), the person checks what was detected and may
 * override it, and only then is it imported.
 */
export function ImportFileCard({ file, onDismiss }: { file: File; onDismiss: () => void }) {
  const [choices, setChoices] = useState<ImportChoices>(NO_CHOICES);
  const [progress, setProgress] = useState(0);
  const preview = usePreviewImport();
  const commit = useCommitImport();
  const runPreview = (next: ImportChoices) => preview.mutate({ file, choices: next, onProgress: setProgress });

  useEffect(() => {
    runPreview(NO_CHOICES);
    // Preview once when the file arrives; later previews follow explicit changes.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [file]);

  const shown: ImportOutcome | undefined = commit.data ?? preview.data;
  const done = commit.isSuccess;
  return (
    <article className="space-y-4 rounded-lg border border-frost-deep bg-white p-4 shadow-sm" aria-label={`Import of ${file.name}`}>
      <header className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 className="font-mono font-semibold break-all">{file.name}</h3>
        <span className="text-sm text-ink-soft">{(file.size / 1024).toLocaleString(undefined, { maximumFractionDigits: 0 })} KB</span>
      </header>
      {preview.isPending && <Progress fraction={progress} label={progress < 1 ? 'Uploading for a preview…' : 'Reading the file…'} />}
      {commit.isPending && <Progress fraction={progress} label={progress < 1 ? 'Uploading…' : 'Storing readings…'} />}
      {preview.isError && <ErrorNotice title="This file could not be read" error={preview.error} />}
      {commit.isError && <ErrorNotice title="The import failed; nothing from it was stored" error={commit.error} />}

      {done && commit.data && (
        <div className="rounded-md bg-moss-light p-3" role="status">
          {commit.data.alreadyImported ? (
            <p className="font-semibold">This exact file was imported before{commit.data.import ? ` (import #${commit.data.import.id})` : ''}; nothing new was stored.</p>
          ) : (
            <p className="font-semibold">Imported into {commit.data.import?.loggerLabel}.</p>
          )}
          <RowCountsLine rows={commit.data.rows} acceptedLabel="stored" />
          {commit.data.import && (
            <Link to={`/imports/${commit.data.import.id}`} className="text-slate underline underline-offset-4">
              See the import record
            </Link>
          )}
        </div>
      )}

      {shown && !done && (
        <>
          <RowCountsLine rows={shown.rows} acceptedLabel="readable" />
          <DetectionSummary detected={shown.detected} />
          <PreviewRows rows={shown.preview} />
          <LineNotes title="Rejected lines" notes={shown.rejectedLines} total={shown.rows.rejected} />
          <LineNotes title="Conflicting lines" notes={shown.conflictLines} total={shown.rows.conflicts} />
        </>
      )}

      {!done && (
        <details className="rounded-md border border-frost-deep p-3" open={preview.isError}>
          <summary className="cursor-pointer font-semibold">Change what was detected</summary>
          <div className="mt-3 space-y-3">
            <ImportChoicesForm choices={choices} onChange={setChoices} />
            <Button variant="secondary" size="sm" onClick={() => runPreview(choices)} busy={preview.isPending} busyLabel="Reading…">
              Preview again
            </Button>
          </div>
        </details>
      )}

      <div className="flex flex-wrap gap-2">
        {!done && (
          <Button
            onClick={() => commit.mutate({ file, choices, onProgress: setProgress })}
            disabled={!preview.isSuccess}
            busy={commit.isPending}
            busyLabel="Importing…"
          >
            Import {shown ? `${shown.rows.accepted.toLocaleString()} readings` : ''}
          </Button>
        )}
        <Button variant="quiet" onClick={onDismiss}>
          {done ? 'Close' : 'Cancel'}
        </Button>
      </div>
    </article>
  );
}
