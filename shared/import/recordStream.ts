import { CsvError, Parser } from 'csv-parse';
import { lineTooLong, readSource, type ByteSourceFactory } from './byteSource';
import { createDecoder } from './encoding';
import { ImportError } from './importError';
import type { Delimiter, EncodingName } from './types';

export interface RecordStreamOptions {
  encoding: EncodingName;
  delimiter: Delimiter;
  lineEnding: 'LF' | 'CRLF' | 'CR';
  /** Physical lines (preamble and header) dropped before the records start. */
  skipLines: number;
  maxLineBytes: number;
}

export interface RecordHandlers {
  /** Called for every record in file order with its fields and the physical line it starts on. */
  onRecord(fields: string[], line: number): void;
  /** Awaited after each chunk of input, for the caller to hand on a batch (back-pressure). */
  afterChunk?(): Promise<void> | void;
  /** Checked after each chunk: true ends the pass early (a scan that has found what it looked for). */
  isDone?(): boolean;
}

/**
 * Input is parsed this much at a time, whatever the source's chunk size: after a 1 MiB chunk some 35,000
 * readings waited for the batch hand-on, outlived young-generation collections and grew the heap, and
 * each chunk became a 1 MiB string that only a full collection frees.
 */
const PIECE_BYTES = 64 * 1024;

/** LF and CRLF files take both endings: files pasted together from two exports mix them. */
const LINE_BREAKS: Record<RecordStreamOptions['lineEnding'], string[]> = { LF: ['\r\n', '\n'], CRLF: ['\r\n', '\n'], CR: ['\r'] };

/**
 * Streams the file through csv-parse (RFC 4180 quoting), one chunk at a time, never holding the file.
 * Records are counted to physical lines here: csv-parse's per-record `info` would give line numbers too,
 * but copying it for every record made a million-row file several times slower (measured).
 */
export async function streamRecords(source: ByteSourceFactory, options: RecordStreamOptions, handlers: RecordHandlers): Promise<void> {
  const newlineChar = options.lineEnding === 'CR' ? '\r' : '\n';
  const parser = new Parser({
    delimiter: options.delimiter,
    record_delimiter: LINE_BREAKS[options.lineEnding],
    relax_column_count: true,
    relax_quotes: true,
    ltrim: true,
    rtrim: true,
    max_record_size: options.maxLineBytes,
  });
  let line = options.skipLines + 1;
  // Only a quoted field can hold a line break; files without any quote skip the count.
  let quotesSeen = false;
  let handlerFailure: unknown = null;
  let parserFailure: unknown = null;
  parser.on('data', (fields: string[]) => {
    if (handlerFailure !== null) return;
    try {
      handlers.onRecord(fields, line);
    } catch (error) {
      handlerFailure = error;
    }
    line += quotesSeen ? 1 + embeddedLineBreaks(fields, newlineChar) : 1;
  });
  parser.on('error', (error) => {
    parserFailure ??= error;
  });
  const ended = new Promise<void>((resolve) => parser.once('end', resolve).once('error', () => resolve()));
  parser.resume();

  const decoder = createDecoder(options.encoding);
  const skipper = new LineSkipper(options.skipLines, newlineChar, options.maxLineBytes);
  const write = (text: string) =>
    new Promise<void>((resolve) => {
      if (!quotesSeen && text.includes('"')) quotesSeen = true;
      if (text === '') resolve();
      else parser.write(text, () => resolve());
    });

  try {
    for await (const chunk of readSource(source)) {
      for (let at = 0; at < chunk.length; at += PIECE_BYTES) {
        await write(skipper.pass(decoder.write(chunk.subarray(at, at + PIECE_BYTES))));
        throwIfFailed(parserFailure, handlerFailure, line, options);
        await handlers.afterChunk?.();
        if (handlers.isDone?.()) return;
      }
    }
    await write(skipper.pass(decoder.end()));
    parser.end();
    await ended;
    throwIfFailed(parserFailure, handlerFailure, line, options);
    await handlers.afterChunk?.();
  } finally {
    parser.destroy();
  }
}

function throwIfFailed(parserFailure: unknown, handlerFailure: unknown, line: number, { maxLineBytes, skipLines }: RecordStreamOptions): void {
  if (handlerFailure !== null) throw handlerFailure;
  if (parserFailure === null) return;
  if (parserFailure instanceof CsvError) {
    // CsvError carries the parser's position (csv-parse copies its info onto the error).
    const reported = (parserFailure as CsvError & { lines?: number }).lines;
    // csv-parse counts from the first line it was given, after the skipped preamble and header.
    const at = typeof reported === 'number' ? reported + skipLines : line;
    if (parserFailure.code === 'CSV_MAX_RECORD_SIZE') throw lineTooLong(at, maxLineBytes);
    throw new ImportError(
      'malformed_csv',
      `Line ${at}: the CSV quoting is broken (${parserFailure.message.replace(/^[^:]*:\s*/, '').replace(/\s*at line \d+/, '')}). Fix the quotes on that line and try again.`,
      { cause: parserFailure },
    );
  }
  throw parserFailure;
}

function embeddedLineBreaks(fields: string[], newlineChar: string): number {
  let count = 0;
  for (const field of fields) {
    if (field.length === 0) continue;
    let at = field.indexOf(newlineChar);
    while (at !== -1) {
      count++;
      at = field.indexOf(newlineChar, at + 1);
    }
  }
  return count;
}

/** Drops the first N physical lines of decoded text as it streams past. */
class LineSkipper {
  private remaining: number;
  private skippedLength = 0;

  constructor(
    lines: number,
    private readonly newlineChar: string,
    private readonly maxLineBytes: number,
  ) {
    this.remaining = lines;
  }

  pass(text: string): string {
    let start = 0;
    while (this.remaining > 0) {
      const at = text.indexOf(this.newlineChar, start);
      if (at === -1) {
        this.skippedLength += text.length - start;
        if (this.skippedLength > this.maxLineBytes) throw lineTooLong(null, this.maxLineBytes);
        return '';
      }
      start = at + 1;
      this.skippedLength = 0;
      this.remaining--;
    }
    return start === 0 ? text : text.slice(start);
  }
}
