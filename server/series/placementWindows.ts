import { Op } from 'sequelize';
import { Logger } from '../loggers/logger.model';
import { LoggerPlacement } from '../loggers/loggerPlacement.model';

/** A closed stretch [from, to] in epoch ms. */
export interface Closed {
  from: number;
  to: number;
}

export interface LoggerInRoom {
  loggerId: number;
  label: string;
  /** When the logger was in the room within the asked range, in time order; loggers move between rooms. */
  windows: Closed[];
}

/**
 * The loggers that were in the room at some time in [from, to], each with its stays clipped to the range. A stay
 * ends the instant the next begins (placedTo is exclusive), so its last included millisecond is placedTo − 1.
 */
export async function loggersInRoom(roomId: number, from: number, to: number): Promise<LoggerInRoom[]> {
  const placements = await LoggerPlacement.findAll({
    where: { roomId, placedFrom: { [Op.lte]: new Date(to) }, [Op.or]: [{ placedTo: null }, { placedTo: { [Op.gt]: new Date(from) } }] },
    include: [{ model: Logger, as: 'logger', attributes: ['id', 'label'] }],
    order: [['placedFrom', 'ASC']],
  });
  const byLogger = new Map<number, LoggerInRoom>();
  for (const p of placements) {
    const label = (p as LoggerPlacement & { logger: Logger }).logger.label;
    const entry = byLogger.get(p.loggerId) ?? { loggerId: p.loggerId, label, windows: [] };
    entry.windows.push({ from: Math.max(from, p.placedFrom.getTime()), to: Math.min(to, (p.placedTo?.getTime() ?? Infinity) - 1) });
    byLogger.set(p.loggerId, entry);
  }
  return [...byLogger.values()].sort((a, b) => a.label.localeCompare(b.label));
}
