import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { readBytes } from './readText';

/**
 * Property: a series written in any supported shape reads back as written — times exact to the
 * second or millisecond written, temperatures to the written precision, line numbers physical.
 */

type DateShape = 'iso-offset' | 'iso-basic' | 'iso-z-ms' | 'ymd-space' | 'dmy-dot' | 'mdy-12h' | 'date+time' | 'epoch-s' | 'epoch-ms';
type Encoding = 'utf-8' | 'utf-8-bom' | 'windows-1252' | 'utf-16le';

interface Shape {
  delimiter: ',' | ';' | '\t';
  decimalComma: boolean;
  dateShape: DateShape;
  unit: 'C' | 'F';
  header: boolean;
  humidity: boolean;
  preamble: string[];
  encoding: Encoding;
  crlf: boolean;
  offsetMinutes: number;
  chunkSize: number;
}

// Free of delimiters: above a header-less table, a preamble line that splits like a row reads as its header.
const PREAMBLE_LINES = ['# Coldknit test rig', 'Logger: K-01', 'Room: Callus room', 'Bench probe export - unit 4', 'Brackenfold Nursery'];

const shapeArb: fc.Arbitrary<Shape> = fc.record({
  delimiter: fc.constantFrom(',' as const, ';' as const, '\t' as const),
  decimalComma: fc.boolean(),
  dateShape: fc.constantFrom<DateShape>('iso-offset', 'iso-basic', 'iso-z-ms', 'ymd-space', 'dmy-dot', 'mdy-12h', 'date+time', 'epoch-s', 'epoch-ms'),
  unit: fc.constantFrom('C' as const, 'F' as const),
  header: fc.boolean(),
  humidity: fc.boolean(),
  preamble: fc.subarray(PREAMBLE_LINES),
  encoding: fc.constantFrom<Encoding>('utf-8', 'utf-8-bom', 'windows-1252', 'utf-16le'),
  crlf: fc.boolean(),
  offsetMinutes: fc.constantFrom(-300, -210, 0, 60, 120, 330),
  chunkSize: fc.integer({ min: 1, max: 5000 }),
});

interface Row {
  t: number;
  /** Temperature in the file's unit, in tenths (written with one decimal). */
  tenths: number;
  rh: number;
}

const seriesArb = fc
  .record({
    start: fc.integer({ min: Date.UTC(2001, 0, 1) / 1000, max: Date.UTC(2090, 0, 1) / 1000 }),
    steps: fc.array(fc.integer({ min: 1, max: 90 * 60 }), { minLength: 1, maxLength: 40 }),
    millis: fc.integer({ min: 0, max: 999 }),
  })
  .chain(({ start, steps, millis }) =>
    fc.tuple(
      fc.constant(steps.reduce((times, step) => [...times, times[times.length - 1] + step * 1000], [start * 1000 + millis])),
      fc.array(fc.record({ tenths: fc.integer({ min: -300, max: 400 }), rh: fc.integer({ min: 0, max: 100 }) }), {
        minLength: steps.length + 1,
        maxLength: steps.length + 1,
      }),
    ),
  )
  .map(([times, values]) => times.map((t, i): Row => ({ t, tenths: values[i].tenths, rh: values[i].rh })));

const two = (n: number) => String(n).padStart(2, '0');

/** Wall-clock fields of an instant seen at a fixed offset. */
function wall(t: number, offsetMinutes: number) {
  const d = new Date(t + offsetMinutes * 60_000);
  return {
    y: d.getUTCFullYear(),
    mo: d.getUTCMonth() + 1,
    d: d.getUTCDate(),
    h: d.getUTCHours(),
    mi: d.getUTCMinutes(),
    s: d.getUTCSeconds(),
    ms: d.getUTCMilliseconds(),
  };
}

function offsetText(minutes: number): string {
  const size = Math.abs(minutes);
  return `${minutes < 0 ? '-' : '+'}${two(Math.floor(size / 60))}:${two(size % 60)}`;
}

/** The timestamp cells of a row, and what the reader should make of them (ms precision kept or not). */
function timeCells(t: number, shape: Shape): { cells: string[]; expected: number } {
  const seconds = Math.floor(t / 1000) * 1000;
  const w = wall(seconds, shape.offsetMinutes);
  const time = `${two(w.h)}:${two(w.mi)}:${two(w.s)}`;
  switch (shape.dateShape) {
    case 'iso-offset':
      return { cells: [`${w.y}-${two(w.mo)}-${two(w.d)}T${time}${offsetText(shape.offsetMinutes)}`], expected: seconds };
    case 'iso-basic':
      return { cells: [`${w.y}${two(w.mo)}${two(w.d)}T${two(w.h)}${two(w.mi)}${two(w.s)}${offsetText(shape.offsetMinutes).replace(':', '')}`], expected: seconds };
    case 'iso-z-ms':
      return { cells: [new Date(t).toISOString()], expected: t };
    case 'ymd-space':
      return { cells: [`${w.y}-${two(w.mo)}-${two(w.d)} ${time}`], expected: seconds };
    case 'dmy-dot':
      return { cells: [`${two(w.d)}.${two(w.mo)}.${w.y} ${time}`], expected: seconds };
    case 'mdy-12h': {
      const hour = w.h % 12 === 0 ? 12 : w.h % 12;
      return { cells: [`${w.mo}/${w.d}/${w.y} ${hour}:${two(w.mi)}:${two(w.s)} ${w.h < 12 ? 'AM' : 'PM'}`], expected: seconds };
    }
    case 'date+time':
      return { cells: [`${w.y}-${two(w.mo)}-${two(w.d)}`, time], expected: seconds };
    case 'epoch-s':
      return { cells: [String(seconds / 1000)], expected: seconds };
    case 'epoch-ms':
      return { cells: [String(t)], expected: t };
  }
}

function numberCell(tenths: number, shape: Shape): string {
  const text = (tenths / 10).toFixed(1);
  if (!shape.decimalComma) return text;
  const comma = text.replace('.', ',');
  // RFC 4180 §2.6: a field holding the delimiter is quoted.
  return shape.delimiter === ',' ? `"${comma}"` : comma;
}

function writeFile(rows: Row[], shape: Shape): { bytes: Uint8Array; expected: { t: number; c: number; rh: number | null; line: number }[] } {
  const withHumidity = shape.humidity && shape.header;
  const lines = [...shape.preamble];
  if (shape.header) {
    const timeNames = shape.dateShape === 'date+time' ? ['Date', 'Time'] : ['Timestamp'];
    lines.push([...timeNames, `Temperature (°${shape.unit})`, ...(withHumidity ? ['RH (%)'] : [])].join(shape.delimiter));
  }
  const expected = rows.map((row, i) => {
    const { cells, expected: t } = timeCells(row.t, shape);
    lines.push([...cells, numberCell(row.tenths, shape), ...(withHumidity ? [String(row.rh)] : [])].join(shape.delimiter));
    const written = row.tenths / 10;
    return {
      t,
      c: shape.unit === 'F' ? (written - 32) / 1.8 : written,
      rh: withHumidity ? row.rh : null,
      line: shape.preamble.length + (shape.header ? 1 : 0) + i + 1,
    };
  });
  const text = lines.join(shape.crlf ? '\r\n' : '\n') + (shape.crlf ? '\r\n' : '\n');
  const bytes =
    shape.encoding === 'windows-1252'
      ? Buffer.from(text, 'latin1')
      : shape.encoding === 'utf-16le'
        ? Buffer.from(`\uFEFF${text}`, 'utf16le')
        : Buffer.from(shape.encoding === 'utf-8-bom' ? `\uFEFF${text}` : text, 'utf8');
  return { bytes: Uint8Array.from(bytes), expected };
}

describe('round trip: write a series in a random supported shape, read it back equal', () => {
  it('holds for every shape', async () => {
    await fc.assert(
      fc.asyncProperty(seriesArb, shapeArb, async (rows, shape) => {
        // In °F the written tenths must stay inside the plausible range once converted.
        fc.pre(shape.unit === 'C' || rows.every((row) => row.tenths / 10 >= -58 && row.tenths / 10 <= 158));
        const { bytes, expected } = writeFile(rows, shape);
        const fixedZone = shape.dateShape === 'iso-offset' || shape.dateShape === 'iso-basic' || shape.dateShape.startsWith('epoch') ? undefined : offsetText(shape.offsetMinutes);
        const { summary, readings } = await readBytes(
          bytes,
          {
            tz: fixedZone,
            unit: shape.header ? undefined : shape.unit,
            dateOrder: shape.dateShape === 'dmy-dot' ? 'dmy' : shape.dateShape === 'mdy-12h' ? 'mdy' : undefined,
          },
          shape.chunkSize,
        );
        expect(summary.rows).toEqual({ total: rows.length, accepted: rows.length, rejected: 0, duplicates: 0, conflicts: 0 });
        expect(summary.detected.delimiter).toBe(shape.delimiter);
        expect(summary.detected.preambleLines).toBe(shape.preamble.length);
        expect(summary.detected.hasHeader).toBe(shape.header);
        expect(readings.map((r) => [r.t, r.rh, r.line])).toEqual(expected.map((e) => [e.t, e.rh, e.line]));
        readings.forEach((reading, i) => expect(reading.c).toBeCloseTo(expected[i].c, 9));
      }),
      { numRuns: 300 },
    );
  }, 120_000);
});
