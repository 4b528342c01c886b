import { Link } from 'react-router-dom';
import { EmptyState } from '../ui/EmptyState';
import { Panel } from '../ui/Panel';
import { QueryResult } from '../ui/QueryResult';
import { AlertTable } from './AlertTable';
import { useAlerts } from './queries';

const link = 'font-semibold text-slate underline underline-offset-4 hover:text-slate-deep';

/** A room's alerts, newest first: for the room page. The full history pages on the alerts page. */
export function RoomAlertHistory({ roomId }: { roomId: number }) {
  const alerts = useAlerts({ roomId, limit: 10 });
  return (
    <Panel title="Alerts" description={<Link to={`/alerts?roomId=${roomId}`} className={link}>Full alert history of this room</Link>}>
      <QueryResult query={alerts} loading="Loading the room's alerts…" failed="Could not load the room's alerts">
        {({ alerts: list }) =>
          list.length ? <AlertTable alerts={list} caption="Alerts in this room" /> : <EmptyState title="No alerts in this room so far" />
        }
      </QueryResult>
    </Panel>
  );
}
