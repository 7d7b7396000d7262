import type { Browser } from 'playwright-core';
import { afterAll, beforeAll } from 'vitest';
import { launchBrowser } from './browser';
import { E2eStack } from './stack';

/** The whole stack and one Chromium for a test file: started before its tests, stopped after them. */
export function useBrowserStack(): { stack: E2eStack; browser: () => Browser } {
  const stack = new E2eStack();
  let browser: Browser | undefined;
  beforeAll(async () => {
    await stack.start();
    browser = await launchBrowser();
  }, 60_000);
  afterAll(async () => {
    await browser?.close();
    await stack.stop();
  });
  return {
    stack,
    browser: () => {
      if (!browser) throw new Error('the browser is not started yet: use it inside a test');
      return browser;
    },
  };
}
