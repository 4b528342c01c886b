// Who hears about what: a user's own level per topic, or their role's default.
import type { AlertRule, Severity } from '../../shared/alerts/rules';
import { SUBSCRIPTION_TOPICS, type SubscriptionLevel, type SubscriptionTopic } from '../../shared/schemas/alerts';
import type { Role } from '../../shared/schemas/common';

/** Owners and staff hear everything; viewers only freeze risk. Nobody gets the digest until they ask. */
export function defaultLevel(role: Role, topic: SubscriptionTopic): SubscriptionLevel {
  if (topic === 'daily_digest') return 'off';
  if (role === 'viewer') return topic === 'freeze_risk' ? 'all' : 'off';
  return 'all';
}

export type Levels = Record<SubscriptionTopic, SubscriptionLevel>;

export function levelsFor(role: Role, chosen: readonly { topic: string; level: SubscriptionLevel }[]): Levels {
  const levels = Object.fromEntries(SUBSCRIPTION_TOPICS.map((t) => [t, defaultLevel(role, t)])) as Levels;
  for (const row of chosen) if (row.topic in levels) levels[row.topic as SubscriptionTopic] = row.level;
  return levels;
}

/** Whether a level lets a finding of this severity through. */
export function admits(level: SubscriptionLevel, severity: Severity): boolean {
  return level === 'all' || (level === 'critical' && severity === 'critical');
}

export const admitsRule = (levels: Levels, rule: AlertRule, severity: Severity) => admits(levels[rule], severity);
