import { Worker } from 'node:worker_threads';
import { ImportError } from '../../shared/import/importError';
import type { ReadHooks } from '../../shared/import/readLoggerFile';
import type { OnBatch, ReadSummary } from '../../shared/import/types';
import { unpackReadings } from './packedReadings';
import type { FromReader, ReaderJob, ToReader } from './readerMessages';

const ENTRY = new URL('./readerWorker.mjs', import.meta.url);
/**
 * An idle reader thread is kept this long for the next file of a nightly run (sent one after another), then stopped:
 * after a large file it holds some 75 MB (measured on a million rows) that only stopping it gives back.
 */
const KEEP_IDLE_MS = 5_000;

let idle: { worker: Worker; timer: NodeJS.Timeout } | null = null;

function takeThread(): Worker {
  if (!idle) return new Worker(ENTRY);
  const { worker, timer } = idle;
  idle = null;
  clearTimeout(timer);
  worker.ref();
  return worker;
}

/** One idle thread is kept (unreferenced, so it never holds the process open); any other is stopped. */
function giveBack(worker: Worker): void {
  if (idle) {
    void worker.terminate();
    return;
  }
  worker.unref();
  const timer = setTimeout(() => {
    if (idle?.worker === worker) idle = null;
    void worker.terminate();
  }, KEEP_IDLE_MS);
  timer.unref();
  idle = { worker, timer };
}

/**
 * Reads a logger file on a thread of its own and hands its batches to `onBatch` here, in order; same contract as
 * readLoggerFile. Parsing a big file is seconds of steady CPU: on the server's own thread it held up every other
 * request, and the connection streaming the import's readings to MariaDB (LOAD DATA LOCAL) got a turn only between
 * pieces of parsing, so the load ran at a quarter of its speed (measured).
 */
export function readInThread(job: ReaderJob, onBatch: OnBatch, hooks: ReadHooks = {}): Promise<ReadSummary> {
  return new Promise<ReadSummary>((resolve, reject) => {
    const worker = takeThread();
    const tell = (message: ToReader) => worker.postMessage(message);
    let settled = false;
    /** A thread that finished its file is kept for the next; one stopped half-way (the import failed) is not. */
    const settle = (finished: boolean, outcome: () => void) => {
      if (settled) return;
      settled = true;
      // Only this job's listeners: the Worker's own (they start and stop its message port) must stay.
      worker.off('message', onMessage).off('error', onError).off('exit', onExit);
      if (finished) giveBack(worker);
      else void worker.terminate();
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
              await onBatch(unpackReadings(message.packed));
              tell({ kind: 'taken' });
              return;
            case 'done':
              settle(true, () => resolve(message.summary));
              return;
            case 'failed':
              settle(true, () => reject(readerError(message.error)));
          }
        })
        .catch((err: unknown) => settle(false, () => reject(err)));
    };
    const onError = (err: Error) => settle(false, () => reject(err));
    const onExit = (code: number) => settle(false, () => reject(new Error(`The file reader stopped (exit code ${code}) before it finished.`)));
    worker.on('message', onMessage).on('error', onError).on('exit', onExit);
    tell({ kind: 'read', job });
  });
}

function readerError(error: Extract<FromReader, { kind: 'failed' }>['error']): Error {
  if (error.code !== null) return new ImportError(error.code, error.message);
  const err = new Error(error.message);
  if (error.stack) err.stack = error.stack;
  return err;
}
