// Small builders for rule tests: a room, a batch and readings on a 10-minute logger clock.
import type { BatchFacts, BatchSnapshot, LoggerSeries, NurserySnapshot, RoomSnapshot } from '../../../shared/alerts/types';
import type { Reading } from '../../../shared/exposure/types';

export const MIN = 60_000;
export const HOUR = 60 * MIN;
export const T0 = Date.UTC(2027, 0, 14, 18);

/** Readings every `stepMin` minutes from `from` to `to` (inclusive), temperature from `c(t)`. */
export function sampled(from: number, to: number, c: (t: number) => number, stepMin = 10): Reading[] {
  const out: Reading[] = [];
  for (let t = from; t <= to; t += stepMin * MIN) out.push({ t, c: c(t) });
  return out;
}

export const apple: BatchFacts = {
  batchId: 11, code: '27-APL-001', speciesName: 'Apple', count: 240,
  band: { minC: 0, maxC: 7.222 }, freezeC: -2, storageMaxC: 10,
};
export const walnut: BatchFacts = {
  batchId: 12, code: '27-WAL-001', speciesName: 'Walnut', count: 60,
  band: { minC: 23.9, maxC: 29 }, freezeC: -2, storageMaxC: null,
};

export function room(readings: Reading[], batches: BatchFacts[] = [apple], extra: LoggerSeries[] = []): RoomSnapshot {
  return { roomId: 1, name: 'Test garage', loggers: [{ loggerId: 1, label: 'G-1', readings }, ...extra], batches };
}

export function batchIn(readings: Reading[], facts: BatchFacts = apple, from = readings[0]?.t ?? T0): BatchSnapshot {
  return { ...facts, roomId: 1, stays: [{ roomId: 1, from, to: null, loggers: [{ loggerId: 1, readings, from, to: null }] }] };
}

export function nursery(r: RoomSnapshot, batches: BatchSnapshot[] = []): NurserySnapshot {
  return { nurseryId: 1, rooms: [r], batches, loggers: [] };
}
