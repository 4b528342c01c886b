/**
 * Where commands write. Results go to stdout (with --json, exactly one JSON object and nothing else);
 * errors and warnings go to stderr, so a script can pipe the JSON straight on.
 */
export function printJson(value: unknown): void {
  process.stdout.write(`${JSON.stringify(value, null, 2)}\n`);
}

export function printLines(lines: string[]): void {
  process.stdout.write(`${lines.join('\n')}\n`);
}

export function printError(message: string): void {
  process.stderr.write(`coldknit: ${message}\n`);
}
