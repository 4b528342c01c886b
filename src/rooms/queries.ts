import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { RoomKind, roomBody, roomPatch } from '../../shared/schemas/rooms';
import { api } from '../api/client';

export interface Room {
  id: number;
  name: string;
  kind: RoomKind;
  notes: string;
}

export const roomKeys = {
  all: ['rooms'] as const,
  list: () => [...roomKeys.all, 'list'] as const,
  detail: (id: number) => [...roomKeys.all, 'detail', id] as const,
};

export const useRooms = () => useQuery({ queryKey: roomKeys.list(), queryFn: () => api.get<Room[]>('/rooms') });
export const useRoom = (id: number) => useQuery({ queryKey: roomKeys.detail(id), queryFn: () => api.get<Room>(`/rooms/${id}`) });

export function useCreateRoom() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: z.output<typeof roomBody>) => api.post<Room>('/rooms', body),
    onSuccess: (room) => {
      // Written into the cached list at once: a form opened next (a logger placed in this room) reads the list
      // before any refetch could finish, and must already find the new room there.
      client.setQueryData(roomKeys.detail(room.id), room);
      client.setQueryData<Room[]>(roomKeys.list(), (old) => old && [...old, room].sort((a, b) => a.name.localeCompare(b.name)));
      return client.invalidateQueries({ queryKey: roomKeys.list() });
    },
  });
}

export function useUpdateRoom(id: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: z.output<typeof roomPatch>) => api.patch<Room>(`/rooms/${id}`, body),
    onSuccess: (room) => {
      client.setQueryData(roomKeys.detail(id), room);
      return client.invalidateQueries({ queryKey: roomKeys.list() });
    },
  });
}

export function useDeleteRoom(id: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => api.delete(`/rooms/${id}`),
    onSuccess: () => {
      client.removeQueries({ queryKey: roomKeys.detail(id) });
      return client.invalidateQueries({ queryKey: roomKeys.list() });
    },
  });
}
