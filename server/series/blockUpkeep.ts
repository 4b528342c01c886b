import type { Pool } from 'mariadb';
import { onReadingsChanged } from '../readings/readingEvents';
import { ensureBlocksCurrent } from './blockRefresh';

/**
 * Rebuilds a logger's stored blocks as soon as an import of it answers, so the first chart after a large import does
 * not wait for the rebuild. Charts bring blocks up to date themselves anyway; this only moves the work earlier.
 * Call once per process (the server's start-up): listeners stay registered for the life of the process.
 */
export function refreshBlocksAfterImports(pool: Pool): void {
  onReadingsChanged((change) => ensureBlocksCurrent(pool, change.loggerId));
}
