import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { BatchListQuery, BatchStatus, batchLeaveBody, batchMoveBody, batchPatch, bulkBatchBody } from '../../shared/schemas/batches';
import { api } from '../api/client';

export interface BatchPlacement {
  id: number;
  roomId: number;
  from: string;
  /** null while the batch is still there. */
  to: string | null;
}

export interface Batch {
  id: number;
  code: string;
  species: string;
  scionCultivar: string;
  rootstock: string;
  method: string;
  count: number;
  graftedOn: string;
  grafter: string;
  storageMedium: string;
  notes: string;
  status: BatchStatus;
  leftAt: string | null;
  leftNote: string;
  /** The room it is in now; null once it left storage. */
  roomId: number | null;
  placements: BatchPlacement[];
}

export interface LimitFigures {
  limitC: number;
  hours: number;
  degreeHours: number;
}

/** The server's exposure report: time and degree-hours beyond each limit, coverage, extremes. */
export interface ExposureFigures {
  hoursCovered: number;
  hoursMissing: number;
  minC: number | null;
  maxC: number | null;
  meanC: number | null;
  below: LimitFigures;
  above: LimitFigures;
  freeze: LimitFigures;
}

export interface CallusOutlook {
  status: 'complete' | 'estimated' | 'none';
  fullCallusAt: string | null;
  reason: 'not_in_storage' | 'no_recent_readings' | 'rate_zero' | null;
  basis: { loggerId: number; loggerLabel: string | null; from: string; to: string; meanC: number; rate: number } | null;
}

export interface CallusProgress {
  optimumEquivalentHours: number;
  hoursAtOptimum: number;
  progressPct: number;
  outlook: CallusOutlook;
}

export interface BatchExposure {
  batchId: number;
  code: string;
  status: BatchStatus;
  asOf: string;
  computedAt: string;
  profile: {
    key: string;
    name: string;
    freezeC: number;
    band: { minC: number; maxC: number };
    storageMaxC: number | null;
    callus: { baseC: number; optLowC: number; optHighC: number; upperC: number; hoursAtOptimum: number };
  };
  headline: ExposureFigures | null;
  placements: {
    placementId: number;
    roomId: number;
    roomName: string | null;
    from: string;
    to: string | null;
    until: string;
    headline: ExposureFigures;
    unwatchedHours: number;
    loggers: { loggerId: number; label: string | null; spans: { from: string; to: string }[]; exposure: ExposureFigures }[];
  }[];
  progress: CallusProgress | null;
}

export interface StoredBatchExposure {
  batchId: number;
  code: string;
  species: string;
  speciesName: string;
  scionCultivar: string;
  rootstock: string;
  count: number;
  graftedOn: string;
  roomId: number | null;
  roomName: string | null;
  since: string | null;
  headline: ExposureFigures | null;
  progress: CallusProgress | null;
}

export const batchKeys = {
  all: ['batches'] as const,
  list: (filters: BatchListQuery) => [...batchKeys.all, 'list', filters] as const,
  detail: (id: number) => [...batchKeys.all, 'detail', id] as const,
  exposure: (id: number) => [...batchKeys.all, 'exposure', id] as const,
  stored: () => [...batchKeys.all, 'stored-exposure'] as const,
};

function queryString(filters: BatchListQuery): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(filters)) if (value !== undefined && value !== '') params.set(key, String(value));
  const text = params.toString();
  return text ? `?${text}` : '';
}

/** The previous list stays on screen while a changed filter loads, instead of a spinner on every keystroke. */
export const useBatches = (filters: BatchListQuery) =>
  useQuery({ queryKey: batchKeys.list(filters), queryFn: () => api.get<Batch[]>(`/batches${queryString(filters)}`), placeholderData: keepPreviousData });
export const useBatch = (id: number) => useQuery({ queryKey: batchKeys.detail(id), queryFn: () => api.get<Batch>(`/batches/${id}`) });
export const useBatchExposure = (id: number) =>
  useQuery({ queryKey: batchKeys.exposure(id), queryFn: () => api.get<BatchExposure>(`/batches/${id}/exposure`) });
export const useStoredExposure = () =>
  useQuery({ queryKey: batchKeys.stored(), queryFn: () => api.get<{ asOf: string; rows: StoredBatchExposure[] }>('/exposure/batches') });

/** Any batch write can change lists, exposure and the nursery table: refresh everything under `batches`. */
function useBatchWrite<Body, Result>(send: (body: Body) => Promise<Result>) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: (result) => {
      const one = result as Batch;
      if (!Array.isArray(result) && one.id) client.setQueryData(batchKeys.detail(one.id), one);
      return client.invalidateQueries({ queryKey: batchKeys.all });
    },
  });
}

export const useCreateBatchDay = () => useBatchWrite((body: z.output<typeof bulkBatchBody>) => api.post<Batch[]>('/batches/bulk', body));
export const useUpdateBatch = (id: number) => useBatchWrite((body: z.output<typeof batchPatch>) => api.patch<Batch>(`/batches/${id}`, body));
export const useMoveBatch = (id: number) => useBatchWrite((body: z.output<typeof batchMoveBody>) => api.post<Batch>(`/batches/${id}/move`, body));
export const useDiscardBatch = (id: number) => useBatchWrite((body: z.output<typeof batchLeaveBody>) => api.post<Batch>(`/batches/${id}/discard`, body));
