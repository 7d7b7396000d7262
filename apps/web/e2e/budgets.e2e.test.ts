import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { deleteMould, signedInState, uploadAnalysedMould } from '../bench/app-session';
import { budgets } from '../bench/budgets';
import { pocketBlockStl } from '../bench/pocket-block-stl';
import { recordScripts, totalGzipBytes } from '../bench/script-loads';
import { watchedPage } from './support/browser';
import { useBrowserStack } from './support/use-browser-stack';

const e2e = useBrowserStack();
const stack = e2e.stack;

/** The scripts the built index.html asks for before anything runs: the entry and its module preloads. */
function entryScripts(): string[] {
  const html = readFileSync(join(import.meta.dirname, '../dist/index.html'), 'utf8');
  return [...html.matchAll(/<(?:script[^>]*\bsrc|link[^>]*rel="modulepreload"[^>]*\bhref)="\/assets\/([^"]+\.js)"/g)].map((m) => m[1]!);
}

describe('the performance budget of the built app, measured from the network in Chromium', () => {
  it('loads the signed-in home with under 250 kB of gzip JavaScript and no three.js, which only the mould page fetches', { timeout: 90_000 }, async () => {
    const state = await signedInState(e2e.browser(), stack.baseUrl, 'maker@gelpoint.test', 'gelpoint-demo');
    const context = await e2e.browser().newContext({ storageState: state, viewport: { width: 1280, height: 900 } });
    const { page, watch } = await watchedPage(context, stack.baseUrl);

    const home = recordScripts(page);
    await page.goto(`${stack.baseUrl}/today`, { waitUntil: 'networkidle' });
    await expect.poll(() => page.getByRole('heading', { name: 'Today', level: 1 }).isVisible()).toBe(true);
    home.stop();
    const loads = await home.loads();
    // The recorder must have seen what index.html itself names, or the sum below would prove nothing.
    expect(loads.map((l) => l.name)).toEqual(expect.arrayContaining(entryScripts()));
    // Sizes are gzip of each body by node:zlib (the reference implementation of RFC 1952 that Node ships).
    expect(totalGzipBytes(loads)).toBeLessThan(budgets.initialJsGzipBytes.max);
    expect(loads.filter((l) => l.isThree).map((l) => l.name)).toEqual([]);

    const mouldId = await uploadAnalysedMould(page, pocketBlockStl(), `Budget check block ${Date.now()}`);
    const mould = recordScripts(page);
    await page.goto(`${stack.baseUrl}/moulds/${mouldId}`);
    await expect.poll(() => page.locator('[data-testid="mold-3d"] canvas').count(), { timeout: 30_000 }).toBe(1);
    mould.stop();
    expect((await mould.loads()).filter((l) => l.isThree)).toHaveLength(1);

    await deleteMould(page, mouldId);
    expect(watch.problems).toEqual([]);
    await context.close();
  });
});
