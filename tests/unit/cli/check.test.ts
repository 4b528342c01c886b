import { execFile } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { getSpeciesProfile } from '../../../shared/species/profiles';

const ROOT = fileURLToPath(new URL('../../../', import.meta.url));
const TSX = `${ROOT}node_modules/.bin/tsx`;

interface Run {
  code: number;
  stdout: string;
  stderr: string;
}

/** Runs the CLI as a user would, in the repository root, with a fixed machine zone. */
function cli(args: string[], entry: string[] = [TSX, 'cli/main.ts']): Promise<Run> {
  const [command, ...rest] = entry;
  return new Promise((resolve) => {
    execFile(command, [...rest, ...args], { cwd: ROOT, env: { ...process.env, TZ: 'Europe/Berlin' } }, (error, stdout, stderr) => {
      const code = error ? (typeof error.code === 'number' ? error.code : 1) : 0;
      resolve({ code, stdout, stderr });
    });
  });
}

const check = (...args: string[]) => cli(['check', ...args]);
const TIMEOUT = 60_000;

describe('coldknit check --json', () => {
  it(
    'a clean file: exit 0, exactly one JSON object, ISO 8601 UTC span, exposure without band figures',
    async () => {
      const run = await check('samples/root-cellar-k01-iso.csv', '--json');
      expect(run.code).toBe(0);
      expect(run.stderr).toBe('');
      const report = JSON.parse(run.stdout);
      expect(Object.keys(report)).toEqual(['detected', 'rows', 'rejectedLines', 'conflictLines', 'span', 'exposure']);
      expect(report.detected).toMatchObject({ loggerHint: 'K-01', preambleLines: 2, delimiter: ',' });
      expect(report.detected.timestamp).toMatchObject({ zone: 'explicit offset', format: 'YYYY-MM-DDTHH:mm:ss±HH:MM' });
      expect(report.rows).toEqual({ total: 288, accepted: 288, rejected: 0, duplicates: 0, conflicts: 0 });
      // First row 2025-01-13T00:00:00+01:00, last 287 × 15 min later.
      expect(report.span).toEqual({ first: '2025-01-12T23:00:00Z', last: '2025-01-15T22:45:00Z' });
      // 287 steps of 15 minutes, none over the 180-minute gap limit: 71.75 h covered, none missing.
      expect(report.exposure.hoursCovered).toBeCloseTo(71.75, 9);
      expect(report.exposure.hoursMissing).toBe(0);
      expect(report.exposure).toMatchObject({ band: null, freezeC: -2, maxGapMinutes: 180 });
      expect(report.exposure.freeze.hours).toBe(0);
      expect(report.exposure).not.toHaveProperty('below');
    },
    TIMEOUT,
  );

  it(
    'rejected and conflicting rows: exit 1 with their physical line numbers',
    async () => {
      const run = await check('samples/crisper-fridge-bad-rows.csv', '--json');
      expect(run.code).toBe(1);
      const report = JSON.parse(run.stdout);
      expect(report.rejectedLines.map((note: { line: number }) => note.line)).toEqual([8, 12, 17, 23, 29, 34, 43]);
      expect(report.conflictLines).toEqual([
        { line: 64, reason: expect.stringContaining('same time as line 63') },
      ]);
      const { total, accepted, rejected, duplicates, conflicts } = report.rows;
      expect({ rejected, duplicates, conflicts }).toEqual({ rejected: 7, duplicates: 1, conflicts: 1 });
      expect(accepted + rejected + duplicates + conflicts).toBe(total);
    },
    TIMEOUT,
  );

  it(
    '--range in °F gives the band in °C and the time below and above it',
    async () => {
      const run = await check('samples/crisper-fridge-epoch-noheader.csv', '--unit', 'C', '--range', '35F:40F', '--json');
      expect(run.code).toBe(0);
      const { exposure, detected } = JSON.parse(run.stdout);
      expect(detected.timestamp.kind).toBe('epoch-s');
      // (35 − 32) / 1.8 and (40 − 32) / 1.8 (NIST SP 811 App. B.8; REFERENCES §6).
      expect(exposure.band.minC).toBeCloseTo(5 / 3, 12);
      expect(exposure.band.maxC).toBeCloseTo(40 / 9, 12);
      expect(exposure.bandSource).toBe('--range');
      expect(exposure.below.hours).toBeGreaterThan(0);
      expect(exposure.below.hours + exposure.above.hours).toBeLessThanOrEqual(exposure.hoursCovered);
    },
    TIMEOUT,
  );

  it(
    '--species takes band and freeze limit from the profile; --freeze overrides the limit',
    async () => {
      const apple = getSpeciesProfile('apple');
      const run = await check('samples/north-garage-fahrenheit-mdy.csv', '--species', 'apple', '--freeze', '28F', '--json');
      expect(run.code).toBe(0);
      const { exposure, detected } = JSON.parse(run.stdout);
      expect(detected.temperature).toMatchObject({ unit: 'F', unitSource: 'header' });
      expect(exposure.band).toEqual(apple?.band);
      expect(exposure.bandSource).toBe('species apple');
      expect(exposure.freezeC).toBeCloseTo(-20 / 9, 12);
      expect(exposure.freeze.hours).toBeGreaterThan(0);
    },
    TIMEOUT,
  );

  it(
    '--max-gap below the logging interval leaves every hour missing',
    async () => {
      const run = await check('samples/root-cellar-k01-iso.csv', '--max-gap', '10', '--json');
      const { exposure } = JSON.parse(run.stdout);
      expect(exposure.hoursCovered).toBe(0);
      expect(exposure.hoursMissing).toBeCloseTo(71.75, 9);
    },
    TIMEOUT,
  );
});

describe('coldknit check exit codes and messages', () => {
  it(
    'a file that needs --unit: exit 2, the flag named on stderr, nothing on stdout',
    async () => {
      const run = await check('samples/crisper-fridge-epoch-noheader.csv', '--json');
      expect(run.code).toBe(2);
      expect(run.stdout).toBe('');
      expect(run.stderr).toContain('--unit C or --unit F');
    },
    TIMEOUT,
  );

  it.each([
    [['samples/root-cellar-k01-iso.csv', '--unit', 'K']],
    [['samples/root-cellar-k01-iso.csv', '--range', '1:4', '--species', 'apple']],
    [['samples/root-cellar-k01-iso.csv', '--species', 'banana']],
    [['samples/root-cellar-k01-iso.csv', '--tz', 'Mars/Olympus']],
    [[]],
  ])('usage error %j: exit 2', async (args) => {
    const run = await check(...args);
    expect(run.code).toBe(2);
    expect(run.stderr).not.toBe('');
  }, TIMEOUT);

  it(
    'a missing file and a file with nothing readable: exit 3',
    async () => {
      const missing = await check('samples/no-such-file.csv');
      expect(missing.code).toBe(3);
      expect(missing.stderr).toContain('[unreadable]');
      const invalid = await check('tests/fixtures/import/all-invalid.csv', '--json');
      expect(invalid.code).toBe(3);
      expect(invalid.stdout).toBe('');
      expect(invalid.stderr).toContain('[nothing_readable]');
    },
    TIMEOUT,
  );

  it(
    'text output names what was detected; the installed entry point runs the same program',
    async () => {
      const run = await cli(['check', 'samples/root-cellar-new-york-dst.csv', '--tz', 'America/New_York'], ['node', 'cli/bin.mjs']);
      expect(run.code).toBe(0);
      expect(run.stdout).toContain('zone America/New_York (from --tz)');
      expect(run.stdout).toContain('288 rows: 288 accepted, 0 rejected');
      expect(run.stdout).toContain('no band given');
    },
    TIMEOUT,
  );

  it(
    'without --tz the machine zone is used and said so',
    async () => {
      const run = await check('samples/north-garage-tab-preamble.txt');
      expect(run.code).toBe(0);
      expect(run.stdout).toContain("zone Europe/Berlin (this machine's; use --tz to change)");
      expect(run.stdout).toContain('logger G-07');
    },
    TIMEOUT,
  );
});
