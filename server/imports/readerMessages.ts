import type { ImportErrorCode } from '../../shared/import/importError';
import type { Detection, ReadOptions, ReadSummary } from '../../shared/import/types';
import type { FileSegments } from './fileSegments';

/** One file to read, with the reader's options. */
export interface ReaderJob {
  file: FileSegments;
  options: ReadOptions;
}

/** Reader thread → import. */
export type FromReader =
  | { kind: 'detected'; detected: Detection }
  | { kind: 'batch'; packed: Float64Array }
  | { kind: 'done'; summary: ReadSummary }
  | { kind: 'failed'; error: { code: ImportErrorCode | null; message: string; stack?: string } };

/** Import → reader thread: read a file; carry on after its layout was accepted, or after a batch was taken. */
export type ToReader = { kind: 'read'; job: ReaderJob } | { kind: 'proceed' } | { kind: 'taken' };
