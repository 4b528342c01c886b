// Block summaries: readings cut on a fixed grid of blockMs (aligned to the epoch) and summarised per block. The server
// computes them in MariaDB (server/series/blockSql.ts); tests/support/foldBlocks.ts folds them from readings to check it.
import type { Summary } from './summary';

export interface BlockSummary extends Summary {
  /** Epoch ms where the block begins; it covers [start, start + blockMs). */
  start: number;
}
