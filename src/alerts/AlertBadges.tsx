import type { Severity } from '../../shared/alerts/rules';
import type { AlertStatus } from '../../shared/schemas/alerts';
import { SEVERITY_LABEL, SEVERITY_LOOK, STATUS_LABEL, STATUS_LOOK } from './alertLabels';

const pill = 'inline-block rounded-full px-2.5 py-0.5 text-sm font-semibold whitespace-nowrap';

export function SeverityBadge({ severity }: { severity: Severity }) {
  return <span className={`${pill} ${SEVERITY_LOOK[severity]}`}>{SEVERITY_LABEL[severity]}</span>;
}

export function StatusBadge({ status }: { status: AlertStatus }) {
  return <span className={`${pill} ${STATUS_LOOK[status]}`}>{STATUS_LABEL[status]}</span>;
}
