import { useNavigate } from 'react-router-dom';
import { PageHeader } from '../ui/PageHeader';
import { useCreateRoom } from './queries';
import { RoomForm } from './RoomForm';

export function NewRoomPage() {
  const create = useCreateRoom();
  const navigate = useNavigate();
  return (
    <>
      <PageHeader title="Add a room" back={{ to: '/rooms', label: 'Rooms' }} />
      <RoomForm
        initial={{ name: '', kind: 'basement', notes: '' }}
        submitLabel="Add room"
        cancelTo="/rooms"
        busy={create.isPending}
        error={create.error}
        onSubmit={(body) => create.mutate(body, { onSuccess: (room) => navigate(`/rooms/${room.id}`) })}
      />
    </>
  );
}
