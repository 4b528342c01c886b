// Plain data the rules judge: what a nursery's rooms, batches and loggers looked like, read once per evaluation.
import type { Reading } from '../exposure/types';
import type { TemperatureBand } from '../units';
import type { AlertRule, Severity, SubjectKind } from './rules';

/** One logger's readings while it was in one room, in time order. */
export interface LoggerSeries {
  loggerId: number;
  label: string;
  readings: Reading[];
}

/** What a batch brings to a rule: who it is, and its species' limits. */
export interface BatchFacts {
  batchId: number;
  code: string;
  speciesName: string;
  count: number;
  band: TemperatureBand;
  freezeC: number;
  /** Null for species kept warm to callus: cold-storage limits do not apply. */
  storageMaxC: number | null;
}

export interface RoomSnapshot {
  roomId: number;
  name: string;
  loggers: LoggerSeries[];
  /** Batches in the room now. */
  batches: BatchFacts[];
}

/** A stretch of a batch's stay in one room, with the readings of every logger there during it. */
export interface BatchStay {
  roomId: number;
  /** Epoch ms; `to` null while the batch is still there. */
  from: number;
  to: number | null;
  loggers: { loggerId: number; readings: Reading[]; from: number; to: number | null }[];
}

export interface BatchSnapshot extends BatchFacts {
  /** The room it is in now. */
  roomId: number;
  stays: BatchStay[];
}

export interface LoggerSnapshot {
  loggerId: number;
  label: string;
  /** The room it is placed in now. */
  roomId: number;
  roomName: string;
  placedFrom: number;
  lastReadingAt: number | null;
}

export interface NurserySnapshot {
  nurseryId: number;
  rooms: RoomSnapshot[];
  batches: BatchSnapshot[];
  loggers: LoggerSnapshot[];
}

/** Figures an alert message and page show; every field is optional because each rule fills its own. */
export interface FindingDetail {
  /** The latest reading that decided the finding, and the logger it came from. */
  valueC?: number | null;
  loggerLabel?: string | null;
  readingAt?: number | null;
  limitC?: number;
  /** Freeze risk: whether a reading is at or below the limit now, or only the trend line gets there. */
  cause?: 'at_or_below' | 'trend';
  trendCPerHour?: number | null;
  /** Freeze risk: when the trend line reaches the limit (epoch ms). */
  reachesAt?: number | null;
  band?: TemperatureBand;
  hoursBelow?: number;
  hoursAbove?: number;
  windowHours?: number;
  allowedHours?: number;
  degreeHours?: number;
  budgetDegreeHours?: number;
  lastReadingAt?: number | null;
  maxAgeHours?: number;
  batches?: { id: number; code: string; species: string; count: number }[];
  /** The condition held further back than the rules trace ("since" is then the horizon, not the start). */
  sinceCapped?: boolean;
}

/**
 * The verdict on one subject: `firing` once the condition has held for its hold time, `clear` once it has been
 * false that long, `settling` in between (nothing changes), `unknown` when the data are too old to judge.
 */
export type FindingState = 'firing' | 'clear' | 'settling' | 'unknown';

export interface Finding {
  rule: AlertRule;
  subjectKind: SubjectKind;
  subjectId: number;
  /** The room the subject is in now: for links, per-room settings and a room's history. */
  roomId: number | null;
  subjectName: string;
  state: FindingState;
  severity: Severity;
  /** Data time from which the current state has held (epoch ms). */
  since: number | null;
  /** The instant judged: the newest reading considered, or the evaluation time for silence. */
  asOf: number;
  detail: FindingDetail;
}
