import { FixedOffsetZone, IANAZone } from 'luxon';
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
const DAY = 86_400_000;

export function createLocalTimeResolver(zone: string, order: 'ascending' | 'descending'): LocalTimeResolver {
  const fixed = parseFixedOffset(zone);
  if (fixed !== null) {
    const name = FixedOffsetZone.instance(fixed).name;
    return { zoneName: name === 'UTC' ? 'UTC' : name.replace(/^UTC/, ''), toUtc: (localMs) => localMs - fixed * MINUTE };
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

class IanaResolver implements LocalTimeResolver {
  readonly zoneName: string;
  private readonly zone: IANAZone;
  private readonly descending: boolean;
  private cachedDay = Number.NaN;
  /** Offset in minutes for every time of the cached local day, or NaN when a change falls near it. */
  private cachedDayOffset = Number.NaN;

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
    return this.nearChange(localMs, previousUtc);
  }

  /** The offset of a local day when the zone keeps one offset from a day before it to a day after it. */
  private steadyOffset(day: number): number {
    const before = this.offsetAt((day - 1) * DAY);
    const after = this.offsetAt((day + 2) * DAY);
    return before === after ? before : Number.NaN;
  }

  private nearChange(localMs: number, previousUtc: number | null): number | string {
    const candidates = new Set([this.offsetAt(localMs - DAY), this.offsetAt(localMs + DAY)]);
    const valid = [...candidates].filter((offset) => this.offsetAt(localMs - offset * MINUTE) === offset);
    if (valid.length === 0) {
      return `local time ${formatLocal(localMs)} does not exist in ${this.zoneName} (the clocks went forward then)`;
    }
    if (valid.length === 1) return localMs - valid[0] * MINUTE;
    // The hour repeated when the clocks go back: take the reading that keeps the file in its order.
    const earlier = localMs - Math.max(...valid) * MINUTE;
    const later = localMs - Math.min(...valid) * MINUTE;
    if (previousUtc === null) return this.descending ? later : earlier;
    if (this.descending) return later <= previousUtc ? later : earlier;
    return earlier >= previousUtc ? earlier : later;
  }

  private offsetAt(utcMs: number): number {
    return this.zone.offset(utcMs);
  }
}

function formatLocal(localMs: number): string {
  return new Date(localMs).toISOString().slice(0, 16).replace('T', ' ');
}
