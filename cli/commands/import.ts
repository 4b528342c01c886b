import { Command, Option } from 'commander';
import { openAsBlob } from 'node:fs';
import { basename } from 'node:path';
import { SingleBar } from 'cli-progress';
import type { LineNote, RowCounts } from '../../shared/import/types';
import { CliError } from '../output/cliError';
import { EXIT, type ExitCode } from '../output/exitCodes';
import { printError, printJson, printLines } from '../output/streams';
import { apiRequest, ServerRefusal } from '../server/apiRequest';
import { resolveServerConfig, type ServerConfig } from '../server/config';
import { expandPaths } from '../server/expandPaths';

interface ImportFlags {
  logger?: string;
  tz?: string;
  unit?: 'C' | 'F';
  dateOrder?: 'dmy' | 'mdy' | 'ymd';
  dryRun?: boolean;
  json?: boolean;
  server?: string;
  token?: string;
}

interface Outcome {
  alreadyImported: boolean;
  dryRun: boolean;
  import: { id: number; loggerLabel: string | null } | null;
  rows: RowCounts;
  rejectedLines: LineNote[];
  conflictLines: LineNote[];
  span: { first: string | null; last: string | null };
}

type FileResult = { path: string; ok: true; outcome: Outcome } | { path: string; ok: false; error: { code: string; message: string } };

/** Server answers that are about the file (not the connection or the token). */
const USAGE_CODES = new Set(['unit_unknown', 'date_order_ambiguous', 'bad_option', 'logger_required', 'logger_unknown', 'validation_failed']);

function exitCodeOf(result: FileResult): ExitCode {
  if (!result.ok) return USAGE_CODES.has(result.error.code) ? EXIT.usage : EXIT.failed;
  return result.outcome.rows.rejected + result.outcome.rows.conflicts > 0 ? EXIT.rowsRejected : EXIT.ok;
}

async function sendFile(config: ServerConfig, path: string, flags: ImportFlags): Promise<Outcome> {
  const form = new FormData();
  for (const [key, value] of Object.entries({ logger: flags.logger, tz: flags.tz, unit: flags.unit, dateOrder: flags.dateOrder })) {
    if (value) form.append(key, value);
  }
  form.append('dryRun', String(!!flags.dryRun));
  // openAsBlob streams the file from disk as the request is sent; it is never read into memory whole.
  form.append('file', await openAsBlob(path), basename(path));
  return apiRequest<Outcome>(config, '/imports', { method: 'POST', body: form });
}

function describe(result: FileResult): string {
  if (!result.ok) return `${result.path}: failed — ${result.error.message}`;
  const { rows, alreadyImported, dryRun, import: record } = result.outcome;
  const where = record?.loggerLabel ? ` → ${record.loggerLabel}` : '';
  if (alreadyImported) return `${result.path}${where}: already imported (import #${record?.id}); nothing new`;
  const verb = dryRun ? 'would store' : 'stored';
  return `${result.path}${where}: ${rows.total} rows, ${verb} ${rows.accepted}, ${rows.duplicates} already there, ${rows.rejected} rejected, ${rows.conflicts} conflicts`;
}

function firstNotes(result: FileResult): string[] {
  if (!result.ok) return [];
  const notes = [...result.outcome.rejectedLines, ...result.outcome.conflictLines].sort((a, b) => a.line - b.line);
  return notes.slice(0, 5).map((n) => `  line ${n.line}: ${n.reason}`);
}

async function importOne(config: ServerConfig, path: string, flags: ImportFlags, bar: SingleBar | null): Promise<FileResult> {
  try {
    return { path, ok: true, outcome: await sendFile(config, path, flags) };
  } catch (err) {
    // A dead server or a refused token fails every file alike: stop at once.
    if (err instanceof CliError) {
      bar?.stop();
      throw err;
    }
    const refusal = err instanceof ServerRefusal ? err : null;
    return { path, ok: false, error: { code: refusal?.code ?? 'unreadable', message: refusal?.message ?? (err as Error).message } };
  }
}

function report(result: FileResult): void {
  const lines = [describe(result), ...firstNotes(result)];
  if (result.ok) printLines(lines);
  else printError(lines.join('\n'));
}

export function importCommand(): Command {
  return new Command('import')
    .description('Send logger files to the Coldknit server. Overlapping and repeated files add only what is new.')
    .argument('<paths...>', 'files, folders (their .csv/.txt/.tsv files) or quoted patterns like "exports/*.csv"')
    .option('--logger <label>', 'the logger the files came from (label or serial); needed unless the file names it')
    .option('--tz <zone>', "zone of timestamps written without an offset (IANA name or +01:00); default: the nursery's zone")
    .addOption(new Option('--unit <unit>', 'temperature unit when the file does not say').choices(['C', 'F']))
    .addOption(new Option('--date-order <order>', 'day/month order of dates such as 03/04/2024').choices(['dmy', 'mdy', 'ymd']))
    .option('--dry-run', 'read and count on the server, store nothing')
    .option('--json', 'print one JSON summary on stdout (messages go to stderr)')
    .option('--server <url>', 'server address (default: COLDKNIT_SERVER or `coldknit login`)')
    .option('--token <token>', 'API token (default: COLDKNIT_TOKEN or `coldknit login`)')
    .action(async (paths: string[], flags: ImportFlags) => {
      const config = await resolveServerConfig(flags);
      const files = await expandPaths(paths);
      const results: FileResult[] = [];
      // A bar only for a person watching; cron and pipes get one plain line per file.
      const bar = process.stderr.isTTY && !flags.json ? new SingleBar({ format: 'importing {bar} {value}/{total} files  {file}', stream: process.stderr, hideCursor: true }) : null;
      bar?.start(files.length, 0, { file: '' });
      for (const path of files) {
        bar?.update({ file: basename(path) });
        const result = await importOne(config, path, flags, bar);
        results.push(result);
        bar?.increment();
        // Without a bar (cron, pipes) each file's line goes out as soon as it is known.
        if (!bar && !flags.json) report(result);
      }
      bar?.stop();
      if (bar) results.forEach(report);
      const code = results.map(exitCodeOf).reduce<ExitCode>((worst, c) => (c > worst ? c : worst), EXIT.ok);
      if (flags.json) printJson({ files: results, exitCode: code });
      process.exitCode = code;
    });
}
