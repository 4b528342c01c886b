import { fahrenheitToCelsius } from '../units';
import { PLAUSIBLE_MAX_C, PLAUSIBLE_MIN_C, readHumidityCell, readTemperatureCell } from './cellValues';
import type { TimestampPlan } from './columnRoles';
import { clip, readDateAndTime, readDateTime, readEpoch, type WrittenTimeOutcome } from './dateTimeText';
import type { LocalTimeResolver } from './localTime';
import { SeenReadings } from './seenReadings';
import { mixedUnits } from './temperatureUnit';
import { MAX_NOTED_LINES, type LineNote, type Reading, type RowCounts, type TemperatureUnit } from './types';

export interface RowPlan {
  timestamp: TimestampPlan;
  temperatureColumn: number;
  unit: TemperatureUnit;
  humidityColumn: number | null;
  /** Resolver for times written without an offset; null for Unix times. */
  localTime: LocalTimeResolver | null;
  /** Fields a row must have to hold every column used. */
  fieldsNeeded: number;
}

const SYMBOL: Record<TemperatureUnit, string> = { C: '°C', F: '°F' };

/**
 * Reads each data row and accounts for it: accepted, rejected (with its reason), duplicate (same time
 * and reading as an earlier row) or conflict (same time, different reading; the first one is kept).
 * Readings already accepted are kept as numbers (SeenReadings), the only per-file memory the reader needs.
 */
export class RowAccountant {
  readonly counts: RowCounts = { total: 0, accepted: 0, rejected: 0, duplicates: 0, conflicts: 0 };
  readonly rejectedLines: LineNote[] = [];
  readonly conflictLines: LineNote[] = [];
  first: number | null = null;
  last: number | null = null;
  pending: Reading[] = [];

  private readonly seen = new SeenReadings();
  private previousUtc: number | null = null;

  constructor(private readonly plan: RowPlan) {}

  onRecord(fields: string[], line: number): void {
    if (isBlank(fields)) return;
    this.counts.total++;
    if (fields.length < this.plan.fieldsNeeded) {
      this.reject(line, `missing fields: ${fields.length} found, ${this.plan.fieldsNeeded} needed`);
      return;
    }
    const t = this.timeOf(fields);
    if (typeof t === 'string') {
      this.reject(line, t);
      return;
    }
    this.previousUtc = t;
    const c = this.celsiusOf(fields[this.plan.temperatureColumn], line);
    if (typeof c === 'string') {
      this.reject(line, c);
      return;
    }
    const rh = this.humidityOf(fields);
    if (typeof rh === 'string') {
      this.reject(line, rh);
      return;
    }
    const seen = this.seen;
    if (seen.find(t)) {
      const sameRh = rh === null ? Number.isNaN(seen.foundRh) : seen.foundRh === rh;
      if (seen.foundC === c && sameRh) {
        this.counts.duplicates++;
      } else {
        this.counts.conflicts++;
        if (this.conflictLines.length < MAX_NOTED_LINES) {
          this.conflictLines.push({
            line,
            reason: `same time as line ${seen.foundLine} but a different reading (${round(seen.foundC)} °C there, ${round(c)} °C here); line ${seen.foundLine} kept`,
          });
        }
      }
      return;
    }
    seen.add(t, c, rh ?? Number.NaN, line);
    this.counts.accepted++;
    if (this.first === null || t < this.first) this.first = t;
    if (this.last === null || t > this.last) this.last = t;
    this.pending.push({ t, c, rh, line });
  }

  takePending(): Reading[] {
    const batch = this.pending;
    this.pending = [];
    return batch;
  }

  private reject(line: number, reason: string): void {
    this.counts.rejected++;
    if (this.rejectedLines.length < MAX_NOTED_LINES) this.rejectedLines.push({ line, reason });
  }

  private timeOf(fields: string[]): number | string {
    const plan = this.plan.timestamp;
    if (plan.kind === 'epoch') return readEpoch(fields[plan.column], plan.unit);
    // Detection settles the order before any row is read; 'ymd' stands for year-first formats.
    const order = plan.order ?? 'ymd';
    const written: WrittenTimeOutcome =
      plan.kind === 'datetime'
        ? readDateTime(fields[plan.column], plan.style, order)
        : readDateAndTime(fields[plan.dateColumn], fields[plan.timeColumn], plan.style, order);
    if (typeof written === 'string') return written;
    if (written.offsetMinutes !== null) return written.localMs - written.offsetMinutes * 60_000;
    // Not null for written dates: detection always gives a zone for them.
    return (this.plan.localTime as LocalTimeResolver).toUtc(written.localMs, this.previousUtc);
  }

  private celsiusOf(cell: string, line: number): number | string {
    const value = readTemperatureCell(cell);
    switch (value.kind) {
      case 'empty':
        return 'missing temperature';
      case 'sensor code':
        return `sensor error code "${clip(value.text)}" instead of a temperature`;
      case 'not a number':
        return `temperature is not a number: "${clip(value.text)}"`;
    }
    if (value.unit !== null && value.unit !== this.plan.unit) {
      throw mixedUnits(`Line ${line} is written in ${SYMBOL[value.unit]} but the column is in ${SYMBOL[this.plan.unit]}.`);
    }
    const c = this.plan.unit === 'F' ? fahrenheitToCelsius(value.value) : value.value;
    if (c < PLAUSIBLE_MIN_C || c > PLAUSIBLE_MAX_C) {
      return `implausible temperature ${round(c)} °C (outside ${PLAUSIBLE_MIN_C}…+${PLAUSIBLE_MAX_C} °C), taken as a sensor fault`;
    }
    return c;
  }

  private humidityOf(fields: string[]): number | null | string {
    if (this.plan.humidityColumn === null) return null;
    const value = readHumidityCell(fields[this.plan.humidityColumn] ?? '');
    // A humidity sensor that is absent or faulty does not spoil the temperature reading.
    if (value.kind === 'empty' || value.kind === 'sensor code') return null;
    if (value.kind === 'not a number') return `humidity is not a number: "${clip(value.text)}"`;
    if (value.value < 0 || value.value > 100) return `humidity ${value.value} % is outside 0–100 %`;
    return value.value;
  }
}

function isBlank(fields: string[]): boolean {
  for (const field of fields) if (field !== '') return false;
  return true;
}

function round(c: number): string {
  return (Math.round(c * 100) / 100).toString();
}
