// How a chart's time range is cut into buckets: one per pixel column, or whole stored blocks when the range is long.

const MINUTE = 60_000;

/**
 * Sizes of the stored block summaries, smallest first: each divides the next and the largest divides a day, and none
 * exceeds the 180-minute join limit (so no block hides a break). Three times apart, a chart reads fewer than
 * 9 blocks per bucket on any range the blocks serve.
 */
export const BLOCK_MINUTES = [10, 30, 90, 180] as const;
export type BlockMinutes = (typeof BLOCK_MINUTES)[number];

/**
 * A block size is used only when a bucket holds at least this many: a bucket is then less than one block wider than
 * a pixel column, and a column holds over two blocks, so buckets stay narrower than 1.5 columns.
 */
const MIN_BLOCKS_PER_BUCKET = 3;

/**
 * Bucket i covers [origin + i·span/count, origin + (i+1)·span/count). Integer inputs keep the index exact:
 * (t − origin)·count stays below 2^53 for any range of decades and any chart width.
 */
export interface BucketGrid {
  origin: number;
  span: number;
  count: number;
  /** The stored block size the buckets are made of, or null when buckets are filled from the readings themselves. */
  blockMinutes: BlockMinutes | null;
}

export function bucketIndex(grid: BucketGrid, t: number): number {
  return Math.floor(((t - grid.origin) * grid.count) / grid.span);
}

export function bucketMs(grid: BucketGrid): number {
  return grid.span / grid.count;
}

/**
 * For a chart `width` pixels wide over [from, to] (epoch ms, both included). Short ranges get exactly `width`
 * buckets, one per pixel column, as M4 prescribes. Long ranges get buckets made of whole stored blocks, aligned to
 * the block grid, so the server reads a few thousand block summaries instead of every reading; there are then
 * between 2/3 of `width` and `width` buckets, each with its true first, lowest, highest and last reading.
 */
export function planBucketGrid(from: number, to: number, width: number): BucketGrid {
  if (!(Number.isSafeInteger(from) && Number.isSafeInteger(to) && to >= from)) throw new Error(`bad range [${from}, ${to}]`);
  if (!(Number.isSafeInteger(width) && width >= 1)) throw new Error(`bad width ${width}`);
  const span = to - from + 1;
  for (const minutes of [...BLOCK_MINUTES].reverse()) {
    const blockMs = minutes * MINUTE;
    const origin = Math.floor(from / blockMs) * blockMs;
    const covered = to + 1 - origin;
    const blocksPerBucket = Math.ceil(covered / (width * blockMs));
    if (blocksPerBucket < MIN_BLOCKS_PER_BUCKET) continue;
    const size = blocksPerBucket * blockMs;
    const count = Math.ceil(covered / size);
    return { origin, span: count * size, count, blockMinutes: minutes };
  }
  return { origin: from, span, count: width, blockMinutes: null };
}
