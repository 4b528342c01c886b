import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { CapturedMail } from './captureServer';

/** Newest first, for the development inbox page; the files are written by the capture server. */
export function readDevInbox(dir: string, limit = 100): CapturedMail[] {
  const files = readdirSync(dir).filter((f) => f.endsWith('.json')).sort().reverse().slice(0, limit);
  return files.map((f) => JSON.parse(readFileSync(join(dir, f), 'utf8')) as CapturedMail);
}
