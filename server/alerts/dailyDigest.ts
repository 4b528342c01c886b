// Writes each nursery's digest once per local day, at or after the digest hour, for the people who asked for it.
import type { Pool } from 'mariadb';
import { UniqueConstraintError, type Sequelize } from 'sequelize';
import { nurseryThresholds } from '../../shared/alerts/thresholds';
import { Nursery } from '../nurseries/nursery.model';
import { AlertDigest } from './alertDigest.model';
import { loadDigestData } from './digestData';
import { localDayAndHour } from './localDay';
import { composeDigest } from './mail/digestMessage';
import { enqueueMessages } from './outboxWriter';
import { loadOverrides } from './settings.service';
import { loadAudience } from './subscriptions.service';

export interface DigestDeps {
  sequelize: Sequelize;
  pool: Pool;
  appOrigin: string;
}

/**
 * Late rather than never: a server that was down at the digest hour sends that day's digest when it comes back.
 * The (nursery, day) key is claimed in the transaction that writes the messages, so a second instance (or a second
 * tick) finds it taken and writes nothing. Answers how many messages were written.
 */
export async function queueDigestIfDue(deps: DigestDeps, nurseryId: number, now: Date): Promise<number> {
  const nursery = await Nursery.findByPk(nurseryId);
  if (!nursery) return 0;
  const { digestHour } = nurseryThresholds(await loadOverrides(nurseryId));
  const { day, hour } = localDayAndHour(now, nursery.timeZone);
  if (hour < digestHour || (await AlertDigest.findOne({ where: { nurseryId, localDate: day } }))) return 0;
  const readers = (await loadAudience(nurseryId)).filter((m) => m.levels.daily_digest === 'all');
  const data = readers.length ? await loadDigestData(deps.pool, nurseryId, now.getTime()) : null;
  try {
    return await deps.sequelize.transaction(async (transaction) => {
      await AlertDigest.create({ nurseryId, localDate: day, createdAt: now }, { transaction });
      const messages = readers.map(({ user }) => ({
        nurseryId, kind: 'digest' as const, userId: user.id, toAddress: user.email, alertIds: data!.alerts.map((a) => a.id),
        ...composeDigest(data!, {
          nurseryName: nursery.name, recipientName: user.name, reader: { unit: user.unit, timeZone: nursery.timeZone },
          appOrigin: deps.appOrigin, day,
        }),
      }));
      await enqueueMessages(transaction, messages, now, deps.appOrigin);
      return messages.length;
    });
  } catch (err) {
    if (err instanceof UniqueConstraintError) return 0;
    throw err;
  }
}
