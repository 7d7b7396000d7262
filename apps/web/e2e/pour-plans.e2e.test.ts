import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { watchedPage } from './support/browser';
import { useBrowserStack } from './support/use-browser-stack';

// The demo sign-ins come from the demo seed (packages/db/src/seed/demo.ts); everything else is made here, with unique names.
const e2e = useBrowserStack();
const stack = e2e.stack;

async function signIn(page: Page, email: string) {
  await page.goto(`${stack.baseUrl}/sign-in`);
  await page.getByLabel('Email').fill(email);
  await page.getByLabel('Password').fill('gelpoint-demo');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/today$/);
}

const pdfMagic = '%PDF-';

describe('the shelf and the pour planner in a real browser', () => {
  it('lets the lead add a product and a maker plan a two-layer pour with a seal coat, then print its run sheet', async () => {
    const stamp = Date.now();
    const productName = `Test Deep 20 ${stamp}`;
    const pieceName = `Test tray ${stamp}`;

    const lead = await e2e.browser().newContext({ viewport: { width: 1280, height: 900 } });
    const leadPage = await watchedPage(lead, stack.baseUrl);
    leadPage.page.setDefaultTimeout(10_000);
    await signIn(leadPage.page, 'lead@gelpoint.test');
    await leadPage.page.goto(`${stack.baseUrl}/shelf`);
    await leadPage.page.getByRole('link', { name: 'Add resin system' }).click();
    await leadPage.page.waitForURL(/\/shelf\/resin-systems\/new$/);
    const sheet = leadPage.page.getByRole('form', { name: 'New resin system' });
    // An empty form is refused field by field, in the contract's words.
    await sheet.getByRole('button', { name: 'Add to the shelf' }).click();
    await expect.poll(() => sheet.getByText('pot life must be a number').isVisible()).toBe(true);
    const typed: [string, string][] = [
      ['Name', productName],
      ['Shelf life (months)', '12'],
      ['Mix ratio, part A (parts)', '2'],
      ['Mix ratio, part B (parts)', '1'],
      // Typical densities, from memory of data sheets: resin about 1.16 g/mL, amine hardener about 0.97 g/mL.
      ['Density of part A (g/mL)', '1.16'],
      ['Density of part B (g/mL)', '0.97'],
      ['Reference temperature (°C)', '22'],
      ['Pot life (min)', '40'],
      ['Gel time (h)', '8'],
      ['Tack-free (h)', '14'],
      ['Recoat window opens (h)', '10'],
      ['Recoat window closes (h)', '24'],
      ['Demold (h)', '48'],
      ['Full cure (h)', '168'],
      ['Maximum layer (mm)', '20'],
      ['Maximum batch (g)', '4000'],
      ['Minimum working temperature (°C)', '18'],
      ['Maximum working temperature (°C)', '30'],
      ['Price per kit (shop currency)', '180'],
      ['Kit size, A + B together (g)', '6000'],
    ];
    for (const [label, value] of typed) await sheet.getByLabel(label, { exact: true }).fill(value);
    await sheet.getByText('Parts by volume', { exact: true }).click();
    expect(await sheet.getByLabel('Parts by volume').isChecked()).toBe(true);
    // Empty activation energy: the common-practice default (rate doubles per 10 °C) is shown with its value.
    await expect.poll(() => sheet.getByText(/Value used: \d+\.\d kJ\/mol \(the common-practice default\)/).isVisible()).toBe(true);
    await sheet.getByRole('button', { name: 'Add to the shelf' }).click();
    await leadPage.page.waitForURL(/\/shelf\/resin-systems\/[0-9a-f-]{36}$/);
    await leadPage.page.goto(`${stack.baseUrl}/shelf?q=${encodeURIComponent(productName)}`);
    await expect.poll(() => leadPage.page.getByRole('link', { name: productName }).isVisible()).toBe(true);
    await leadPage.page.getByRole('button', { name: 'Product' }).click();
    await expect.poll(() => leadPage.page.getByRole('columnheader', { name: 'Product' }).getAttribute('aria-sort')).toBe('ascending');
    expect(leadPage.watch.problems).toEqual([]);
    await lead.close();

    const maker = await e2e.browser().newContext({ viewport: { width: 1440, height: 1000 } });
    const { page, watch } = await watchedPage(maker, stack.baseUrl);
    page.setDefaultTimeout(10_000);
    await signIn(page, 'maker@gelpoint.test');
    await page.goto(`${stack.baseUrl}/shelf`);
    await expect.poll(() => page.getByText('You can read everything on the shelf.').isVisible()).toBe(true);
    expect(await page.getByRole('link', { name: 'Add resin system' }).count()).toBe(0);

    await page.goto(`${stack.baseUrl}/pieces/new`);
    await page.getByLabel('Name').fill(pieceName);
    await page.getByRole('button', { name: 'Create piece' }).click();
    await page.waitForURL(/\/pieces\/[0-9a-f-]{36}$/);

    await page.goto(`${stack.baseUrl}/pour-plans`);
    await page.getByLabel('Piece to plan for').selectOption({ label: pieceName });
    await page.getByRole('button', { name: 'Plan a pour' }).click();
    await page.waitForURL(/\/pieces\/[0-9a-f-]{36}\/pour-plans\/new$/);

    const planner = page.getByRole('form', { name: 'Pour plan' });
    await planner.getByLabel('Shape of the cavity', { exact: true }).selectOption('rectangle');
    await planner.getByLabel('Length (mm)', { exact: true }).fill('300');
    await planner.getByLabel('Width (mm)', { exact: true }).fill('200');
    await planner.getByLabel('Depth (mm)', { exact: true }).fill('30');
    await planner.getByLabel('Fill level (mm)', { exact: true }).fill('30');
    const productOption = (await planner.getByLabel('Deep-pour product', { exact: true }).locator('option', { hasText: productName }).getAttribute('value'))!;
    await planner.getByLabel('Deep-pour product', { exact: true }).selectOption(productOption);
    await planner.getByLabel('Seal the wood first', { exact: true }).check();
    await planner.getByLabel('Seal-coat product', { exact: true }).selectOption(productOption);
    await planner.getByLabel('Film thickness (mm)', { exact: true }).fill('0.2');
    await planner.getByLabel('Coats', { exact: true }).fill('1');
    await planner.getByLabel('How much the wood soaks up', { exact: true }).selectOption('closed_grain');
    await planner.getByLabel('Over-pour (% of each layer)', { exact: true }).fill('5');
    await planner.getByLabel('Shop temperature (°C)', { exact: true }).fill('22');

    // CRC prism volume: 300 × 200 × 30 mm = 1 800 000 mm³ = 1.80 L; with 5 % over-pour 1.89 L; 30 mm under a 20 mm limit is two 15 mm layers.
    const live = page.getByRole('region', { name: 'Live numbers of this plan' });
    await expect.poll(() => live.getByText('2 × 15.0 mm').isVisible(), { timeout: 10_000 }).toBe(true);
    expect(await live.getByText('1.80 L').first().isVisible()).toBe(true);
    expect(await live.getByText('1.89 L').first().isVisible()).toBe(true);
    expect(await live.getByRole('heading', { name: 'Layer 1 of 2' }).isVisible()).toBe(true);
    expect(await live.getByRole('heading', { name: 'Layer 2 of 2' }).isVisible()).toBe(true);
    expect(await live.getByRole('heading', { name: `Seal coat: ${productName}` }).isVisible()).toBe(true);
    const liveTotal = await live.getByText('Resin to weigh out, A + B + pigment').locator('xpath=following-sibling::dd[1]').textContent();

    await planner.getByRole('button', { name: 'Save pour plan' }).click();
    await page.waitForURL(/\/pour-plans\/[0-9a-f-]{36}$/);
    const planUrl = page.url();
    const stored = page.getByRole('region', { name: 'The saved plan' });
    await expect.poll(() => stored.getByText('2 × 15.0 mm').isVisible()).toBe(true);
    expect(await stored.getByText('1.89 L').first().isVisible()).toBe(true);
    // The server's stored result and the browser's live numbers come from the same core functions.
    expect(await stored.getByText('Resin to weigh out, A + B + pigment').locator('xpath=following-sibling::dd[1]').textContent()).toBe(liveTotal);

    await page.getByRole('link', { name: 'Run sheet' }).click();
    await page.waitForURL(/\/run-sheet$/);
    await expect.poll(() => page.getByRole('article', { name: 'Cup 1 of 3' }).isVisible()).toBe(true);
    expect(await page.getByRole('article', { name: 'Cup 3 of 3' }).getByText('Layer 2 · batch 1 of 1').isVisible()).toBe(true);
    expect(await page.getByRole('navigation', { name: 'Main' }).count()).toBe(0);
    expect(await page.getByRole('heading', { name: 'Before you mix' }).count()).toBe(1);
    expect(await page.getByRole('button', { name: 'Print' }).isVisible()).toBe(true);

    for (const format of ['A4', 'Letter'] as const) {
      const pdf = await page.pdf({ format, printBackground: false });
      expect(pdf.byteLength).toBeGreaterThan(10_000);
      expect(pdf.subarray(0, pdfMagic.length).toString('latin1')).toBe(pdfMagic);
    }

    await page.goto(planUrl);
    await expect.poll(() => page.getByRole('link', { name: 'Edit plan' }).isVisible()).toBe(true);
    expect(watch.problems).toEqual([]);
    await maker.close();
  }, 120_000);
});
