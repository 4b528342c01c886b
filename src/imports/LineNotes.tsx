import type { LineNote } from '../../shared/import/types';

/** Rejected or conflicting lines with their physical line numbers, so they can be found in the file. */
export function LineNotes({ title, notes, total }: { title: string; notes: LineNote[]; total: number }) {
  if (total === 0) return null;
  return (
    <details className="rounded-md border border-frost-deep bg-paper p-3">
      <summary className="cursor-pointer font-semibold">
        {title}: {total.toLocaleString()}
        {notes.length < total ? ` (first ${notes.length} listed)` : ''}
      </summary>
      <ol className="mt-2 max-h-64 space-y-1 overflow-auto text-sm">
        {notes.map((n) => (
          <li key={`${n.line}-${n.reason}`}>
            <span className="font-mono font-semibold">line {n.line}</span> — {n.reason}
          </li>
        ))}
      </ol>
    </details>
  );
}
