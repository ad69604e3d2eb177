import { Browser } from 'playwright-core';
import { launchBrowser } from './browser';
import { E2eServer, startE2eServer } from './e2e-server';

/** The server and browser of one spec file, started before its tests and stopped after them. */
export interface E2eEnvironment {
  readonly server: E2eServer;
  readonly browser: Browser;
}

/** Registers beforeAll/afterAll for a spec file; read the fields inside tests only. */
export function useE2eEnvironment(): E2eEnvironment {
  let server: E2eServer | undefined;
  let browser: { browser: Browser; close(): Promise<void> } | undefined;
  beforeAll(async () => {
    server = await startE2eServer();
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });
  return {
    get server() {
      if (!server) throw new Error('The e2e server is not started yet: use it inside a test.');
      return server;
    },
    get browser() {
      if (!browser) throw new Error('The browser is not started yet: use it inside a test.');
      return browser.browser;
    },
  };
}
