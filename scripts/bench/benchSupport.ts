// Helpers shared by the benchmarks: a migrated database on the throw-away MariaDB the bootstrap started, timing, tables.
import { openDatabase, type Database } from '../../server/db/database';
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
