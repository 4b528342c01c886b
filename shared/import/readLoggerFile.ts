import { readPrefix, type ByteSourceFactory } from './byteSource';
import type { TimestampPlan } from './columnRoles';
import { DateOrderEvidence } from './dateOrder';
import { readDateAndTime, readDateTime } from './dateTimeText';
import { buildDetection, chooseZone } from './detectionReport';
import { ImportError } from './importError';
import { inspectPrefix, writtenDates, type PrefixFindings } from './inspectPrefix';
import { createLocalTimeResolver } from './localTime';
import { streamRecords, type RecordStreamOptions } from './recordStream';
import { RowAccountant } from './rowAccountant';
import type { DateOrder, DateOrderSource, Detection, OnBatch, ReadOptions, ReadSummary } from './types';

export type { ByteSourceFactory } from './byteSource';

export const DEFAULT_MAX_LINE_BYTES = 1024 * 1024;
const DEFAULT_BATCH_SIZE = 5000;
/** Enough for a preamble, a header and a few hundred rows. */
const PREFIX_BYTES = 64 * 1024;

/**
 * Reads a temperature-logger export: detects its layout from the first 64 KiB, then streams every row,
 * handing accepted readings to `onBatch` a batch at a time (awaited, so a database insert paces the read).
 * The file is read two or three times through `source` and never held whole; a third pass happens only
 * when every date could be day-first or month-first and the first 64 KiB do not settle which.
 * Throws ImportError when the file as a whole cannot be read; batches already handed on before such an
 * error (only 'mixed_units' can come that late) belong to a file the caller should discard.
 */
export interface ReadHooks {
  /** Called once the layout is known and before any batch: the importer picks the logger and opens its transaction here. */
  onDetected?: (detected: Detection) => Promise<void>;
}

export async function readLoggerFile(source: ByteSourceFactory, options: ReadOptions, onBatch: OnBatch, hooks: ReadHooks = {}): Promise<ReadSummary> {
  checkOptions(options);
  const maxLineBytes = options.maxLineBytes ?? DEFAULT_MAX_LINE_BYTES;
  const batchSize = options.batchSize ?? DEFAULT_BATCH_SIZE;
  const prefix = await readPrefix(source, PREFIX_BYTES, maxLineBytes);
  if (prefix.bytes.length === 0) {
    throw new ImportError('empty', 'The file is empty. Pick the file the logger exported, with its readings.');
  }
  const findings = inspectPrefix(prefix, options);
  const streamOptions: RecordStreamOptions = {
    encoding: findings.encoding.encoding,
    delimiter: findings.table.delimiter,
    lineEnding: findings.table.lineEnding,
    skipLines: findings.table.preambleLines + findings.table.headerLines,
    maxLineBytes,
  };
  const dateOrder = findings.dateOrder ?? (await scanForDateOrder(source, streamOptions, findings));
  const stamp = withOrder(findings.roles.timestamp, dateOrder?.order ?? null);
  const direction = fileDirection(findings, stamp);
  const optionZone = options.tz ? createLocalTimeResolver(options.tz, direction) : null;
  const localTime = stamp.kind === 'epoch' ? null : (optionZone ?? createLocalTimeResolver(options.defaultZone, direction));
  const zone = chooseZone(findings, optionZone?.zoneName ?? null, localTime?.zoneName ?? 'UTC');
  const detected = buildDetection(findings, dateOrder, zone, direction);
  await hooks.onDetected?.(detected);

  const roles = findings.roles;
  const timeColumns = stamp.kind === 'date+time' ? [stamp.dateColumn, stamp.timeColumn] : [stamp.column];
  const accountant = new RowAccountant({
    timestamp: stamp,
    temperatureColumn: roles.temperatureColumn,
    unit: findings.unit.unit,
    humidityColumn: roles.humidityColumn,
    localTime,
    fieldsNeeded: Math.max(roles.temperatureColumn, ...timeColumns) + 1,
  });
  const handOn = async (atLeast: number) => {
    if (accountant.pending.length >= atLeast && accountant.pending.length > 0) await onBatch(accountant.takePending());
  };
  await streamRecords(source, streamOptions, {
    onRecord: (fields, line) => accountant.onRecord(fields, line),
    afterChunk: () => handOn(batchSize),
  });
  await handOn(1);

  const { counts } = accountant;
  if (counts.total === 0) {
    throw new ImportError('no_data', 'The file has a header but no readings below it. Check that the export contains readings.');
  }
  if (counts.accepted === 0) {
    const examples = accountant.rejectedLines
      .slice(0, 3)
      .map((note) => `line ${note.line}: ${note.reason}`)
      .join('; ');
    throw new ImportError(
      'nothing_readable',
      `None of the ${counts.total} rows could be read (${examples}). Check the options (--unit, --tz, --date-order) or the file.`,
    );
  }
  return {
    detected,
    rows: { ...counts },
    rejectedLines: accountant.rejectedLines,
    conflictLines: accountant.conflictLines,
    span: { first: accountant.first, last: accountant.last },
  };
}

function checkOptions(options: ReadOptions): void {
  if (options.unit !== undefined && options.unit !== 'C' && options.unit !== 'F') {
    throw new ImportError('bad_option', `Unit "${String(options.unit)}" is not C or F.`);
  }
  if (options.dateOrder !== undefined && !['dmy', 'mdy', 'ymd'].includes(options.dateOrder)) {
    throw new ImportError('bad_option', `Date order "${String(options.dateOrder)}" is not dmy, mdy or ymd.`);
  }
  if (options.maxLineBytes !== undefined && !(options.maxLineBytes > 0)) {
    throw new ImportError('bad_option', 'The longest line allowed must be a positive number of bytes.');
  }
}

/** Second pass over dates only, when the first 64 KiB could be read either day-first or month-first. */
async function scanForDateOrder(
  source: ByteSourceFactory,
  streamOptions: RecordStreamOptions,
  findings: PrefixFindings,
): Promise<{ order: DateOrder; source: DateOrderSource } | null> {
  const evidence: DateOrderEvidence | null = findings.orderEvidence;
  if (!evidence) return null;
  await streamRecords(source, streamOptions, {
    onRecord: (fields) => {
      const [written] = writtenDates(findings.roles, [fields]);
      if (written.date.trim() !== '') evidence.add(written);
    },
    isDone: () => evidence.settledByValues(),
  });
  return evidence.verdict();
}

function withOrder(stamp: TimestampPlan, order: DateOrder | null): TimestampPlan {
  return stamp.kind === 'epoch' ? stamp : { ...stamp, order };
}

/** Newest-first files exist; the order tells which repeated hour a reading at the autumn change belongs to. */
function fileDirection(findings: PrefixFindings, stamp: TimestampPlan): 'ascending' | 'descending' {
  if (stamp.kind === 'epoch') return 'ascending';
  const order = stamp.order ?? 'ymd';
  const times = findings.sampleDates
    .map((written) =>
      written.time === null
        ? readDateTime(written.date, stamp.style, order)
        : readDateAndTime(written.date, written.time, stamp.style, order),
    )
    .filter((outcome) => typeof outcome !== 'string')
    .map((outcome) => outcome.localMs - (outcome.offsetMinutes ?? 0) * 60_000);
  return times.length >= 2 && times[times.length - 1] < times[0] ? 'descending' : 'ascending';
}
