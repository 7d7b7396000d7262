import { describe, expect, it } from 'vitest';
import { watchedPage } from './support/browser';
import { deepPourProduct } from './support/deep-pour-product';
import { useBrowserStack } from './support/use-browser-stack';

// A log that questions odd values and keeps its corrections: an apprentice types a °F reading into °C, weighs a cup
// far from its target, and voids both mistakes with a reason. Everything poured here is this test's own.
const e2e = useBrowserStack();
const stack = e2e.stack;
const password = 'gelpoint-demo';
const unique = `${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 6)}`;

async function signIn(email: string): Promise<string> {
  const res = await fetch(`${stack.baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  expect(res.status).toBe(200);
  return ((await res.json()) as { token: string }).token;
}

async function call<T>(token: string, method: string, path: string, body: unknown, status: number): Promise<T> {
  const res = await fetch(`${stack.baseUrl}/api${path}`, {
    method,
    headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${token}` },
    body: JSON.stringify(body),
  });
  const text = await res.text();
  expect(res.status, text).toBe(status);
  return JSON.parse(text) as T;
}

interface PlannedCup {
  partA: { grams: number };
  partB: { grams: number };
}

describe('a log that questions odd values and keeps its corrections', () => {
  it('asks "did you mean °F?", questions a cup far from its target, and voids each mistake with its reason', async () => {
    const lead = await signIn('lead@gelpoint.test');
    const maker = await signIn('maker@gelpoint.test');
    const product = await call<{ id: string }>(lead, 'POST', '/shelf/resin-systems', deepPourProduct(`E2E Guard ${unique}`), 201);
    const pieceName = `E2E guard tray ${unique}`;
    const piece = await call<{ id: string }>(maker, 'POST', '/pieces', { name: pieceName }, 201);
    const plan = await call<{ id: string; result: { layers: { batches: PlannedCup[] }[] } }>(
      maker,
      'POST',
      '/pour-plans',
      {
        pieceId: piece.id,
        name: `E2E guard plan ${unique}`,
        cavity: { source: 'shape', shape: { kind: 'rectangle', lengthMm: 200, widthMm: 100, depthMm: 20 } },
        fillLevelMm: 20,
        deepPour: { resinSystemId: product.id },
        overPourPct: 5,
        cupWaste: { massG: 5 },
        shopTempC: 21,
      },
      201,
    );
    const cup = plan.result.layers[0]!.batches[0]!;
    const pour = await call<{ id: string }>(maker, 'POST', '/pours', { pourPlanId: plan.id }, 201);

    const context = await e2e.browser().newContext({ viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true });
    const { page, watch } = await watchedPage(context, stack.baseUrl);
    await page.goto(`${stack.baseUrl}/pours/${pour.id}`);
    await page.waitForURL(/\/sign-in/);
    await page.getByLabel('Email').fill('apprentice@gelpoint.test');
    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(new RegExp(`/pours/${pour.id}$`));
    await expect.poll(() => page.getByRole('heading', { level: 1, name: pieceName }).isVisible(), { timeout: 10_000 }).toBe(true);

    // A cup weighed at three times its part A: the form asks before it logs.
    const card = page.getByRole('region', { name: /^Cup 1 of/ });
    await card.getByRole('button', { name: 'Log this batch' }).click();
    const form = card.getByRole('form', { name: 'Log cup 1' });
    await form.getByLabel('Part A weighed (g)').fill((cup.partA.grams * 3).toFixed(1));
    await form.getByLabel('Part B weighed (g)').fill(cup.partB.grams.toFixed(1));
    await form.getByRole('button', { name: 'Log this batch' }).click();
    await expect.poll(() => form.getByText(/^Part A weighed .* against a target of/).isVisible(), { timeout: 10_000 }).toBe(true);
    await form.getByRole('button', { name: 'Log this cup as it is' }).click();
    await expect.poll(() => card.textContent(), { timeout: 10_000 }).toMatch(/Logged/);

    // The cup was wrong: void it with the reason; the card goes back to "To mix".
    await card.getByRole('button', { name: 'Void…' }).click();
    const dialog = page.getByRole('dialog', { name: 'Void cup 1?' });
    await dialog.getByLabel('Why is it wrong?').fill('weighed part A three times over');
    await dialog.getByRole('button', { name: 'Void it' }).click();
    await expect.poll(() => card.getByText('To mix').isVisible(), { timeout: 10_000 }).toBe(true);
    await expect
      .poll(() =>
        page
          .getByRole('region', { name: 'Voided cups' })
          .getByText(/weighed part A three times over/)
          .isVisible(),
      )
      .toBe(true);

    // 70 typed as °C: the form asks whether it was °F and offers 21.1 °C.
    const reading = page.getByRole('form', { name: 'Add a temperature reading' });
    await reading.getByLabel('Temperature (°C)').fill('70');
    await reading.getByRole('button', { name: 'Add reading' }).click();
    await expect.poll(() => reading.getByText(/did you mean °F\?/).isVisible(), { timeout: 10_000 }).toBe(true);
    await reading.getByRole('button', { name: 'It was °F: use 21.1 °C' }).click();
    expect(await reading.getByLabel('Temperature (°C)').inputValue()).toBe('21.1');
    await reading.getByRole('button', { name: 'Add reading' }).click();
    await expect.poll(() => reading.getByText('Reading saved.').isVisible(), { timeout: 10_000 }).toBe(true);

    // The reading is listed with who logged it, and voided with its reason.
    await page.getByText(/^All readings \(1/).click();
    const table = page.getByRole('table', { name: 'Temperature readings of this pour' });
    await expect.poll(() => table.getByText('typed in by Mika Hale').isVisible()).toBe(true);
    await table.getByRole('button', { name: 'Void…' }).click();
    const readingDialog = page.getByRole('dialog', { name: /^Void the reading of 21.1 °C/ });
    await readingDialog.getByRole('button', { name: 'Void it' }).click();
    await expect.poll(() => readingDialog.getByText('Say why, so the log shows what happened.').isVisible()).toBe(true);
    await readingDialog.getByLabel('Why is it wrong?').fill('read before the thermometer settled');
    await readingDialog.getByRole('button', { name: 'Void it' }).click();
    await expect.poll(() => table.getByText(/Voided by Mika Hale: read before the thermometer settled/).isVisible(), { timeout: 10_000 }).toBe(true);

    // The API kept both, voided, with their reasons.
    const view = await fetch(`${stack.baseUrl}/api/pours/${pour.id}`, { headers: { Authorization: `Bearer ${lead}` } }).then(
      (r) => r.json() as Promise<{ batches: unknown[]; voidedBatches: { voided: { reason: string } }[]; voidedReadings: { voided: { reason: string } }[] }>,
    );
    expect(view.batches).toEqual([]);
    expect(view.voidedBatches.map((b) => b.voided.reason)).toEqual(['weighed part A three times over']);
    expect(view.voidedReadings.map((r) => r.voided.reason)).toEqual(['read before the thermometer settled']);

    expect(watch.problems).toEqual([]);
    await context.close();
  });
});
