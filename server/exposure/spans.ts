// Time spans of placements and the pieces they split into where the set of loggers watching a room changes.

/** A closed stretch of time in epoch ms, from < to. */
export interface Span {
  from: number;
  to: number;
}

/** A logger's stay in a room; `to` null while it is still there. */
export interface LoggerStay {
  loggerId: number;
  roomId: number;
  from: number;
  to: number | null;
}

/** A part of a batch placement during which the same loggers watched the room. */
export interface CoveredPiece extends Span {
  loggerIds: number[];
}

/**
 * Cuts a batch placement at every instant a logger arrived in or left its room, so that within each piece the
 * set of loggers is fixed: each piece's headline is the worst of its loggers, and pieces add up. Loggers that
 * watched the room one after another therefore add their exposures instead of competing for the worst.
 */
export function splitByLoggers(window: Span, stays: readonly LoggerStay[]): CoveredPiece[] {
  const clipped = stays
    .map((s) => ({ loggerId: s.loggerId, from: Math.max(s.from, window.from), to: Math.min(s.to ?? Infinity, window.to) }))
    .filter((s) => s.to > s.from);
  const cuts = [...new Set([window.from, window.to, ...clipped.flatMap((s) => [s.from, s.to])])].sort((a, b) => a - b);
  const pieces: CoveredPiece[] = [];
  for (let i = 0; i + 1 < cuts.length; i++) {
    const from = cuts[i];
    const to = cuts[i + 1];
    const loggerIds = [...new Set(clipped.filter((s) => s.from <= from && s.to >= to).map((s) => s.loggerId))].sort((a, b) => a - b);
    pieces.push({ from, to, loggerIds });
  }
  return pieces;
}

/** Where a stay and a span overlap, or null when they only touch or miss. */
export function overlap(a: Span, b: { from: number; to: number | null }): Span | null {
  const from = Math.max(a.from, b.from);
  const to = Math.min(a.to, b.to ?? Infinity);
  return to > from ? { from, to } : null;
}
