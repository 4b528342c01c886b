import { Link } from 'react-router-dom';
import { useCurrentSession, useRoleAtLeast } from '../auth/useCurrentSession';
import { useRooms } from '../rooms/queries';
import { formatInstant } from '../time/nurseryTime';
import { ButtonLink } from '../ui/Button';
import { EmptyState } from '../ui/EmptyState';
import { PageHeader } from '../ui/PageHeader';
import { QueryResult } from '../ui/QueryResult';
import { Table } from '../ui/Table';
import { useLoggers, type Logger } from './queries';
import { RoomName } from './RoomName';

const link = 'font-semibold text-slate underline underline-offset-4 hover:text-slate-deep';

function currentSince(logger: Logger): string | null {
  return logger.placements.find((p) => p.to === null)?.from ?? null;
}

export function LoggersPage() {
  const canEdit = useRoleAtLeast('staff');
  const { nursery } = useCurrentSession();
  const loggers = useLoggers();
  const rooms = useRooms();
  const addButton = canEdit && <ButtonLink to="/loggers/new">Add logger</ButtonLink>;
  return (
    <>
      <PageHeader title="Loggers" description={`Each logger and the room it is in. Times in ${nursery.timeZone}.`} actions={addButton} />
      <QueryResult query={loggers} loading="Loading loggers…" failed="Could not load the loggers">
        {(list) =>
          list.length === 0 ? (
            <EmptyState title="No loggers yet" action={addButton}>
              Add each temperature logger you own, then place it in the room it records.
            </EmptyState>
          ) : (
            <Table<Logger>
              caption="Loggers"
              rows={list}
              rowKey={(l) => l.id}
              columns={[
                { header: 'Label', cell: (l) => <Link to={`/loggers/${l.id}`} className={link}>{l.label}</Link> },
                { header: 'Serial', cell: (l) => l.serial || '—', figure: true },
                { header: 'Room now', cell: (l) => <RoomName roomId={l.roomId} rooms={rooms.data} /> },
                {
                  header: 'Since',
                  cell: (l) => {
                    const since = currentSince(l);
                    return since ? formatInstant(since, nursery.timeZone) : '—';
                  },
                  figure: true,
                },
              ]}
            />
          )
        }
      </QueryResult>
    </>
  );
}
