import type { Severity } from '../../shared/alerts/rules';
import type { AlertStatus } from '../../shared/schemas/alerts';

export const STATUS_LABEL: Record<AlertStatus, string> = { open: 'Open', acknowledged: 'Acknowledged', resolved: 'Resolved' };

/** Said as what to do, not as a colour: the badge also carries the words. */
export const SEVERITY_LABEL: Record<Severity, string> = { critical: 'Act now', warning: 'Look today' };

export const SEVERITY_LOOK: Record<Severity, string> = { critical: 'bg-ember text-white', warning: 'bg-callus-light text-ink' };
export const STATUS_LOOK: Record<AlertStatus, string> = {
  open: 'bg-ice-light text-ice',
  acknowledged: 'bg-frost text-slate-deep',
  resolved: 'bg-moss-light text-moss-deep',
};
