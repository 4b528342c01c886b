import { useQuery } from '@tanstack/react-query';
import type { CapturedMail } from '../../server/mail/captureServer';
import { api } from '../api/client';

export type { CapturedMail };

/** Polled, so a message the server just sent shows up while the page is open. */
export function useCapturedMail(enabled: boolean) {
  return useQuery({
    queryKey: ['dev-mail'],
    queryFn: () => api.get<CapturedMail[]>('/dev/mail'),
    enabled,
    refetchInterval: 5_000,
  });
}
