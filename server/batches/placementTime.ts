import { DateTime } from 'luxon';
import { badRequest } from '../http/errors';
import { Nursery } from '../nurseries/nursery.model';

/** A little slack for a client clock slightly ahead of the server's. */
const CLOCK_SLACK_MS = 60_000;

/** Placements record what happened: never in the future. */
export function checkNotFuture(at: Date, now = Date.now()): void {
  if (at.getTime() > now + CLOCK_SLACK_MS) {
    throw badRequest('in_future', 'That time is in the future; record a move once it has happened.');
  }
}

/** Grafts go into a room on their grafting day (the nursery's calendar) or later, and not in the future. */
export async function checkPlacementTime(nurseryId: number, graftedOn: string, at: Date): Promise<void> {
  checkNotFuture(at);
  const nursery = await Nursery.findByPk(nurseryId);
  const localDay = DateTime.fromJSDate(at, { zone: nursery!.timeZone }).toISODate()!;
  if (localDay < graftedOn) {
    throw badRequest('before_grafting', `The batch cannot be in a room on ${localDay}, before it was grafted (${graftedOn}).`);
  }
}
