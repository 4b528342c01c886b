// Too warm for cold storage: a room's reading above the lowest storage limit of the cold-stored batches in it.
import { freshReadingAt } from './freshness';
import type { FindingDetail, LoggerSeries } from './types';

export interface StorageVerdict {
  holds: boolean;
  detail: FindingDetail;
}

/** The warmest fresh reading at t decides; null when no logger has a fresh reading. */
export function judgeStorageAt(loggers: readonly LoggerSeries[], t: number, limitC: number): StorageVerdict | null {
  let warmest: { c: number; t: number; label: string } | null = null;
  for (const series of loggers) {
    const reading = freshReadingAt(series.readings, t);
    if (reading && (!warmest || reading.c > warmest.c)) warmest = { ...reading, label: series.label };
  }
  if (!warmest) return null;
  return {
    holds: warmest.c > limitC,
    detail: { valueC: warmest.c, readingAt: warmest.t, loggerLabel: warmest.label, limitC },
  };
}
