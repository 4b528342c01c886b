import { open, stat } from 'node:fs/promises';
import { Op } from 'sequelize';
import { digestFile, type FileDigest } from './fileDigest';
import type { FileSegments } from './fileSegments';
import { Import } from './import.model';

/** How many earlier imports are tried as the start of a new file; nightly re-exports match the latest few. */
const CANDIDATES = 20;

/**
 * A logger re-exports everything since it was started, so tonight's file is usually last night's file with a day
 * appended. When the new file begins with the exact bytes of a completed import, only what follows needs reading.
 */
export interface AppendBase {
  base: Import;
  /** Physical lines in the shared beginning. */
  prefixLines: number;
  /** Preamble and header lines at the top of the file, kept in front of the new part so the reader sees the layout. */
  headLines: number;
  /** The header lines, then everything after the shared beginning. */
  file: FileSegments;
}

export async function digestWithAppendBase(nurseryId: number, path: string): Promise<{ digest: FileDigest; append: AppendBase | null }> {
  const { size } = await stat(path);
  const candidates = await Import.findAll({
    where: { nurseryId, status: 'completed', loggerId: { [Op.ne]: null }, fileBytes: { [Op.gt]: 0, [Op.lt]: size } },
    order: [['id', 'DESC']],
    limit: CANDIDATES,
  });
  const digest = await digestFile(path, candidates.map((c) => Number(c.fileBytes)));
  const base = candidates
    .filter((c) => digest.prefixes.get(Number(c.fileBytes))?.sha256 === c.fileSha256 && c.detection && c.detection.lineEnding !== 'CR')
    .sort((a, b) => Number(b.fileBytes) - Number(a.fileBytes))[0];
  if (!base || !(await endsALine(path, Number(base.fileBytes)))) return { digest, append: null };
  const headLines = base.detection!.preambleLines + (base.detection!.hasHeader ? 1 : 0);
  const headEnd = await offsetAfterLines(path, headLines);
  if (headEnd === null) return { digest, append: null };
  const from = Number(base.fileBytes);
  return {
    digest,
    append: {
      base,
      prefixLines: digest.prefixes.get(from)!.lines,
      headLines,
      file: { path, segments: [{ start: 0, end: headEnd }, { start: from }] },
    },
  };
}

/** The shared beginning must end exactly at a line break, or the first new line would be cut in two. */
async function endsALine(path: string, length: number): Promise<boolean> {
  const file = await open(path, 'r');
  try {
    const { buffer } = await file.read(Buffer.alloc(1), 0, 1, length - 1);
    return buffer[0] === 10;
  } finally {
    await file.close();
  }
}

/** Byte offset just after the first `lines` line breaks (within the first MiB, where any header is). */
async function offsetAfterLines(path: string, lines: number): Promise<number | null> {
  if (lines === 0) return 0;
  const file = await open(path, 'r');
  try {
    const { buffer, bytesRead } = await file.read(Buffer.alloc(1 << 20), 0, 1 << 20, 0);
    let at = -1;
    for (let i = 0; i < lines; i++) {
      at = buffer.indexOf(10, at + 1);
      if (at === -1 || at >= bytesRead) return null;
    }
    return at + 1;
  } finally {
    await file.close();
  }
}
