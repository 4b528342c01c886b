// The reference the stored chart blocks are checked against: blocks folded from readings one by one, in plain code.
import type { BlockSummary } from '../../shared/series/blocks';
import { mergeLater, type Summary } from '../../shared/series/summary';

/**
 * Folds time-ordered runs (a reading's own summary, or the summaries of smaller blocks that divide this size) into one
 * summary per block that holds any, handing each block to `emit` once it is complete; empty blocks are simply absent.
 */
export function createBlockFolder(blockMs: number, emit: (block: BlockSummary) => void) {
  let open: BlockSummary | null = null;
  return {
    push(run: Summary): void {
      const start = Math.floor(run.first.t / blockMs) * blockMs;
      if (open && open.start === start) {
        mergeLater(open, run);
        return;
      }
      if (open) emit(open);
      open = { start, first: run.first, min: run.min, max: run.max, last: run.last };
    },
    finish(): void {
      if (open) emit(open);
      open = null;
    },
  };
}

/**
 * Every block size at once from one pass over time-ordered runs (readings' own summaries, or blocks of the smallest
 * size): runs fold into the smallest size and each completed block into the next size up (each size divides the
 * next), so a run is handled once, not once per size. Merging keeps the earlier extreme on ties, so the blocks are
 * those each size would get from the readings.
 */
export function createBlockCascade(minutes: readonly number[], emit: (minutes: number, block: BlockSummary) => void) {
  const folders: ReturnType<typeof createBlockFolder>[] = [];
  for (let i = minutes.length - 1; i >= 0; i--) {
    const larger = folders[0];
    const size = minutes[i];
    folders.unshift(
      createBlockFolder(size * 60_000, (block) => {
        emit(size, block);
        larger?.push(block);
      }),
    );
  }
  return {
    push(run: Summary): void {
      folders[0].push(run);
    },
    /** Closes the open blocks, smallest first so each reaches the size above before that one closes. */
    finish(): void {
      for (const folder of folders) folder.finish();
    },
  };
}
