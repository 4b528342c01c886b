import { chmod, mkdir, readFile, writeFile } from 'node:fs/promises';
import { homedir } from 'node:os';
import { dirname, join } from 'node:path';
import { usageError } from '../output/cliError';

export interface ServerConfig {
  server: string;
  token: string;
}

/** `$XDG_CONFIG_HOME/coldknit/config.json`, else `~/.config/coldknit/config.json`. */
export function configPath(): string {
  const base = process.env.XDG_CONFIG_HOME || join(homedir(), '.config');
  return join(base, 'coldknit', 'config.json');
}

async function readSaved(): Promise<Partial<ServerConfig>> {
  try {
    return JSON.parse(await readFile(configPath(), 'utf8')) as Partial<ServerConfig>;
  } catch {
    return {};
  }
}

/** Flags win over the environment, the environment over what `coldknit login` saved. */
export async function resolveServerConfig(flags: { server?: string; token?: string }): Promise<ServerConfig> {
  const saved = await readSaved();
  const server = flags.server ?? process.env.COLDKNIT_SERVER ?? saved.server;
  const token = flags.token ?? process.env.COLDKNIT_TOKEN ?? saved.token;
  if (!server || !token) {
    throw usageError('No server to talk to. Run `coldknit login --server URL` once, or set COLDKNIT_SERVER and COLDKNIT_TOKEN.');
  }
  return { server: server.replace(/\/+$/, ''), token };
}

/** The token is a secret: the file is created readable by its owner only (0600). */
export async function saveServerConfig(config: ServerConfig): Promise<string> {
  const path = configPath();
  await mkdir(dirname(path), { recursive: true, mode: 0o700 });
  await writeFile(path, `${JSON.stringify(config, null, 2)}\n`, { mode: 0o600 });
  await chmod(path, 0o600);
  return path;
}
