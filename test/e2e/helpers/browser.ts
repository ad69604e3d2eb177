import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Browser, BrowserContext, chromium, Page } from 'playwright-core';
import AxeBuilder from '@axe-core/playwright';

const CHROMIUM_FLAGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/** Debian's Chromium, headless, with a fresh profile folder of its own. */
export async function launchBrowser(): Promise<{ browser: Browser; close(): Promise<void> }> {
  const profileRoot = mkdtempSync(join(tmpdir(), 'commonwort-e2e-'));
  process.env.TMPDIR = profileRoot;
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', headless: true, args: CHROMIUM_FLAGS });
  return {
    browser,
    async close() {
      await browser.close();
      rmSync(profileRoot, { recursive: true, force: true });
    },
  };
}

export async function newPage(browser: Browser, baseURL: string, viewport = { width: 1280, height: 800 }): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ baseURL, viewport });
  return { context, page: await context.newPage() };
}

/** The serious and critical accessibility violations on the page as it is now (rule id and a target each). */
export async function seriousA11yViolations(page: Page): Promise<string[]> {
  // Check the page as it settles, not mid-change: rendered (every page has an h1), the icon font
  // loaded (until then an icon shows its ligature as text), a snack bar past its first 150 ms (its
  // content stays aria-hidden until announced) and no transition running (a half-faded element has
  // a contrast it never keeps).
  await page.waitForFunction(
    () =>
      document.querySelector('h1') !== null &&
      document.fonts.status === 'loaded' &&
      !document.querySelector('mat-snack-bar-container [aria-hidden="true"] button') &&
      document.getAnimations().every((animation) => animation.playState !== 'running'),
  );
  await page.evaluate(() => new Promise((resolve) => requestAnimationFrame(() => requestAnimationFrame(resolve))));
  const results = await new AxeBuilder({ page }).analyze();
  return results.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
}
