import { Link, useSearchParams } from 'react-router-dom';
import { batchListQuery, type BatchListQuery } from '../../shared/schemas/batches';
import { useRoleAtLeast } from '../auth/useCurrentSession';
import { RoomName } from '../loggers/RoomName';
import { useProfiles } from '../profiles/queries';
import { useRooms } from '../rooms/queries';
import { ButtonLink } from '../ui/Button';
import { EmptyState } from '../ui/EmptyState';
import { PageHeader } from '../ui/PageHeader';
import { QueryResult } from '../ui/QueryResult';
import { Table } from '../ui/Table';
import { BatchFilters } from './BatchFilters';
import { STATUS_LABEL } from './batchStatus';
import { useBatches, type Batch } from './queries';
import { speciesName } from './SpeciesSelect';

const link = 'font-semibold text-slate underline underline-offset-4 hover:text-slate-deep';

/** The address's filters, keeping only what the shared schema accepts (a hand-edited address must not break the page). */
function readFilters(params: URLSearchParams): BatchListQuery {
  const known = Object.fromEntries([...params].filter(([key]) => key in batchListQuery.shape));
  const parsed = batchListQuery.safeParse(known);
  const bad = new Set(parsed.success ? [] : parsed.error.issues.map((i) => String(i.path[0])));
  return Object.fromEntries(Object.entries(known).filter(([key]) => !bad.has(key))) as BatchListQuery;
}

export function BatchesPage() {
  const [params, setParams] = useSearchParams();
  const filters = readFilters(params);
  const batches = useBatches(filters);
  const profiles = useProfiles();
  const rooms = useRooms();
  const canEdit = useRoleAtLeast('staff');
  const addButton = canEdit && <ButtonLink to="/batches/grafting-day">Record a grafting day</ButtonLink>;
  const filtered = params.size > 0;
  return (
    <>
      <PageHeader
        title="Batches"
        description={
          <>
            The grafts of each grafting day, by species and cultivar, and where they are. <Link className={link} to="/batches/exposure">Exposure of every batch in storage</Link>.
          </>
        }
        actions={addButton}
      />
      <BatchFilters
        filters={filters}
        onChange={(next) => setParams(Object.entries(next).filter(([, v]) => v !== undefined && v !== '') as [string, string][], { replace: true })}
        profiles={profiles.data ?? []}
        rooms={rooms.data ?? []}
      />
      <QueryResult query={batches} loading="Loading batches…" failed="Could not load the batches">
        {(list) =>
          list.length === 0 ? (
            <EmptyState title={filtered ? 'No batch matches' : 'No batches yet'} action={!filtered && addButton}>
              {filtered ? 'Loosen a filter to see more.' : 'Record a grafting day: the grafts of each species and cultivar, and the room they went into.'}
            </EmptyState>
          ) : (
            <Table<Batch>
              caption="Batches"
              rows={list}
              rowKey={(b) => b.id}
              columns={[
                { header: 'Code', cell: (b) => <Link to={`/batches/${b.id}`} className={link}>{b.code}</Link>, figure: true },
                { header: 'Species', cell: (b) => speciesName(profiles.data, b.species) },
                { header: 'Scion on rootstock', cell: (b) => `${b.scionCultivar} on ${b.rootstock}` },
                { header: 'Grafts', cell: (b) => b.count, figure: true },
                { header: 'Grafted', cell: (b) => b.graftedOn, figure: true },
                { header: 'Room now', cell: (b) => (b.roomId === null ? STATUS_LABEL[b.status] : <RoomName roomId={b.roomId} rooms={rooms.data} />) },
                { header: 'Status', cell: (b) => STATUS_LABEL[b.status] },
              ]}
            />
          )
        }
      </QueryResult>
    </>
  );
}
