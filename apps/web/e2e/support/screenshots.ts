import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Locator, Page } from 'playwright-core';

const folder = join(import.meta.dirname, '../../../../docs/screenshots');

/** A main screen for the README, as the flow just saw it: docs/screenshots/<name>.png. */
export async function saveScreenshot(page: Page, name: string, options: { from?: Locator } = {}): Promise<void> {
  mkdirSync(folder, { recursive: true });
  // The picture starts at what it is meant to show, not wherever the last field left the page scrolled.
  if (options.from) {
    await options.from.evaluate((element) => {
      element.scrollIntoView({ block: 'start', behavior: 'instant' });
      // A little of what is above, so the picture does not start on the element's border.
      window.scrollBy({ top: -24, behavior: 'instant' });
    });
  } else await page.evaluate(() => window.scrollTo({ top: 0, behavior: 'instant' }));
  // No hover left on the last thing clicked, and the shipped fonts loaded, or the picture shows fallback text.
  await page.mouse.move(0, 0);
  await page.evaluate(() => document.fonts.ready.then(() => undefined));
  await page.screenshot({ path: join(folder, `${name}.png`), animations: 'disabled', caret: 'hide' });
}
