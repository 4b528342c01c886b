import { randomBytes } from 'node:crypto';
import type { Pool } from 'mariadb';
import type TestAgent from 'supertest/lib/agent';
import { Import } from '../../../server/imports/import.model';
import { sqlInstant } from '../../../server/readings/readingStore';

export interface Row {
  t: number;
  c: number;
  rh?: number | null;
}

const CHUNK = 50_000;

/**
 * Stores readings the way an import does: an import record naming the logger and the span, and the rows through the
 * connector's batch() with string timestamps and decimals, in one transaction. `rows` is produced chunk by chunk so a
 * year of one-minute readings never sits in memory as objects at once.
 */
export async function storeReadings(pool: Pool, nurseryId: number, loggerId: number, count: number, rowAt: (i: number) => Row): Promise<void> {
  const record = await Import.create({
    nurseryId, loggerId, userId: null, tokenId: null, fileName: 'test-readings.csv', fileSha256: randomBytes(32).toString('hex'),
    fileBytes: 0, status: 'running', startedAt: new Date(),
  });
  const conn = await pool.getConnection();
  try {
    await conn.beginTransaction();
    for (let start = 0; start < count; start += CHUNK) {
      const chunk: (string | null)[][] = [];
      for (let i = start; i < Math.min(count, start + CHUNK); i++) {
        const r = rowAt(i);
        chunk.push([String(loggerId), sqlInstant(r.t), r.c.toFixed(4), r.rh == null ? null : r.rh.toFixed(2), String(record.id)]);
      }
      await conn.batch('INSERT INTO readings (logger_id, t, c, rh, import_id) VALUES (?, ?, ?, ?, ?)', chunk);
    }
    await conn.commit();
  } finally {
    conn.release();
  }
  await record.update({
    status: 'completed', finishedAt: new Date(), rowsTotal: count, rowsAccepted: count, rowsStored: count,
    firstAt: new Date(rowAt(0).t), lastAt: new Date(rowAt(count - 1).t),
  });
}

let seq = 0;

/** A fresh room and a logger placed in it since `since`, made through the API as staff would. */
export async function roomWithLogger(agent: TestAgent, since: Date): Promise<{ roomId: number; loggerId: number }> {
  const name = `series-${Date.now()}-${++seq}`;
  const roomId = (await agent.post('/api/rooms').send({ name, kind: 'garage' })).body.id as number;
  const loggerId = (await agent.post('/api/loggers').send({ label: name })).body.id as number;
  const moved = await agent.post(`/api/loggers/${loggerId}/move`).send({ roomId, at: since.toISOString() });
  if (moved.status !== 200) throw new Error(`placing the logger failed: ${moved.status} ${JSON.stringify(moved.body)}`);
  return { roomId, loggerId };
}
