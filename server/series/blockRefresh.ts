import type { Pool, PoolConnection } from 'mariadb';
import { BLOCK_MINUTES } from '../../shared/series/bucketGrid';
import type { HalfOpen } from './rawReadings';
import { rebuildBlocksInSql } from './blockSql';

const MINUTE = 60_000;
/** Rebuilds cover whole blocks of the largest size, which every smaller size divides. */
const REBUILD_GRAIN = Math.max(...BLOCK_MINUTES) * MINUTE;
/**
 * An import still "running" after this long died with its process; its transaction was rolled back, so it stored
 * nothing and must not hold the mark back for ever. A year of one-minute readings imports in seconds.
 */
const DEAD_IMPORT_MS = 60 * MINUTE;

interface ImportRow {
  id: number;
  status: 'running' | 'completed' | 'failed';
  firstMs: number | null;
  lastMs: number | null;
  startedMs: number;
}

interface Work {
  spans: HalfOpen[];
  /** The mark may move up to here: every import up to this id is either included or stored nothing. */
  through: number;
}

async function markOf(conn: Pool | PoolConnection, loggerId: number): Promise<number> {
  const [row] = (await conn.query('SELECT through_import_id AS id FROM reading_block_marks WHERE logger_id = ?', [loggerId])) as { id: number }[];
  return row?.id ?? 0;
}

async function importsAfter(conn: Pool | PoolConnection, loggerId: number, mark: number): Promise<ImportRow[]> {
  return (await conn.query(
    // What each import stored: its stored span; records without one (demo seed, imports before migration 008) stored
    // their whole span when they stored anything.
    `SELECT id, status,
            CAST(UNIX_TIMESTAMP(IF(stored_first_at IS NOT NULL OR rows_stored = 0, stored_first_at, first_at)) * 1000 AS SIGNED) AS firstMs,
            CAST(UNIX_TIMESTAMP(IF(stored_last_at IS NOT NULL OR rows_stored = 0, stored_last_at, last_at)) * 1000 AS SIGNED) AS lastMs,
            CAST(UNIX_TIMESTAMP(started_at) * 1000 AS SIGNED) AS startedMs
       FROM imports WHERE logger_id = ? AND id > ? ORDER BY id`,
    [loggerId, mark],
  )) as ImportRow[];
}

/** Whole rebuild grains around each import's span, overlapping stretches merged. */
function planWork(imports: readonly ImportRow[], mark: number, now: number): Work {
  const spans: HalfOpen[] = [];
  let through = mark;
  let held = false;
  for (const i of imports) {
    // Its readings may be committing right now and its span is not written yet: include it on a later request.
    if (i.status === 'running' && now - i.startedMs < DEAD_IMPORT_MS) {
      held = true;
      continue;
    }
    if (i.status === 'completed' && i.firstMs !== null && i.lastMs !== null) {
      spans.push({ from: Math.floor(i.firstMs / REBUILD_GRAIN) * REBUILD_GRAIN, to: (Math.floor(i.lastMs / REBUILD_GRAIN) + 1) * REBUILD_GRAIN });
    }
    if (!held) through = i.id;
  }
  spans.sort((a, b) => a.from - b.from);
  const merged: HalfOpen[] = [];
  for (const s of spans) {
    const last = merged.at(-1);
    if (last && s.from <= last.to) last.to = Math.max(last.to, s.to);
    else merged.push({ ...s });
  }
  return { spans: merged, through };
}

/**
 * A stretch is rebuilt a fortnight at a time (a whole number of the largest block, so no block straddles two pieces),
 * so each statement stays short however long the stretch.
 */
const PIECE_MS = 14 * 24 * 60 * MINUTE;

async function rebuild(conn: PoolConnection, loggerId: number, span: HalfOpen): Promise<void> {
  for (let from = span.from; from < span.to; from += PIECE_MS) {
    await rebuildBlocksInSql(conn, loggerId, { from, to: Math.min(span.to, from + PIECE_MS) });
  }
}

/** Rebuilds the stretches and moves the mark in one transaction, so readers see old blocks or new ones, never half. */
async function applyWork(conn: PoolConnection, loggerId: number, current: number, work: Work): Promise<void> {
  // Read committed: the range DELETE then locks only this logger's rows, not the gaps next to other loggers' keys,
  // so rebuilds of different loggers at once (the overview asks for every room together) do not deadlock.
  await conn.query('SET TRANSACTION ISOLATION LEVEL READ COMMITTED');
  await conn.beginTransaction();
  try {
    for (const span of work.spans) await rebuild(conn, loggerId, span);
    if (work.through > current) {
      await conn.query(
        'INSERT INTO reading_block_marks (logger_id, through_import_id) VALUES (?, ?) ON DUPLICATE KEY UPDATE through_import_id = VALUES(through_import_id)',
        [loggerId, work.through],
      );
    }
    await conn.commit();
  } catch (err) {
    await conn.rollback();
    throw err;
  }
}

/**
 * Brings a logger's stored blocks up to date with its readings before they are read. Every reading arrives with
 * an import record naming its logger and span (the importer and the demo seed both write one), so the imports
 * after the logger's mark say exactly which stretches changed. Rebuilding holds a per-logger lock, so two requests
 * never rebuild the same stretch at once.
 */
export async function ensureBlocksCurrent(pool: Pool, loggerId: number, now = Date.now()): Promise<void> {
  const mark = await markOf(pool, loggerId);
  const pending = await importsAfter(pool, loggerId, mark);
  if (pending.length === 0) return;
  const conn = await pool.getConnection();
  const lock = `coldknit:blocks:logger:${loggerId}`;
  try {
    const [held] = (await conn.query('SELECT GET_LOCK(?, 60) AS got', [lock])) as { got: number | null }[];
    // Still held after a minute: another rebuild of this logger is running long; serve the blocks as they are.
    if (held.got !== 1) return;
    try {
      // Another request may have done the work while this one waited for the lock.
      const current = await markOf(conn, loggerId);
      await applyWork(conn, loggerId, current, planWork(await importsAfter(conn, loggerId, current), current, now));
    } finally {
      await conn.query('SELECT RELEASE_LOCK(?)', [lock]);
    }
  } finally {
    conn.release();
  }
}
