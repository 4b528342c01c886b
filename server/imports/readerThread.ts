import { Worker } from 'node:worker_threads';
import { ImportError } from '../../shared/import/importError';
import type { ReadHooks } from '../../shared/import/readLoggerFile';
import type { ReadSummary } from '../../shared/import/types';
import type { PackedReadings } from './packedReadings';
import type { FromReader, ReaderJob, ToReader } from './readerMessages';

const ENTRY = new URL('./readerWorker.mjs', import.meta.url);

/**
 * Reads a logger file on a thread of its own and hands its batches, packed, to `onBatch` here, in order; otherwise
 * the same contract as readLoggerFile. Parsing a big file is seconds of steady CPU: on the server's own thread it held up every other
 * request, and the connection streaming the import's readings to MariaDB (LOAD DATA LOCAL) got a turn only between
 * pieces of parsing, so the load ran at a quarter of its speed (measured).
 */
export function readInThread(job: ReaderJob, onBatch: (batch: PackedReadings) => Promise<void>, hooks: ReadHooks = {}): Promise<ReadSummary> {
  return new Promise<ReadSummary>((resolve, reject) => {
    // A thread per file, stopped when the file is done: after a large file a thread holds some 75 MB (measured on a
    // million rows) that only stopping it gives back, and starting one costs about 0.3 s.
    const worker = new Worker(ENTRY, { workerData: job });
    const tell = (message: ToReader) => worker.postMessage(message);
    let settled = false;
    const settle = (outcome: () => void) => {
      if (settled) return;
      settled = true;
      void worker.terminate();
      outcome();
    };
    // Messages are handled one after another: a batch is stored before the next is looked at.
    let queue = Promise.resolve();
    const onMessage = (message: FromReader) => {
      queue = queue
        .then(async () => {
          if (settled) return;
          switch (message.kind) {
            case 'detected':
              await hooks.onDetected?.(message.detected);
              tell({ kind: 'proceed' });
              return;
            case 'batch':
              await onBatch(message.packed);
              tell({ kind: 'taken' });
              return;
            case 'done':
              settle(() => resolve(message.summary));
              return;
            case 'failed':
              settle(() => reject(readerError(message.error)));
          }
        })
        .catch((err: unknown) => settle(() => reject(err)));
    };
    const onError = (err: Error) => settle(() => reject(err));
    const onExit = (code: number) => settle(() => reject(new Error(`The file reader stopped (exit code ${code}) before it finished.`)));
    worker.on('message', onMessage).on('error', onError).on('exit', onExit);
  });
}

function readerError(error: Extract<FromReader, { kind: 'failed' }>['error']): Error {
  if (error.code !== null) return new ImportError(error.code, error.message);
  const err = new Error(error.message);
  if (error.stack) err.stack = error.stack;
  return err;
}
