// The reader thread: reads one logger file with the shared reader and sends its readings to the import batch by batch.
import { parentPort } from 'node:worker_threads';
import { isImportError } from '../../shared/import/importError';
import { readLoggerFile } from '../../shared/import/readLoggerFile';
import { segmentsSource } from './fileSegments';
import { packReadings } from './packedReadings';
import type { FromReader, ReaderJob, ToReader } from './readerMessages';

const port = parentPort!;
const send = (message: FromReader, transfer: ArrayBuffer[] = []) => port.postMessage(message, transfer);

/** Batches in flight: the reader reads the next one while the import stores the last. */
const AHEAD = 2;
/** Batches the import is ready for: none until it has accepted the layout. */
let credit = 0;
let wake: (() => void) | null = null;
const ready = () => (credit > 0 ? Promise.resolve() : new Promise<void>((resolve) => (wake = resolve)));

async function read(job: ReaderJob): Promise<void> {
  try {
    const summary = await readLoggerFile(
      segmentsSource(job.file),
      job.options,
      async (batch) => {
        await ready();
        credit--;
        const packed = packReadings(batch);
        send({ kind: 'batch', packed }, [packed.buffer as ArrayBuffer]);
      },
      {
        onDetected: async (detected) => {
          send({ kind: 'detected', detected });
          await ready();
        },
      },
    );
    send({ kind: 'done', summary });
  } catch (err) {
    const error = err instanceof Error ? err : new Error(String(err));
    send({ kind: 'failed', error: { code: isImportError(error) ? error.code : null, message: error.message, stack: error.stack } });
  }
}

port.on('message', (message: ToReader) => {
  if (message.kind === 'read') {
    void read(message.job);
    return;
  }
  credit += message.kind === 'proceed' ? AHEAD : 1;
  wake?.();
  wake = null;
});
