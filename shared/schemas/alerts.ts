import { z } from 'zod';
import { ALERT_RULES, SEVERITIES } from '../alerts/rules';

/** Thresholds a room may override; every one is also a nursery-wide setting. */
export const roomThresholdsShape = z.object({
  holdMinutes: z.number().int('Whole minutes').min(0).max(24 * 60),
  freezeTrendHours: z.number().min(1).max(48),
  freezeLookaheadHours: z.number().min(0).max(72),
  outOfBandHours: z.number().min(0).max(24),
  storageWarmMinutes: z.number().int('Whole minutes').min(0).max(7 * 24 * 60),
  silentHours: z.number().min(1).max(14 * 24),
  /** Null switches the budget rule off. */
  exposureBudgetDegreeHours: z.number().positive().max(1_000_000).nullable(),
  reminderHours: z.number().min(0.25).max(14 * 24),
});

export const nurseryThresholdsShape = roomThresholdsShape.extend({
  /** Hour of the day (nursery time) when the daily digest goes out. */
  digestHour: z.number().int().min(0).max(23),
});

export type RoomThresholds = z.infer<typeof roomThresholdsShape>;
export type AlertThresholds = z.infer<typeof nurseryThresholdsShape>;

/**
 * Stored settings are overrides: a key not stored falls back to the nursery's value, then to the default. A change
 * sets some keys and resets others to inherit again (null cannot mean "inherit": it switches the budget off).
 */
function overridesPatch<S extends z.ZodObject>(shape: S) {
  const keys = Object.keys(shape.shape) as [string, ...string[]];
  return z.object({ set: shape.partial().strict().default({}), reset: z.array(z.enum(keys)).default([]) }).strict();
}
export const nurseryThresholdsPatch = overridesPatch(nurseryThresholdsShape);
export const roomThresholdsPatch = overridesPatch(roomThresholdsShape);
export type ThresholdsPatch = z.input<typeof nurseryThresholdsPatch>;

export const ALERT_STATUSES = ['open', 'acknowledged', 'resolved'] as const;
export type AlertStatus = (typeof ALERT_STATUSES)[number];

export const alertListQuery = z.object({
  status: z.enum(ALERT_STATUSES).optional(),
  rule: z.enum(ALERT_RULES).optional(),
  severity: z.enum(SEVERITIES).optional(),
  roomId: z.coerce.number().int().positive().optional(),
  /** Alerts opened before this alert id, for paging back through history. */
  before: z.coerce.number().int().positive().optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
});
export type AlertListQuery = z.input<typeof alertListQuery>;

/** Per rule: every finding, only critical ones, or none. The digest takes `all` (on) or `off`. */
export const SUBSCRIPTION_LEVELS = ['all', 'critical', 'off'] as const;
export type SubscriptionLevel = (typeof SUBSCRIPTION_LEVELS)[number];
export const SUBSCRIPTION_TOPICS = [...ALERT_RULES, 'daily_digest'] as const;
export type SubscriptionTopic = (typeof SUBSCRIPTION_TOPICS)[number];

export const subscriptionsBody = z
  .object(Object.fromEntries(SUBSCRIPTION_TOPICS.map((t) => [t, z.enum(SUBSCRIPTION_LEVELS)])) as Record<SubscriptionTopic, z.ZodEnum<{ all: 'all'; critical: 'critical'; off: 'off' }>>)
  .partial()
  .strict()
  .refine((s) => s.daily_digest !== 'critical', { message: 'The daily digest is either on (all) or off', path: ['daily_digest'] });
