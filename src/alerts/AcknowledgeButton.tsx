import { useRoleAtLeast } from '../auth/useCurrentSession';
import { Button } from '../ui/Button';
import { ErrorNotice } from '../ui/ErrorNotice';
import { useAcknowledgeAlert, type AlertItem } from './queries';

/** Staff and owners acknowledge an open alert: the reminders stop, the alert stays until its condition clears. */
export function AcknowledgeButton({ alert, size = 'md' }: { alert: AlertItem; size?: 'sm' | 'md' }) {
  const canAcknowledge = useRoleAtLeast('staff');
  const acknowledge = useAcknowledgeAlert();
  if (!canAcknowledge || alert.status !== 'open') return null;
  return (
    <div className="flex flex-col items-start gap-2">
      <Button size={size} busy={acknowledge.isPending} busyLabel="Acknowledging…" onClick={() => acknowledge.mutate(alert.id)}>
        Acknowledge
      </Button>
      {acknowledge.error ? <ErrorNotice title="Not acknowledged" error={acknowledge.error} /> : null}
    </div>
  );
}
