import type { ImportErrorCode } from '../../shared/import/importError';
import { EXIT, type ExitCode } from './exitCodes';

/** Errors whose fix is a flag on the command line (--unit, --date-order, --tz) count as usage errors. */
const FIXED_BY_A_FLAG: ReadonlySet<ImportErrorCode> = new Set(['unit_unknown', 'date_order_ambiguous', 'bad_option']);

export function exitCodeForImportError(code: ImportErrorCode): ExitCode {
  return FIXED_BY_A_FLAG.has(code) ? EXIT.usage : EXIT.failed;
}
