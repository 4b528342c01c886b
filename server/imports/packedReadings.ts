import type { Reading } from '../../shared/import/types';

/**
 * A batch of readings as one Float64Array (time, °C, humidity or NaN, line — four numbers per reading), so it crosses
 * from the reader thread by moving its buffer instead of copying thousands of small objects.
 */
export function packReadings(readings: Reading[]): Float64Array {
  const packed = new Float64Array(readings.length * 4);
  let at = 0;
  for (const r of readings) {
    packed[at] = r.t;
    packed[at + 1] = r.c;
    packed[at + 2] = r.rh ?? Number.NaN;
    packed[at + 3] = r.line;
    at += 4;
  }
  return packed;
}

export function unpackReadings(packed: Float64Array): Reading[] {
  const readings: Reading[] = new Array(packed.length / 4);
  for (let i = 0, at = 0; at < packed.length; i++, at += 4) {
    const rh = packed[at + 2];
    readings[i] = { t: packed[at], c: packed[at + 1], rh: Number.isNaN(rh) ? null : rh, line: packed[at + 3] };
  }
  return readings;
}
