import { beforeAll, describe, expect, it } from 'vitest';
import { axeFindings, focusProblems, type Finding, type FocusProblem } from './support/a11y-checks';
import { watchedPage, type PageWatch } from './support/browser';
import { prepareMainPages, publicPages, settle, signIn, signedInPages, type DemoRole, type MainPage, type PageFixtures } from './support/main-pages';
import { useBrowserStack } from './support/use-browser-stack';

// A demo database of this file's own, seeded just now (packages/db/src/seed); the mould and the invitation are made here.
const e2e = useBrowserStack({ freshDemoFor: 'a11y' });
const stack = e2e.stack;

let fixtures: PageFixtures;
let invitation = '';

beforeAll(async () => {
  ({ fixtures, invitation } = await prepareMainPages(e2e.browser(), stack, 'a11y'));
}, 60_000);

/**
 * axe on the pages given; the Tab walk too when asked. The lead can open every page and sees every control the
 * other roles see and more, so the lead and the signed-out pages get both checks, and the maker and the apprentice
 * get axe on the pages where their view differs (a machine of two cores runs the whole set within the time limit).
 */
async function checkPages(
  role: DemoRole | null,
  pages: MainPage[],
  walkFocus: boolean,
  watchAll: PageWatch[],
): Promise<{ findings: Finding[]; focus: FocusProblem[]; stops: number }> {
  const context = await e2e.browser().newContext({ viewport: { width: 1280, height: 900 } });
  const { page, watch } = await watchedPage(context, stack.baseUrl);
  watchAll.push(watch);
  page.setDefaultTimeout(20_000);
  if (role) await signIn(page, stack.baseUrl, role);
  const findings: Finding[] = [];
  const focus: FocusProblem[] = [];
  let stops = 0;
  for (const p of pages) {
    await page.goto(`${stack.baseUrl}${p.path}`);
    await settle(page);
    findings.push(...(await axeFindings(page, { page: p.name, role: role ?? 'signed out' })));
    if (!walkFocus) continue;
    const tabbed = await focusProblems(page, `${p.name} (${role ?? 'signed out'})`);
    focus.push(...tabbed.problems);
    stops += tabbed.stops;
  }
  await context.close();
  return { findings, focus, stops };
}

// Where the maker's and the apprentice's view differs from the lead's: other buttons, other notes, other reminders.
const ownViews: Record<DemoRole, ReadonlySet<string> | null> = {
  lead: null,
  maker: new Set(['today', 'pieces', 'piece', 'mould', 'planner', 'plan', 'cure board', 'pour', 'shelf', 'resin system']),
  apprentice: new Set(['today', 'pieces', 'piece', 'mould', 'plan', 'run sheet', 'cure board', 'pour', 'new pour', 'shelf lots', 'lot']),
};
const pagesOf = (role: DemoRole) => signedInPages(fixtures).filter((p) => p.roles.includes(role) && (ownViews[role]?.has(p.name) ?? true));

describe('accessibility of every main page in a real browser', () => {
  it('finds no serious or critical axe violation and a visible focus on every tab stop, for every role and signed out', { timeout: 150_000 }, async () => {
    const watches: PageWatch[] = [];
    // Two browser contexts at a time: the machine has two cores.
    const runs = await Promise.all([
      checkPages(null, publicPages(invitation), true, watches).then(async (signedOut) => [signedOut, await checkPages('lead', pagesOf('lead'), true, watches)]),
      checkPages('maker', pagesOf('maker'), false, watches).then(async (maker) => [
        maker,
        await checkPages('apprentice', pagesOf('apprentice'), false, watches),
      ]),
    ]).then((pairs) => pairs.flat());
    const findings = runs.flatMap((r) => r.findings);
    const focus = runs.flatMap((r) => r.focus);
    expect(findings.map((f) => `${f.role} · ${f.page}: ${f.rule} (${f.impact}) ${f.help} → ${f.targets.join(' | ')}`)).toEqual([]);
    expect(focus.map((f) => `${f.page}: ${f.element}`)).toEqual([]);
    // Each page has something to tab to, so the focus check above looked at real stops.
    expect(runs.reduce((sum, r) => sum + r.stops, 0)).toBeGreaterThan(100);
    expect(watches.flatMap((w) => w.problems)).toEqual([]);
  });

  it('keeps forms with their errors shown, the delete question and the phone menu free of serious violations', { timeout: 60_000 }, async () => {
    const context = await e2e.browser().newContext({ viewport: { width: 1280, height: 900 } });
    const { page, watch } = await watchedPage(context, stack.baseUrl);
    page.setDefaultTimeout(20_000);
    const findings: Finding[] = [];

    await page.goto(`${stack.baseUrl}/sign-in`);
    await settle(page);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect.poll(() => page.locator('[aria-invalid="true"]').count()).toBeGreaterThan(0);
    findings.push(...(await axeFindings(page, { page: 'sign in with errors', role: 'signed out' })));

    await signIn(page, stack.baseUrl, 'lead');
    await page.goto(`${stack.baseUrl}/pieces/new`);
    await settle(page);
    await page.getByRole('button', { name: 'Create piece' }).click();
    await expect.poll(() => page.locator('[aria-invalid="true"]').count()).toBeGreaterThan(0);
    findings.push(...(await axeFindings(page, { page: 'new piece with errors', role: 'lead' })));

    await page.goto(`${stack.baseUrl}/pieces/${fixtures.pieceId}`);
    await settle(page);
    await page.getByRole('button', { name: 'Delete piece' }).click();
    await expect.poll(() => page.getByRole('dialog').isVisible()).toBe(true);
    findings.push(...(await axeFindings(page, { page: 'delete question', role: 'lead' })));
    await page.keyboard.press('Escape');
    await expect.poll(() => page.getByRole('dialog').count()).toBe(0);

    await page.setViewportSize({ width: 375, height: 812 });
    await page.getByRole('button', { name: 'Menu' }).click();
    await expect.poll(() => page.getByRole('navigation', { name: 'Main' }).isVisible()).toBe(true);
    findings.push(...(await axeFindings(page, { page: 'phone menu open', role: 'lead' })));

    expect(findings.map((f) => `${f.role} · ${f.page}: ${f.rule} (${f.impact}) ${f.help} → ${f.targets.join(' | ')}`)).toEqual([]);
    expect(watch.problems).toEqual([]);
    await context.close();
  });

  it('gives the 3D mould view its numbers in words, and shows stages and cautions in words or icons, not colour alone', { timeout: 60_000 }, async () => {
    const context = await e2e.browser().newContext({ viewport: { width: 1280, height: 900 } });
    const { page, watch } = await watchedPage(context, stack.baseUrl);
    page.setDefaultTimeout(15_000);
    await signIn(page, stack.baseUrl, 'maker');

    await page.goto(`${stack.baseUrl}/moulds/${fixtures.moldId}`);
    await settle(page);
    const view = page.getByTestId('mold-3d').getByRole('img', { name: /The mould in 3D/ });
    await expect.poll(() => view.locator('canvas').count()).toBe(1);
    // The canvas is a picture with a name; its description is the figure's caption, the numbers in words.
    const description = await view.evaluate((el) =>
      (el.getAttribute('aria-describedby') ?? '')
        .split(' ')
        .map((id) => document.getElementById(id)?.textContent ?? '')
        .join(' '),
    );
    // Prism formula (CRC Concise Encyclopedia of Mathematics): the 80 × 40 × 20 mm pocket holds 64 000 mm³ = 64 mL at its rim.
    expect(description).toContain('64.0 mL');
    expect(description).toContain('100.0 mm × 60.0 mm × 30.0 mm');

    await page.goto(`${stack.baseUrl}/cure-board?status=all`);
    await settle(page);
    const cards = page.getByRole('list', { name: 'Pours' }).getByRole('listitem');
    expect(await cards.count()).toBeGreaterThanOrEqual(2);
    for (const card of await cards.all()) {
      // A stage word beside its own icon on each card, so the stage reads without the bar's colour.
      const stage = card.locator('p', { has: page.locator('svg') }).first();
      expect(await stage.textContent()).toMatch(/Liquid|Gelled|Next layer|Tack-free|Next-layer window|demold|cured|machine/i);
      expect(await card.getByRole('progressbar').getAttribute('aria-valuetext')).toMatch(/\d+ %/);
    }

    await page.goto(`${stack.baseUrl}/pour-plans/${fixtures.planId}`);
    await settle(page);
    const cautionLists = page.getByRole('list', { name: /^Cautions for/ });
    expect(await cautionLists.count()).toBeGreaterThanOrEqual(1);
    // Every caution says its severity in a word beside its own glyph (circle, triangle, octagon), never by tint alone.
    for (const item of await cautionLists.getByRole('listitem').all()) {
      expect(await item.textContent()).toMatch(/^(Danger|Caution|Note):/);
      expect(await item.locator('svg').count()).toBe(1);
    }
    expect(watch.problems).toEqual([]);
    await context.close();
  });
});
