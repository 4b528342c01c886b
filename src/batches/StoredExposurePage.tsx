import { DateTime } from 'luxon';
import { Link } from 'react-router-dom';
import { useCurrentSession } from '../auth/useCurrentSession';
import { formatInstant } from '../time/nurseryTime';
import { EmptyState } from '../ui/EmptyState';
import { PageHeader } from '../ui/PageHeader';
import { QueryResult } from '../ui/QueryResult';
import { Table } from '../ui/Table';
import { hoursText, limitText, rangeText } from './exposureText';
import { useStoredExposure, type StoredBatchExposure } from './queries';

const link = 'font-semibold text-slate underline underline-offset-4 hover:text-slate-deep';

/** Riskiest first: freeze time, then time below and above the band. */
const byRisk = (a: StoredBatchExposure, b: StoredBatchExposure) => {
  const risk = (r: StoredBatchExposure) => [r.headline?.freeze.hours ?? 0, r.headline?.below.hours ?? 0, r.headline?.above.hours ?? 0];
  const [ra, rb] = [risk(a), risk(b)];
  return rb[0] - ra[0] || rb[1] - ra[1] || rb[2] - ra[2] || a.code.localeCompare(b.code);
};

function callusText(r: StoredBatchExposure, zone: string): string {
  if (!r.progress) return '—';
  const pct = `${Math.min(100, r.progress.progressPct).toFixed(0)} %`;
  const { outlook } = r.progress;
  if (outlook.status === 'estimated') return `${pct}, full about ${DateTime.fromISO(outlook.fullCallusAt!, { zone }).toFormat('d LLL')}`;
  return outlook.status === 'complete' ? `${pct}, done` : pct;
}

/** Every batch in storage with its exposure so far and its callus progress, in one table. */
export function StoredExposurePage() {
  const stored = useStoredExposure();
  const { user, nursery } = useCurrentSession();
  const unit = user.unit;
  return (
    <>
      <PageHeader
        title="Exposure of stored batches"
        description="Each batch summed over its stays; where several loggers watch a room, the worst of them counts. Riskiest first."
        back={{ to: '/batches', label: 'Batches' }}
      />
      <QueryResult query={stored} loading="Working out exposure…" failed="Could not work out the exposure">
        {({ rows, asOf }) =>
          rows.length === 0 ? (
            <EmptyState title="No batches in storage" />
          ) : (
            <>
              <p className="mb-3 text-sm text-ink-soft">As of {formatInstant(asOf, nursery.timeZone)}.</p>
              <Table<StoredBatchExposure>
                caption="Exposure of stored batches"
                rows={[...rows].sort(byRisk)}
                rowKey={(r) => r.batchId}
                columns={[
                  { header: 'Batch', cell: (r) => <Link className={link} to={`/batches/${r.batchId}`}>{r.code}</Link>, figure: true },
                  { header: 'What', cell: (r) => `${r.speciesName}, ${r.scionCultivar}` },
                  { header: 'Room now', cell: (r) => r.roomName ?? '—' },
                  { header: 'Below freeze limit', cell: (r) => (r.headline ? limitText(r.headline.freeze, unit) : '—'), figure: true },
                  { header: 'Below band', cell: (r) => (r.headline ? limitText(r.headline.below, unit) : '—'), figure: true },
                  { header: 'Above band', cell: (r) => (r.headline ? limitText(r.headline.above, unit) : '—'), figure: true },
                  { header: 'Range', cell: (r) => (r.headline ? rangeText(r.headline.minC, r.headline.maxC, unit) : '—'), figure: true },
                  { header: 'Unlogged', cell: (r) => (r.headline ? hoursText(r.headline.hoursMissing) : '—'), figure: true },
                  { header: 'Callus', cell: (r) => callusText(r, nursery.timeZone), figure: true },
                ]}
              />
            </>
          )
        }
      </QueryResult>
    </>
  );
}
