import { Link } from 'react-router-dom';
import type { Room } from '../rooms/queries';

/** A room id shown as the room's name with a link, or plain words when the logger is in no room. */
export function RoomName({ roomId, rooms }: { roomId: number | null; rooms: Room[] | undefined }) {
  if (roomId === null) return <span className="text-ink-soft">Not in a room</span>;
  const room = rooms?.find((r) => r.id === roomId);
  return (
    <Link to={`/rooms/${roomId}`} className="text-slate underline underline-offset-4 hover:text-slate-deep">
      {room?.name ?? `Room ${roomId}`}
    </Link>
  );
}
