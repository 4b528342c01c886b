import { IANAZone } from 'luxon';
import { ImportError } from './importError';

/**
 * Turns wall-clock times written without an offset into UTC, for one zone. Zone rules come from the
 * IANA tz database as Node's ICU ships it, read through luxon. Offsets are looked up once per local day
 * (a day with no change nearby has one offset throughout), so a million rows cost a few thousand look-ups.
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
const HOUR = 3_600_000;
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
export function parseFixedOffset(text: string): number | null {
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

class IanaResolver implements LocalTimeResolver {
  readonly zoneName: string;
  private readonly zone: IANAZone;
  private readonly descending: boolean;
  private cachedDay = Number.NaN;
  /** Offset in minutes for every time of the cached local day, or NaN when a change falls near it. */
  private cachedDayOffset = Number.NaN;
  /** Offsets at UTC midnights, each asked of the zone once (a day's check shares them with its neighbours). */
  private readonly midnightOffsets = new Map<number, number>();
  private cachedHour = Number.NaN;
  private cachedHourOffset = Number.NaN;

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
    }
    if (!Number.isNaN(this.cachedDayOffset)) return localMs - this.cachedDayOffset * MINUTE;
    // Near a change, an hour that starts and ends on the same single offset has it throughout.
    const hour = Math.floor(localMs / HOUR);
    if (hour !== this.cachedHour) {
      this.cachedHour = hour;
      const start = this.validOffsets(hour * HOUR);
      const end = this.validOffsets((hour + 1) * HOUR - 1);
      this.cachedHourOffset = start.length === 1 && end.length === 1 && start[0] === end[0] ? start[0] : Number.NaN;
    }
    if (!Number.isNaN(this.cachedHourOffset)) return localMs - this.cachedHourOffset * MINUTE;
    return this.nearChange(localMs, previousUtc);
  }

  /** The offset of a local day when the zone keeps one offset from a day before it to a day after it. */
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
   * Offsets under which a local time exists: none in the spring gap, two in the repeated autumn hour.
   * Any offset in force within a day either side is a candidate (zones change at most once in that span).
   */
  private validOffsets(localMs: number): number[] {
    const candidates = new Set([this.offsetAt(localMs - DAY), this.offsetAt(localMs + DAY)]);
    return [...candidates].filter((offset) => this.offsetAt(localMs - offset * MINUTE) === offset);
  }

  private nearChange(localMs: number, previousUtc: number | null): number | string {
    const valid = this.validOffsets(localMs);
    if (valid.length === 0) {
      return `local time ${formatLocal(localMs)} does not exist in ${this.zoneName} (the clocks went forward then)`;
    }
    if (valid.length === 1) return localMs - valid[0] * MINUTE;
    // The hour repeated when the clocks go back: take the reading that keeps the file in its order.
    const earlier = localMs - Math.max(...valid) * MINUTE;
    const later = localMs - Math.min(...valid) * MINUTE;
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
