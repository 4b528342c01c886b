import type { Reader } from '../../shared/alerts/readerFormat';
import { useCurrentSession } from '../auth/useCurrentSession';

/** The signed-in person's unit on the nursery's clock, as the alert sentences take it. */
export function useReader(): Reader {
  const { user, nursery } = useCurrentSession();
  return { unit: user.unit, timeZone: nursery.timeZone };
}
