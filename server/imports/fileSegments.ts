import { createReadStream } from 'node:fs';
import type { ByteSourceFactory } from '../../shared/import/byteSource';

/**
 * Which bytes of an uploaded file the reader sees, as plain data so it can cross to the reader thread: the whole
 * file, or (for a re-export that continues an earlier import) its header lines followed by the new part.
 */
export interface FileSegments {
  path: string;
  /** Byte ranges read one after another; `end` is exclusive, absent for "to the end of the file". */
  segments: { start: number; end?: number }[];
}

export const wholeFile = (path: string): FileSegments => ({ path, segments: [{ start: 0 }] });

/**
 * 64 KiB reads, the size the reader parses at a time: 1 MiB reads were no faster and held some 30 MB more
 * (read-ahead buffers and the larger strings decoded from them; measured on a million-row file).
 */
const READ_BYTES = 64 * 1024;

export function segmentsSource({ path, segments }: FileSegments): ByteSourceFactory {
  return async function* () {
    for (const { start, end } of segments) {
      if (end !== undefined && end <= start) continue;
      yield* createReadStream(path, { start, end: end === undefined ? undefined : end - 1, highWaterMark: READ_BYTES });
    }
  };
}
