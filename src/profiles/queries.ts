import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { profileCopyBody, ProfilePatch } from '../../shared/schemas/profiles';
import type { SpeciesProfile } from '../../shared/species/schema';
import { api } from '../api/client';

/** A built-in profile (read-only) or one of the nursery's own copies, with how many batches use it. */
export interface ListedProfile extends SpeciesProfile {
  origin: 'built-in' | 'nursery';
  /** For a nursery copy, the built-in profile it descends from. */
  basedOn: string | null;
  updatedAt: string | null;
  batchCount: number;
}

export const profileKeys = { list: ['profiles'] as const };

export const useProfiles = () => useQuery({ queryKey: profileKeys.list, queryFn: () => api.get<ListedProfile[]>('/profiles') });

/** A profile change alters exposure figures too, which the server recomputes on the next read. */
function useProfileWrite<Body, Result>(send: (body: Body) => Promise<Result>) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: () => Promise.all([client.invalidateQueries({ queryKey: profileKeys.list }), client.invalidateQueries({ queryKey: ['batches'] })]),
  });
}

export const useCopyProfile = () => useProfileWrite((body: z.output<typeof profileCopyBody>) => api.post<ListedProfile>('/profiles', body));
export const useUpdateProfile = (key: string) => useProfileWrite((body: ProfilePatch) => api.patch<ListedProfile>(`/profiles/${key}`, body));
export const useDeleteProfile = (key: string) => useProfileWrite(() => api.delete(`/profiles/${key}`));
