import { mkdir, mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type ConsoleMessage, type Locator, type Page } from 'playwright-core';

const SCREENSHOT_DIR = join(import.meta.dirname, '..', '..', '..', '.test-output', 'screenshots');

export const WIDTHS = [360, 1280] as const;

export interface Browser {
  context: BrowserContext;
  close(): Promise<void>;
}

/**
 * Debian's chromium through playwright-core, as /work/shared/STACK.md "Browser tests" describes. The browser's own
 * zone is set far from the demo nursery's so that a page showing browser-local time instead of nursery time is caught.
 */
export async function launchBrowser(): Promise<Browser> {
  const profile = await mkdtemp(join(tmpdir(), 'ck-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: '/usr/bin/chromium',
    headless: true,
    timezoneId: 'Asia/Tokyo',
    locale: 'en-GB',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  return {
    context,
    async close() {
      await context.close();
      await rm(profile, { recursive: true, force: true });
    },
  };
}

/**
 * Signed out, the app asks /api/auth/me and gets 401 by design; Chromium logs every 4xx resource as a console error.
 * Those and the statuses a test provokes on purpose are the only console errors tolerated.
 */
export interface ExpectedFailure {
  status: number;
  path: string;
}
const SIGNED_OUT_CHECK: ExpectedFailure = { status: 401, path: '/api/auth/me' };

function isExpected(msg: ConsoleMessage, expected: ExpectedFailure[]): boolean {
  const url = msg.location().url;
  return expected.some((e) => msg.text().includes(`status of ${e.status}`) && new URL(url || 'about:blank', 'http://x').pathname === e.path);
}

export interface WatchedPage {
  page: Page;
  /** Console errors and uncaught page errors seen so far, beyond the expected ones. */
  problems: string[];
  /** Tolerate one more provoked failure, e.g. a 409 the test causes to check its message. */
  expect(failure: ExpectedFailure): void;
}

/** A fresh tab, signed out: the persistent profile keeps cookies between tests, so they are cleared first. */
export async function openPage(browser: Browser, width: number): Promise<WatchedPage> {
  await browser.context.clearCookies();
  const page = await browser.context.newPage();
  await page.setViewportSize({ width, height: width < 700 ? 760 : 900 });
  page.setDefaultTimeout(15_000);
  const expected = [SIGNED_OUT_CHECK];
  const problems: string[] = [];
  page.on('console', (msg) => {
    if (msg.type() === 'error' && !isExpected(msg, expected)) problems.push(`console: ${msg.text()} (${msg.location().url})`);
  });
  page.on('pageerror', (err) => problems.push(`page error: ${err.message}`));
  return { page, problems, expect: (failure) => expected.push(failure) };
}

async function screenshot(page: Page, name: string): Promise<void> {
  await mkdir(SCREENSHOT_DIR, { recursive: true });
  // Fonts are bundled and load from the same server; wait for them so the picture shows the real type.
  await page.evaluate(() => document.fonts.ready);
  // A full-page capture leaves sticky bars where the viewport ended; growing the viewport to the page shows them in place.
  const viewport = page.viewportSize()!;
  const height = await page.evaluate(() => document.documentElement.scrollHeight);
  await page.setViewportSize({ width: viewport.width, height: Math.max(height, viewport.height) });
  await page.screenshot({ path: join(SCREENSHOT_DIR, `${name}-${viewport.width}.png`) });
  await page.setViewportSize(viewport);
}

/** Waits until the locator is visible; playwright-core has no expect(), and a timeout here names what was missing. */
export async function visible(locator: Locator): Promise<Locator> {
  await locator.waitFor({ state: 'visible' });
  return locator;
}

export const heading = (page: Page, name: string | RegExp) => page.getByRole('heading', { level: 1, name });
export const sectionNav = (page: Page) => page.getByRole('navigation', { name: 'Sections' });

interface AxeViolation {
  id: string;
  help: string;
  nodes: { target: string[] }[];
}

/**
 * Runs axe-core (Deque's engine for the WCAG 2.1 A and AA success criteria) in the page and fails on any violation,
 * naming the rule and the elements, so contrast, labels and landmarks are checked against the standard, not by eye.
 */
export async function assertAccessible(page: Page): Promise<void> {
  const { default: axe } = await import('axe-core');
  await page.evaluate(axe.source);
  const violations = await page.evaluate(async () => {
    const result = await (window as unknown as { axe: { run(ctx: Document, opts: object): Promise<{ violations: AxeViolation[] }> } }).axe.run(document, {
      runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'] },
    });
    return result.violations.map((v) => ({ id: v.id, help: v.help, nodes: v.nodes.map((n) => ({ target: n.target })) }));
  });
  const summary = violations.map((v) => `${v.id}: ${v.help} — ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
  if (summary.length) throw new Error(`Accessibility violations on ${page.url()}:\n${summary.join('\n')}`);
}

/** Every page a test visits on purpose is photographed for review and checked against WCAG by axe. */
export async function recordPage(page: Page, name: string): Promise<void> {
  await screenshot(page, name);
  await assertAccessible(page);
}

/** Opens a section the way a person would: from the section bar, or on phones through "More" when it is not on the bar. */
export async function goToSection(page: Page, name: string): Promise<void> {
  const link = sectionNav(page).getByRole('link', { name, exact: true });
  if ((await link.count()) > 0) return link.click();
  await sectionNav(page).getByRole('link', { name: 'More', exact: true }).click();
  await page.getByRole('main').getByRole('link', { name, exact: true }).click();
}
