import type { RowCounts } from '../../shared/import/types';

/** The accounting every import owes: every row is accepted, rejected, a duplicate or a conflict. */
export function RowCountsLine({ rows, acceptedLabel = 'new' }: { rows: RowCounts; acceptedLabel?: string }) {
  const part = (n: number, label: string, tone = '') => (
    <span className={tone}>
      <span className="font-mono font-semibold">{n.toLocaleString()}</span> {label}
    </span>
  );
  return (
    <p className="flex flex-wrap gap-x-4 gap-y-1">
      {part(rows.total, 'rows')}
      {part(rows.accepted, acceptedLabel, 'text-moss-deep')}
      {part(rows.duplicates, 'already there')}
      {part(rows.rejected, 'rejected', rows.rejected ? 'text-ember' : '')}
      {part(rows.conflicts, 'conflicts', rows.conflicts ? 'text-ember' : '')}
    </p>
  );
}
