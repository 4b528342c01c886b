import type { Sequelize } from 'sequelize';
import { Nursery } from '../nurseries/nursery.model';
import { User } from '../users/user.model';
import { Invitation } from '../users/invitation.model';
import { Room } from '../rooms/room.model';
import { Logger } from '../loggers/logger.model';
import { LoggerPlacement } from '../loggers/loggerPlacement.model';
import { ApiToken } from '../tokens/apiToken.model';
import { Import } from '../imports/import.model';
import { ALERT_MODELS } from '../alerts/alertModels';
import { NurseryProfile } from '../profiles/nurseryProfile.model';
import { Batch } from '../batches/batch.model';
import { BatchPlacement } from '../batches/batchPlacement.model';
import { SEASON_MODELS } from '../season/seasonModels';

/** Binds every model to this Sequelize and declares the associations once. */
export function initModels(sequelize: Sequelize): void {
  for (const model of [Nursery, User, Invitation, ApiToken, Room, Logger, LoggerPlacement, Import]) model.initModel(sequelize);
  for (const model of ALERT_MODELS) model.initModel(sequelize);
  Logger.hasMany(LoggerPlacement, { foreignKey: 'loggerId', as: 'placements' });
  LoggerPlacement.belongsTo(Logger, { foreignKey: 'loggerId', as: 'logger' });
  LoggerPlacement.belongsTo(Room, { foreignKey: 'roomId', as: 'room' });
  Room.hasMany(LoggerPlacement, { foreignKey: 'roomId', as: 'loggerPlacements' });
  for (const model of [NurseryProfile, Batch, BatchPlacement]) model.initModel(sequelize);
  Batch.hasMany(BatchPlacement, { foreignKey: 'batchId', as: 'placements' });
  BatchPlacement.belongsTo(Batch, { foreignKey: 'batchId', as: 'batch' });
  for (const model of SEASON_MODELS) model.initModel(sequelize);
}
