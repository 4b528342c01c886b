import type { Sequelize } from 'sequelize';
import { hashPassword } from '../auth/password';
import { Logger } from '../loggers/logger.model';
import { LoggerPlacement } from '../loggers/loggerPlacement.model';
import { Nursery } from '../nurseries/nursery.model';
import { Room } from '../rooms/room.model';
import { User } from '../users/user.model';
import { DEMO_PASSWORD, DEMO_USERS } from './demoAccounts';
import { DEMO_LOGGERS, DEMO_NURSERY, DEMO_ROOMS, DEMO_SEASON_START } from './demoData';

/**
 * Seeds the invented demo nursery once: a restart finds its owner and leaves everything as it is,
 * so changes made while trying the demo survive.
 */
export async function seedDemoNursery(sequelize: Sequelize): Promise<void> {
  if (await User.findOne({ where: { email: DEMO_USERS[0].email } })) return;
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await sequelize.transaction(async (transaction) => {
    const nursery = await Nursery.create(DEMO_NURSERY, { transaction });
    for (const u of DEMO_USERS) await User.create({ ...u, nurseryId: nursery.id, passwordHash }, { transaction });
    const rooms = new Map<string, Room>();
    for (const r of DEMO_ROOMS) rooms.set(r.name, await Room.create({ ...r, nurseryId: nursery.id }, { transaction }));
    for (const l of DEMO_LOGGERS) {
      const logger = await Logger.create({ nurseryId: nursery.id, label: l.label, serial: l.serial, notes: l.notes }, { transaction });
      await LoggerPlacement.create({ loggerId: logger.id, roomId: rooms.get(l.room)!.id, placedFrom: DEMO_SEASON_START }, { transaction });
    }
  });
  console.log(`Seeded the demo nursery "${DEMO_NURSERY.name}".`);
}
