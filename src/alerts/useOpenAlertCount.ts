import { useAlertSummary } from './queries';

/** Alerts nobody has acknowledged yet, for the count beside "Alerts" in the navigation; null while unknown. */
export function useOpenAlertCount(): number | null {
  return useAlertSummary().data?.open ?? null;
}
