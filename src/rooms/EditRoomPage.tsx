import { useNavigate } from 'react-router-dom';
import { NotFoundPage } from '../layout/NotFoundPage';
import { PageHeader } from '../ui/PageHeader';
import { QueryResult } from '../ui/QueryResult';
import { useIdParam } from '../ui/useIdParam';
import { useRoom, useUpdateRoom } from './queries';
import { RoomForm } from './RoomForm';

function EditRoom({ id }: { id: number }) {
  const room = useRoom(id);
  const update = useUpdateRoom(id);
  const navigate = useNavigate();
  return (
    <>
      <PageHeader title={room.data ? `Edit ${room.data.name}` : 'Edit room'} back={{ to: `/rooms/${id}`, label: room.data?.name ?? 'Room' }} />
      <QueryResult query={room} loading="Loading the room…" failed="Could not load the room">
        {(r) => (
          <RoomForm
            initial={{ name: r.name, kind: r.kind, notes: r.notes }}
            submitLabel="Save changes"
            cancelTo={`/rooms/${id}`}
            busy={update.isPending}
            error={update.error}
            onSubmit={(body) => update.mutate(body, { onSuccess: () => navigate(`/rooms/${id}`) })}
          />
        )}
      </QueryResult>
    </>
  );
}

export function EditRoomPage() {
  const id = useIdParam();
  return id === null ? <NotFoundPage what="room" /> : <EditRoom id={id} />;
}
