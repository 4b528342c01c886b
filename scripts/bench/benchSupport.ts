// Helpers shared by the benchmarks: a migrated database on the throw-away MariaDB the bootstrap started, timing, tables.
import { once } from 'node:events';
import type { AddressInfo } from 'node:net';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { openDatabase, type Database } from '../../server/db/database';
import { createMailer } from '../../server/mail/mailer';
import { createToken } from '../../server/tokens/tokens.service';
import { createMigrator } from '../../server/db/migrator';

export async function openBenchDatabase(): Promise<Database> {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('Run benchmarks with `npm run bench:<name>`: the bootstrap starts a throw-away MariaDB.');
  const db = openDatabase(url);
  await createMigrator(db.sequelize).up();
  return db;
}

export async function timed<T>(work: () => Promise<T>): Promise<{ ms: number; value: T }> {
  const start = performance.now();
  const value = await work();
  return { ms: performance.now() - start, value };
}

export const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

/** Prints a Markdown table, ready to paste into the README. */
export function printTable(title: string, rows: [string, string, string?][]): void {
  console.log(`\n### ${title}\n`);
  console.log('| measure | value | target |');
  console.log('|---|---|---|');
  for (const [measure, value, target] of rows) console.log(`| ${measure} | ${value} | ${target ?? ''} |`);
  console.log('');
}

export const peakRssMb = () => process.resourceUsage().maxRSS / 1024;

/** The real app on a loopback port with an API token for the nursery, as the CLI and a browser reach it. */
export async function startBenchServer(db: Database, nurseryId: number): Promise<{ origin: string; token: string; close(): void }> {
  const { token } = await createToken(nurseryId, null, 'bench');
  const config = loadConfig({ DATABASE_URL: process.env.DATABASE_URL, PORT: '0', JWT_SECRET: 'b'.repeat(40) });
  const mailer = createMailer('smtp://127.0.0.1:9', config.mailFrom);
  const { app } = createApp({ config, sequelize: db.sequelize, pool: db.pool, mailer });
  const server = app.listen(0, '127.0.0.1');
  await once(server, 'listening');
  return {
    origin: `http://127.0.0.1:${(server.address() as AddressInfo).port}`,
    token,
    close() {
      server.close();
      mailer.close();
    },
  };
}
