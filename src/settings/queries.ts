import { useMutation, useQuery, useQueryClient, type QueryKey } from '@tanstack/react-query';
import type { z } from 'zod';
import type { inviteBody } from '../../shared/schemas/auth';
import type { Role } from '../../shared/schemas/common';
import type { nurseryPatch, tokenBody } from '../../shared/schemas/nursery';
import { api } from '../api/client';
import { sessionKey, type SessionNursery, type SessionUser } from '../auth/queries';

export interface Invitation {
  id: number;
  email: string;
  role: Role;
  expiresAt: string;
}

export interface ApiToken {
  id: number;
  name: string;
  /** The first characters of the secret, to tell tokens apart; the secret itself is never shown again. */
  hint: string;
  createdAt: string;
  lastUsedAt: string | null;
  revokedAt: string | null;
}

export interface CreatedToken extends ApiToken {
  token: string;
}

export const settingsKeys = {
  nursery: ['nursery'] as const,
  users: ['users'] as const,
  invitations: ['invitations'] as const,
  tokens: ['tokens'] as const,
};

export const useNursery = () => useQuery({ queryKey: settingsKeys.nursery, queryFn: () => api.get<SessionNursery>('/nursery') });
export const useUsers = () => useQuery({ queryKey: settingsKeys.users, queryFn: () => api.get<SessionUser[]>('/users') });
export const useInvitations = () => useQuery({ queryKey: settingsKeys.invitations, queryFn: () => api.get<Invitation[]>('/invitations') });
export const useTokens = () => useQuery({ queryKey: settingsKeys.tokens, queryFn: () => api.get<ApiToken[]>('/tokens') });

/** A write that makes the listed caches stale; what changed is re-read rather than patched in by hand. */
function useWrite<Vars, Result>(send: (vars: Vars) => Promise<Result>, stale: QueryKey[]) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: () => Promise.all(stale.map((queryKey) => client.invalidateQueries({ queryKey }))),
  });
}

// The nursery's name and zone also live in the session (the header shows them), so both are refreshed.
export const useUpdateNursery = () =>
  useWrite((body: z.output<typeof nurseryPatch>) => api.patch<SessionNursery>('/nursery', body), [settingsKeys.nursery, sessionKey]);
export const useChangeRole = () =>
  useWrite(({ id, role }: { id: number; role: Role }) => api.patch<SessionUser>(`/users/${id}`, { role }), [settingsKeys.users]);
export const useRemoveUser = () => useWrite((id: number) => api.delete(`/users/${id}`), [settingsKeys.users]);
export const useInvite = () => useWrite((body: z.output<typeof inviteBody>) => api.post<Invitation>('/invitations', body), [settingsKeys.invitations]);
export const useCancelInvitation = () => useWrite((id: number) => api.delete(`/invitations/${id}`), [settingsKeys.invitations]);
export const useCreateToken = () => useWrite((body: z.output<typeof tokenBody>) => api.post<CreatedToken>('/tokens', body), [settingsKeys.tokens]);
export const useRevokeToken = () => useWrite((id: number) => api.post<ApiToken>(`/tokens/${id}/revoke`), [settingsKeys.tokens]);
