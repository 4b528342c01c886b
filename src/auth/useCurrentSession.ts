import { ROLE_RANK, type Role } from '../../shared/schemas/common';
import { useSession, type Session } from './queries';

/**
 * The signed-in session inside the app frame, which renders only once the session is known. Throwing here
 * instead of returning null keeps every page free of "maybe signed out" checks.
 */
export function useCurrentSession(): Session {
  const { data } = useSession();
  if (!data) throw new Error('useCurrentSession is used outside the signed-in app frame.');
  return data;
}

/** Whether the signed-in role reaches `least`; the server enforces the same ranks, this only hides what would fail. */
export function useRoleAtLeast(least: Role): boolean {
  return ROLE_RANK[useCurrentSession().user.role] >= ROLE_RANK[least];
}
