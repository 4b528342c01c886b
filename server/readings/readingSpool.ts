import { createReadStream, createWriteStream, type WriteStream } from 'node:fs';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { once } from 'node:events';
import { createInterface } from 'node:readline';
import type { PoolConnection } from 'mariadb';
import type { Reading } from '../../shared/import/types';
import { LOAD_READINGS, readingLines } from './readingStore';

/** ER_NOT_ALLOWED_COMMAND and ER_LOAD_INFILE_CAPABILITY_DISABLED: the server or connection does not take LOCAL INFILE. */
const LOCAL_INFILE_REFUSED = new Set([1148, 4166]);
const INSERT_READING = 'INSERT INTO readings (logger_id, t, c, rh, import_id) VALUES (?, ?, ?, ?, ?)';
/** Rows per chunk file: large enough that LOAD DATA runs at full speed, small enough to start loading early. */
const CHUNK_ROWS = 100_000;

/**
 * New readings of one import go to temporary chunk files as the logger file streams through; each full chunk is
 * loaded with LOAD DATA LOCAL INFILE on the import's connection (inside its transaction) while the next one is
 * still being read. The database's fastest bulk path then runs beside the parsing, on the other core, and memory
 * does not grow with the file.
 */
export class ReadingSpool {
  private out: WriteStream | null = null;
  private chunk = 0;
  private inChunk = 0;
  private loading: Promise<void> = Promise.resolve();
  private failure: unknown = null;
  count = 0;

  private constructor(
    private readonly dir: string,
    private readonly conn: PoolConnection,
    private readonly loggerId: number,
    private readonly importId: number,
  ) {}

  static async open(conn: PoolConnection, loggerId: number, importId: number): Promise<ReadingSpool> {
    return new ReadingSpool(await mkdtemp(join(tmpdir(), 'coldknit-import-')), conn, loggerId, importId);
  }

  async add(readings: Reading[]): Promise<void> {
    if (this.failure) throw this.failure;
    if (readings.length === 0) return;
    this.out ??= createWriteStream(this.chunkPath());
    this.count += readings.length;
    this.inChunk += readings.length;
    if (!this.out.write(readingLines(this.loggerId, this.importId, readings))) await once(this.out, 'drain');
    if (this.inChunk >= CHUNK_ROWS) await this.sendChunk();
  }

  /** Loads what is left and waits for every load; the caller commits afterwards. */
  async finish(): Promise<void> {
    await this.sendChunk();
    await this.loading;
    if (this.failure) throw this.failure;
  }

  async discard(): Promise<void> {
    this.out?.destroy();
    await this.loading;
    await rm(this.dir, { recursive: true, force: true });
  }

  private chunkPath(n = this.chunk): string {
    return join(this.dir, `readings-${n}.tsv`);
  }

  private async sendChunk(): Promise<void> {
    if (!this.out) return;
    const out = this.out;
    const path = this.chunkPath();
    this.out = null;
    this.chunk++;
    this.inChunk = 0;
    out.end();
    await once(out, 'finish');
    // Loads run one after another on the one connection; a failure is kept and thrown at the next add or at finish.
    this.loading = this.loading.then(async () => {
      if (this.failure) return;
      try {
        await this.load(path);
      } catch (err) {
        this.failure = err;
      } finally {
        await rm(path, { force: true });
      }
    });
  }

  private async load(path: string): Promise<void> {
    try {
      await this.conn.query(LOAD_READINGS, [path]);
    } catch (err) {
      if (!LOCAL_INFILE_REFUSED.has((err as { errno?: number }).errno ?? 0)) throw err;
      await this.insertInBatches(path);
    }
  }

  /** For a MariaDB run with local_infile off (an existing server given by DATABASE_URL): batched INSERTs instead. */
  private async insertInBatches(path: string): Promise<void> {
    let rows: (string | null)[][] = [];
    for await (const line of createInterface({ input: createReadStream(path), crlfDelay: Infinity })) {
      rows.push(line.split('\t').map((v) => (v === '\\N' ? null : v)));
      if (rows.length === 5000) {
        await this.conn.batch(INSERT_READING, rows);
        rows = [];
      }
    }
    if (rows.length) await this.conn.batch(INSERT_READING, rows);
  }
}
