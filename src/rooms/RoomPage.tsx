import { useNavigate } from 'react-router-dom';
import { useRoleAtLeast } from '../auth/useCurrentSession';
import { NotFoundPage } from '../layout/NotFoundPage';
import { ButtonLink } from '../ui/Button';
import { ConfirmAction } from '../ui/ConfirmAction';
import { DetailList } from '../ui/DetailList';
import { PageHeader } from '../ui/PageHeader';
import { Panel } from '../ui/Panel';
import { QueryResult } from '../ui/QueryResult';
import { useIdParam } from '../ui/useIdParam';
import { useDeleteRoom, useRoom, type Room } from './queries';
import { RoomLoggers } from './RoomLoggers';
import { RoomChartPanel } from '../roomview/RoomChartPanel';
import { RoomAlertHistory } from '../alerts/RoomAlertHistory';
import { roomKindLabel } from './roomKinds';

function RoomActions({ room }: { room: Room }) {
  const remove = useDeleteRoom(room.id);
  const navigate = useNavigate();
  return (
    <div className="flex flex-wrap items-start gap-2">
      <ButtonLink to={`/rooms/${room.id}/edit`} variant="secondary">
        Edit
      </ButtonLink>
      <ConfirmAction
        label="Delete"
        question={`Delete ${room.name}?`}
        confirmLabel="Delete room"
        busy={remove.isPending}
        onConfirm={() => remove.mutate(undefined, { onSuccess: () => navigate('/rooms', { replace: true }) })}
        error={remove.error}
        errorTitle="The room was not deleted"
      />
    </div>
  );
}

function RoomDetail({ id }: { id: number }) {
  const room = useRoom(id);
  const canEdit = useRoleAtLeast('staff');
  return (
    <QueryResult query={room} loading="Loading the room…" failed="Could not load the room">
      {(r) => (
        <>
          <PageHeader title={r.name} description={roomKindLabel(r.kind)} back={{ to: '/rooms', label: 'Rooms' }} actions={canEdit && <RoomActions room={r} />} />
          <div className="flex flex-col gap-6">
            <Panel title="About this room">
              <DetailList
                items={[
                  { label: 'Kind', value: roomKindLabel(r.kind) },
                  { label: 'Notes', value: r.notes || 'No notes yet.' },
                ]}
              />
            </Panel>
            <RoomChartPanel roomId={r.id} roomName={r.name} />
            <RoomLoggers roomId={r.id} />
            <RoomAlertHistory roomId={r.id} />
          </div>
        </>
      )}
    </QueryResult>
  );
}

export function RoomPage() {
  const id = useIdParam();
  return id === null ? <NotFoundPage what="room" /> : <RoomDetail id={id} />;
}
