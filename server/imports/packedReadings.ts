import type { Reading } from '../../shared/import/types';

/**
 * A batch of readings as one Float64Array, four numbers per reading: time (epoch ms), °C, humidity or NaN, line. It
 * crosses from the reader thread by moving its buffer, and the import works on it as is: a million readings as
 * objects on the import's thread were a million short-lived allocations whose promoted garbage grew the server's
 * heap by tens of MB per large import (measured).
 */
export type PackedReadings = Float64Array;

export const STRIDE = 4;
export const T = 0;
export const C = 1;
export const RH = 2;
export const LINE = 3;

export const countOf = (packed: PackedReadings) => packed.length / STRIDE;

export function packReadings(readings: Reading[]): PackedReadings {
  const packed = new Float64Array(readings.length * STRIDE);
  let at = 0;
  for (const r of readings) {
    packed[at + T] = r.t;
    packed[at + C] = r.c;
    packed[at + RH] = r.rh ?? Number.NaN;
    packed[at + LINE] = r.line;
    at += STRIDE;
  }
  return packed;
}

export function unpackReadings(packed: PackedReadings): Reading[] {
  const readings: Reading[] = new Array(countOf(packed));
  for (let i = 0, at = 0; at < packed.length; i++, at += STRIDE) {
    const rh = packed[at + RH];
    readings[i] = { t: packed[at + T], c: packed[at + C], rh: Number.isNaN(rh) ? null : rh, line: packed[at + LINE] };
  }
  return readings;
}

/** The readings at the given indexes, in that order. */
export function pickReadings(packed: PackedReadings, indexes: readonly number[]): PackedReadings {
  const picked = new Float64Array(indexes.length * STRIDE);
  indexes.forEach((index, k) => picked.set(packed.subarray(index * STRIDE, index * STRIDE + STRIDE), k * STRIDE));
  return picked;
}
