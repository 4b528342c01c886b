import { createReadStream, createWriteStream, type WriteStream } from 'node:fs';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { once } from 'node:events';
import { createInterface } from 'node:readline';
import type { PoolConnection } from 'mariadb';
import { countOf, type PackedReadings } from '../imports/packedReadings';
import { LOAD_READINGS, loadDataRows } from './loadDataText';

/** ER_NOT_ALLOWED_COMMAND and ER_LOAD_INFILE_CAPABILITY_DISABLED: the server or connection does not take LOCAL INFILE. */
const LOCAL_INFILE_REFUSED = new Set([1148, 4166]);
const INSERT_READING = 'INSERT INTO readings (logger_id, t, c, rh, import_id) VALUES (?, ?, ?, ?, ?)';
/**
 * Bytes per chunk file (some 29,000 readings). Small chunks start loading early and leave little to load after the
 * last row is read. Under 1 MB also because the connector holds a LOCAL INFILE file whole in the connection's packet
 * buffer and keeps that buffer for the connection's life: 1 MiB instead of 16 MiB on each pooled connection. (Files
 * over 16 MiB take a path in connector 3.0.2 that refills that buffer while the socket may still be sending it; that
 * fits the "packets out of order" errors seen when a benchmark once loaded a 45 MB file in one statement.)
 */
const CHUNK_BYTES = 1_000_000;
/** Chunks written but not yet loaded, at most: then reading waits for the database. */
const AHEAD = 2;

/**
 * New readings of one import go to temporary chunk files as the logger file streams through; each full chunk is
 * loaded with LOAD DATA LOCAL INFILE on the import's connection (inside its transaction) while the next one is
 * still being read. The database's fastest bulk path then runs beside the parsing, on the other core, and memory
 * does not grow with the file.
 */
export class ReadingSpool {
  private out: WriteStream | null = null;
  private chunk = 0;
  private chunkBytes = 0;
  private loading: Promise<void> = Promise.resolve();
  private readonly queued: Promise<void>[] = [];
  private failure: unknown = null;

  private constructor(
    private readonly dir: string,
    private readonly conn: PoolConnection,
    private readonly loggerId: number,
    private readonly importId: number,
  ) {}

  static async open(conn: PoolConnection, loggerId: number, importId: number): Promise<ReadingSpool> {
    return new ReadingSpool(await mkdtemp(join(tmpdir(), 'coldknit-import-')), conn, loggerId, importId);
  }

  async add(readings: PackedReadings): Promise<void> {
    if (this.failure) throw this.failure;
    if (countOf(readings) === 0) return;
    const rows = loadDataRows(readings);
    if (this.chunkBytes + rows.length > CHUNK_BYTES) await this.sendChunk();
    this.out ??= createWriteStream(this.chunkPath());
    this.chunkBytes += rows.length;
    if (!this.out.write(rows)) await once(this.out, 'drain');
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
    this.chunkBytes = 0;
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
    // Reading stays at most AHEAD chunks ahead of the database. Both want a core; a reader running further ahead only
    // leaves the loads to finish alone at the end, with the other core idle (measured: a third of the import).
    this.queued.push(this.loading);
    while (this.queued.length > AHEAD) await this.queued.shift();
  }

  private async load(path: string): Promise<void> {
    try {
      await this.conn.query(LOAD_READINGS, [path, this.loggerId, this.importId]);
    } catch (err) {
      if (!LOCAL_INFILE_REFUSED.has((err as { errno?: number }).errno ?? 0)) throw err;
      await this.insertInBatches(path);
    }
  }

  /** For a MariaDB run with local_infile off (an existing server given by DATABASE_URL): batched INSERTs instead. */
  private async insertInBatches(path: string): Promise<void> {
    let rows: (string | number | null)[][] = [];
    for await (const line of createInterface({ input: createReadStream(path), crlfDelay: Infinity })) {
      rows.push([this.loggerId, ...line.split('\t').map((v) => (v === '\\N' ? null : v)), this.importId]);
      if (rows.length === 5000) {
        await this.conn.batch(INSERT_READING, rows);
        rows = [];
      }
    }
    if (rows.length) await this.conn.batch(INSERT_READING, rows);
  }
}
