import type { Browser } from 'playwright-core';
import { afterAll, beforeAll } from 'vitest';
import { launchBrowser } from './browser';
import { freshDemoDatabase, type FreshDemoDatabase } from './fresh-demo-database';
import { E2eStack } from './stack';

export interface BrowserStackOptions {
  /** Start from a demo database of the flow's own, seeded just now and dropped afterwards (see freshDemoDatabase). */
  freshDemoFor?: string;
}

/** The whole stack and one Chromium for a test file: started before its tests, stopped after them. */
export function useBrowserStack(options: BrowserStackOptions = {}): { stack: E2eStack; browser: () => Browser } {
  const stack = new E2eStack();
  let browser: Browser | undefined;
  let database: FreshDemoDatabase | undefined;
  beforeAll(async () => {
    // Chromium starts while the database and the processes do; kept even when they fail, so afterAll closes it.
    const starting = launchBrowser();
    try {
      if (options.freshDemoFor) database = await freshDemoDatabase(options.freshDemoFor);
      await stack.start(database?.url);
    } finally {
      browser = await starting;
    }
  }, 120_000);
  afterAll(async () => {
    await browser?.close();
    await stack.stop();
    await database?.drop();
  });
  return {
    stack,
    browser: () => {
      if (!browser) throw new Error('the browser is not started yet: use it inside a test');
      return browser;
    },
  };
}
