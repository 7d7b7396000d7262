import { formatVolume } from '@gelpoint/core';
import { describe, expect, it } from 'vitest';
import { watchedPage } from './support/browser';
import { deepPourProduct } from './support/deep-pour-product';
import { useBrowserStack } from './support/use-browser-stack';

// A shop of its own, registered here and switched to US units, on a demo database of its own: the shared one must
// hold the demo shop alone (packages/db/src/seed/demo.test.ts counts its shops).
const e2e = useBrowserStack({ freshDemoFor: 'us_units' });
const stack = e2e.stack;
const unique = `${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 6)}`;
const email = `us-units-${unique}@example.test`;
const password = `units-${unique}`;

async function call<T>(method: string, path: string, token: string | null, body: unknown, status: number): Promise<T> {
  const res = await fetch(`${stack.baseUrl}/api${path}`, {
    method,
    headers: { 'Content-Type': 'application/json', ...(token ? { Authorization: `Bearer ${token}` } : {}) },
    ...(body === undefined ? {} : { body: JSON.stringify(body) }),
  });
  const text = await res.text();
  expect(res.status, text).toBe(status);
  return JSON.parse(text) as T;
}

interface SavedInputs {
  inputs: { cavity: { shape: Record<string, number> }; fillLevelMm: number; shopTempC: number };
}

/** A US shop with one deep-pour product and one piece, made through the API. */
async function usShop(): Promise<{ token: string; pieceId: string }> {
  const { token } = await call<{ token: string }>('POST', '/auth/register', null, { shopName: `Inch Shop ${unique}`, name: 'Inch Lead', email, password }, 201);
  const shop = await call<{ unitSystem: string }>('PATCH', '/shop', token, { unitSystem: 'us' }, 200);
  expect(shop.unitSystem).toBe('us');
  await call('POST', '/shelf/resin-systems', token, deepPourProduct(`Inch Deep ${unique}`), 201);
  const piece = await call<{ id: string }>('POST', '/pieces', token, { name: `Inch tray ${unique}` }, 201);
  return { token, pieceId: piece.id };
}

describe('the pour planner in a US shop, in a real browser', () => {
  it('takes inches and °F, shows the volume in the shop’s unit, saves mm and reopens the plan in inches', async () => {
    const { token, pieceId } = await usShop();
    const context = await e2e.browser().newContext({ viewport: { width: 1440, height: 1000 } });
    const { page, watch } = await watchedPage(context, stack.baseUrl);
    page.setDefaultTimeout(10_000);
    await page.goto(`${stack.baseUrl}/sign-in`);
    await page.getByLabel('Email').fill(email);
    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL((url) => !url.pathname.endsWith('/sign-in'));

    await page.goto(`${stack.baseUrl}/pieces/${pieceId}/pour-plans/new`);
    const planner = page.getByRole('form', { name: 'Pour plan' });
    await planner.getByLabel('Shape of the cavity', { exact: true }).selectOption('rectangle');
    await planner.getByLabel('Length (in)', { exact: true }).fill('10');
    await planner.getByLabel('Width (in)', { exact: true }).fill('5');
    await planner.getByLabel('Depth (in)', { exact: true }).fill('1');
    await planner.getByLabel('Fill level (in)', { exact: true }).fill('1');
    const productOption = (await planner
      .getByLabel('Deep-pour product', { exact: true })
      .locator('option', { hasText: `Inch Deep ${unique}` })
      .getAttribute('value'))!;
    await planner.getByLabel('Deep-pour product', { exact: true }).selectOption(productOption);
    await planner.getByLabel('Shop temperature (°F)', { exact: true }).fill('68');
    expect(await planner.getByLabel('Length (mm)', { exact: true }).count()).toBe(0);

    // CRC prism volume 10 × 5 × 1 in = 50 in³; NIST SP 811: 1 in³ = 16.387064 mL (exact, from 1 in = 25.4 mm).
    const expected = formatVolume(50 * 16.387064, 'us').text;
    const live = page.getByRole('region', { name: 'Live numbers of this plan' });
    const liveFill = live.getByText('Fill volume', { exact: true }).locator('xpath=following-sibling::dd[1]');
    await expect.poll(() => liveFill.textContent(), { timeout: 10_000 }).toBe(expected);

    await planner.getByRole('button', { name: 'Save pour plan' }).click();
    await page.waitForURL(/\/pour-plans\/[0-9a-f-]{36}$/);
    const planId = /\/pour-plans\/([0-9a-f-]{36})$/.exec(page.url())![1]!;
    const stored = page.getByRole('region', { name: 'The saved plan' });
    await expect.poll(() => stored.getByText('Fill volume', { exact: true }).locator('xpath=following-sibling::dd[1]').textContent()).toBe(expected);
    // The contract holds mm and °C: 10 in = 254 mm, 68 °F = 20 °C (NIST SP 811).
    const saved = await call<SavedInputs>('GET', `/pour-plans/${planId}`, token, undefined, 200);
    expect(saved.inputs.cavity.shape).toMatchObject({ lengthMm: 254, widthMm: 127, depthMm: 25.4 });
    expect(saved.inputs.fillLevelMm).toBe(25.4);
    expect(saved.inputs.shopTempC).toBe(20);

    await page.getByRole('link', { name: 'Edit plan' }).click();
    await page.waitForURL(/\/edit$/);
    const editor = page.getByRole('form', { name: 'Pour plan' });
    await expect.poll(() => editor.getByLabel('Length (in)', { exact: true }).inputValue()).toBe('10');
    expect(await editor.getByLabel('Width (in)', { exact: true }).inputValue()).toBe('5');
    expect(await editor.getByLabel('Depth (in)', { exact: true }).inputValue()).toBe('1');
    expect(await editor.getByLabel('Fill level (in)', { exact: true }).inputValue()).toBe('1');
    expect(await editor.getByLabel('Shop temperature (°F)', { exact: true }).inputValue()).toBe('68');

    // Saved again unchanged, the plan keeps its numbers exactly.
    await editor.getByRole('button', { name: 'Save changes' }).click();
    await page.waitForURL(new RegExp(`/pour-plans/${planId}$`));
    const again = await call<SavedInputs>('GET', `/pour-plans/${planId}`, token, undefined, 200);
    expect(again.inputs).toEqual(saved.inputs);
    expect(watch.problems).toEqual([]);
    await context.close();
  }, 120_000);
});
