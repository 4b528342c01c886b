import type { z } from 'zod';
import type { subscriptionsBody } from '../../shared/schemas/alerts';
import { SUBSCRIPTION_TOPICS, type SubscriptionTopic } from '../../shared/schemas/alerts';
import { forbidden } from '../http/errors';
import type { AuthContext } from '../http/route';
import { User } from '../users/user.model';
import { AlertSubscription } from './alertSubscription.model';
import { defaultLevel, levelsFor, type Levels } from './subscriptionLevels';

export interface Audience {
  user: User;
  levels: Levels;
}

/** Everyone in the nursery with their levels, for deciding who a message goes to. */
export async function loadAudience(nurseryId: number): Promise<Audience[]> {
  const users = await User.findAll({ where: { nurseryId }, order: [['id', 'ASC']] });
  const rows = users.length ? await AlertSubscription.findAll({ where: { userId: users.map((u) => u.id) } }) : [];
  return users.map((user) => ({ user, levels: levelsFor(user.role, rows.filter((r) => r.userId === user.id)) }));
}

function signedInUser(auth: AuthContext): number {
  // API tokens act for the nursery, not for a person, so they have no subscriptions of their own.
  if (auth.userId === null) throw forbidden('Subscriptions belong to a signed-in person, not to an API token.');
  return auth.userId;
}

export async function getMySubscriptions(auth: AuthContext) {
  const userId = signedInUser(auth);
  const rows = await AlertSubscription.findAll({ where: { userId } });
  const levels = levelsFor(auth.role, rows);
  const defaults = Object.fromEntries(SUBSCRIPTION_TOPICS.map((t) => [t, defaultLevel(auth.role, t)])) as Levels;
  return { levels, defaults };
}

export async function patchMySubscriptions(auth: AuthContext, body: z.output<typeof subscriptionsBody>) {
  const userId = signedInUser(auth);
  for (const [topic, level] of Object.entries(body) as [SubscriptionTopic, Levels[SubscriptionTopic]][]) {
    await AlertSubscription.upsert({ userId, topic, level });
  }
  return getMySubscriptions(auth);
}
