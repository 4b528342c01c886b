/**
 * The one error a logger file can stop on. Everything that affects a single row is a rejection
 * (see ReadSummary.rejectedLines); an ImportError means the file as a whole cannot be read as asked.
 * Every message says what to do next, so callers can show it as is.
 */
export type ImportErrorCode =
  | 'unreadable' // the byte source itself failed (missing file, permission, aborted upload)
  | 'binary' // not text: a spreadsheet workbook, an image, random bytes
  | 'empty' // no bytes, or only blank lines
  | 'no_data' // a header or preamble but not one data row
  | 'no_delimiter' // no comma, semicolon or tab separates the columns consistently
  | 'no_timestamp' // no column holds dates/times we can read
  | 'no_temperature' // no column can be told to be the temperature
  | 'unit_unknown' // the temperature unit is written nowhere: ask for --unit
  | 'mixed_units' // one column carries both °C and °F
  | 'date_order_ambiguous' // day/month order cannot be told: ask for --date-order
  | 'line_too_long' // a line longer than maxLineBytes (usually a file that is not line-based)
  | 'malformed_csv' // broken quoting that the CSV parser cannot get past
  | 'nothing_readable' // rows exist but every one was rejected
  | 'bad_option'; // an option value the reader cannot use (time zone, unit, date order)

export class ImportError extends Error {
  readonly code: ImportErrorCode;

  constructor(code: ImportErrorCode, message: string, options?: { cause?: unknown }) {
    super(message, options);
    this.name = 'ImportError';
    this.code = code;
  }
}

export function isImportError(value: unknown): value is ImportError {
  return value instanceof ImportError;
}
