import { QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiError } from './client';
import { sessionKey } from '../auth/queries';

/**
 * Client errors (4xx) are answers, not hiccups: retrying them only delays the message. A 401 on any call means the
 * session ended (expired, or the password was changed elsewhere), so the session is re-read and the app falls back
 * to the sign-in page.
 */
export function createQueryClient(): QueryClient {
  const client: QueryClient = new QueryClient({
    queryCache: new QueryCache({
      onError: (err, query) => {
        if (isApiError(err, 401) && query.queryKey[0] !== sessionKey[0]) void client.invalidateQueries({ queryKey: sessionKey });
      },
    }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        retry: (count, err) => !(isApiError(err) && err.status >= 400 && err.status < 500) && count < 2,
        refetchOnWindowFocus: false,
      },
      mutations: { retry: false },
    },
  });
  return client;
}
