import type { Pool } from 'mariadb';
import { onReadingsChanged } from '../readings/readingEvents';
import { ensureBlocksCurrent } from './blockRefresh';

/**
 * Rebuilds a logger's stored blocks right after an import of it, so the first chart after a large import does not
 * wait for the rebuild. It runs after the import has answered, not before: blocks only summarise readings that are
 * already stored, and a chart asked for in the meantime brings them up to date itself (waiting on the same
 * per-logger lock). A first import of a year of 30-second readings would otherwise answer some 3 s later (measured).
 * Call once per process (the server's start-up): listeners stay registered for the life of the process.
 */
export function refreshBlocksAfterImports(pool: Pool, log: (message: string) => void = console.error): void {
  onReadingsChanged(async (change) => {
    ensureBlocksCurrent(pool, change.loggerId).catch((err: unknown) => {
      log(`chart blocks of logger ${change.loggerId} not rebuilt after an import (charts will rebuild them): ${String(err)}`);
    });
  });
}
