/** Exit codes shared by every coldknit command. */
export const EXIT = {
  /** Everything read and nothing to report. */
  ok: 0,
  /** The command ran, but some rows were rejected or conflicted. */
  rowsRejected: 1,
  /** The command line was wrong, or the file needs a flag (--unit, --date-order, --tz) to be read. */
  usage: 2,
  /** The command failed: unreadable file, nothing readable, server unreachable… */
  failed: 3,
} as const;

export type ExitCode = (typeof EXIT)[keyof typeof EXIT];
