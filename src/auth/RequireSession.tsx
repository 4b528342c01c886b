import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Spinner } from '../ui/Spinner';
import { useSession } from './queries';

export interface ReturnState {
  from?: string;
}

function SessionWait({ children }: { children: ReactNode }) {
  return <div className="mx-auto max-w-md px-4 py-16">{children}</div>;
}

/** The gate of the signed-in app: unknown session waits, no session goes to sign-in (and comes back after). */
export function RequireSession({ children }: { children: ReactNode }) {
  const session = useSession();
  const location = useLocation();
  if (session.isPending) return <SessionWait><Spinner label="Checking your sign-in…" /></SessionWait>;
  if (session.isError) {
    return (
      <SessionWait>
        <ErrorNotice title="Could not check your sign-in" error={session.error} onRetry={() => void session.refetch()} />
      </SessionWait>
    );
  }
  if (!session.data) {
    const state: ReturnState = { from: location.pathname + location.search };
    return <Navigate to="/sign-in" replace state={state} />;
  }
  return <>{children}</>;
}

/** Sign-in and sign-up make no sense when already signed in: go where the person was heading. */
export function RedirectIfSignedIn({ children }: { children: ReactNode }) {
  const session = useSession();
  const location = useLocation();
  if (session.data) return <Navigate to={(location.state as ReturnState | null)?.from ?? '/overview'} replace />;
  return <>{children}</>;
}
