import { Link } from 'react-router-dom';
import { RULE_TITLES } from '../../shared/alerts/rules';
import { instant } from '../../shared/alerts/readerFormat';
import { Table } from '../ui/Table';
import { AcknowledgeButton } from './AcknowledgeButton';
import { SeverityBadge, StatusBadge } from './AlertBadges';
import type { AlertItem } from './queries';
import { useReader } from './useReader';

const link = 'font-semibold text-slate underline underline-offset-4 hover:text-slate-deep';

/** Alerts as rows: what and where (linking the alert), how grave, since when, where it stands, and acknowledging. */
export function AlertTable({ alerts, caption }: { alerts: AlertItem[]; caption: string }) {
  const reader = useReader();
  return (
    <Table<AlertItem>
      caption={caption}
      rows={alerts}
      rowKey={(a) => a.id}
      columns={[
        {
          header: 'Alert',
          cell: (a) => (
            <Link to={`/alerts/${a.id}`} className={link}>
              {RULE_TITLES[a.rule]}: {a.subjectName}
            </Link>
          ),
        },
        { header: 'Severity', cell: (a) => <SeverityBadge severity={a.severity} /> },
        { header: 'Since', cell: (a) => instant(a.since ?? a.openedAt, reader), figure: true },
        { header: 'Status', cell: (a) => <StatusBadge status={a.status} /> },
        { header: 'Action', cell: (a) => <AcknowledgeButton alert={a} size="sm" /> },
      ]}
    />
  );
}
