import { EXIT, type ExitCode } from './exitCodes';

/** An error a command reports on stderr and exits with; anything else is a bug and exits "failed". */
export class CliError extends Error {
  constructor(
    message: string,
    readonly exitCode: ExitCode,
  ) {
    super(message);
    this.name = 'CliError';
  }
}

export function usageError(message: string): CliError {
  return new CliError(message, EXIT.usage);
}

export function failure(message: string): CliError {
  return new CliError(message, EXIT.failed);
}
