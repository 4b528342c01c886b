// Block summaries: readings cut on a fixed grid of blockMs (aligned to the epoch) and summarised per block.
import { mergeLater, summaryOf, type Summary, type TimedValue } from './summary';

export interface BlockSummary extends Summary {
  /** Epoch ms where the block begins; it covers [start, start + blockMs). */
  start: number;
}

/** Folds time-ordered readings into one summary per block that holds any; empty blocks are simply absent. */
export function createBlockFolder(blockMs: number) {
  const done: BlockSummary[] = [];
  let open: BlockSummary | null = null;
  return {
    push(point: TimedValue): void {
      const start = Math.floor(point.t / blockMs) * blockMs;
      if (open && open.start === start) {
        mergeLater(open, summaryOf(point));
        return;
      }
      if (open) done.push(open);
      open = { start, ...summaryOf(point) };
    },
    finish(): BlockSummary[] {
      if (open) done.push(open);
      open = null;
      return done;
    },
  };
}
