import { Link } from 'react-router-dom';
import { useCurrentSession, useRoleAtLeast } from '../auth/useCurrentSession';
import { useLoggers } from '../loggers/queries';
import { formatInstant } from '../time/nurseryTime';
import { ButtonLink } from '../ui/Button';
import { EmptyState } from '../ui/EmptyState';
import { Panel } from '../ui/Panel';
import { QueryResult } from '../ui/QueryResult';
import { Table } from '../ui/Table';
import { roomOccupancy, type RoomStay } from './roomOccupancy';

const link = 'font-semibold text-slate underline underline-offset-4 hover:text-slate-deep';

export function RoomLoggers({ roomId }: { roomId: number }) {
  const loggers = useLoggers();
  const { nursery } = useCurrentSession();
  const canEdit = useRoleAtLeast('staff');
  const at = (iso: string | null) => (iso ? formatInstant(iso, nursery.timeZone) : 'now');
  const loggerLink = (s: RoomStay) => <Link to={`/loggers/${s.logger.id}`} className={link}>{s.logger.label}</Link>;
  const placeButton = canEdit && (
    <ButtonLink to={`/loggers/new?roomId=${roomId}`} variant="secondary" size="sm">
      Add a logger here
    </ButtonLink>
  );
  return (
    <QueryResult query={loggers} loading="Loading loggers…" failed="Could not load the loggers">
      {(list) => {
        const { current, earlier } = roomOccupancy(list, roomId);
        return (
          <div className="flex flex-col gap-6">
            <Panel title="Loggers here now" description={`Times in ${nursery.timeZone}.`} actions={placeButton}>
              {current.length === 0 ? (
                <EmptyState title="No logger in this room">Without a logger, nothing records this room's temperature.</EmptyState>
              ) : (
                <Table<RoomStay>
                  caption="Loggers in this room now"
                  rows={current}
                  rowKey={(s) => s.placement.id}
                  columns={[
                    { header: 'Logger', cell: loggerLink },
                    { header: 'Serial', cell: (s) => s.logger.serial || '—', figure: true },
                    { header: 'Here since', cell: (s) => at(s.placement.from), figure: true },
                  ]}
                />
              )}
            </Panel>
            {earlier.length > 0 && (
              <Panel title="Loggers here before">
                <Table<RoomStay>
                  caption="Loggers that were in this room before"
                  rows={earlier}
                  rowKey={(s) => s.placement.id}
                  columns={[
                    { header: 'Logger', cell: loggerLink },
                    { header: 'From', cell: (s) => at(s.placement.from), figure: true },
                    { header: 'Until', cell: (s) => at(s.placement.to), figure: true },
                  ]}
                />
              </Panel>
            )}
          </div>
        );
      }}
    </QueryResult>
  );
}
