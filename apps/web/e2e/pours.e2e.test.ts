import { describe, expect, it } from 'vitest';
import { watchedPage } from './support/browser';
import { deepPourProduct } from './support/deep-pour-product';
import { useBrowserStack } from './support/use-browser-stack';

// The demo sign-ins and shop come from the demo seed (packages/db/src/seed/demo.ts). Everything this test pours is
// its own: a resin system, a piece and a plan with a unique name, so it needs no other test's data and leaves the
// demo data as it was, give or take one more pour on the board.
const e2e = useBrowserStack();
const stack = e2e.stack;
const password = 'gelpoint-demo';
const unique = `${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 6)}`;

// A 1 × 1 PNG: signature, IHDR, one IDAT row, IEND (PNG specification, ISO/IEC 15948).
const tinyPng = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==', 'base64');

async function signIn(email: string): Promise<string> {
  const res = await fetch(`${stack.baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  expect(res.status).toBe(200);
  return ((await res.json()) as { token: string }).token;
}

async function post<T>(token: string, path: string, body: unknown, status = 201): Promise<T> {
  const res = await fetch(`${stack.baseUrl}/api${path}`, {
    method: 'POST',
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

interface Setup {
  pourId: string;
  pieceName: string;
  cup: PlannedCup;
}

/** A lead's resin system, a maker's piece and plan, and the pour started from it. */
async function pourToLog(): Promise<Setup> {
  const lead = await signIn('lead@gelpoint.test');
  const maker = await signIn('maker@gelpoint.test');
  const apprentice = await signIn('apprentice@gelpoint.test');
  const product = await post<{ id: string }>(lead, '/shelf/resin-systems', deepPourProduct(`E2E Deep ${unique}`));
  const pieceName = `E2E inlay ${unique}`;
  const piece = await post<{ id: string }>(maker, '/pieces', { name: pieceName });
  const plan = await post<{ id: string; result: { layers: { batches: PlannedCup[] }[] } }>(maker, '/pour-plans', {
    pieceId: piece.id,
    name: `E2E plan ${unique}`,
    cavity: { source: 'shape', shape: { kind: 'rectangle', lengthMm: 200, widthMm: 100, depthMm: 20 } },
    fillLevelMm: 20,
    deepPour: { resinSystemId: product.id },
    overPourPct: 5,
    cupWaste: { massG: 5 },
    shopTempC: 21,
  });
  const cup = plan.result.layers[0]?.batches[0];
  expect(cup).toBeDefined();
  const me = await fetch(`${stack.baseUrl}/api/me`, { headers: { Authorization: `Bearer ${apprentice}` } });
  const apprenticeId = ((await me.json()) as { user: { id: string } }).user.id;
  const pour = await post<{ id: string }>(maker, '/pours', { pourPlanId: plan.id, notifyUserIds: [apprenticeId] });
  return { pourId: pour.id, pieceName, cup: cup! };
}

describe('pours in a real browser', () => {
  it('lets an apprentice on a phone log a cup, a temperature and a cure check with a photo, and shows the pour on the cure board', async () => {
    const { pourId, pieceName, cup } = await pourToLog();
    const context = await e2e.browser().newContext({ viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true });
    const { page, watch } = await watchedPage(context, stack.baseUrl);

    await page.goto(`${stack.baseUrl}/pours/${pourId}`);
    await page.waitForURL(/\/sign-in/);
    await page.getByLabel('Email').fill('apprentice@gelpoint.test');
    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(new RegExp(`/pours/${pourId}$`));
    await expect.poll(() => page.getByRole('heading', { level: 1, name: pieceName }).isVisible()).toBe(true);

    const card = page.getByRole('region', { name: /^Cup 1 of/ });
    // The run sheet shows the plan's grams at the shop's 0.1 g scale.
    await expect.poll(() => card.getByText(`${cup.partA.grams.toFixed(1)} g`, { exact: true }).isVisible()).toBe(true);
    await card.getByRole('button', { name: 'Start mixing' }).click();
    await expect.poll(() => card.getByText(/min of pot life left/).isVisible()).toBe(true);

    const form = card.getByRole('form', { name: 'Log cup 1' });
    await form.getByLabel('Lot number of part A').fill(`A-${unique}`);
    await form.getByLabel('Lot number of part B').fill(`B-${unique}`);
    // 10 % too much part A: beyond the demo shop's 3 % tolerance.
    await form.getByLabel('Part A weighed (g)').fill((cup.partA.grams * 1.1).toFixed(1));
    await form.getByLabel('Part B weighed (g)').fill(cup.partB.grams.toFixed(1));
    await expect.poll(() => form.getByText('Off ratio', { exact: true }).isVisible()).toBe(true);
    await form.getByLabel('Part A weighed (g)').fill(cup.partA.grams.toFixed(1));
    await expect.poll(() => form.getByText(/^On ratio/).isVisible()).toBe(true);
    expect(await form.getByText('Off ratio', { exact: true }).count()).toBe(0);
    await form.getByLabel('Air temperature (°C)').fill('21');
    await form.getByLabel('Surface temperature (°C)').fill('20');
    await form.getByLabel('Relative humidity (%)').fill('50');
    const submit = form.getByRole('button', { name: 'Log this batch' });
    // Gloved fingers: the main buttons are at least 48 px tall.
    expect((await submit.boundingBox())?.height).toBeGreaterThanOrEqual(48);
    await submit.click();
    await expect.poll(() => card.textContent()).toMatch(/Logged[\s\S]*Mixed by Mika Hale/);
    await expect.poll(() => card.getByText(`Lot A-${unique}`).isVisible()).toBe(true);

    const reading = page.getByRole('form', { name: 'Add a temperature reading' });
    await reading.getByLabel('Temperature (°C)').fill('21.5');
    await reading.getByRole('button', { name: 'Add reading' }).click();
    await expect.poll(() => reading.getByText('Reading saved.').isVisible()).toBe(true);
    await expect.poll(() => page.getByRole('img', { name: 'Temperature log' }).isVisible()).toBe(true);

    const check = page.getByRole('form', { name: 'Add a cure check' });
    await check.getByLabel('What the resin was like').selectOption('liquid');
    await check.getByLabel('Photo').setInputFiles({ name: 'check.png', mimeType: 'image/png', buffer: tinyPng });
    await check.getByRole('button', { name: 'Save the check' }).click();
    await expect.poll(() => check.getByText('Cure check saved.').isVisible()).toBe(true);
    const photo = page.getByRole('img', { name: 'Cure check photo: still liquid' });
    await expect.poll(() => photo.evaluate((img) => (img as HTMLImageElement).complete && (img as HTMLImageElement).naturalWidth)).toBe(1);

    await page.goto(`${stack.baseUrl}/cure-board`);
    const board = page.getByRole('list', { name: 'Pours' });
    const entry = board.getByRole('listitem').filter({ has: page.getByRole('link', { name: pieceName }) });
    await expect.poll(() => entry.isVisible()).toBe(true);
    await expect.poll(() => entry.getByText(/% of full cure/).isVisible()).toBe(true);
    await expect.poll(() => entry.getByText('1 of 1 cups logged', { exact: false }).isVisible()).toBe(true);

    expect(watch.problems).toEqual([]);
    await context.close();
  });
});
