import type { Pool } from 'mariadb';
import type { BlockMinutes } from '../../shared/series/bucketGrid';
import { summaryOf, type Summary } from '../../shared/series/summary';
import { readBlocks, type Quantity } from './blockStore';
import { ensureBlocksCurrent } from './blockRefresh';
import { readRaw, type HalfOpen, type RawRow } from './rawReadings';

const MINUTE = 60_000;

/** One logger's readings over a stretch as time-ordered summaries: stored blocks where they fit, readings elsewhere. */
export type Pieces = Record<Quantity, Summary[]>;

function rawPieces(rows: readonly RawRow[]): Pieces {
  const pieces: Pieces = { c: [], rh: [] };
  for (const [t, c, rh] of rows) {
    pieces.c.push(summaryOf({ t, v: c }));
    if (rh !== null) pieces.rh.push(summaryOf({ t, v: rh }));
  }
  return pieces;
}

/** Two time-ordered lists whose pieces never overlap, as one. */
function mergeByTime(a: readonly Summary[], b: readonly Summary[]): Summary[] {
  const out: Summary[] = [];
  let i = 0;
  let j = 0;
  while (i < a.length || j < b.length) {
    if (j >= b.length || (i < a.length && a[i].first.t < b[j].first.t)) out.push(a[i++]);
    else out.push(b[j++]);
  }
  return out;
}

/**
 * The readings in [from, to] (both included). With a block size, whole blocks inside the stretch come from the stored
 * summaries and only the ragged ends from the readings; a block holding one of `cuts` strictly inside it is read as
 * readings too, so that no piece straddles a cut (a local midnight, say). Without one, every reading is a piece.
 */
export async function readPieces(pool: Pool, loggerId: number, from: number, to: number, minutes: BlockMinutes | null, cuts: readonly number[] = []): Promise<Pieces> {
  const blockMs = (minutes ?? 0) * MINUTE;
  const inner: HalfOpen = minutes === null ? { from: 0, to: 0 } : { from: Math.ceil(from / blockMs) * blockMs, to: Math.floor((to + 1) / blockMs) * blockMs };
  if (minutes === null || inner.from >= inner.to) return rawPieces(await readRaw(pool, loggerId, [{ from, to: to + 1 }]));

  await ensureBlocksCurrent(pool, loggerId);
  const stored = await readBlocks(pool, loggerId, minutes, inner);
  const straddles = (start: number) => cuts.some((cut) => cut > start && cut < start + blockMs);
  const cutStarts = new Set([...stored.c, ...stored.rh].map((b) => b.start).filter(straddles));
  const ranges: HalfOpen[] = [{ from, to: inner.from }, ...[...cutStarts].sort((a, b) => a - b).map((s) => ({ from: s, to: s + blockMs })), { from: inner.to, to: to + 1 }];
  const raw = rawPieces(await readRaw(pool, loggerId, ranges));
  const kept = (q: Quantity) => stored[q].filter((b) => !cutStarts.has(b.start));
  return { c: mergeByTime(kept('c'), raw.c), rh: mergeByTime(kept('rh'), raw.rh) };
}
