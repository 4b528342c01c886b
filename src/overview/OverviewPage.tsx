import { useCurrentSession, useRoleAtLeast } from '../auth/useCurrentSession';
import { ButtonLink } from '../ui/Button';
import { EmptyState } from '../ui/EmptyState';
import { PageHeader } from '../ui/PageHeader';
import { QueryResult } from '../ui/QueryResult';
import { formatAge } from './formatAge';
import { useOverview } from './queries';
import { RoomCard } from './RoomCard';
import { useNow } from './useNow';

/** Every room on one screen, those needing someone first; one column on a phone, more on a desk. */
export function OverviewPage() {
  const { user, nursery } = useCurrentSession();
  const overview = useOverview();
  const canAddRooms = useRoleAtLeast('staff');
  const now = useNow();
  return (
    <>
      <PageHeader
        title="Overview"
        description={overview.data ? `Updated ${formatAge(now - Date.parse(overview.data.asOf))}; rooms that need attention come first.` : 'Rooms that need attention come first.'}
      />
      <QueryResult query={overview} loading="Loading the rooms…" failed="Could not load the overview">
        {(o) =>
          o.rooms.length === 0 ? (
            <EmptyState title="No rooms yet" action={canAddRooms && <ButtonLink to="/rooms/new">Add a room</ButtonLink>}>
              Add the cellar, garage or fridge where grafts wait, then place a logger in it.
            </EmptyState>
          ) : (
            <div className="grid grid-cols-1 gap-4 lg:grid-cols-2">
              {o.rooms.map((room) => (
                <RoomCard key={room.id} room={room} week={o.sparkline} unit={user.unit} timeZone={nursery.timeZone} now={now} />
              ))}
            </div>
          )
        }
      </QueryResult>
    </>
  );
}
