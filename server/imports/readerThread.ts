import { Worker } from 'node:worker_threads';
import { ImportError } from '../../shared/import/importError';
import type { ReadHooks } from '../../shared/import/readLoggerFile';
import type { ReadSummary } from '../../shared/import/types';
import type { PackedReadings } from './packedReadings';
import type { FromReader, ReaderJob, ToReader } from './readerMessages';

const ENTRY = new URL('./readerWorker.mjs', import.meta.url);

export interface Reader {
  /** Reads one file; batches reach `onBatch` here, packed and in order. Otherwise the contract of readLoggerFile. */
  read(job: ReaderJob, onBatch: (batch: PackedReadings) => Promise<void>, hooks?: ReadHooks): Promise<ReadSummary>;
  /** Stops the thread, whether it read a file or not. */
  stop(): void;
}

/**
 * A thread of its own for reading one logger file. Parsing a big file is seconds of steady CPU: on the server's own
 * thread it held up every other request, and the connection streaming the import's readings to MariaDB (LOAD DATA
 * LOCAL) got a turn only between pieces of parsing, so the load ran at a quarter of its speed (measured). One thread
 * per file, stopped after it: after a large file a thread holds some 75 MB (measured on a million rows) that only
 * stopping it gives back. Starting one takes about 0.3 s, so it is started as the upload begins (readerAhead).
 */
export function startReader(): Reader {
  const worker = new Worker(ENTRY);
  let stopped = false;
  const stop = () => {
    if (stopped) return;
    stopped = true;
    void worker.terminate();
  };
  return {
    stop,
    read(job, onBatch, hooks = {}) {
      if (stopped) return Promise.reject(new Error('The file reader was stopped before it was given the file.'));
      return new Promise<ReadSummary>((resolve, reject) => {
        const tell = (message: ToReader) => worker.postMessage(message);
        let settled = false;
        const settle = (outcome: () => void) => {
          if (settled) return;
          settled = true;
          stop();
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
        worker.on('message', onMessage);
        worker.on('error', (err) => settle(() => reject(err)));
        worker.on('exit', (code) => settle(() => reject(new Error(`The file reader stopped (exit code ${code}) before it finished.`))));
        tell({ kind: 'read', job });
      });
    },
  };
}

function readerError(error: Extract<FromReader, { kind: 'failed' }>['error']): Error {
  if (error.code !== null) return new ImportError(error.code, error.message);
  const err = new Error(error.message);
  if (error.stack) err.stack = error.stack;
  return err;
}
