import type { UseQueryResult } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { useRoleAtLeast } from '../auth/useCurrentSession';
import { useLoggers, type Logger } from '../loggers/queries';
import { ButtonLink } from '../ui/Button';
import { EmptyState } from '../ui/EmptyState';
import { PageHeader } from '../ui/PageHeader';
import { QueryResult } from '../ui/QueryResult';
import { Table } from '../ui/Table';
import { useRooms, type Room } from './queries';
import { roomKindLabel } from './roomKinds';

const link = 'font-semibold text-slate underline underline-offset-4 hover:text-slate-deep';

/** The count needs the loggers list, which loads beside the rooms; "…" while it comes, "—" if it could not. */
function loggerCount(loggers: UseQueryResult<Logger[]>, roomId: number): string {
  if (loggers.isError) return '—';
  if (!loggers.data) return '…';
  return String(loggers.data.filter((l) => l.roomId === roomId).length);
}

export function RoomsPage() {
  const canEdit = useRoleAtLeast('staff');
  const rooms = useRooms();
  const loggers = useLoggers();
  const addButton = canEdit && <ButtonLink to="/rooms/new">Add room</ButtonLink>;
  return (
    <>
      <PageHeader title="Rooms" description="The places where grafts are stored, and the loggers in each." actions={addButton} />
      <QueryResult query={rooms} loading="Loading rooms…" failed="Could not load the rooms">
        {(list) =>
          list.length === 0 ? (
            <EmptyState title="No rooms yet" action={addButton}>
              Add the cellar, garage or fridge where grafts wait, then place a logger in it.
            </EmptyState>
          ) : (
            <Table<Room>
              caption="Rooms"
              rows={list}
              rowKey={(r) => r.id}
              columns={[
                { header: 'Name', cell: (r) => <Link to={`/rooms/${r.id}`} className={link}>{r.name}</Link> },
                { header: 'Kind', cell: (r) => roomKindLabel(r.kind) },
                { header: 'Loggers', cell: (r) => loggerCount(loggers, r.id), figure: true },
                { header: 'Notes', cell: (r) => <span className="line-clamp-2 text-ink-soft">{r.notes || '—'}</span> },
              ]}
            />
          )
        }
      </QueryResult>
    </>
  );
}
