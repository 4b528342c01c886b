// Seasons are grafting years: batches grafted from 1 July of year N−1 to 30 June of year N belong to season N.
// Grafting runs through winter, so a calendar year would cut one season's work in two; 1 July falls after
// planting out and before the next winter's grafting in the northern hemisphere.

const CALENDAR_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

/** The season of a grafting date given as an ISO 8601 calendar date (YYYY-MM-DD, the nursery's local date). */
export function seasonOf(graftedOn: string): number {
  const match = CALENDAR_DATE.exec(graftedOn);
  if (!match) throw new Error(`seasonOf needs a YYYY-MM-DD date (got "${graftedOn}")`);
  const year = Number(match[1]);
  const month = Number(match[2]);
  return month >= 7 ? year + 1 : year;
}

/** First and last grafting dates of season N, inclusive. */
export function seasonDates(season: number): { from: string; to: string } {
  if (!Number.isInteger(season) || season < 1001 || season > 9999) throw new Error(`season must be a four-digit year (got ${season})`);
  return { from: `${season - 1}-07-01`, to: `${season}-06-30` };
}

/** A season's name as people say it: "2025–26" for season 2026. */
export function seasonLabel(season: number): string {
  return `${season - 1}–${String(season).slice(-2)}`;
}
