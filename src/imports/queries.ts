import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Detection, LineNote, RowCounts } from '../../shared/import/types';
import { api } from '../api/client';
import { uploadFile } from '../api/upload';

export interface ImportRecord {
  id: number;
  status: 'running' | 'completed' | 'failed';
  fileName: string;
  fileBytes: number;
  loggerId: number | null;
  loggerLabel: string | null;
  startedAt: string;
  finishedAt: string | null;
  error: { code: string; message: string } | null;
  rows: RowCounts;
  span: { first: string | null; last: string | null };
}

export interface ImportDetail extends ImportRecord {
  detected: Detection | null;
  rejectedLines: LineNote[];
  conflictLines: LineNote[];
}

/** What the server answers for a preview (dry run) or a stored import. */
export interface ImportOutcome {
  alreadyImported: boolean;
  dryRun: boolean;
  import: ImportDetail | null;
  detected: Detection;
  rows: RowCounts;
  rejectedLines: LineNote[];
  conflictLines: LineNote[];
  span: { first: string | null; last: string | null };
  preview: { t: string; c: number; rh: number | null; line: number }[];
}

/** Settings a person may override; empty means "as detected". */
export interface ImportChoices {
  logger: string;
  tz: string;
  unit: '' | 'C' | 'F';
  dateOrder: '' | 'dmy' | 'mdy' | 'ymd';
}

export const importKeys = {
  all: ['imports'] as const,
  list: () => [...importKeys.all, 'list'] as const,
  detail: (id: number) => [...importKeys.all, 'detail', id] as const,
};

export const useImports = () => useQuery({ queryKey: importKeys.list(), queryFn: () => api.get<ImportRecord[]>('/imports?limit=100') });
export const useImport = (id: number) => useQuery({ queryKey: importKeys.detail(id), queryFn: () => api.get<ImportDetail>(`/imports/${id}`) });

function fieldsOf(choices: ImportChoices, dryRun: boolean): Record<string, string> {
  const fields: Record<string, string> = { dryRun: String(dryRun) };
  for (const [key, value] of Object.entries(choices)) if (value) fields[key] = value;
  return fields;
}

export function usePreviewImport() {
  return useMutation({
    mutationFn: ({ file, choices, onProgress }: { file: File; choices: ImportChoices; onProgress: (f: number) => void }) =>
      uploadFile<ImportOutcome>('/imports', file, fieldsOf(choices, true), onProgress),
  });
}

/** Storing readings changes nearly everything shown elsewhere (charts, exposure, alerts), so all cached data is refreshed. */
export function useCommitImport() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ file, choices, onProgress }: { file: File; choices: ImportChoices; onProgress: (f: number) => void }) =>
      uploadFile<ImportOutcome>('/imports', file, fieldsOf(choices, false), onProgress),
    onSuccess: () => client.invalidateQueries(),
  });
}
