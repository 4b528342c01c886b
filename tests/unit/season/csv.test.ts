import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { toCsv } from '../../../shared/season/csv';

// RFC 4180 §2: records end with CRLF; fields holding comma, double quote, CR or LF are enclosed in double
// quotes, and a double quote inside is written twice. Output is read back with csv-parse in strict mode.
describe('toCsv (RFC 4180)', () => {
  const header = ['Batch', 'Note', 'Count'];
  const rows = [
    ['A-1', 'plain', 12],
    ['A-2', 'comma, inside', 0],
    ['A-3', 'say "when"', 3.5],
    ['A-4', 'two\r\nlines', null],
    ['A-5', 'lone\nLF and lone\rCR', -2],
  ];

  it('ends every record with CRLF and quotes only where needed', () => {
    const text = toCsv(header, rows);
    expect(text.startsWith('Batch,Note,Count\r\nA-1,plain,12\r\nA-2,"comma, inside",0\r\nA-3,"say ""when""",3.5\r\n')).toBe(true);
    expect(text.endsWith('\r\n')).toBe(true);
  });

  it('reads back field for field with csv-parse (strict quoting, CRLF records)', () => {
    const parsed = parse(toCsv(header, rows), { record_delimiter: '\r\n', relax_quotes: false, relax_column_count: false }) as string[][];
    expect(parsed).toEqual([header, ...rows.map((r) => r.map((cell) => (cell === null ? '' : String(cell))))]);
  });

  it('keeps typed-in text that starts like a formula as text', () => {
    const parsed = parse(toCsv(['Cultivar'], [['=HYPERLINK("x")'], ['@home'], ['+1'], ['-']]), { record_delimiter: '\r\n' }) as string[][];
    expect(parsed.slice(1).flat()).toEqual(['\'=HYPERLINK("x")', '\'@home', '\'+1', '\'-']);
  });

  it('writes numbers as numbers, including negatives, and leaves non-finite ones empty', () => {
    expect(toCsv(['v'], [[-2.5], [Number.NaN]])).toBe('v\r\n-2.5\r\n\r\n');
  });

  it('refuses rows that do not match the header', () => {
    expect(() => toCsv(['a', 'b'], [['only one']])).toThrow(/1 fields where the header has 2/);
  });
});
