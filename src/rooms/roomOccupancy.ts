import type { Logger, Placement } from '../loggers/queries';

export interface RoomStay {
  logger: Logger;
  placement: Placement;
}

/** Which loggers are in the room now and which were there before, newest first, from the loggers' placement histories. */
export function roomOccupancy(loggers: Logger[], roomId: number): { current: RoomStay[]; earlier: RoomStay[] } {
  const stays = loggers.flatMap((logger) => logger.placements.filter((p) => p.roomId === roomId).map((placement) => ({ logger, placement })));
  stays.sort((a, b) => b.placement.from.localeCompare(a.placement.from));
  return { current: stays.filter((s) => s.placement.to === null), earlier: stays.filter((s) => s.placement.to !== null) };
}
