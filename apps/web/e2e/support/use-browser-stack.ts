import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, inject } from 'vitest';
import { launchBrowser } from './browser';
import { freshDemoDatabase, type FreshDemoDatabase } from './fresh-demo-database';
import { E2eStack } from './stack';

declare module 'vitest' {
  export interface ProvidedContext {
    /** The ports of the run's shared stack (docker-free-scripts/test-setup/browser-project.ts). */
    sharedStack: { apiPort: number; mailHttpPort: number };
  }
}

export interface BrowserStackOptions {
  /** Start from a demo database of the flow's own, seeded just now and dropped afterwards (see freshDemoDatabase). */
  freshDemoFor?: string;
}

/**
 * A stack and one Chromium for a test file. Without options the file uses the run's shared stack (started once by
 * the browser project's global set-up, against gelpoint_e2e); with freshDemoFor it gets a stack of its own over its
 * own copy of the demo, started before its tests and stopped after them.
 */
export function useBrowserStack(options: BrowserStackOptions = {}): { stack: E2eStack; browser: () => Browser } {
  const ownStack = Boolean(options.freshDemoFor);
  const stack = ownStack ? new E2eStack() : E2eStack.shared(inject('sharedStack'));
  let browser: Browser | undefined;
  let database: FreshDemoDatabase | undefined;
  beforeAll(async () => {
    // Chromium starts while the database and the processes do; kept even when they fail, so afterAll closes it.
    const starting = launchBrowser();
    try {
      if (options.freshDemoFor) {
        database = await freshDemoDatabase(options.freshDemoFor);
        await stack.start(database.url);
      }
    } finally {
      browser = await starting;
    }
  }, 120_000);
  afterAll(async () => {
    await browser?.close();
    if (ownStack) await stack.stop();
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
