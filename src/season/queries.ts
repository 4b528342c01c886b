import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { TemperatureUnit } from '../../shared/schemas/common';
import type { assessmentBody, plantingBody } from '../../shared/season/schemas';
import type { SeasonReport } from '../../shared/season/seasonReport';
import type { BatchOutcome, ExposureSnapshot, TakeFigure } from '../../shared/season/types';
import { api } from '../api/client';

export interface SeasonEntry {
  season: number;
  label: string;
  current: boolean;
  batches: number;
  planted: number;
  assessed: number;
}

export interface PlantingRecord {
  id: number;
  batchId: number;
  plantedOn: string;
  count: number;
  location: string;
  notes: string;
  snapshot: ExposureSnapshot;
}

export interface AssessmentRecord {
  id: number;
  batchId: number;
  assessedOn: string;
  grown: number;
  notes: string;
}

export interface BatchOutcomeView {
  batchId: number;
  status: 'in_storage' | 'planted_out' | 'discarded';
  season: number;
  count: number;
  outcome: BatchOutcome;
  take: TakeFigure | null;
  plantings: PlantingRecord[];
  assessments: AssessmentRecord[];
}

export const seasonKeys = {
  all: ['seasons'] as const,
  list: () => [...seasonKeys.all, 'list'] as const,
  report: (season: number, unit: TemperatureUnit) => [...seasonKeys.all, 'report', season, unit] as const,
  outcome: (batchId: number) => [...seasonKeys.all, 'outcome', batchId] as const,
};

export const useSeasons = () => useQuery({ queryKey: seasonKeys.list(), queryFn: () => api.get<{ current: number; seasons: SeasonEntry[] }>('/seasons') });

export const useSeasonReport = (season: number, unit: TemperatureUnit, enabled = true) =>
  useQuery({ queryKey: seasonKeys.report(season, unit), queryFn: () => api.get<SeasonReport>(`/seasons/${season}/report?unit=${unit}`), enabled });

export const useBatchOutcome = (batchId: number) =>
  useQuery({ queryKey: seasonKeys.outcome(batchId), queryFn: () => api.get<BatchOutcomeView>(`/batches/${batchId}/outcome`) });

/** The CSV export is a plain download link: the browser saves it under the name the server gives. */
export const seasonExportUrl = (season: number, unit: TemperatureUnit) => `/api/seasons/${season}/export?unit=${unit}`;

/**
 * A planting can take a batch out of storage and every outcome moves the season's figures, so after any write
 * all cached data is refreshed (batch lists and pages included), not only this section's.
 */
function useOutcomeWrite<Args>(send: (args: Args) => Promise<unknown>) {
  const client = useQueryClient();
  return useMutation({ mutationFn: send, onSuccess: () => client.invalidateQueries() });
}

export const useAddPlanting = (batchId: number) =>
  useOutcomeWrite((body: z.output<typeof plantingBody>) => api.post<PlantingRecord>(`/batches/${batchId}/plantings`, body));
export const useAddAssessment = (batchId: number) =>
  useOutcomeWrite((body: z.output<typeof assessmentBody>) => api.post<AssessmentRecord>(`/batches/${batchId}/assessments`, body));
/** Removes a planting row or an assessment by id. */
export const useDeleteRecord = (kind: 'plantings' | 'assessments') => useOutcomeWrite((id: number) => api.delete(`/${kind}/${id}`));
