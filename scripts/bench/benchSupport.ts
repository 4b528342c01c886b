// Helpers shared by the benchmarks: a migrated database on the throw-away MariaDB the bootstrap started, timing, tables.
import { spawn } from 'node:child_process';
import { once } from 'node:events';
import { createServer } from 'node:net';
import { join } from 'node:path';
import { readFileSync, writeFileSync } from 'node:fs';
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

/** Linux keeps a process's peak RSS; writing 5 to clear_refs starts it again from now, so only what follows counts. */
export const restartPeakRss = (pid: number | 'self' = 'self') => writeFileSync(`/proc/${pid}/clear_refs`, '5');
export const peakRssMb = (pid: number | 'self' = 'self') => Number(/VmHWM:\s+(\d+)/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'))![1]) / 1024;

async function freePort(): Promise<number> {
  const probe = createServer().listen(0, '127.0.0.1');
  await once(probe, 'listening');
  const { port } = probe.address() as AddressInfo;
  probe.close();
  return port;
}

/**
 * The server itself, as `npm start` runs it (server/main.ts under tsx, with its chart upkeep and alerting), in a
 * process of its own: what it does and holds is then the server's alone. Mail goes nowhere (no alerts are set up).
 */
export async function startServerProcess(nurseryId: number): Promise<{ origin: string; token: string; pid: number; close(): Promise<void> }> {
  const { token } = await createToken(nurseryId, null, 'bench');
  const port = await freePort();
  const child = spawn(process.execPath, ['--import', 'tsx', join('server', 'main.ts')], {
    env: { ...process.env, PORT: String(port), JWT_SECRET: 'b'.repeat(40), SMTP_URL: 'smtp://127.0.0.1:9', COLDKNIT_DEMO: '0', NODE_ENV: 'production' },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const origin = `http://127.0.0.1:${port}`;
  for (let tries = 0; ; tries++) {
    if (child.exitCode !== null) throw new Error(`the server stopped at start (exit code ${child.exitCode})`);
    const up = await fetch(`${origin}/api/health`).then((r) => r.ok, () => false);
    if (up) break;
    if (tries > 600) throw new Error('the server did not answer within a minute');
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  return {
    origin,
    token,
    pid: child.pid!,
    async close() {
      child.kill('SIGTERM');
      await once(child, 'exit');
    },
  };
}

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
