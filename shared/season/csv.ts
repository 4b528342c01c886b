// A CSV writer after RFC 4180: CRLF between records, fields with a comma, quote, CR or LF quoted, quotes doubled.
// Written out (not csv-stringify) because it runs in the browser as well as the server, on arrays already in
// memory, and the rules fit in a few lines; tests read its output back with csv-parse.

export type CsvCell = string | number | null;

/** Spreadsheets run text that starts like a formula; a leading apostrophe keeps typed-in names as plain text. */
const FORMULA_START = /^[=+\-@\t\r]/;

function field(cell: CsvCell): string {
  if (cell === null) return '';
  const text = typeof cell === 'number' ? (Number.isFinite(cell) ? String(cell) : '') : FORMULA_START.test(cell) ? `'${cell}` : cell;
  return /[",\r\n]/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}

/** Header and rows as one CSV text; every record, the last included, ends with CRLF (RFC 4180 §2.1–2.2). */
export function toCsv(header: readonly string[], rows: readonly (readonly CsvCell[])[]): string {
  for (const row of rows) {
    if (row.length !== header.length) throw new Error(`a CSV row has ${row.length} fields where the header has ${header.length}`);
  }
  return [header, ...rows].map((record) => `${record.map(field).join(',')}\r\n`).join('');
}
