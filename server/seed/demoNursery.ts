import type { Pool } from 'mariadb';
import type { Sequelize } from 'sequelize';
import { hashPassword } from '../auth/password';
import { Logger } from '../loggers/logger.model';
import { LoggerPlacement } from '../loggers/loggerPlacement.model';
import { Nursery } from '../nurseries/nursery.model';
import { Room } from '../rooms/room.model';
import { User } from '../users/user.model';
import { DEMO_PASSWORD, DEMO_USERS } from './demoAccounts';
import { seedDemoBatches } from './demoBatches';
import { seedDemoSeasons } from './demoSeason';
import { topUpDemoReadings } from './demoReadings';
import { DEMO_LOGGERS, DEMO_NURSERY, DEMO_ROOMS, DEMO_SEASON_START } from './demoData';

/**
 * Seeds the invented demo nursery once: a restart finds its owner and leaves its records as they are, so changes made
 * while trying the demo survive; only the demo loggers' readings are brought up to now.
 */
export async function seedDemoNursery(sequelize: Sequelize, pool: Pool): Promise<void> {
  const owner = await User.findOne({ where: { email: DEMO_USERS[0].email } });
  const nurseryId = owner ? owner.nurseryId : await createDemoRecords(sequelize);
  await topUpDemoReadings(pool, nurseryId);
  if (!owner) await seedDemoBatches(sequelize, nurseryId);
}

async function createDemoRecords(sequelize: Sequelize): Promise<number> {
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const nurseryId = await sequelize.transaction(async (transaction) => {
    const nursery = await Nursery.create(DEMO_NURSERY, { transaction });
    for (const u of DEMO_USERS) await User.create({ ...u, nurseryId: nursery.id, passwordHash }, { transaction });
    const rooms = new Map<string, Room>();
    for (const r of DEMO_ROOMS) rooms.set(r.name, await Room.create({ ...r, nurseryId: nursery.id }, { transaction }));
    for (const l of DEMO_LOGGERS) {
      const logger = await Logger.create({ nurseryId: nursery.id, label: l.label, serial: l.serial, notes: l.notes }, { transaction });
      await LoggerPlacement.create({ loggerId: logger.id, roomId: rooms.get(l.room)!.id, placedFrom: DEMO_SEASON_START }, { transaction });
    }
    await seedDemoSeasons(nursery.id, DEMO_NURSERY.timeZone, rooms, transaction);
    return nursery.id;
  });
  console.log(`Seeded the demo nursery "${DEMO_NURSERY.name}".`);
  return nurseryId;
}
