import type { ReactNode } from 'react';
import type { UseQueryResult } from '@tanstack/react-query';
import { isApiError } from '../api/client';
import { ErrorNotice } from './ErrorNotice';
import { Spinner } from './Spinner';

interface QueryResultProps<T> {
  query: UseQueryResult<T>;
  /** What is being loaded, read out while waiting: "Loading rooms…". */
  loading: string;
  /** Said above the server's message when loading fails: "Could not load the rooms". */
  failed: string;
  children: (data: T) => ReactNode;
}

/** Every page shows the same three states for its data: waiting, failed with a way to retry, or the data. */
export function QueryResult<T>({ query, loading, failed, children }: QueryResultProps<T>) {
  if (query.isPending) return <Spinner label={loading} />;
  if (query.isError) {
    // A 4xx is the server's considered answer (gone, not allowed); only failures of the moment are worth retrying.
    const lasting = isApiError(query.error) && query.error.status >= 400 && query.error.status < 500;
    return <ErrorNotice title={failed} error={query.error} onRetry={lasting ? undefined : () => void query.refetch()} />;
  }
  return <>{children(query.data)}</>;
}
