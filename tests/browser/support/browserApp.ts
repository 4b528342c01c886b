import { existsSync } from 'node:fs';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { createServer, type RequestListener } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll } from 'vitest';
import { startTestApp, type TestApp } from '../../support/testApp';
import { launchBrowser, type Browser } from './browser';

const CLIENT_DIR = join(import.meta.dirname, '..', '..', '..', 'dist');

export interface BrowserApp extends TestApp {
  /** Where the browser opens the app; also the server's APP_ORIGIN, so invitation links point here. */
  origin: string;
  /** Copies what the capture server received into the development inbox folder the Captured mail page reads. */
  publishCapturedMail(): Promise<void>;
}

/**
 * The real app with the built client, listening on a free loopback port. The port is taken before the app is built
 * so that APP_ORIGIN (invitation links, the same-origin check) can name it.
 */
export async function startBrowserApp(): Promise<BrowserApp> {
  if (!existsSync(join(CLIENT_DIR, 'index.html'))) throw new Error('dist/ has no built client: run `npx vite build` first.');
  let handler: RequestListener | null = null;
  const server = createServer((req, res) => {
    if (handler) return handler(req, res);
    res.statusCode = 503;
    res.end();
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const origin = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const mailDir = await mkdtemp(join(tmpdir(), 'ck-devmail-'));
  const t = await startTestApp({ clientDir: CLIENT_DIR, env: { APP_ORIGIN: origin, COLDKNIT_DEV_MAIL_DIR: mailDir } });
  handler = t.app as unknown as RequestListener;
  return {
    ...t,
    origin,
    async publishCapturedMail() {
      await Promise.all(t.mail.messages.map((m) => writeFile(join(mailDir, `${m.id}.json`), JSON.stringify(m))));
    },
    async close() {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await t.close();
      await rm(mailDir, { recursive: true, force: true });
    },
  };
}

/**
 * One app and one browser for a whole test file, shared by its tests at every width (each test names what it creates
 * after its width, so they do not collide). Starting them once per file keeps the suite's run time down.
 */
export function useBrowserSuite(): { app: () => BrowserApp; browser: () => Browser } {
  let app: BrowserApp | undefined;
  let browser: Browser | undefined;
  beforeAll(async () => {
    app = await startBrowserApp();
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
    await app?.close();
  });
  return {
    app: () => app ?? fail('the app did not start'),
    browser: () => browser ?? fail('the browser did not start'),
  };
}

function fail(message: string): never {
  throw new Error(message);
}
