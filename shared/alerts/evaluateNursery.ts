// One pass of every rule over a nursery's snapshot: a finding per watched subject, pure and clock-free.
import type { Reading } from '../exposure/types';
import { judgeBudgetAt } from './exposureBudget';
import { judgeFreezeAt } from './freezeRisk';
import { heldState, isSettled } from './heldState';
import { judgeBandAt } from './outOfBand';
import type { AlertRule, Severity } from './rules';
import { instantsWithin, readingsWithin } from './series';
import { judgeSilence } from './silentLogger';
import { judgeStorageAt } from './storageWarm';
import { OUT_OF_BAND_WINDOW_HOURS, thresholdsFor, type ThresholdOverrides } from './thresholds';
import type { BatchFacts, BatchSnapshot, Finding, FindingDetail, NurserySnapshot, RoomSnapshot } from './types';

const MS_PER_HOUR = 3_600_000;
const MS_PER_MINUTE = 60_000;

/** How far back the start of a condition is traced for "since"; an older start shows as this far back. */
export const SINCE_HORIZON_HOURS = 24;

interface Verdict {
  holds: boolean;
  severity?: Severity;
  detail: FindingDetail;
}

interface Subject {
  rule: AlertRule;
  subjectKind: Finding['subjectKind'];
  subjectId: number;
  roomId: number | null;
  subjectName: string;
}

interface Judging {
  /** The readings that can decide the finding; their instants are where the condition is judged. */
  series: Reading[][];
  judgeAt: (t: number) => Verdict | null;
  /** How long the condition must hold before the finding fires. */
  holdMs: number;
  /** How long it must have been false before the finding clears; the hold time when not given. */
  clearMs?: number;
  /** Beyond this age the newest reading no longer tells how things are now. */
  staleMs: number;
  monotone?: boolean;
}

const atStake = (batches: readonly BatchFacts[]) =>
  batches.map((b) => ({ id: b.batchId, code: b.code, species: b.speciesName, count: b.count }));

/** Traces the condition back over the instants readings were taken and says whether it has settled. */
function judgeSubject(subject: Subject, batches: readonly BatchFacts[], judging: Judging, now: number): Finding {
  const unknown = (asOf: number, detail: FindingDetail = {}): Finding => ({
    ...subject, state: 'unknown', severity: 'warning', since: null, asOf, detail: { ...detail, batches: atStake(batches) },
  });
  const recent = instantsWithin(judging.series, now - judging.staleMs - SINCE_HORIZON_HOURS * MS_PER_HOUR, now);
  if (!recent.length) return unknown(now);
  const asOf = recent[recent.length - 1];
  const latest = judging.judgeAt(asOf);
  if (!latest) return unknown(asOf);
  if (now - asOf > judging.staleMs) return unknown(asOf, latest.detail);
  const instants = recent.filter((t) => t >= asOf - SINCE_HORIZON_HOURS * MS_PER_HOUR);
  const held = heldState(instants, (t) => (t === asOf ? latest.holds : (judging.judgeAt(t)?.holds ?? false)), { monotone: judging.monotone })!;
  const state = isSettled(held, held.holds ? judging.holdMs : (judging.clearMs ?? judging.holdMs)) ? (held.holds ? 'firing' : 'clear') : 'settling';
  // The run reaches back past the horizon when it starts at the first instant judged and older readings exist.
  const sinceCapped = held.since === instants[0] && recent.length > instants.length;
  return {
    ...subject,
    state,
    severity: latest.severity ?? 'warning',
    since: held.since,
    asOf,
    detail: { ...latest.detail, batches: atStake(batches), ...(sinceCapped ? { sinceCapped } : {}) },
  };
}

function roomFindings(room: RoomSnapshot, overrides: ThresholdOverrides, now: number): Finding[] {
  if (!room.batches.length) return [];
  const th = thresholdsFor(overrides, room.roomId);
  const series = room.loggers.map((l) => l.readings);
  const staleMs = th.silentHours * MS_PER_HOUR;
  const subject = (rule: AlertRule): Subject => ({ rule, subjectKind: 'room', subjectId: room.roomId, roomId: room.roomId, subjectName: room.name });
  // The strictest freeze limit is the highest: the first species to suffer sets the alarm.
  const freezeParams = {
    limitC: Math.max(...room.batches.map((b) => b.freezeC)),
    trendHours: th.freezeTrendHours,
    lookaheadHours: th.freezeLookaheadHours,
  };
  const findings = [
    judgeSubject(subject('freeze_risk'), room.batches, {
      series, staleMs, holdMs: th.holdMinutes * MS_PER_MINUTE,
      judgeAt: (t) => judgeFreezeAt(room.loggers, t, freezeParams),
    }, now),
  ];
  const coldStored = room.batches.filter((b) => b.storageMaxC !== null);
  if (coldStored.length) {
    const limitC = Math.min(...coldStored.map((b) => b.storageMaxC!));
    findings.push(
      // Warm for the storage time before it fires; back under the limit for the ordinary hold before it clears.
      judgeSubject(subject('storage_warm'), coldStored, {
        series, staleMs, holdMs: th.storageWarmMinutes * MS_PER_MINUTE, clearMs: th.holdMinutes * MS_PER_MINUTE,
        judgeAt: (t) => judgeStorageAt(room.loggers, t, limitC),
      }, now),
    );
  }
  return findings;
}

/** Each logger's readings while it watched the batch: the instants at which the batch's rules are judged. */
function batchSeries(batch: BatchSnapshot): Reading[][] {
  return batch.stays.flatMap((stay) =>
    stay.loggers.map((l) => readingsWithin(l.readings, Math.max(stay.from, l.from), Math.min(stay.to ?? Infinity, l.to ?? Infinity))),
  );
}

function batchFindings(batch: BatchSnapshot, roomName: string, overrides: ThresholdOverrides, now: number): Finding[] {
  const th = thresholdsFor(overrides, batch.roomId);
  const series = batchSeries(batch);
  const staleMs = th.silentHours * MS_PER_HOUR;
  const holdMs = th.holdMinutes * MS_PER_MINUTE;
  const subject = (rule: AlertRule): Subject => ({
    rule, subjectKind: 'batch', subjectId: batch.batchId, roomId: batch.roomId,
    subjectName: `${batch.code} (${batch.speciesName}) in ${roomName}`,
  });
  const findings = [
    judgeSubject(subject('out_of_band'), [batch], {
      series, staleMs, holdMs,
      judgeAt: (t) => judgeBandAt(batch, t, OUT_OF_BAND_WINDOW_HOURS, th.outOfBandHours),
    }, now),
  ];
  const budget = th.exposureBudgetDegreeHours;
  if (budget !== null) {
    findings.push(
      judgeSubject(subject('exposure_budget'), [batch], {
        series, staleMs, holdMs, monotone: true,
        judgeAt: (t) => judgeBudgetAt(batch, t, budget),
      }, now),
    );
  }
  return findings;
}

/**
 * Every rule over every subject watched now. A subject with an open alert but no finding here (a batch planted
 * out, a room emptied, a rule switched off) is no longer watched, and its alert ends.
 */
export function evaluateNursery(snapshot: NurserySnapshot, overrides: ThresholdOverrides, now: number): Finding[] {
  const roomNames = new Map(snapshot.rooms.map((r) => [r.roomId, r.name]));
  return [
    ...snapshot.rooms.flatMap((room) => roomFindings(room, overrides, now)),
    ...snapshot.batches.flatMap((batch) => batchFindings(batch, roomNames.get(batch.roomId) ?? 'its room', overrides, now)),
    ...snapshot.loggers.map((logger) => judgeSilence(logger, now, thresholdsFor(overrides, logger.roomId).silentHours)),
  ];
}
