import { Command, CommanderError } from 'commander';
import { isImportError } from '../shared/import/importError';
import { checkCommand } from './commands/check';
import { importCommand } from './commands/import';
import { loginCommand } from './commands/login';
import { CliError } from './output/cliError';
import { EXIT } from './output/exitCodes';
import { exitCodeForImportError } from './output/importErrors';
import { printError } from './output/streams';

/** Adding a command: one file under commands/ exporting a Command, and one line here. */
const COMMANDS: (() => Command)[] = [checkCommand, importCommand, loginCommand];

function buildProgram(): Command {
  const program = new Command('coldknit')
    .description('Cold-room records for a graft nursery: read logger files, track batches and their exposure.')
    .version(process.env.npm_package_version ?? '0.1.0');
  for (const make of COMMANDS) program.addCommand(make());
  // Commander must throw instead of exiting so usage errors get exit code 2 (its own default is 1).
  for (const command of [program, ...program.commands]) command.exitOverride().showHelpAfterError('(add --help for usage)');
  return program;
}

async function run(argv: string[]): Promise<void> {
  try {
    await buildProgram().parseAsync(argv);
  } catch (error) {
    process.exitCode = reportFailure(error);
  }
}

function reportFailure(error: unknown): number {
  if (error instanceof CommanderError) {
    // Commander has printed its message already; help and --version end with code 0.
    return error.exitCode === 0 ? EXIT.ok : EXIT.usage;
  }
  if (error instanceof CliError) {
    printError(error.message);
    return error.exitCode;
  }
  if (isImportError(error)) {
    printError(`${error.message} [${error.code}]`);
    return exitCodeForImportError(error.code);
  }
  printError(`unexpected failure: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`);
  return EXIT.failed;
}

await run(process.argv);
