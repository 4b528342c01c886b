import { leadingDateParts, readDateAndTime, readDateTime } from './dateTimeText';
import { ImportError } from './importError';
import type { DateOrder, DateOrderSource } from './types';

const DAY = 86_400_000;
/** A step this many times the usual interval (and over a day) breaks the series (design choice). */
const BREAK_FACTOR = 4;
/** The order kept may break its series at most this often, as real files have a few gaps. */
const TOLERATED_BREAKS = 0.05;

type AmbiguousOrder = 'dmy' | 'mdy';
const ORDERS: AmbiguousOrder[] = ['dmy', 'mdy'];

/** A date (and time) as written in a year-last file: one date-time cell, or a date cell and a time cell. */
export interface WrittenDate {
  date: string;
  time: string | null;
}

function localUnder(written: WrittenDate, order: AmbiguousOrder): number {
  const outcome =
    written.time === null
      ? readDateTime(written.date, 'year-last', order)
      : readDateAndTime(written.date, written.time, 'year-last', order);
  return typeof outcome === 'string' ? Number.NaN : outcome.localMs;
}

/** The usual step between readings under each order, from the sample at the top of the file. */
export function usualSteps(sample: WrittenDate[]): Record<AmbiguousOrder, number> {
  const result = { dmy: DAY, mdy: DAY };
  for (const order of ORDERS) {
    const times = sample.map((written) => localUnder(written, order)).filter((t) => !Number.isNaN(t));
    const steps = times
      .slice(1)
      .map((t, i) => t - times[i])
      .filter((step) => step > 0)
      .sort((a, b) => a - b);
    if (steps.length > 0) result[order] = steps[steps.length >> 1];
  }
  return result;
}

/**
 * Collects what tells day-first from month-first in dates like 03/04/2024: a first or second number
 * above 12 settles it outright; when every date could be either, the order under which the readings
 * form a steady, increasing series wins (a wrong order turns each new day into a jump of a month).
 */
export class DateOrderEvidence {
  private dayFirstVotes = 0;
  private monthFirstVotes = 0;
  private ordersDiffer = false;
  private example: string | null = null;
  private readonly previous = { dmy: Number.NaN, mdy: Number.NaN };
  private readonly breaks = { dmy: 0, mdy: 0 };
  private steps = 0;
  private readonly breakAbove: Record<AmbiguousOrder, number>;

  constructor(usual: Record<AmbiguousOrder, number>) {
    this.breakAbove = { dmy: Math.max(DAY, BREAK_FACTOR * usual.dmy), mdy: Math.max(DAY, BREAK_FACTOR * usual.mdy) };
  }

  add(written: WrittenDate): void {
    const parts = leadingDateParts(written.date);
    if (!parts) return;
    if (parts[0] > 12 && parts[1] <= 12) this.dayFirstVotes++;
    else if (parts[1] > 12 && parts[0] <= 12) this.monthFirstVotes++;
    if (this.settledByValues()) return;
    this.example ??= written.time === null ? written.date.trim() : `${written.date.trim()} ${written.time.trim()}`;
    const dmy = localUnder(written, 'dmy');
    const mdy = localUnder(written, 'mdy');
    if (Number.isNaN(dmy) || Number.isNaN(mdy)) return;
    if (dmy !== mdy) this.ordersDiffer = true;
    if (!Number.isNaN(this.previous.dmy)) this.steps++;
    for (const [order, t] of [['dmy', dmy], ['mdy', mdy]] as const) {
      const step = t - this.previous[order];
      if (step < 0 || step > this.breakAbove[order]) this.breaks[order]++;
      this.previous[order] = t;
    }
  }

  settledByValues(): boolean {
    return this.dayFirstVotes + this.monthFirstVotes > 0;
  }

  /** The order and how it was told, or an error asking for the date-order option. */
  verdict(): { order: DateOrder; source: DateOrderSource } {
    if (this.settledByValues()) {
      if (this.dayFirstVotes !== this.monthFirstVotes) {
        return { order: this.dayFirstVotes > this.monthFirstVotes ? 'dmy' : 'mdy', source: 'values' };
      }
      throw this.ambiguous('some dates only fit day-first and as many only fit month-first');
    }
    // Every date has day = month: both orders read the same times.
    if (!this.ordersDiffer) return { order: 'dmy', source: 'series' };
    const { dmy, mdy } = this.breaks;
    const better: AmbiguousOrder = dmy < mdy ? 'dmy' : 'mdy';
    const allowed = Math.max(1, this.steps * TOLERATED_BREAKS);
    if (dmy === mdy || this.breaks[better] > allowed) {
      throw this.ambiguous(dmy === mdy ? 'both orders give a steady series' : 'neither order gives a steady series');
    }
    return { order: better, source: 'series' };
  }

  private ambiguous(why: string): ImportError {
    const example = this.example ? `Dates such as "${this.example}"` : 'The dates';
    return new ImportError(
      'date_order_ambiguous',
      `${example} can be read day-first or month-first, and the file does not settle it (${why}). ` +
        'Run again with --date-order dmy (day/month/year) or --date-order mdy (month/day/year).',
    );
  }
}
