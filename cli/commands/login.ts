import { Command } from 'commander';
import { createInterface } from 'node:readline/promises';
import { usageError } from '../output/cliError';
import { printLines } from '../output/streams';
import { apiRequest } from '../server/apiRequest';
import { saveServerConfig } from '../server/config';

async function askForToken(): Promise<string> {
  if (!process.stdin.isTTY) {
    // A token piped in: `echo "$TOKEN" | coldknit login --server …` keeps it out of the shell history.
    let text = '';
    for await (const chunk of process.stdin) text += chunk;
    return text.trim();
  }
  const rl = createInterface({ input: process.stdin, output: process.stderr });
  try {
    return (await rl.question('API token (from Settings → API tokens): ')).trim();
  } finally {
    rl.close();
  }
}

export function loginCommand(): Command {
  return new Command('login')
    .description('Remember which Coldknit server to import into, and the API token to use (saved with mode 0600).')
    .requiredOption('--server <url>', 'address of the Coldknit server, e.g. http://192.168.1.20:5180')
    .option('--token <token>', 'API token; without it the token is read from standard input')
    .action(async (flags: { server: string; token?: string }) => {
      let server: URL;
      try {
        server = new URL(flags.server);
      } catch {
        throw usageError(`"${flags.server}" is not a URL; give it like http://host:5180.`);
      }
      const token = flags.token ?? (await askForToken());
      if (!token) throw usageError('No token given.');
      const config = { server: server.origin, token };
      const nursery = await apiRequest<{ name: string }>(config, '/nursery');
      const path = await saveServerConfig(config);
      printLines([`Signed in to ${nursery.name} at ${config.server}.`, `Saved in ${path}.`]);
    });
}
