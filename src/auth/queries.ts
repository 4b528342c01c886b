import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { acceptInviteBody, loginBody, passwordChangeBody, preferencesBody, signupBody } from '../../shared/schemas/auth';
import type { Role, TemperatureUnit } from '../../shared/schemas/common';
import { api, isApiError } from '../api/client';

export interface SessionUser {
  id: number;
  email: string;
  name: string;
  role: Role;
  unit: TemperatureUnit;
}
export interface SessionNursery {
  id: number;
  name: string;
  timeZone: string;
}
export interface Session {
  user: SessionUser;
  nursery: SessionNursery;
}
export interface InvitationPreview {
  email: string;
  role: Role;
  nurseryName: string;
}

export const sessionKey = ['session'] as const;
const invitationPreviewKey = (token: string) => ['invitation-preview', token] as const;

/** Signed out is a normal state, not an error: /auth/me's 401 becomes null. */
export function useSession() {
  return useQuery({
    queryKey: sessionKey,
    queryFn: async () => {
      try {
        return await api.get<Session>('/auth/me');
      } catch (err) {
        if (isApiError(err, 401)) return null;
        throw err;
      }
    },
    staleTime: 5 * 60_000,
  });
}

/** Mutations that sign someone in answer with the session itself; storing it saves a round trip to /auth/me. */
function useSignInMutation<Body>(send: (body: Body) => Promise<Session>) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: (session) => {
      // Whatever another account had cached must not leak into this one.
      client.removeQueries({ predicate: (q) => q.queryKey[0] !== sessionKey[0] });
      client.setQueryData(sessionKey, session);
    },
  });
}

export const useSignIn = () => useSignInMutation((body: z.output<typeof loginBody>) => api.post<Session>('/auth/login', body));
export const useSignUp = () => useSignInMutation((body: z.output<typeof signupBody>) => api.post<Session>('/auth/signup', body));
export const useAcceptInvitation = (token: string) =>
  useSignInMutation((body: z.output<typeof acceptInviteBody>) => api.post<Session>(`/invitations/token/${encodeURIComponent(token)}/accept`, body));

export function useInvitationPreview(token: string) {
  return useQuery({
    queryKey: invitationPreviewKey(token),
    queryFn: () => api.get<InvitationPreview>(`/invitations/token/${encodeURIComponent(token)}`),
  });
}

/**
 * Signing out loads the sign-in page afresh: nothing of the account stays in memory, and the session gate does not
 * mistake a deliberate sign-out for an expired session (which would bring the next person back to this page).
 */
export function useSignOut() {
  return useMutation({
    mutationFn: () => api.post<void>('/auth/logout'),
    onSuccess: () => window.location.replace('/sign-in'),
  });
}

export function useChangePassword() {
  return useMutation({ mutationFn: (body: z.output<typeof passwordChangeBody>) => api.post<void>('/auth/password', body) });
}

export function useSetUnit() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: z.output<typeof preferencesBody>) => api.patch<Session>('/auth/preferences', body),
    onSuccess: (session) => client.setQueryData(sessionKey, session),
  });
}
