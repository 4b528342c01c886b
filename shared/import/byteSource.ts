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
 * Reads about `wantBytes` from the start of the file for detection, never holding more than
 * `maxLineBytes` while still looking for the end of the first line.
 */
export async function readPrefix(source: ByteSourceFactory, wantBytes: number, maxLineBytes: number): Promise<Prefix> {
  const chunks: Uint8Array[] = [];
  let length = 0;
  let sawLineEnd = false;
  let complete = true;
  for await (const chunk of readSource(source)) {
    chunks.push(chunk);
    length += chunk.length;
    if (!sawLineEnd) sawLineEnd = chunk.includes(LF) || chunk.includes(CR);
    if (!sawLineEnd && length > maxLineBytes) throw lineTooLong(1, maxLineBytes);
    if (length >= wantBytes && sawLineEnd) {
      complete = false;
      break;
    }
  }
  const bytes = new Uint8Array(length);
  let offset = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, offset);
    offset += chunk.length;
  }
  return { bytes, complete };
}

export function lineTooLong(line: number | null, maxLineBytes: number): ImportError {
  const where = line === null ? 'A line' : `Line ${line}`;
  return new ImportError(
    'line_too_long',
    `${where} is longer than ${maxLineBytes} bytes, so this does not look like a logger's CSV/text export. ` +
      'Check that you picked the right file.',
  );
}
