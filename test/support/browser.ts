/**
 * Debian's Chromium driven by playwright-core, with the flags this sandbox needs; every request
 * is recorded so tests can assert that nothing leaves localhost.
 */
import { existsSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

export const CHROMIUM = '/usr/bin/chromium';
export const ARTIFACTS = resolve(__dirname, '..', '..', 'test-artifacts');
const FLAGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export interface BrowserSession {
  context: BrowserContext;
  page: Page;
  /** Every URL the page requested, blocked or not. */
  requests: string[];
  close(): Promise<void>;
}

export function chromiumAvailable(): boolean {
  return existsSync(CHROMIUM);
}

export async function openPage(url: string): Promise<BrowserSession> {
  const profile = mkdtempSync(join(tmpdir(), 'plumbline-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    headless: true,
    args: FLAGS,
    viewport: { width: 1600, height: 1000 },
  });
  const requests: string[] = [];
  const origin = new URL(url).origin;
  await context.route('**/*', (route) => {
    requests.push(route.request().url());
    return route.request().url().startsWith(origin) ? route.continue() : route.abort('blockedbyclient');
  });
  const page = context.pages()[0] ?? (await context.newPage());
  await page.goto(url);
  return {
    context,
    page,
    requests,
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(ARTIFACTS, { recursive: true });
  const path = join(ARTIFACTS, `${name}.png`);
  await page.screenshot({ path });
  return path;
}
