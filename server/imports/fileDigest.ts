import { createHash } from 'node:crypto';
import { createReadStream } from 'node:fs';

export interface FileDigest {
  sha256: string;
  bytes: number;
  /** SHA-256 and line count of the file's first N bytes, for each N asked for that the file reaches. */
  prefixes: Map<number, { sha256: string; lines: number }>;
}

function countNewlines(bytes: Uint8Array): number {
  let n = 0;
  for (let i = bytes.indexOf(10); i !== -1; i = bytes.indexOf(10, i + 1)) n++;
  return n;
}

/**
 * SHA-256 and size of a file in one streamed pass; on the way, the hash of each asked-for prefix, so a logger's
 * re-export (the last file plus what came since) is recognised without reading the file twice.
 */
export async function digestFile(path: string, prefixLengths: number[] = []): Promise<FileDigest> {
  const wanted = [...new Set(prefixLengths.filter((n) => n > 0))].sort((a, b) => a - b);
  const hash = createHash('sha256');
  const prefixes = new Map<number, { sha256: string; lines: number }>();
  let bytes = 0;
  let lines = 0;
  let next = 0;
  for await (const chunk of createReadStream(path, { highWaterMark: 1 << 20 }) as AsyncIterable<Buffer>) {
    let pos = 0;
    while (next < wanted.length && wanted[next] <= bytes + chunk.length) {
      const piece = chunk.subarray(pos, wanted[next] - bytes);
      hash.update(piece);
      lines += countNewlines(piece);
      pos += piece.length;
      prefixes.set(wanted[next], { sha256: hash.copy().digest('hex'), lines });
      next++;
    }
    const rest = chunk.subarray(pos);
    hash.update(rest);
    lines += countNewlines(rest);
    bytes += chunk.length;
  }
  return { sha256: hash.digest('hex'), bytes, prefixes };
}
