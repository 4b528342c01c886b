import type { Sequelize, Transaction } from 'sequelize';
import { z } from 'zod';
import { loggerBody, loggerPatch } from '../../shared/schemas/loggers';
import { conflict, notFound } from '../http/errors';
import { findRoom } from '../rooms/rooms.service';
import { Logger } from './logger.model';
import { LoggerPlacement } from './loggerPlacement.model';

function present(logger: Logger, placements: LoggerPlacement[]) {
  const current = placements.find((p) => p.placedTo === null) ?? null;
  return {
    id: logger.id,
    label: logger.label,
    serial: logger.serial,
    notes: logger.notes,
    roomId: current?.roomId ?? null,
    placements: placements.map((p) => ({ id: p.id, roomId: p.roomId, from: p.placedFrom, to: p.placedTo })),
  };
}

/** Clocks on phones drift; a move stamped a few minutes ahead is still "now". */
const FUTURE_SLACK_MS = 5 * 60_000;

export async function listLoggers(nurseryId: number) {
  const loggers = await Logger.findAll({
    where: { nurseryId },
    include: [{ model: LoggerPlacement, as: 'placements' }],
    order: [['label', 'ASC'], [{ model: LoggerPlacement, as: 'placements' }, 'placedFrom', 'ASC']],
  });
  return loggers.map((l) => present(l, (l as Logger & { placements: LoggerPlacement[] }).placements));
}

export async function findLogger(nurseryId: number, id: number) {
  const logger = await Logger.findOne({ where: { id, nurseryId } });
  if (!logger) throw notFound('That logger');
  return logger;
}

export async function getLogger(nurseryId: number, id: number) {
  const logger = await findLogger(nurseryId, id);
  const placements = await LoggerPlacement.findAll({ where: { loggerId: id }, order: [['placedFrom', 'ASC']] });
  return present(logger, placements);
}

export async function createLogger(sequelize: Sequelize, nurseryId: number, input: z.output<typeof loggerBody>) {
  const { roomId, ...fields } = input;
  if (roomId) await findRoom(nurseryId, roomId);
  const logger = await sequelize.transaction(async (transaction) => {
    const created = await Logger.create({ nurseryId, ...fields }, { transaction });
    if (roomId) await LoggerPlacement.create({ loggerId: created.id, roomId, placedFrom: new Date() }, { transaction });
    return created;
  });
  return getLogger(nurseryId, logger.id);
}

export async function updateLogger(nurseryId: number, id: number, patch: z.output<typeof loggerPatch>) {
  const logger = await findLogger(nurseryId, id);
  await logger.update(patch);
  return getLogger(nurseryId, id);
}

/**
 * Closes the open placement at `at` and opens the next one there, so placements never overlap. The open placement is
 * locked for the transaction, so two moves at once cannot both close it.
 */
export async function moveLogger(sequelize: Sequelize, nurseryId: number, id: number, roomId: number | null, at = new Date()) {
  await findLogger(nurseryId, id);
  if (roomId !== null) await findRoom(nurseryId, roomId);
  // A placement records where the logger was; a move planned for later would make "where it is now" wrong until then.
  if (at.getTime() > Date.now() + FUTURE_SLACK_MS) throw conflict('move_in_future', 'A move cannot be dated in the future; record it when it happens.');
  await sequelize.transaction(async (transaction: Transaction) => {
    // Lock the logger row first, so two moves at once queue up instead of deadlocking on the placement rows.
    await Logger.findOne({ where: { id, nurseryId }, lock: transaction.LOCK.UPDATE, transaction });
    const latest = await LoggerPlacement.findOne({
      where: { loggerId: id },
      order: [['placedFrom', 'DESC']],
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    const lastStart = latest?.placedFrom.getTime() ?? -Infinity;
    const lastEnd = latest?.placedTo?.getTime() ?? null;
    if (at.getTime() <= lastStart || (lastEnd !== null && at.getTime() < lastEnd)) {
      throw conflict('move_before_last', 'A move must come after the logger\'s last placement began (and ended).');
    }
    if (latest && latest.placedTo === null) {
      if (latest.roomId === roomId) throw conflict('already_there', 'The logger is already in that room.');
      await latest.update({ placedTo: at }, { transaction });
    }
    if (roomId !== null) await LoggerPlacement.create({ loggerId: id, roomId, placedFrom: at }, { transaction });
  });
  return getLogger(nurseryId, id);
}
