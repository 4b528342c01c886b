import { useCurrentSession } from '../auth/useCurrentSession';
import type { Room } from '../rooms/queries';
import { formatSpan } from '../time/duration';
import { formatInstant } from '../time/nurseryTime';
import { EmptyState } from '../ui/EmptyState';
import { Table } from '../ui/Table';
import type { Placement } from './queries';
import { RoomName } from './RoomName';

/** Where the logger has been, newest first: readings are assigned to rooms by these spans. */
export function PlacementHistory({ placements, rooms }: { placements: Placement[]; rooms: Room[] | undefined }) {
  const { nursery } = useCurrentSession();
  if (placements.length === 0) return <EmptyState title="Never placed">This logger has not been put in a room yet.</EmptyState>;
  const newestFirst = [...placements].sort((a, b) => b.from.localeCompare(a.from));
  return (
    <Table<Placement>
      caption="Placement history"
      rows={newestFirst}
      rowKey={(p) => p.id}
      columns={[
        { header: 'Room', cell: (p) => <RoomName roomId={p.roomId} rooms={rooms} /> },
        { header: 'From', cell: (p) => formatInstant(p.from, nursery.timeZone), figure: true },
        { header: 'Until', cell: (p) => (p.to ? formatInstant(p.to, nursery.timeZone) : 'still there'), figure: true },
        { header: 'How long', cell: (p) => formatSpan(p.from, p.to), figure: true },
      ]}
    />
  );
}
