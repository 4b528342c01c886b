import { hasDecimalComma } from './cellValues';
import { loggerHintInLine } from './columnNames';
import { findColumnRoles, type ColumnRoles } from './columnRoles';
import { DateOrderEvidence, usualSteps, type WrittenDate } from './dateOrder';
import { readDateAndTime, readDateTime } from './dateTimeText';
import { createDecoder, guessEncoding, type EncodingGuess } from './encoding';
import { ImportError } from './importError';
import type { Prefix } from './byteSource';
import { lineEndingOf, prefixLines, readPrefixTable, type PrefixTable } from './prefixTable';
import { decideUnit, type UnitDecision } from './temperatureUnit';
import type { DateOrder, DateOrderSource, ReadOptions } from './types';

/** Everything the first bytes of the file tell, before any row is read. */
export interface PrefixFindings {
  encoding: EncodingGuess;
  table: PrefixTable;
  roles: ColumnRoles;
  unit: UnitDecision;
  decimalComma: boolean;
  loggerHint: string | null;
  /** The timestamps of the sample rows as written. */
  sampleDates: WrittenDate[];
  /** Settled day/month order, or null when the rest of the file must be scanned for it. */
  dateOrder: { order: DateOrder; source: DateOrderSource } | null;
  /** Set when the order is still open: feed it every date of the file, then ask its verdict. */
  orderEvidence: DateOrderEvidence | null;
}

export function inspectPrefix(prefix: Prefix, options: ReadOptions): PrefixFindings {
  const encoding = guessEncoding(prefix.bytes, prefix.complete);
  const decoder = createDecoder(encoding.encoding);
  const text = decoder.write(prefix.bytes) + (prefix.complete ? decoder.end() : '');
  if (text.trim() === '') {
    throw new ImportError('empty', 'The file is empty. Pick the file the logger exported, with its readings.');
  }
  const lineEnding = lineEndingOf(text);
  const table = readPrefixTable(prefixLines(text, lineEnding, prefix.complete), lineEnding);
  const rows = table.dataRows.map((row) => row.fields);
  const roles = findColumnRoles(table.header, rows);
  const preambleTexts = table.preamble.map((row) => preambleText(row.fields));
  const unit = decideUnit({
    headerName: table.header?.[roles.temperatureColumn] ?? null,
    cells: rows.map((row) => row[roles.temperatureColumn] ?? ''),
    preamble: preambleTexts,
    option: options.unit,
  });
  const numberColumns = [roles.temperatureColumn, roles.humidityColumn].filter((j) => j !== null);
  const decimalComma = rows.some((row) => numberColumns.some((j) => hasDecimalComma(row[j] ?? '')));
  const loggerHint = preambleTexts.map(loggerHintInLine).find((hint) => hint !== null) ?? null;
  const sampleDates = writtenDates(roles, rows);

  let dateOrder: PrefixFindings['dateOrder'] = null;
  let orderEvidence: DateOrderEvidence | null = null;
  const stamp = roles.timestamp;
  if (stamp.kind === 'epoch' || stamp.style === 'year-first') {
    dateOrder = stamp.kind === 'epoch' ? null : { order: 'ymd', source: 'format' };
  } else if (options.dateOrder) {
    refuseUnfittingOrder(options.dateOrder, sampleDates);
    dateOrder = { order: options.dateOrder, source: 'option' };
  } else {
    const usual = usualSteps(sampleDates);
    const probe = new DateOrderEvidence(usual);
    sampleDates.forEach((written) => probe.add(written));
    if (probe.settledByValues() || prefix.complete) dateOrder = probe.verdict();
    else orderEvidence = new DateOrderEvidence(usual);
  }
  return { encoding, table, roles, unit, decimalComma, loggerHint, sampleDates, dateOrder, orderEvidence };
}

/** A preamble line as "key: value" text: in a delimited preamble ("Serial no.;40177") the delimiter is the colon. */
function preambleText(fields: string[]): string {
  const text = fields.length < 2 ? (fields[0] ?? '') : `${fields[0].replace(/\s*[:=]\s*$/, '')}: ${fields.slice(1).join(' ')}`;
  return text.replace(/\s+/g, ' ').trim();
}

/** The timestamp text of each row, as the date-order evidence takes it. */
export function writtenDates(roles: ColumnRoles, rows: string[][]): WrittenDate[] {
  const stamp = roles.timestamp;
  if (stamp.kind === 'epoch') return [];
  return rows.map((row) =>
    stamp.kind === 'datetime'
      ? { date: row[stamp.column] ?? '', time: null }
      : { date: row[stamp.dateColumn] ?? '', time: row[stamp.timeColumn] ?? '' },
  );
}

/** A date-order option that reads none of the sample dates is a mistake worth stopping on. */
function refuseUnfittingOrder(order: DateOrder, sample: WrittenDate[]): void {
  const fits = sample.some((written) => {
    const outcome =
      written.time === null
        ? readDateTime(written.date, 'year-last', order)
        : readDateAndTime(written.date, written.time, 'year-last', order);
    return typeof outcome !== 'string';
  });
  if (!fits && sample.length > 0) {
    throw new ImportError(
      'bad_option',
      `The date order ${order} does not fit dates such as "${sample[0].date.trim()}". ` +
        'Use --date-order dmy or --date-order mdy, or leave it out to let the reader tell.',
    );
  }
}
