import { useSearchParams } from 'react-router-dom';
import { alertListQuery, type AlertListQuery } from '../../shared/schemas/alerts';
import { useRooms } from '../rooms/queries';
import { Button, ButtonLink } from '../ui/Button';
import { EmptyState } from '../ui/EmptyState';
import { PageHeader } from '../ui/PageHeader';
import { QueryResult } from '../ui/QueryResult';
import { AlertFilters } from './AlertFilters';
import { AlertTable } from './AlertTable';
import { useAlerts } from './queries';

/** Each filter in the address is checked on its own against the shared schema: a hand-edited value drops only itself. */
function readFilters(params: URLSearchParams): AlertListQuery {
  const filters: Record<string, unknown> = {};
  for (const key of ['status', 'rule', 'severity', 'roomId', 'before'] as const) {
    const raw = params.get(key);
    const parsed = raw === null ? null : alertListQuery.shape[key].safeParse(raw);
    if (parsed?.success && parsed.data !== undefined) filters[key] = parsed.data;
  }
  return filters as AlertListQuery;
}

export function AlertsPage() {
  const [params, setParams] = useSearchParams();
  const filters = readFilters(params);
  const alerts = useAlerts(filters);
  const rooms = useRooms();
  const filtered = Object.keys(filters).some((k) => k !== 'before');
  return (
    <>
      <PageHeader
        title="Alerts"
        description="What the rules found in the rooms: open until someone acknowledges, resolved when the condition clears."
        actions={<ButtonLink to="/alerts/settings" variant="secondary">Alert settings</ButtonLink>}
      />
      <AlertFilters
        filters={filters}
        rooms={rooms.data ?? []}
        onChange={(next) => setParams(Object.entries(next).filter(([, v]) => v !== undefined && v !== '').map(([k, v]) => [k, String(v)] as [string, string]), { replace: true })}
      />
      <QueryResult query={alerts} loading="Loading alerts…" failed="Could not load the alerts">
        {({ alerts: list, nextBefore }) =>
          list.length === 0 ? (
            <EmptyState title={filtered ? 'No alert matches' : 'No alerts yet'}>
              {filtered ? 'Loosen a filter to see more.' : 'When a room nears freezing or a logger falls silent, it shows here and goes out by e-mail.'}
            </EmptyState>
          ) : (
            <div className="flex flex-col gap-4">
              <AlertTable alerts={list} caption="Alerts, newest first" />
              <div className="flex flex-wrap gap-2">
                {filters.before !== undefined && (
                  <Button variant="secondary" onClick={() => setParams(withBefore(params, undefined), { replace: true })}>
                    Newest
                  </Button>
                )}
                {nextBefore !== null && (
                  <Button variant="secondary" onClick={() => setParams(withBefore(params, nextBefore), { replace: true })}>
                    Older alerts
                  </Button>
                )}
              </div>
            </div>
          )
        }
      </QueryResult>
    </>
  );
}

function withBefore(params: URLSearchParams, before: number | undefined): URLSearchParams {
  const next = new URLSearchParams(params);
  if (before === undefined) next.delete('before');
  else next.set('before', String(before));
  return next;
}
