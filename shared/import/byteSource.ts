import { ImportError } from './importError';

/** A way to read the file from its start, as many times as the reader needs (detection, then the rows). */
export type ByteSourceFactory = () => AsyncIterable<Uint8Array>;

/** Iterates the source, turning its failures (missing file, aborted upload) into one clear error. */
export async function* readSource(source: ByteSourceFactory): AsyncGenerator<Uint8Array> {
  let iterator: AsyncIterator<Uint8Array>;
  try {
    iterator = source()[Symbol.asyncIterator]();
  } catch (cause) {
    throw unreadable(cause);
  }
  try {
    for (;;) {
      let step: IteratorResult<Uint8Array>;
      try {
        step = await iterator.next();
      } catch (cause) {
        throw unreadable(cause);
      }
      if (step.done) return;
      yield step.value;
    }
  } finally {
    await iterator.return?.();
  }
}

function unreadable(cause: unknown): ImportError {
  if (cause instanceof ImportError) return cause;
  const detail = cause instanceof Error ? cause.message : String(cause);
  return new ImportError('unreadable', `Could not read the file: ${detail}. Check the path and that the file can be opened.`, {
    cause,
  });
}

export interface Prefix {
  bytes: Uint8Array;
  /** True when the prefix is the whole file. */
  complete: boolean;
}

const LF = 0x0a;
const CR = 0x0d;

/**
 * Reads the first `wantBytes` of the file for detection (or, when the first line is longer, that line and
 * `wantBytes` after it), never holding more than `maxLineBytes` while still looking for the end of the
 * first line. The prefix is cut to that size whatever the source's chunks: a 1 MiB read-stream chunk
 * would otherwise make detection split and check some 35,000 rows instead of about 2,000.
 */
export async function readPrefix(source: ByteSourceFactory, wantBytes: number, maxLineBytes: number): Promise<Prefix> {
  const chunks: Uint8Array[] = [];
  let length = 0;
  let firstLineEnd = -1;
  for await (const chunk of readSource(source)) {
    if (firstLineEnd === -1) {
      const at = lineEndIn(chunk);
      if (at !== -1) firstLineEnd = length + at;
    }
    chunks.push(chunk);
    length += chunk.length;
    if (firstLineEnd === -1) {
      if (length > maxLineBytes) throw lineTooLong(1, maxLineBytes);
      continue;
    }
    const enough = firstLineEnd < wantBytes ? wantBytes : firstLineEnd + 1 + wantBytes;
    if (length >= enough) return { bytes: joined(chunks, enough), complete: false };
  }
  return { bytes: joined(chunks, length), complete: true };
}

function lineEndIn(chunk: Uint8Array): number {
  const lf = chunk.indexOf(LF);
  const cr = chunk.indexOf(CR);
  return lf === -1 || (cr !== -1 && cr < lf) ? cr : lf;
}

/** The first `size` bytes of the chunks, as one array. */
function joined(chunks: Uint8Array[], size: number): Uint8Array {
  const bytes = new Uint8Array(size);
  let offset = 0;
  for (const chunk of chunks) {
    if (offset >= size) break;
    const part = chunk.length <= size - offset ? chunk : chunk.subarray(0, size - offset);
    bytes.set(part, offset);
    offset += part.length;
  }
  return bytes;
}

export function lineTooLong(line: number | null, maxLineBytes: number): ImportError {
  const where = line === null ? 'A line' : `Line ${line}`;
  return new ImportError(
    'line_too_long',
    `${where} is longer than ${maxLineBytes} bytes, so this does not look like a logger's CSV/text export. ` +
      'Check that you picked the right file.',
  );
}
