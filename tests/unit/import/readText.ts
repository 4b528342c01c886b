import { readLoggerFile } from '../../../shared/import/readLoggerFile';
import type { ReadOptions, ReadSummary, Reading } from '../../../shared/import/types';

export interface ReadResult {
  summary: ReadSummary;
  readings: Reading[];
  batches: number;
}

/** Bytes of a string in UTF-8, or in Latin-1 when asked (each char one byte). */
export function bytesOf(text: string, encoding: 'utf-8' | 'latin1' = 'utf-8'): Uint8Array {
  return encoding === 'utf-8' ? new TextEncoder().encode(text) : Uint8Array.from(Buffer.from(text, 'latin1'));
}

/** A source factory over fixed bytes, cut into chunks of `chunkSize` (small sizes split characters and lines). */
export function sourceOf(bytes: Uint8Array, chunkSize = 64 * 1024) {
  return async function* () {
    for (let at = 0; at < bytes.length; at += chunkSize) yield bytes.subarray(at, at + chunkSize);
  };
}

export async function readBytes(
  bytes: Uint8Array,
  options: Partial<ReadOptions> = {},
  chunkSize?: number,
): Promise<ReadResult> {
  const readings: Reading[] = [];
  let batches = 0;
  const summary = await readLoggerFile(sourceOf(bytes, chunkSize), { defaultZone: 'UTC', ...options }, async (batch) => {
    batches++;
    readings.push(...batch);
  });
  return { summary, readings, batches };
}

export function readText(text: string, options: Partial<ReadOptions> = {}, chunkSize?: number): Promise<ReadResult> {
  return readBytes(bytesOf(text), options, chunkSize);
}

/** Catches the ImportError a read throws and returns its code and message. */
export async function importErrorOf(read: Promise<unknown>): Promise<{ code: string; message: string }> {
  try {
    await read;
  } catch (error) {
    const { code, message } = error as { code: string; message: string };
    return { code, message };
  }
  throw new Error('expected the read to fail');
}

export const utc = (iso: string): number => Date.parse(iso);
