import type { Page } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import { watchedPage } from './support/browser';
import { deepPourProduct } from './support/deep-pour-product';
import { demoPassword, signInThroughPage } from './support/sign-in';
import { pocketBlockStl } from './support/test-mould';
import { useBrowserStack } from './support/use-browser-stack';

// The shared demo database: the demo sign-ins come from its seed (packages/db/src/seed/demo.ts); the product, piece,
// moulds and plans are made here under unique names.
const e2e = useBrowserStack();
const stack = e2e.stack;
const stamp = `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;

// A 100 × 60 × 30 mm blank with an 80 × 40 × 20 mm pocket routed into its top: the cavity floor stands 10 mm above
// the blank's underside. CRC Concise Encyclopedia of Mathematics, right prism: 15 mm of resin is 80 × 40 × 15 mm³ = 48 mL.
const blank = { block: [100, 60, 30] as [number, number, number], pocket: [80, 40, 20] as [number, number, number] };
const depthMm = 15;
const resinMl = (80 * 40 * depthMm) / 1000;

async function token(email: string): Promise<string> {
  const res = await fetch(`${stack.baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password: demoPassword }),
  });
  expect(res.status).toBe(200);
  return ((await res.json()) as { token: string }).token;
}

async function call<T>(auth: string, method: string, path: string, body?: unknown): Promise<T> {
  const res = await fetch(`${stack.baseUrl}/api${path}`, {
    method,
    headers: { Authorization: `Bearer ${auth}`, ...(body === undefined ? {} : { 'Content-Type': 'application/json' }) },
    ...(body === undefined ? {} : { body: JSON.stringify(body) }),
  });
  const text = await res.text();
  if (!res.ok) throw new Error(`${method} ${path} answered ${res.status}: ${text}`);
  return (text ? JSON.parse(text) : undefined) as T;
}

async function upload(auth: string, bytes: Buffer, fields: Record<string, string>): Promise<string> {
  const form = new FormData();
  form.append('file', new Blob([new Uint8Array(bytes)]), 'blank.stl');
  for (const [k, v] of Object.entries(fields)) form.append(k, v);
  const res = await fetch(`${stack.baseUrl}/api/molds`, { method: 'POST', headers: { Authorization: `Bearer ${auth}` }, body: form });
  expect(res.status).toBe(202);
  return ((await res.json()) as { id: string }).id;
}

/** Waits for the worker to finish the mould's analysis (it is woken by the upload). */
async function analysed(auth: string, moldId: string): Promise<void> {
  const deadline = Date.now() + 30_000;
  for (;;) {
    const { status } = await call<{ status: string }>(auth, 'GET', `/molds/${moldId}`);
    if (status === 'ready') return;
    if (status === 'failed' || Date.now() > deadline) throw new Error(`the mould's analysis ended ${status}`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

interface World {
  maker: string;
  productName: string;
  pieceId: string;
  pieceName: string;
  moldId: string;
  moldName: string;
  planId: string;
}
const world = {} as World;

beforeAll(async () => {
  const lead = await token('lead@gelpoint.test');
  world.maker = await token('maker@gelpoint.test');
  world.productName = `Links Deep ${stamp}`;
  await call(lead, 'POST', '/shelf/resin-systems', deepPourProduct(world.productName));
  world.pieceName = `Links tray ${stamp}`;
  world.pieceId = (await call<{ id: string }>(world.maker, 'POST', '/pieces', { name: world.pieceName })).id;
  world.moldName = `Links pocket ${stamp}`;
  world.moldId = await upload(world.maker, pocketBlockStl(blank).bytes, { name: world.moldName, pieceId: world.pieceId, units: 'mm', up: 'z' });
  await analysed(world.maker, world.moldId);
}, 60_000);

async function makerPage(width = 1440): Promise<{ page: Page; watch: { problems: string[] }; close: () => Promise<void> }> {
  const context = await e2e.browser().newContext({ viewport: { width, height: 1000 } });
  const { page, watch } = await watchedPage(context, stack.baseUrl);
  page.setDefaultTimeout(10_000);
  await signInThroughPage(page, stack.baseUrl, 'maker@gelpoint.test');
  return { page, watch, close: () => context.close() };
}

describe('one datum for the fill level, in the browser', () => {
  it(
    'gives the same resin for the same depth on the mould page, in the planner from the mould and from a quick shape, and in the API',
    { timeout: 90_000 },
    async () => {
      const { page, watch, close } = await makerPage();

      await page.goto(`${stack.baseUrl}/moulds/${world.moldId}`);
      const volume = page.getByTestId('fill-volume');
      await expect.poll(() => volume.textContent(), { timeout: 20_000 }).toBe('64.0 mL');
      // The report opens at the rim: 20 mm above the pocket floor, 30 mm in the file's own frame.
      const level = page.getByLabel('Fill level', { exact: true });
      expect(await level.inputValue()).toBe('20.0');
      await level.fill(String(depthMm));
      await expect.poll(() => volume.textContent()).toBe(`${resinMl.toFixed(1)} mL`);
      expect(await page.getByTestId('level-in-mould-frame').textContent()).toBe(
        'In the mould file’s own frame: resin surface at 25.0 mm, cavity floor at 10.0 mm.',
      );
      // The curve's axis is the input's: it runs from the floor (0) to the rim (20).
      const plotTitle = page.getByRole('img', { name: /Volume against fill level/ });
      await expect.poll(() => plotTitle.count()).toBe(1);
      const ticks = await plotTitle.locator('text').allTextContents();
      expect(ticks).toContain('0');
      expect(ticks).toContain('20');
      expect(ticks).not.toContain('30');

      await page.goto(`${stack.baseUrl}/pieces/${world.pieceId}/pour-plans/new`);
      const planner = page.getByRole('form', { name: 'Pour plan' });
      await planner.getByLabel('Plan name', { exact: true }).fill(`From the mould ${stamp}`);
      await planner.getByText("The piece's mould", { exact: true }).click();
      await planner.getByLabel('Mould', { exact: true }).selectOption({ label: world.moldName });
      await planner.getByLabel('Fill level (mm)', { exact: true }).fill(String(depthMm));
      const deep = planner.getByLabel('Deep-pour product', { exact: true });
      await deep.selectOption((await deep.locator('option', { hasText: world.productName }).getAttribute('value'))!);
      await planner.getByLabel('Over-pour (% of each layer)', { exact: true }).fill('0');
      await planner.getByLabel('Shop temperature (°C)', { exact: true }).fill('21');
      await expect
        .poll(() => planner.getByTestId('planner-level-in-mould-frame').textContent())
        .toBe('In the mould file’s own frame: cavity floor at 10.0 mm, resin surface at 25.0 mm.');
      const live = page.getByRole('region', { name: 'Live numbers of this plan' });
      // One 15 mm layer under the product's 30 mm limit, holding the prism's 48 mL.
      await expect.poll(() => live.getByText('1 × 15.0 mm').isVisible(), { timeout: 10_000 }).toBe(true);
      expect(
        await live
          .getByText(`${resinMl.toFixed(1)} mL`)
          .first()
          .isVisible(),
      ).toBe(true);

      // The same pocket typed as a quick shape gives the same resin for the same depth.
      await planner.getByText('A quick shape', { exact: true }).click();
      await planner.getByLabel('Shape of the cavity', { exact: true }).selectOption('rectangle');
      await planner.getByLabel('Length (mm)', { exact: true }).fill('80');
      await planner.getByLabel('Width (mm)', { exact: true }).fill('40');
      await planner.getByLabel('Depth (mm)', { exact: true }).fill('20');
      await expect.poll(() => live.getByText('1 × 15.0 mm').isVisible(), { timeout: 10_000 }).toBe(true);
      expect(
        await live
          .getByText(`${resinMl.toFixed(1)} mL`)
          .first()
          .isVisible(),
      ).toBe(true);

      await planner.getByText("The piece's mould", { exact: true }).click();
      await expect.poll(() => planner.getByLabel('Mould', { exact: true }).locator('option:checked').textContent()).toBe(world.moldName);
      await planner.getByRole('button', { name: 'Save pour plan' }).click();
      await page.waitForURL(/\/pour-plans\/[0-9a-f-]{36}$/);
      world.planId = page.url().split('/').at(-1)!;
      const stored = page.getByRole('region', { name: 'The saved plan' });
      await expect.poll(() => stored.getByText('1 × 15.0 mm').isVisible()).toBe(true);
      expect(
        await stored
          .getByText(`${resinMl.toFixed(1)} mL`)
          .first()
          .isVisible(),
      ).toBe(true);
      expect(await page.getByRole('link', { name: world.moldName }).isVisible()).toBe(true);

      const saved = await call<{ inputs: { fillLevelMm: number; levelFrom: string }; result: { fill: { fillVolumeMl: number } } }>(
        world.maker,
        'GET',
        `/pour-plans/${world.planId}`,
      );
      expect(saved.inputs).toMatchObject({ fillLevelMm: depthMm, levelFrom: 'floor' });
      expect(saved.result.fill.fillVolumeMl).toBeCloseTo(resinMl, 6);
      const fill = await call<{ volumeMm3: number }>(world.maker, 'GET', `/molds/${world.moldId}/fill?level=${depthMm}`);
      expect(fill.volumeMm3).toBeCloseTo(resinMl * 1000, 3);
      expect(watch.problems).toEqual([]);
      await close();
    },
  );
});

describe('links that hold, in the browser', () => {
  it('opens a mould plan for editing with its mould chosen, keeps a draft across a reload and asks before leaving', { timeout: 90_000 }, async () => {
    const { page, watch, close } = await makerPage();
    const unloadPrompts: string[] = [];
    page.on('dialog', (dialog) => {
      unloadPrompts.push(dialog.type());
      void dialog.accept();
    });

    await page.goto(`${stack.baseUrl}/pour-plans/${world.planId}/edit`);
    const planner = page.getByRole('form', { name: 'Pour plan' });
    await expect.poll(() => planner.getByLabel('Mould', { exact: true }).locator('option:checked').textContent()).toBe(world.moldName);
    expect(await planner.getByLabel("The piece's mould").isChecked()).toBe(true);
    const fillLevel = planner.getByLabel('Fill level (mm)', { exact: true });
    expect(await fillLevel.inputValue()).toBe(String(depthMm));

    // Opened and left as it is: nothing to ask about.
    await page.getByRole('link', { name: 'Back to the plan' }).click();
    await page.waitForURL(new RegExp(`/pour-plans/${world.planId}$`));
    await page.getByRole('link', { name: 'Edit plan' }).click();
    await page.waitForURL(/\/edit$/);

    await fillLevel.fill('18');
    await planner.getByLabel('Plan name', { exact: true }).fill(`Changed ${stamp}`);
    // The draft is written a moment after typing stops.
    await page.waitForTimeout(800);
    await page.reload();
    expect(unloadPrompts).toContain('beforeunload');
    await expect.poll(() => page.getByText('Your unsaved changes are back').isVisible()).toBe(true);
    expect(await fillLevel.inputValue()).toBe('18');
    expect(await planner.getByLabel('Plan name', { exact: true }).inputValue()).toBe(`Changed ${stamp}`);
    await expect.poll(() => planner.getByLabel('Mould', { exact: true }).locator('option:checked').textContent()).toBe(world.moldName);

    // Leaving inside the app asks first; staying keeps the page as it is.
    await page.getByRole('link', { name: 'Back to the plan' }).click();
    const question = page.getByRole('dialog', { name: 'Leave without saving?' });
    await expect.poll(() => question.isVisible()).toBe(true);
    await question.getByRole('button', { name: 'Stay and save' }).click();
    expect(page.url()).toMatch(/\/edit$/);
    await page.getByRole('link', { name: 'Back to the plan' }).click();
    await question.getByRole('button', { name: 'Leave the planner' }).click();
    await page.waitForURL(new RegExp(`/pour-plans/${world.planId}$`));

    // Back in the planner the draft is there still; saving it forgets it.
    await page.getByRole('link', { name: 'Edit plan' }).click();
    await page.waitForURL(/\/edit$/);
    await expect.poll(() => fillLevel.inputValue()).toBe('18');
    await planner.getByRole('button', { name: 'Save changes' }).click();
    await page.waitForURL(new RegExp(`/pour-plans/${world.planId}$`));
    // 80 × 40 × 18 mm³ = 57.6 mL (prism, CRC).
    await expect.poll(() => page.getByRole('region', { name: 'The saved plan' }).getByText('57.6 mL').first().isVisible()).toBe(true);
    await page.getByRole('link', { name: 'Edit plan' }).click();
    await page.waitForURL(/\/edit$/);
    await expect.poll(() => fillLevel.inputValue()).toBe('18');
    expect(await page.getByText('Your unsaved changes are back').count()).toBe(0);
    expect(await page.evaluate(() => Object.keys(localStorage).filter((k) => k.startsWith('gelpoint:planner-draft:')))).toEqual([]);
    expect(watch.problems).toEqual([]);
    await close();
  });

  it(
    'refuses to delete a mould a plan uses, naming the plan, and corrects a mould’s units and piece without uploading it again',
    { timeout: 120_000 },
    async () => {
      const { page, watch, close } = await makerPage();
      await page.goto(`${stack.baseUrl}/moulds/${world.moldId}`);
      await page.getByRole('button', { name: 'Delete mould' }).click();
      await page.getByRole('button', { name: 'Delete for good' }).click();
      await expect
        .poll(() =>
          page
            .getByRole('dialog')
            .getByText(/is the cavity of the pour plan “Changed /)
            .isVisible(),
        )
        .toBe(true);
      await page.getByRole('button', { name: 'Keep it' }).click();
      expect(page.url()).toMatch(new RegExp(`/moulds/${world.moldId}$`));

      // The same blank drawn in centimetres but uploaded as millimetres, and with no piece: a tenth of its size.
      const smallName = `Links drawn in cm ${stamp}`;
      const smallId = await upload(world.maker, pocketBlockStl({ block: [10, 6, 3], pocket: [8, 4, 2] }).bytes, { name: smallName, units: 'mm', up: 'z' });
      await analysed(world.maker, smallId);
      await page.goto(`${stack.baseUrl}/moulds/${smallId}`);
      const volume = page.getByTestId('fill-volume');
      await expect.poll(() => volume.isVisible(), { timeout: 20_000 }).toBe(true);
      expect(await volume.textContent()).not.toBe('64.0 mL');
      const settings = page.getByRole('form', { name: 'Name, piece and frame' });
      await settings.getByLabel('Units in the file', { exact: true }).selectOption('cm');
      await settings.getByLabel('Piece', { exact: true }).selectOption({ label: world.pieceName });
      await settings.getByLabel('Mould name', { exact: true }).fill(`${smallName}, corrected`);
      await settings.getByRole('button', { name: 'Save changes' }).click();
      await expect.poll(() => settings.getByText(/The file is being read again/).isVisible(), { timeout: 10_000 }).toBe(true);
      // Read again as centimetres (1 cm = 10 mm, NIST SP 811): the 80 × 40 × 20 mm pocket, 64 mL to the rim.
      await expect.poll(() => volume.textContent(), { timeout: 30_000 }).toBe('64.0 mL');
      expect(await page.getByRole('heading', { level: 1, name: `${smallName}, corrected` }).isVisible()).toBe(true);
      expect(await page.getByRole('link', { name: `For ${world.pieceName}` }).isVisible()).toBe(true);
      expect(watch.problems).toEqual([]);
      await close();
    },
  );

  it('lists a piece’s moulds, plans and pours on its page, each linked with its state', { timeout: 60_000 }, async () => {
    const pour = await call<{ id: string }>(world.maker, 'POST', '/pours', { pourPlanId: world.planId });
    const { page, watch, close } = await makerPage();
    await page.goto(`${stack.baseUrl}/pieces/${world.pieceId}`);
    const molds = page.getByRole('list', { name: 'Moulds of this piece' });
    await expect.poll(() => molds.getByRole('listitem').count()).toBe(2);
    expect(await molds.getByRole('link', { name: world.moldName }).getAttribute('href')).toBe(`/moulds/${world.moldId}`);
    expect(await molds.getByRole('listitem').filter({ hasText: world.moldName }).getByText('64.0 mL to the top').isVisible()).toBe(true);
    const plans = page.getByRole('list', { name: 'Pour plans of this piece' });
    await expect.poll(() => plans.getByRole('listitem').count()).toBe(1);
    expect(await plans.getByRole('link', { name: `Changed ${stamp}` }).getAttribute('href')).toBe(`/pour-plans/${world.planId}`);
    expect(await plans.getByRole('link', { name: world.moldName }).getAttribute('href')).toBe(`/moulds/${world.moldId}`);
    const pours = page.getByRole('list', { name: 'Pours of this piece' });
    await expect.poll(() => pours.getByRole('listitem').count()).toBe(1);
    expect(await pours.getByRole('link', { name: `Changed ${stamp}` }).getAttribute('href')).toBe(`/pours/${pour.id}`);
    expect(await pours.getByText('Curing: Liquid, not yet gelled').isVisible()).toBe(true);
    await pours.getByRole('link', { name: `Changed ${stamp}` }).click();
    await page.waitForURL(new RegExp(`/pours/${pour.id}$`));
    expect(watch.problems).toEqual([]);
    await close();
  });
});
