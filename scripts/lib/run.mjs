// Small process helpers for the plain-Node bootstrap (no dependencies: it runs before `npm ci`).
import { spawn, spawnSync } from 'node:child_process';

/** Runs a command to completion with inherited output; throws with the command line on failure. */
export function runOrThrow(cmd, args, options = {}) {
  const result = spawnSync(cmd, args, { stdio: 'inherit', ...options });
  if (result.error) throw new Error(`${cmd} could not start: ${result.error.message}`);
  if (result.status !== 0) throw new Error(`${cmd} ${args.join(' ')} exited with ${result.status}`);
}

/** Runs a command and returns its stdout, or null when it fails (used for probes like `which`). */
export function capture(cmd, args, options = {}) {
  const result = spawnSync(cmd, args, { encoding: 'utf8', ...options });
  return result.status === 0 ? result.stdout : null;
}

/** Starts a long-running child and resolves with its exit code when it ends. */
export function startChild(cmd, args, options = {}) {
  const child = spawn(cmd, args, { stdio: 'inherit', ...options });
  const exited = new Promise((resolve) => {
    child.on('exit', (code, signal) => resolve(code ?? (signal ? 1 : 0)));
    child.on('error', (err) => {
      console.error(`${cmd} could not start: ${err.message}`);
      resolve(1);
    });
  });
  return { child, exited };
}

export const isRoot = () => typeof process.getuid === 'function' && process.getuid() === 0;
