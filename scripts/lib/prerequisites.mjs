// Makes sure what the product needs from outside npm is on the machine: node_modules, MariaDB, and (for tests) chromium.
import { existsSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { capture, isRoot, runOrThrow } from './run.mjs';

/** `npm ci` when node_modules is missing or older than the lock file, so a fresh clone needs no step first. */
export function ensureNodeModules(root) {
  const lock = join(root, 'package-lock.json');
  const marker = join(root, 'node_modules', '.package-lock.json');
  if (existsSync(marker) && statSync(marker).mtimeMs >= statSync(lock).mtimeMs) return;
  console.log('[coldknit] installing dependencies (npm ci)…');
  runOrThrow('npm', ['ci', '--no-audit', '--no-fund'], { cwd: root });
}

const hasCommand = (name) => capture('sh', ['-c', `command -v ${name}`]) !== null;

/** Debian packages by the binary that proves they are there. */
const DEBIAN = {
  mariadb: { binary: 'mariadbd', pkg: 'mariadb-server', extraPath: '/usr/sbin' },
  chromium: { binary: 'chromium', pkg: 'chromium' },
};

export function ensureDebianPackages(names) {
  if (!process.env.PATH.split(':').includes('/usr/sbin')) process.env.PATH += ':/usr/sbin';
  const missing = names.map((n) => DEBIAN[n]).filter((d) => !hasCommand(d.binary));
  if (missing.length === 0) return;
  const pkgs = missing.map((d) => d.pkg);
  const command = `apt-get update && apt-get install -y ${pkgs.join(' ')}`;
  if (!isRoot()) {
    console.error(`[coldknit] missing Debian packages: ${pkgs.join(', ')}. Install them as root:\n  sudo sh -c '${command}'`);
    process.exit(1);
  }
  console.log(`[coldknit] installing ${pkgs.join(', ')} with apt-get (a few minutes on a fresh machine)…`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  runOrThrow('apt-get', ['update'], { env });
  runOrThrow('apt-get', ['install', '-y', ...pkgs], { env });
}
