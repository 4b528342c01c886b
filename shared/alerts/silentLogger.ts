// A silent logger: placed in a room, yet no reading newer than the allowed age (a missed import, a dead battery).
import type { Finding, LoggerSnapshot } from './types';

const MS_PER_HOUR = 3_600_000;

/**
 * Judged at `now`, not at a reading: silence is the absence of readings. The age is its own hold time, so the
 * finding fires or clears at once. A logger that never reported counts its silence from when it was placed.
 */
export function judgeSilence(logger: LoggerSnapshot, now: number, maxAgeHours: number): Finding {
  const maxAgeMs = maxAgeHours * MS_PER_HOUR;
  const heardAt = logger.lastReadingAt ?? logger.placedFrom;
  const silent = now - heardAt > maxAgeMs;
  return {
    rule: 'silent_logger',
    subjectKind: 'logger',
    subjectId: logger.loggerId,
    roomId: logger.roomId,
    subjectName: `${logger.label} in ${logger.roomName}`,
    state: silent ? 'firing' : 'clear',
    severity: 'warning',
    since: silent ? heardAt + maxAgeMs : heardAt,
    asOf: now,
    detail: { lastReadingAt: logger.lastReadingAt, maxAgeHours, loggerLabel: logger.label },
  };
}
