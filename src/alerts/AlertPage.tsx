import { Link } from 'react-router-dom';
import { describeBatches, describeCondition, describeLatest, describeSince } from '../../shared/alerts/describeAlert';
import { instant } from '../../shared/alerts/readerFormat';
import { RULE_TITLES } from '../../shared/alerts/rules';
import { NotFoundPage } from '../layout/NotFoundPage';
import { DetailList } from '../ui/DetailList';
import { PageHeader } from '../ui/PageHeader';
import { Panel } from '../ui/Panel';
import { QueryResult } from '../ui/QueryResult';
import { useIdParam } from '../ui/useIdParam';
import { AcknowledgeButton } from './AcknowledgeButton';
import { SeverityBadge, StatusBadge } from './AlertBadges';
import { useAlert, type AlertItem } from './queries';
import { useReader } from './useReader';

const link = 'font-semibold text-slate underline underline-offset-4 hover:text-slate-deep';

function AlertFacts({ alert }: { alert: AlertItem }) {
  const reader = useReader();
  // Sentences relative to "now" use the alert's last check: a resolved alert's forecast is history, not a countdown.
  const asOf = alert.resolvedAt ?? Date.now();
  const where = alert.roomId ? <Link to={`/rooms/${alert.roomId}`} className={link}>{alert.subjectName}</Link> : alert.subjectName;
  const items = [
    { label: 'What', value: describeCondition(alert, reader, asOf) },
    { label: 'Where', value: where },
    { label: 'Severity', value: <SeverityBadge severity={alert.severity} /> },
    { label: 'Status', value: <StatusBadge status={alert.status} /> },
  ];
  if (alert.since) items.push({ label: 'Since', value: describeSince(alert.since, alert.detail, reader) });
  const latest = describeLatest(alert.detail, reader);
  if (latest) items.push({ label: alert.status === 'resolved' ? 'Last figures' : 'Latest', value: latest });
  const batches = describeBatches(alert.detail);
  if (batches) items.push({ label: 'At stake', value: batches });
  items.push({ label: 'Opened', value: instant(alert.openedAt, reader) });
  if (alert.acknowledgedAt) {
    items.push({ label: 'Acknowledged', value: `${instant(alert.acknowledgedAt, reader)}${alert.acknowledgedByName ? ` by ${alert.acknowledgedByName}` : ''}` });
  }
  if (alert.remindersSent) items.push({ label: 'Reminders sent', value: String(alert.remindersSent) });
  if (alert.resolvedAt) {
    items.push({
      label: 'Ended',
      value: `${instant(alert.resolvedAt, reader)}: ${alert.resolution === 'unwatched' ? 'nothing at stake there any more' : 'the condition cleared'}`,
    });
  }
  return <DetailList items={items} />;
}

function AlertDetail({ id }: { id: number }) {
  const alert = useAlert(id);
  return (
    <QueryResult query={alert} loading="Loading the alert…" failed="Could not load the alert">
      {(a) => (
        <>
          <PageHeader title={`${RULE_TITLES[a.rule]}: ${a.subjectName}`} back={{ to: '/alerts', label: 'Alerts' }} actions={<AcknowledgeButton alert={a} />} />
          <div className="flex flex-col gap-6">
            <Panel
              title="The alert"
              description={a.roomId ? <Link to={`/alerts?roomId=${a.roomId}`} className={link}>Other alerts in this room</Link> : undefined}
            >
              <AlertFacts alert={a} />
            </Panel>
          </div>
        </>
      )}
    </QueryResult>
  );
}

export function AlertPage() {
  const id = useIdParam();
  return id === null ? <NotFoundPage what="alert" /> : <AlertDetail id={id} />;
}
