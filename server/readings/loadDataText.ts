import { C, RH, STRIDE, T, countOf, type PackedReadings } from '../imports/packedReadings';

/**
 * The text LOAD DATA reads for new readings: one line per reading, `time<TAB>°C<TAB>humidity`, as
 * 'YYYY-MM-DD HH:MM:SS.mmm' UTC, °C to the 0.0001 the column keeps (DECIMAL(7,4)), humidity to 0.01 % or \N (NULL).
 * The logger and the import are the same on every line, so the statement sets them once.
 */
export const LOAD_READINGS =
  "LOAD DATA LOCAL INFILE ? INTO TABLE readings CHARACTER SET ascii FIELDS TERMINATED BY '\\t' (t, c, rh) SET logger_id = ?, import_id = ?";

const DAY_MS = 86_400_000;
/** The longest line: a 23-character instant, "-50.0000" and "100.00", two tabs and the line break. */
const MAX_LINE_BYTES = 23 + 1 + 8 + 1 + 6 + 1;
const TAB = 0x09;
const LF = 0x0a;
const ZERO = 0x30;

/**
 * Written byte by byte into one buffer: a million readings built as strings and then encoded cost the import's
 * thread about 0.7 s in string building, flattening and garbage (measured); this is a few tens of milliseconds.
 */
export function loadDataRows(readings: PackedReadings): Buffer {
  const out = Buffer.allocUnsafe(countOf(readings) * MAX_LINE_BYTES);
  let at = 0;
  for (let r = 0; r < readings.length; r += STRIDE) {
    at = writeInstant(out, at, readings[r + T]);
    out[at++] = TAB;
    at = writeScaled(out, at, Math.round(readings[r + C] * 10_000), 4);
    out[at++] = TAB;
    const rh = readings[r + RH];
    if (Number.isNaN(rh)) {
      out[at++] = 0x5c; // \
      out[at++] = 0x4e; // N
    } else {
      at = writeScaled(out, at, Math.round(rh * 100), 2);
    }
    out[at++] = LF;
  }
  return out.subarray(0, at);
}

/** The date part is the same for a whole day of readings, so it is formatted once per day. */
let cachedDay = Number.NaN;
const cachedDate = Buffer.alloc(10);

/** 'YYYY-MM-DD HH:MM:SS.mmm' (UTC) into `out` at `at`; answers where the next byte goes. */
export function writeInstant(out: Buffer, at: number, t: number): number {
  const day = Math.floor(t / DAY_MS) * DAY_MS;
  if (day !== cachedDay) {
    cachedDay = day;
    cachedDate.write(new Date(day).toISOString().slice(0, 10), 'ascii');
  }
  cachedDate.copy(out, at);
  at += 10;
  let rest = t - day;
  const hours = Math.floor(rest / 3_600_000);
  rest -= hours * 3_600_000;
  const minutes = Math.floor(rest / 60_000);
  rest -= minutes * 60_000;
  const seconds = Math.floor(rest / 1000);
  out[at++] = 0x20;
  at = writeDigits(out, at, hours, 2);
  out[at++] = 0x3a;
  at = writeDigits(out, at, minutes, 2);
  out[at++] = 0x3a;
  at = writeDigits(out, at, seconds, 2);
  out[at++] = 0x2e;
  return writeDigits(out, at, Math.round(rest - seconds * 1000), 3);
}

/** `value` / 10^decimals with exactly `decimals` decimals: 31400 with 4 → "3.1400", -5 with 4 → "-0.0005". */
function writeScaled(out: Buffer, at: number, value: number, decimals: number): number {
  if (value < 0) {
    out[at++] = 0x2d;
    value = -value;
  }
  const scale = 10 ** decimals;
  const whole = Math.floor(value / scale);
  let width = 1;
  for (let rest = whole; rest >= 10; rest = Math.floor(rest / 10)) width++;
  at = writeDigits(out, at, whole, width);
  out[at++] = 0x2e;
  return writeDigits(out, at, value - whole * scale, decimals);
}

/** A non-negative integer as exactly `width` digits (zero-padded). */
function writeDigits(out: Buffer, at: number, value: number, width: number): number {
  for (let i = width - 1; i >= 0; i--) {
    out[at + i] = ZERO + (value % 10);
    value = Math.floor(value / 10);
  }
  return at + width;
}
