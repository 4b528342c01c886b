import { Op } from 'sequelize';
import type { Pool, PoolConnection } from 'mariadb';
import { isImportError } from '../../shared/import/importError';
import type { Detection, LineNote, Reading, ReadOptions, ReadSummary } from '../../shared/import/types';
import type { ImportSettings } from '../../shared/schemas/imports';
import type { AuthContext } from '../http/route';
import { ApiError, notFound } from '../http/errors';
import { Logger } from '../loggers/logger.model';
import { Nursery } from '../nurseries/nursery.model';
import { compareWithStored, storedSpan } from '../readings/readingStore';
import { ReadingSpool } from '../readings/readingSpool';
import { notifyReadingsChanged } from '../readings/readingEvents';
import { digestWithAppendBase, type AppendBase } from './appendedFile';
import { Import } from './import.model';
import { lockLogger } from './importLock';
import { wholeFile } from './fileSegments';
import { LINE, STRIDE, T, countOf, unpackReadings, type PackedReadings } from './packedReadings';
import type { Reader } from './readerThread';

export interface IncomingFile {
  path: string;
  name: string;
}

const PREVIEW_ROWS = 20;
const MAX_NOTED = 1000;

export function presentImport(i: Import, loggerLabel: string | null = null) {
  return {
    id: i.id,
    status: i.status,
    fileName: i.fileName,
    fileSha256: i.fileSha256,
    fileBytes: Number(i.fileBytes),
    loggerId: i.loggerId,
    loggerLabel,
    by: i.userId ? { userId: i.userId } : i.tokenId ? { tokenId: i.tokenId } : null,
    startedAt: i.startedAt,
    finishedAt: i.finishedAt,
    error: i.errorCode ? { code: i.errorCode, message: i.errorMessage } : null,
    rows: { total: i.rowsTotal, accepted: i.rowsAccepted, rejected: i.rowsRejected, duplicates: i.rowsDuplicates, conflicts: i.rowsConflicts },
    span: { first: i.firstAt, last: i.lastAt },
    detected: i.detection,
    rejectedLines: i.rejectedLines ?? [],
    conflictLines: i.conflictLines ?? [],
  };
}

/** The logger named by the person, else by the file itself (a label or serial in its preamble). */
async function resolveLogger(nurseryId: number, named: string | undefined, detection: Detection): Promise<Logger> {
  const wanted = named ?? detection.loggerHint;
  if (!wanted) {
    throw new ApiError(400, 'logger_required', 'The file does not say which logger it came from; give its label (--logger K-01, or choose it in the form).');
  }
  const logger = await Logger.findOne({ where: { nurseryId, [Op.or]: [{ label: wanted }, { serial: wanted }] } });
  if (!logger) {
    const known = (await Logger.findAll({ where: { nurseryId }, attributes: ['label'], order: [['label', 'ASC']] })).map((l) => l.label);
    throw new ApiError(404, 'logger_unknown', `No logger "${wanted}" in this nursery. Known loggers: ${known.join(', ') || 'none yet'}.`);
  }
  return logger;
}

function readOptions(settings: ImportSettings, zone: string): ReadOptions {
  return { tz: settings.tz, unit: settings.unit, dateOrder: settings.dateOrder, defaultZone: zone };
}

/** A reader error becomes a 422 with the reader's own code and advice; anything else propagates. */
function asApiError(err: unknown): unknown {
  return isImportError(err) ? new ApiError(422, err.code, err.message) : err;
}

export interface ImportOutcome {
  alreadyImported: boolean;
  dryRun: boolean;
  import: ReturnType<typeof presentImport> | null;
  detected: Detection;
  rows: ReadSummary['rows'];
  rejectedLines: LineNote[];
  conflictLines: LineNote[];
  span: { first: string | null; last: string | null };
  preview: { t: string; c: number; rh: number | null; line: number }[];
}

const iso = (t: number | null) => (t === null ? null : new Date(t).toISOString());

/**
 * Reads one logger file and stores each new reading once. Identical files are recognised by SHA-256; overlapping
 * files add only what is new; a value that differs from the stored one is reported as a conflict. The import record
 * is written first and marked failed if anything goes wrong, so a re-run completes it with nothing twice. The file
 * is read on `reader`'s thread, which is stopped when the import ends (an identical file stops it unused).
 */
export async function importFile(pool: Pool, auth: AuthContext, file: IncomingFile, settings: ImportSettings, reader: Reader): Promise<ImportOutcome> {
  try {
    return await importWith(reader, pool, auth, file, settings);
  } finally {
    reader.stop();
  }
}

async function importWith(reader: Reader, pool: Pool, auth: AuthContext, file: IncomingFile, settings: ImportSettings): Promise<ImportOutcome> {
  const nursery = await Nursery.findByPk(auth.nurseryId);
  const { digest, append: appendBase } = await digestWithAppendBase(auth.nurseryId, file.path);
  if (digest.bytes === 0) throw new ApiError(422, 'empty', 'The file is empty. Pick the file the logger exported, with its readings.');
  if (!settings.dryRun) {
    const same = await Import.findOne({ where: { nurseryId: auth.nurseryId, fileSha256: digest.sha256, status: 'completed' }, order: [['id', 'DESC']] });
    if (same) return alreadyImported(same);
  }
  const append = settings.dryRun ? null : await appendFor(appendBase, settings);
  // The new part alone may be too short to show the date order or unit; the file's beginning already did.
  const options = append
    ? readOptions({ ...settings, dateOrder: settings.dateOrder ?? append.base.detection!.timestamp.dateOrder ?? undefined, unit: settings.unit ?? append.base.detection!.temperature.unit }, nursery!.timeZone)
    : readOptions(settings, nursery!.timeZone);

  const run = new ImportRun(pool, auth, file, settings, digest, append);
  try {
    const summary = await reader.read({ file: append?.file ?? wholeFile(file.path), options }, (batch) => run.take(batch), { onDetected: (d) => run.begin(d) })
      .catch((err) => {
        // A re-export whose new part holds only blank lines has nothing to add; that is not an error.
        if (append && isImportError(err) && err.code === 'no_data') return null;
        throw err;
      });
    return await run.finish(summary);
  } catch (err) {
    throw await run.fail(asApiError(err));
  } finally {
    await run.release();
  }
}

/** An append base counts only for the same logger the person names (if they name one). */
async function appendFor(append: AppendBase | null, settings: ImportSettings): Promise<AppendBase | null> {
  if (!append || !settings.logger) return append;
  const logger = await Logger.findByPk(append.base.loggerId!);
  return logger && (logger.label === settings.logger || logger.serial === settings.logger) ? append : null;
}

/** A byte-identical file was imported before: say so at once, with that import's own accounting. */
async function alreadyImported(same: Import): Promise<ImportOutcome> {
  const label = same.loggerId ? ((await Logger.findByPk(same.loggerId))?.label ?? null) : null;
  const shown = presentImport(same, label);
  return {
    alreadyImported: true, dryRun: false, import: shown, detected: same.detection!,
    rows: { total: same.rowsTotal, accepted: 0, rejected: same.rowsRejected, duplicates: same.rowsAccepted + same.rowsDuplicates, conflicts: same.rowsConflicts },
    rejectedLines: shown.rejectedLines, conflictLines: shown.conflictLines,
    span: { first: same.firstAt?.toISOString() ?? null, last: same.lastAt?.toISOString() ?? null }, preview: [],
  };
}

/**
 * The state of one import while the file streams through: the logger, the record, the connection holding the
 * logger's lock and the open transaction, and the running comparison with what is stored.
 */
class ImportRun {
  private logger: Logger | null = null;
  private record: Import | null = null;
  private conn: PoolConnection | null = null;
  /** Compares run on a second connection, so they need not wait while the first is busy loading readings. */
  private readConn: PoolConnection | null = null;
  private locked: (() => Promise<void>) | null = null;
  private spool: ReadingSpool | null = null;
  /** What the logger had stored when this import took its lock. */
  private storedBefore: { first: number; last: number } | null = null;
  private readonly preview: Reading[] = [];
  private stored = 0;
  /** First and last instant among the readings this import stores. */
  private addedSpan: { first: number; last: number } | null = null;
  private alreadyStored = 0;
  private storedConflictCount = 0;
  private readonly storedConflicts: LineNote[] = [];

  constructor(
    private readonly pool: Pool,
    private readonly auth: AuthContext,
    private readonly file: IncomingFile,
    private readonly settings: ImportSettings,
    private readonly digest: { sha256: string; bytes: number },
    /** Set when the file continues an earlier import: only its new part is read. */
    private readonly append: AppendBase | null,
  ) {}

  /** Lines the reader counts in the head-plus-new-part stream, back to the file's physical line numbers. */
  private physicalLine(line: number): number {
    if (!this.append || line <= this.append.headLines) return line;
    return line + this.append.prefixLines - this.append.headLines;
  }

  private physicalNotes(notes: LineNote[]): LineNote[] {
    return notes.map((n) => ({ ...n, line: this.physicalLine(n.line) }));
  }

  /** Once the layout is known: find the logger, write the record, take the logger's lock, open one transaction. */
  async begin(detection: Detection): Promise<void> {
    const named = this.settings.logger ?? detection.loggerHint;
    if (this.settings.dryRun && !named) return;
    if (this.settings.dryRun) {
      // A preview still shows a file that names a logger this nursery does not know: the person picks one next.
      // A logger the person named themselves must exist.
      this.logger = await resolveLogger(this.auth.nurseryId, this.settings.logger, detection).catch((err: unknown) => {
        if (this.settings.logger) throw err;
        return null;
      });
      if (this.logger) {
        this.conn = await this.pool.getConnection();
        this.storedBefore = await storedSpan(this.conn, this.logger.id);
      }
      return;
    }
    this.logger = this.append
      ? await Logger.findByPk(this.append.base.loggerId!)
      : await resolveLogger(this.auth.nurseryId, this.settings.logger, detection);
    if (!this.logger) throw notFound('The logger of the earlier import this file continues');
    this.conn = await this.pool.getConnection();
    this.record = await Import.create({
      nurseryId: this.auth.nurseryId, loggerId: this.logger.id, userId: this.auth.userId, tokenId: this.auth.tokenId,
      fileName: this.file.name, fileSha256: this.digest.sha256, fileBytes: this.digest.bytes, status: 'running',
      startedAt: new Date(), detection,
    });
    this.locked = await lockLogger(this.conn, this.logger.id);
    this.storedBefore = await storedSpan(this.conn, this.logger.id);
    this.spool = await ReadingSpool.open(this.conn, this.logger.id, this.record.id);
    this.readConn = await this.pool.getConnection();
    // One transaction: an import that fails half-way leaves nothing behind, and its re-run stores everything.
    await this.conn.beginTransaction();
  }

  async take(batch: PackedReadings): Promise<void> {
    if (this.append) for (let at = LINE; at < batch.length; at += STRIDE) batch[at] = this.physicalLine(batch[at]);
    if (this.preview.length < PREVIEW_ROWS) this.preview.push(...unpackReadings(batch.subarray(0, (PREVIEW_ROWS - this.preview.length) * STRIDE)));
    if (!this.conn || !this.logger) return;
    const out = await compareWithStored(this.readConn ?? this.conn, this.logger.id, batch, this.storedBefore);
    await this.spool?.add(out.fresh);
    this.stored += countOf(out.fresh);
    for (let at = T; at < out.fresh.length; at += STRIDE) {
      const t = out.fresh[at];
      if (!this.addedSpan) this.addedSpan = { first: t, last: t };
      else if (t < this.addedSpan.first) this.addedSpan.first = t;
      else if (t > this.addedSpan.last) this.addedSpan.last = t;
    }
    this.alreadyStored += out.alreadyStored;
    this.storedConflictCount += out.conflicts.length;
    if (this.storedConflicts.length < MAX_NOTED) this.storedConflicts.push(...out.conflicts.slice(0, MAX_NOTED - this.storedConflicts.length));
  }

  async finish(read: ReadSummary | null): Promise<ImportOutcome> {
    const summary = this.withEarlierPart(read);
    const compared = this.logger !== null;
    const rows = {
      total: summary.rows.total,
      accepted: compared ? this.stored : summary.rows.accepted,
      rejected: summary.rows.rejected,
      duplicates: summary.rows.duplicates + this.alreadyStored,
      conflicts: summary.rows.conflicts + this.storedConflictCount,
    };
    const conflictLines = [...summary.conflictLines, ...this.storedConflicts].sort((a, b) => a.line - b.line).slice(0, MAX_NOTED);
    if (!this.record) return outcome(false, true, null, summary, rows, conflictLines, this.preview);
    await this.spool!.finish();
    await this.conn!.commit();
    await this.record.update({
      status: 'completed', finishedAt: new Date(), detection: summary.detected,
      rowsTotal: rows.total, rowsAccepted: rows.accepted, rowsRejected: rows.rejected, rowsDuplicates: rows.duplicates,
      rowsConflicts: rows.conflicts, rowsStored: this.stored,
      firstAt: summary.span.first === null ? null : new Date(summary.span.first),
      lastAt: summary.span.last === null ? null : new Date(summary.span.last),
      storedFirstAt: this.addedSpan && new Date(this.addedSpan.first),
      storedLastAt: this.addedSpan && new Date(this.addedSpan.last),
      rejectedLines: summary.rejectedLines, conflictLines,
    });
    if (this.stored > 0 && read && read.span.first !== null) {
      await notifyReadingsChanged({ nurseryId: this.auth.nurseryId, loggerId: this.logger!.id, from: read.span.first, to: read.span.last! });
    }
    return outcome(false, false, presentImport(this.record, this.logger!.label), summary, rows, conflictLines, this.preview);
  }

  /**
   * The whole file's accounting: for a continued file, the earlier import's rows (its stored readings now count as
   * already there, its rejections and conflicts stand as they were, line for line) plus the new part's.
   */
  private withEarlierPart(read: ReadSummary | null): ReadSummary {
    if (!this.append) return read!;
    const base = this.append.base;
    const tail = read ?? { detected: base.detection!, rows: { total: 0, accepted: 0, rejected: 0, duplicates: 0, conflicts: 0 }, rejectedLines: [], conflictLines: [], span: { first: null, last: null } };
    return {
      detected: base.detection!,
      rows: {
        total: base.rowsTotal + tail.rows.total,
        accepted: tail.rows.accepted,
        rejected: base.rowsRejected + tail.rows.rejected,
        duplicates: base.rowsAccepted + base.rowsDuplicates + tail.rows.duplicates,
        conflicts: base.rowsConflicts + tail.rows.conflicts,
      },
      rejectedLines: [...(base.rejectedLines ?? []), ...this.physicalNotes(tail.rejectedLines)].slice(0, MAX_NOTED),
      conflictLines: [...(base.conflictLines ?? []), ...this.physicalNotes(tail.conflictLines)].slice(0, MAX_NOTED),
      span: {
        first: base.firstAt?.getTime() ?? tail.span.first,
        last: Math.max(base.lastAt?.getTime() ?? -Infinity, tail.span.last ?? -Infinity),
      },
    };
  }

  /** Rolls back what this import stored and marks its record failed; answers the error to throw. */
  async fail(err: unknown): Promise<unknown> {
    if (this.conn && this.record) await this.conn.rollback().catch(() => undefined);
    if (this.record) {
      const code = err instanceof ApiError ? err.code : 'internal';
      const message = err instanceof Error ? err.message : String(err);
      await this.record.update({ status: 'failed', finishedAt: new Date(), errorCode: code, errorMessage: message });
    }
    return err;
  }

  async release(): Promise<void> {
    await this.spool?.discard();
    await this.readConn?.release();
    if (!this.conn) return;
    try {
      await this.locked?.();
    } finally {
      await this.conn.release();
    }
  }
}

function outcome(
  alreadyImported: boolean, dryRun: boolean, shown: ImportOutcome['import'], summary: ReadSummary,
  rows: ReadSummary['rows'], conflictLines: LineNote[], preview: Reading[],
): ImportOutcome {
  return {
    alreadyImported, dryRun, import: shown, detected: summary.detected, rows,
    rejectedLines: summary.rejectedLines, conflictLines,
    span: { first: iso(summary.span.first), last: iso(summary.span.last) },
    preview: preview.map((r) => ({ t: new Date(r.t).toISOString(), c: r.c, rh: r.rh, line: r.line })),
  };
}

export async function listImports(nurseryId: number, query: { loggerId?: number; status?: string; limit: number }) {
  const where: Record<string, unknown> = { nurseryId };
  if (query.loggerId) where.loggerId = query.loggerId;
  if (query.status) where.status = query.status;
  const [imports, loggers] = await Promise.all([
    Import.findAll({ where, order: [['id', 'DESC']], limit: query.limit }),
    Logger.findAll({ where: { nurseryId }, attributes: ['id', 'label'] }),
  ]);
  const labels = new Map(loggers.map((l) => [l.id, l.label]));
  return imports.map((i) => {
    const { rejectedLines, conflictLines, detected, ...rest } = presentImport(i, i.loggerId ? labels.get(i.loggerId) ?? null : null);
    return { ...rest, rejectedLineCount: rejectedLines.length, conflictLineCount: conflictLines.length, encoding: detected?.encoding ?? null };
  });
}

export async function getImport(nurseryId: number, id: number) {
  const i = await Import.findOne({ where: { id, nurseryId } });
  if (!i) throw notFound('That import');
  const label = i.loggerId ? (await Logger.findByPk(i.loggerId))?.label ?? null : null;
  return presentImport(i, label);
}
