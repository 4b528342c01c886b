#!/usr/bin/env node
// The entry of `npm start`, `npm test` and the benchmarks. Plain Node with no dependencies, because it runs before `npm ci`:
// it installs what is missing, starts a private MariaDB on loopback, then hands over to TypeScript code under tsx.
import { existsSync, mkdtempSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { ensureDebianPackages, ensureNodeModules } from './lib/prerequisites.mjs';
import { ensureAppDatabase, freePort, startMariadb } from './lib/mariadb.mjs';
import { runOrThrow, startChild } from './lib/run.mjs';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const bin = (name) => join(root, 'node_modules', '.bin', name);
const mode = process.argv[2];
const extraArgs = process.argv.slice(3);

/** Stops children and the private database once, whichever signal or exit comes first. */
function onShutdown(cleanup) {
  let done = false;
  const run = async (code) => {
    if (done) return;
    done = true;
    await cleanup();
    process.exit(code);
  };
  process.on('SIGINT', () => run(130));
  process.on('SIGTERM', () => run(143));
  return run;
}

async function start() {
  ensureNodeModules(root);
  const external = process.env.DATABASE_URL;
  if (!external) ensureDebianPackages(['mariadb']);
  let db = null;
  let databaseUrl = external;
  const dataDir = join(root, '.data');
  if (!external) {
    db = await startMariadb({ baseDir: dataDir, port: Number(process.env.MARIADB_PORT ?? 3307) });
    databaseUrl = ensureAppDatabase({ ...db, baseDir: dataDir, database: 'coldknit', user: 'coldknit' });
    console.log(`[coldknit] private MariaDB ${db.startedHere ? 'started' : 'reused'} on 127.0.0.1:${db.port} (data in .data/mariadb)`);
  }
  console.log('[coldknit] building the client…');
  runOrThrow(bin('vite'), ['build', '--logLevel', 'warn'], { cwd: root });
  mkdirSync(join(dataDir, 'mail'), { recursive: true });
  const env = {
    ...process.env,
    DATABASE_URL: databaseUrl,
    COLDKNIT_DEMO: process.env.COLDKNIT_DEMO ?? '1',
    COLDKNIT_DEV_MAIL_DIR: process.env.SMTP_URL ? '' : join(dataDir, 'mail'),
    NODE_ENV: 'production',
  };
  const server = startChild(bin('tsx'), ['server/main.ts'], { cwd: root, env, stdio: ['ignore', 'inherit', 'inherit'] });
  const shutdown = onShutdown(async () => {
    server.child.kill('SIGTERM');
    await server.exited;
    if (db) await db.stop();
  });
  const code = await server.exited;
  await shutdown(code);
}

/** Sums vitest's JSON report into the one closing line CI reads: `N passed, N failed`. */
function summarise(reportPath) {
  if (!existsSync(reportPath)) return { passed: 0, failed: 1 };
  const report = JSON.parse(readFileSync(reportPath, 'utf8'));
  const failedSuites = report.testResults.filter((f) => f.status === 'failed' && f.assertionResults.length === 0).length;
  return { passed: report.numPassedTests, failed: report.numFailedTests + failedSuites };
}

async function test() {
  ensureNodeModules(root);
  ensureDebianPackages(['mariadb', 'chromium']);
  const base = mkdtempSync(join(tmpdir(), 'coldknit-test-'));
  const db = await startMariadb({ baseDir: base, port: await freePort() });
  const cleanup = async () => {
    await db.stop();
    rmSync(base, { recursive: true, force: true });
  };
  const shutdown = onShutdown(cleanup);
  try {
    // The test user may create one database per test file, so files run in parallel without sharing rows.
    const adminUrl = ensureAppDatabase({ ...db, baseDir: base, database: 'coldknit_test', user: 'cktest', allDatabases: true });
    runOrThrow(bin('vite'), ['build', '--logLevel', 'warn'], { cwd: root });
    const reportPath = join(root, '.test-output', 'vitest-report.json');
    rmSync(reportPath, { force: true });
    const vitest = startChild(bin('vitest'), ['run', '--reporter=default', '--reporter=json', `--outputFile.json=${reportPath}`, ...extraArgs], {
      cwd: root,
      env: { ...process.env, COLDKNIT_TEST_DB_URL: adminUrl, NODE_ENV: 'test' },
    });
    const code = await vitest.exited;
    const { passed, failed } = summarise(reportPath);
    console.log(`${passed} passed, ${failed} failed`);
    await shutdown(code === 0 && failed === 0 ? 0 : 1);
  } catch (err) {
    console.error(`[coldknit] ${err.message}`);
    console.log('0 passed, 1 failed');
    await shutdown(1);
  }
}

/** Benchmarks need the same private database as tests, but never the dev data. */
async function bench() {
  ensureNodeModules(root);
  ensureDebianPackages(['mariadb']);
  const base = mkdtempSync(join(tmpdir(), 'coldknit-bench-'));
  const db = await startMariadb({ baseDir: base, port: await freePort() });
  const shutdown = onShutdown(async () => {
    await db.stop();
    rmSync(base, { recursive: true, force: true });
  });
  const url = ensureAppDatabase({ ...db, baseDir: base, database: 'coldknit_bench', user: 'ckbench', allDatabases: true });
  const [name] = extraArgs;
  const child = startChild(bin('tsx'), [join('scripts', 'bench', `${name}.ts`)], {
    cwd: root,
    env: { ...process.env, DATABASE_URL: url },
  });
  await shutdown(await child.exited);
}

const modes = { start, test, bench };
if (!modes[mode]) {
  console.error(`usage: node scripts/bootstrap.mjs ${Object.keys(modes).join('|')}`);
  process.exit(2);
}
modes[mode]().catch((err) => {
  console.error(`[coldknit] ${err.stack ?? err.message}`);
  process.exit(1);
});
