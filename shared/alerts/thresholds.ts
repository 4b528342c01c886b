// Default thresholds and how a room's overrides and the nursery's settings combine.
import type { AlertThresholds, RoomThresholds } from '../schemas/alerts';

/**
 * Defaults. Hold 15 min, trend window 6 h, look-ahead 12 h, 6 h outside the band in 24 h, 26 h of silence and a
 * 12 h reminder come from the alerting brief. The rest are our own choices [DESIGN]:
 * - storageWarmMinutes 120: the storage limit guards against buds pushing over days and weeks (REFERENCES §2,
 *   J. Lehman 2008 and t/3784 [PRACT]); a door left open for a few minutes is not that, two hours of warmth is.
 * - exposureBudgetDegreeHours null: there is no published figure to start from, so the rule waits for the owner's.
 * - digestHour 7: before the morning round of the rooms.
 */
export const DEFAULT_THRESHOLDS: AlertThresholds = {
  holdMinutes: 15,
  freezeTrendHours: 6,
  freezeLookaheadHours: 12,
  outOfBandHours: 6,
  storageWarmMinutes: 120,
  silentHours: 26,
  exposureBudgetDegreeHours: null,
  reminderHours: 12,
  digestHour: 7,
};

/** Out of band counts the time outside the band in this trailing window. */
export const OUT_OF_BAND_WINDOW_HOURS = 24;

export interface ThresholdOverrides {
  nursery: Partial<AlertThresholds>;
  rooms: Map<number, Partial<RoomThresholds>>;
}

/** Only keys actually present override: an explicit null (budget off) is a value, a missing key is not. */
function overlay<T extends object>(base: T, over: Partial<T> | undefined): T {
  const result = { ...base };
  if (!over) return result;
  for (const [key, value] of Object.entries(over)) if (value !== undefined) (result as Record<string, unknown>)[key] = value;
  return result;
}

export function nurseryThresholds(overrides: ThresholdOverrides): AlertThresholds {
  return overlay(DEFAULT_THRESHOLDS, overrides.nursery);
}

/** The thresholds in force in one room (or the nursery's when the subject is in no room). */
export function thresholdsFor(overrides: ThresholdOverrides, roomId: number | null): AlertThresholds {
  const base = nurseryThresholds(overrides);
  return roomId === null ? base : overlay<AlertThresholds>(base, overrides.rooms.get(roomId));
}
