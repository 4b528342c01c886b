import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { loggerBody, loggerMoveBody, loggerPatch } from '../../shared/schemas/loggers';
import { api } from '../api/client';

export interface Placement {
  id: number;
  roomId: number;
  from: string;
  /** null while the logger is still there. */
  to: string | null;
}

export interface Logger {
  id: number;
  label: string;
  serial: string;
  notes: string;
  /** The room it is in now; null when it is in none. */
  roomId: number | null;
  placements: Placement[];
}

export const loggerKeys = {
  all: ['loggers'] as const,
  list: () => [...loggerKeys.all, 'list'] as const,
  detail: (id: number) => [...loggerKeys.all, 'detail', id] as const,
};

export const useLoggers = () => useQuery({ queryKey: loggerKeys.list(), queryFn: () => api.get<Logger[]>('/loggers') });
export const useLogger = (id: number) => useQuery({ queryKey: loggerKeys.detail(id), queryFn: () => api.get<Logger>(`/loggers/${id}`) });

/** Every logger write answers with the whole logger: store it, and refresh the list it also appears in. */
function useLoggerWrite<Body>(send: (body: Body) => Promise<Logger>) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: (logger) => {
      client.setQueryData(loggerKeys.detail(logger.id), logger);
      return client.invalidateQueries({ queryKey: loggerKeys.list() });
    },
  });
}

export const useCreateLogger = () => useLoggerWrite((body: z.output<typeof loggerBody>) => api.post<Logger>('/loggers', body));
export const useUpdateLogger = (id: number) =>
  useLoggerWrite((body: z.output<typeof loggerPatch>) => api.patch<Logger>(`/loggers/${id}`, body));
export const useMoveLogger = (id: number) =>
  useLoggerWrite((body: z.output<typeof loggerMoveBody>) => api.post<Logger>(`/loggers/${id}/move`, body));
