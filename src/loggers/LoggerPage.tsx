import { useCurrentSession, useRoleAtLeast } from '../auth/useCurrentSession';
import { NotFoundPage } from '../layout/NotFoundPage';
import { useRooms } from '../rooms/queries';
import { ButtonLink } from '../ui/Button';
import { DetailList } from '../ui/DetailList';
import { PageHeader } from '../ui/PageHeader';
import { Panel } from '../ui/Panel';
import { QueryResult } from '../ui/QueryResult';
import { useIdParam } from '../ui/useIdParam';
import { MoveLoggerForm } from './MoveLoggerForm';
import { PlacementHistory } from './PlacementHistory';
import { useLogger } from './queries';
import { RoomName } from './RoomName';

function LoggerDetail({ id }: { id: number }) {
  const logger = useLogger(id);
  const rooms = useRooms();
  const canEdit = useRoleAtLeast('staff');
  const { nursery } = useCurrentSession();
  return (
    <QueryResult query={logger} loading="Loading the logger…" failed="Could not load the logger">
      {(l) => (
        <>
          <PageHeader
            title={l.label}
            description={<RoomName roomId={l.roomId} rooms={rooms.data} />}
            back={{ to: '/loggers', label: 'Loggers' }}
            actions={canEdit && <ButtonLink to={`/loggers/${l.id}/edit`} variant="secondary">Edit</ButtonLink>}
          />
          <div className="flex flex-col gap-6">
            <Panel title="About this logger">
              <DetailList
                items={[
                  { label: 'Serial number', value: l.serial || '—', figure: true },
                  { label: 'Room now', value: <RoomName roomId={l.roomId} rooms={rooms.data} /> },
                  { label: 'Notes', value: l.notes || 'No notes yet.' },
                ]}
              />
            </Panel>
            {canEdit && (
              <Panel title="Move" description="Record it when the logger is carried to another room or taken out.">
                <QueryResult query={rooms} loading="Loading rooms…" failed="Could not load the rooms">
                  {(list) => <MoveLoggerForm logger={l} rooms={list} />}
                </QueryResult>
              </Panel>
            )}
            <Panel title="Placement history" description={`Times in ${nursery.timeZone}.`}>
              <PlacementHistory placements={l.placements} rooms={rooms.data} />
            </Panel>
          </div>
        </>
      )}
    </QueryResult>
  );
}

export function LoggerPage() {
  const id = useIdParam();
  return id === null ? <NotFoundPage what="logger" /> : <LoggerDetail id={id} />;
}
