import type { PoolConnection } from 'mariadb';
import { BLOCK_MINUTES } from '../../shared/series/bucketGrid';
import { sqlInstant } from '../readings/readingStore';
import type { Quantity } from './blockStore';
import type { HalfOpen } from './rawReadings';

/**
 * Chart blocks are summarised inside MariaDB, by INSERT … SELECT: the smallest size from the readings, each larger size
 * from the smallest blocks. The server then neither parses nor holds readings or blocks; done in JavaScript after a
 * first import of a year of 30-second readings, the rebuild left some 30 MB of garbage on the server's heap (measured).
 *
 * To pick whole readings with MIN and MAX, a reading's offset in its block and its value (×10,000, shifted to be
 * positive) are packed into one BIGINT: by offset first for the first and last reading, by value first for the lowest
 * and highest, the earlier reading winning a tie (as folding reading by reading does). Values need 21 bits (°C and
 * % RH lie within ±104.8576 once scaled); offsets fit 24 bits (the largest block is 10,800,000 ms).
 */
const VALUE_BITS = 2 ** 21;
const VALUE_SHIFT = 2 ** 20;
const OFFSET_BITS = 2 ** 24;

/** Epoch ms of a DATETIME(3) in integer arithmetic (TO_SECONDS counts from year 0; 62,167,219,200 s is 1970-01-01). */
const EPOCH_MS = '(TO_SECONDS(t) - 62167219200) * 1000 + MICROSECOND(t) DIV 1000';
const scaled = (value: string) => `(CAST(${value} * 10000 AS SIGNED) + ${VALUE_SHIFT})`;
const byOffset = (offset: string, value: string) => `${offset} * ${VALUE_BITS} + ${value}`;
const byValue = (value: string, offset: string) => `${value} * ${OFFSET_BITS} + ${offset}`;
const byValueEarliest = (value: string, offset: string) => `${value} * ${OFFSET_BITS} + ${OFFSET_BITS - 1} - ${offset}`;

/** The four packed aggregates of group `g` unpacked into the block's columns (start in `start`). */
const unpacked = (start: string) => `
  ${start} + f DIV ${VALUE_BITS}, (f MOD ${VALUE_BITS} - ${VALUE_SHIFT}) / 10000,
  ${start} + mn MOD ${OFFSET_BITS}, (mn DIV ${OFFSET_BITS} - ${VALUE_SHIFT}) / 10000,
  ${start} + ${OFFSET_BITS - 1} - mx MOD ${OFFSET_BITS}, (mx DIV ${OFFSET_BITS} - ${VALUE_SHIFT}) / 10000,
  ${start} + l DIV ${VALUE_BITS}, (l MOD ${VALUE_BITS} - ${VALUE_SHIFT}) / 10000`;

const COLUMNS = 'logger_id, quantity, block_minutes, start_ms, first_ms, first_v, min_ms, min_v, max_ms, max_v, last_ms, last_v';
const SMALLEST = BLOCK_MINUTES[0];
const SMALLEST_MS = SMALLEST * 60_000;

/** Parameters: logger (twice), then the stretch as SQL instants. */
const smallestFromReadings = (quantity: Quantity) => `
  INSERT INTO reading_blocks (${COLUMNS})
  SELECT ?, '${quantity}', ${SMALLEST}, b * ${SMALLEST_MS}, ${unpacked(`b * ${SMALLEST_MS}`)}
    FROM (SELECT ms DIV ${SMALLEST_MS} AS b,
                 MIN(${byOffset('o', 'v')}) AS f, MAX(${byOffset('o', 'v')}) AS l,
                 MIN(${byValue('v', 'o')}) AS mn, MAX(${byValueEarliest('v', 'o')}) AS mx
            FROM (SELECT ms, ms MOD ${SMALLEST_MS} AS o, ${scaled(quantity)} AS v
                    FROM (SELECT ${EPOCH_MS} AS ms, ${quantity} FROM readings
                           WHERE logger_id = ? AND t >= ? AND t < ? AND ${quantity} IS NOT NULL) r) x
           GROUP BY b) g`;

/** Parameters: logger, then the stretch in epoch ms. Blocks of every size start on multiples of their size. */
const largerFromSmallest = (minutes: number) => {
  const size = minutes * 60_000;
  return `
  INSERT INTO reading_blocks (${COLUMNS})
  SELECT logger_id, quantity, ${minutes}, b * ${size}, ${unpacked(`b * ${size}`)}
    FROM (SELECT logger_id, quantity, start_ms DIV ${size} AS b,
                 MIN(${byOffset(`first_ms MOD ${size}`, scaled('first_v'))}) AS f,
                 MAX(${byOffset(`last_ms MOD ${size}`, scaled('last_v'))}) AS l,
                 MIN(${byValue(scaled('min_v'), `min_ms MOD ${size}`)}) AS mn,
                 MAX(${byValueEarliest(scaled('max_v'), `max_ms MOD ${size}`)}) AS mx
            FROM reading_blocks
           WHERE logger_id = ? AND block_minutes = ${SMALLEST} AND start_ms >= ? AND start_ms < ?
           GROUP BY logger_id, quantity, b) g`;
};

const SMALLEST_SQL = { c: smallestFromReadings('c'), rh: smallestFromReadings('rh') };
const LARGER_SQL = BLOCK_MINUTES.slice(1).map(largerFromSmallest);

/**
 * Replaces every block starting in the stretch, inside the caller's transaction. The stretch must begin and end on
 * multiples of the largest block size, so that no block reaches outside it.
 */
export async function rebuildBlocksInSql(conn: PoolConnection, loggerId: number, stretch: HalfOpen): Promise<void> {
  await conn.query('DELETE FROM reading_blocks WHERE logger_id = ? AND start_ms >= ? AND start_ms < ?', [loggerId, stretch.from, stretch.to]);
  for (const sql of Object.values(SMALLEST_SQL)) await conn.query(sql, [loggerId, loggerId, sqlInstant(stretch.from), sqlInstant(stretch.to)]);
  for (const sql of LARGER_SQL) await conn.query(sql, [loggerId, stretch.from, stretch.to]);
}
