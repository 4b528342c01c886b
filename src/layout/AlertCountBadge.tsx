import { useOpenAlertCount } from '../alerts/useOpenAlertCount';

/** The number of open alerts beside "Alerts", read out as words for screen readers. */
export function AlertCountBadge() {
  const open = useOpenAlertCount();
  if (!open) return null;
  return (
    <span className="ml-1 inline-flex min-w-6 items-center justify-center rounded-full bg-ember px-1.5 text-xs font-bold text-white">
      {open}
      <span className="sr-only"> open</span>
    </span>
  );
}
