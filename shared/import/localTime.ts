import { IANAZone } from 'luxon';
import { ImportError } from './importError';

/**
 * Turns wall-clock times written without an offset into UTC, for one zone. Zone rules come from the
 * IANA tz database as Node's ICU ships it, read through luxon. Offsets are looked up once per local day
 * (a day with no change nearby has one offset throughout) and each change is pinned down once, so a
 * million rows cost a few thousand look-ups.
 */
export interface LocalTimeResolver {
  /** "Europe/Berlin" or "+01:00". */
  readonly zoneName: string;
  /**
   * UTC ms for a local time, or the reason it has none. `previousUtc` is the time of the row before
   * it in the file: at the autumn change the repeated hour is told apart by the order of the readings.
   */
  toUtc(localMs: number, previousUtc: number | null): number | string;
}

const MINUTE = 60_000;
const DAY = 86_400_000;

export function createLocalTimeResolver(zone: string, order: 'ascending' | 'descending'): LocalTimeResolver {
  const fixed = parseFixedOffset(zone);
  if (fixed !== null) {
    return { zoneName: offsetName(fixed), toUtc: (localMs) => localMs - fixed * MINUTE };
  }
  if (!IANAZone.isValidZone(zone)) {
    throw new ImportError(
      'bad_option',
      `"${zone}" is not a time zone. Give an IANA zone name such as Europe/Berlin or America/New_York, or an offset such as +01:00.`,
    );
  }
  return new IanaResolver(IANAZone.create(zone), order);
}

/** "+01:00", "-0530", "+1", "UTC", "Z", "UTC+01:00" → minutes east of UTC; null when it is not an offset. */
function parseFixedOffset(text: string): number | null {
  const trimmed = text.trim();
  if (/^(?:z|utc|gmt)$/i.test(trimmed)) return 0;
  const match = /^(?:utc|gmt)?\s*([+-])(\d{1,2})(?::?(\d{2}))?$/i.exec(trimmed);
  if (!match) return null;
  const minutes = Number(match[2]) * 60 + Number(match[3] ?? '0');
  if (minutes > 14 * 60 || Number(match[3] ?? '0') > 59) return null;
  return (match[1] === '-' ? -1 : 1) * minutes;
}

/** 60 → "+01:00", -330 → "-05:30", 0 → "UTC". */
function offsetName(minutes: number): string {
  if (minutes === 0) return 'UTC';
  const size = Math.abs(minutes);
  const two = (n: number) => String(n).padStart(2, '0');
  return `${minutes < 0 ? '-' : '+'}${two(Math.floor(size / 60))}:${two(size % 60)}`;
}

/** One change of offset: before it (UTC ms < at) the zone is `before` minutes east of UTC, from it on `after`. */
interface OffsetChange {
  at: number;
  before: number;
  after: number;
}

class IanaResolver implements LocalTimeResolver {
  readonly zoneName: string;
  private readonly zone: IANAZone;
  private readonly descending: boolean;
  private cachedDay = Number.NaN;
  /** Offset in minutes for every time of the cached local day, or NaN when a change falls near it. */
  private cachedDayOffset = Number.NaN;
  /** The change near the cached day, when there is one. */
  private change: OffsetChange | null = null;
  /** Offsets at UTC midnights, each asked of the zone once (a day's check shares them with its neighbours). */
  private readonly midnightOffsets = new Map<number, number>();

  constructor(zone: IANAZone, order: 'ascending' | 'descending') {
    this.zone = zone;
    this.zoneName = zone.name;
    this.descending = order === 'descending';
  }

  toUtc(localMs: number, previousUtc: number | null): number | string {
    const day = Math.floor(localMs / DAY);
    if (day !== this.cachedDay) {
      this.cachedDay = day;
      this.cachedDayOffset = this.steadyOffset(day);
      if (Number.isNaN(this.cachedDayOffset)) this.change = this.findChange(day);
    }
    if (!Number.isNaN(this.cachedDayOffset)) return localMs - this.cachedDayOffset * MINUTE;
    return this.nearChange(localMs, previousUtc, this.change as OffsetChange);
  }

  /**
   * The offset of a local day when the zone keeps one offset from a day before it to two days after
   * (a local day lies within that span of UTC whatever the offset).
   */
  private steadyOffset(day: number): number {
    const before = this.offsetAtMidnight(day - 1);
    const after = this.offsetAtMidnight(day + 2);
    return before === after ? before : Number.NaN;
  }

  private offsetAtMidnight(day: number): number {
    let offset = this.midnightOffsets.get(day);
    if (offset === undefined) {
      offset = this.offsetAt(day * DAY);
      this.midnightOffsets.set(day, offset);
    }
    return offset;
  }

  /**
   * Finds the instant of the change in that three-day span by bisection to the millisecond (about 28
   * look-ups per change); zones change at most once in three days. After that, every local time near the
   * change is resolved by arithmetic.
   */
  private findChange(day: number): OffsetChange {
    if (this.change && this.change.at > (day - 1) * DAY && this.change.at <= (day + 2) * DAY) return this.change;
    let low = (day - 1) * DAY;
    let high = (day + 2) * DAY;
    const before = this.offsetAtMidnight(day - 1);
    const after = this.offsetAtMidnight(day + 2);
    while (high - low > 1) {
      const middle = Math.floor((low + high) / 2);
      if (this.offsetAt(middle) === before) low = middle;
      else high = middle;
    }
    return { at: high, before, after };
  }

  /** Resolves a local time near a change: none in the spring gap, two in the repeated autumn hour. */
  private nearChange(localMs: number, previousUtc: number | null, change: OffsetChange): number | string {
    const asBefore = localMs - change.before * MINUTE;
    const asAfter = localMs - change.after * MINUTE;
    const validBefore = asBefore < change.at;
    const validAfter = asAfter >= change.at;
    if (!validBefore && !validAfter) {
      return `local time ${formatLocal(localMs)} does not exist in ${this.zoneName} (the clocks went forward then)`;
    }
    if (!validBefore || !validAfter) return validBefore ? asBefore : asAfter;
    // The hour repeated when the clocks go back: take the reading that keeps the file in its order.
    const earlier = Math.min(asBefore, asAfter);
    const later = Math.max(asBefore, asAfter);
    if (previousUtc === null) return this.descending ? later : earlier;
    // The same local time again right after itself means the clocks went back in between.
    if (this.descending) return later < previousUtc ? later : earlier;
    return earlier > previousUtc ? earlier : later;
  }

  private offsetAt(utcMs: number): number {
    return this.zone.offset(utcMs);
  }
}

function formatLocal(localMs: number): string {
  return new Date(localMs).toISOString().slice(0, 16).replace('T', ' ');
}
