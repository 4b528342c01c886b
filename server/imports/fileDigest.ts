import { createHash } from 'node:crypto';
import { createReadStream } from 'node:fs';

/** SHA-256 and size of a file, streamed: an identical file is recognised before any row is read. */
export async function digestFile(path: string): Promise<{ sha256: string; bytes: number }> {
  const hash = createHash('sha256');
  let bytes = 0;
  for await (const chunk of createReadStream(path, { highWaterMark: 1 << 20 })) {
    hash.update(chunk as Buffer);
    bytes += (chunk as Buffer).length;
  }
  return { sha256: hash.digest('hex'), bytes };
}
