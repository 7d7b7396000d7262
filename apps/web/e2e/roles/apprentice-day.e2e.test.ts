import { describe, expect, it } from 'vitest';
import { apiSession } from '../support/api-session';
import { watchedPage } from '../support/browser';
import { saveScreenshot } from '../support/screenshots';
import { signInThroughPage } from '../support/sign-in';
import { useBrowserStack } from '../support/use-browser-stack';

// A fresh demo shop (packages/db/src/seed/demo.ts): the people, the serving tray still in planning, the Kettle
// products, the Pearl White paste and their lots on the shelf all come from it.
const e2e = useBrowserStack({ freshDemoFor: 'apprentice' });
const stack = e2e.stack;

// A 1 × 1 PNG: signature, IHDR, one IDAT row, IEND (PNG specification, ISO/IEC 15948).
const tinyPng = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==', 'base64');

const pieceName = 'Serving tray with lagoon inlay';
const hour = 3_600_000;

interface PlannedCup {
  index: number;
  partA: { grams: number };
  partB: { grams: number };
  pigment: { grams: number };
}

interface SavedPlan {
  id: string;
  result: { sealCoat: { coats: { batches: PlannedCup[] }[] } | null; layers: { batches: PlannedCup[] }[] };
}

/**
 * What happened before the apprentice's day, through the API: the maker planned the tray's inlay with a seal coat
 * and started the pour, and the apprentice mixed the seal coat five hours ago. The seal coat's recoat window opens
 * 4 h after mixing at 22 °C (the demo data sheet), so today's pour is due on Today.
 */
async function todaysPour(): Promise<{ pourId: string; deepCup: PlannedCup }> {
  const maker = await apiSession(stack.baseUrl, 'maker@gelpoint.test');
  const apprentice = await apiSession(stack.baseUrl, 'apprentice@gelpoint.test');
  const pieces = await maker.get<{ items: { id: string; name: string }[] }>(`/pieces?q=${encodeURIComponent(pieceName)}`);
  const resinSystems = await maker.get<{ items: { id: string; name: string }[] }>('/shelf/resin-systems');
  const pigments = await maker.get<{ items: { id: string; name: string }[] }>('/shelf/pigments');
  const idOf = (list: { id: string; name: string }[], name: string) => {
    const found = list.find((item) => item.name === name);
    if (!found) throw new Error(`the demo seed has no "${name}"`);
    return found.id;
  };
  const plan = await maker.post<SavedPlan>('/pour-plans', {
    pieceId: idOf(pieces.items, pieceName),
    name: 'Lagoon inlay, pearl',
    cavity: { source: 'shape', shape: { kind: 'rectangle', lengthMm: 260, widthMm: 90, depthMm: 8 } },
    fillLevelMm: 8,
    deepPour: { resinSystemId: idOf(resinSystems.items, 'Kettle Deep Pour 2:1'), pigmentId: idOf(pigments.items, 'Pearl White paste'), pigmentPct: 2 },
    sealCoat: { resinSystemId: idOf(resinSystems.items, 'Kettle Seal & Coat 1:1'), filmThicknessMm: 0.15, coats: 1, absorptionFactor: 1.15 },
    overPourPct: 5,
    cupWaste: { massG: 5 },
    shopTempC: 21,
  });
  const sealCup = plan.result.sealCoat?.coats[0]?.batches[0];
  const deepCup = plan.result.layers[0]?.batches[0];
  if (!sealCup || !deepCup) throw new Error('the plan has no seal-coat cup or no layer cup');
  const pour = await maker.post<{ id: string }>('/pours', { pourPlanId: plan.id, notifyUserIds: [maker.userId, apprentice.userId] });
  await apprentice.post(`/pours/${pour.id}/batches`, {
    planBatchIndex: sealCup.index,
    mixedAt: new Date(Date.now() - 5 * hour).toISOString(),
    lotANumber: 'KSC-A-2503',
    lotBNumber: 'KSC-B-2611',
    weighedAG: sealCup.partA.grams,
    weighedBG: sealCup.partB.grams,
    ambientTempC: 21,
    surfaceTempC: 20,
    rhPct: 45,
  });
  return { pourId: pour.id, deepCup };
}

describe("an apprentice's day on a phone", () => {
  it(
    "opens today's pour, logs a cup with its lots and grams (warned while off ratio), a temperature and a cure check with a photo",
    { timeout: 60_000 },
    async () => {
      const { pourId, deepCup } = await todaysPour();
      const context = await e2e.browser().newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
      const { page, watch } = await watchedPage(context, stack.baseUrl);
      page.setDefaultTimeout(10_000);
      await signInThroughPage(page, stack.baseUrl, 'apprentice@gelpoint.test');

      await expect.poll(() => page.getByText(`Pour window opens: ${pieceName}, seal coat`, { exact: false }).isVisible()).toBe(true);
      await page
        .getByRole('link', { name: `Open the pour of ${pieceName}` })
        .first()
        .click();
      await page.waitForURL(new RegExp(`/pours/${pourId}$`));
      await expect.poll(() => page.getByRole('heading', { level: 1, name: pieceName }).isVisible()).toBe(true);

      // The seal coat is logged; the layer's cup is next, with the plan's grams at the shop's 0.1 g scale.
      expect(await page.getByRole('region', { name: /^Cup 1 of 2/ }).textContent()).toMatch(/Logged[\s\S]*Mixed by Mika Hale/);
      const card = page.getByRole('region', { name: /^Cup 2 of 2/ });
      await expect.poll(() => card.getByText(`${deepCup.partA.grams.toFixed(1)} g`, { exact: true }).isVisible()).toBe(true);
      expect(await card.getByText(`${deepCup.partB.grams.toFixed(1)} g`, { exact: true }).isVisible()).toBe(true);
      await saveScreenshot(page, 'pour-on-a-phone', { from: card });

      await card.getByRole('button', { name: 'Start mixing' }).click();
      await expect.poll(() => card.getByText(/min of pot life left/).isVisible()).toBe(true);
      const form = card.getByRole('form', { name: 'Log cup 2' });
      const pick = async (label: string, lotNumber: string) => {
        const select = form.getByLabel(label, { exact: true });
        await select.selectOption((await select.locator('option', { hasText: lotNumber }).getAttribute('value'))!);
      };
      await pick('Lot of part A', 'KDP-A-2611');
      await pick('Lot of part B', 'KDP-B-2611');
      await pick('Lot of pigment', 'PWP-1102');

      // 10 % too much part A: beyond the demo shop's 3 % off-ratio tolerance.
      await form.getByLabel('Part A weighed (g)').fill((deepCup.partA.grams * 1.1).toFixed(1));
      await form.getByLabel('Part B weighed (g)').fill(deepCup.partB.grams.toFixed(1));
      await expect.poll(() => form.getByText('Off ratio', { exact: true }).isVisible()).toBe(true);
      await form.getByLabel('Part A weighed (g)').fill(deepCup.partA.grams.toFixed(1));
      await expect.poll(() => form.getByText(/^On ratio/).isVisible()).toBe(true);
      expect(await form.getByText('Off ratio', { exact: true }).count()).toBe(0);
      await form.getByLabel('Pigment weighed (g)').fill(deepCup.pigment.grams.toFixed(1));
      await form.getByLabel('Air temperature (°C)').fill('21');
      await form.getByLabel('Surface temperature (°C)').fill('20');
      await form.getByLabel('Relative humidity (%)').fill('50');
      const submit = form.getByRole('button', { name: 'Log this batch' });
      // Gloved fingers: the main buttons are at least 48 px tall.
      expect((await submit.boundingBox())?.height).toBeGreaterThanOrEqual(48);
      await submit.click();
      // The demo shop's night is cooler than the plan assumed, so the seal coat's window may still be a few minutes
      // from opening: then the form names the window and asks, and the apprentice, told the coat is tacky, logs it.
      const asIs = form.getByRole('button', { name: 'Log this cup as it is' });
      await expect.poll(async () => (await asIs.isVisible()) || /Logged/.test((await card.textContent()) ?? '')).toBe(true);
      if (await asIs.isVisible()) {
        expect(await form.getByText(/whose window for the next pour opens/).textContent()).toMatch(/ (PST|PDT)\b/);
        await asIs.click();
      }
      await expect.poll(() => card.textContent()).toMatch(/Logged[\s\S]*Mixed by Mika Hale/);
      for (const lot of ['KDP-A-2611', 'KDP-B-2611', 'PWP-1102']) expect(await card.getByText(`Lot ${lot}`).isVisible()).toBe(true);

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

      // Every cup is in, so the pour shows on the board as curing with both cups logged.
      await page.getByRole('link', { name: 'Back to the cure board' }).click();
      await page.waitForURL(/\/cure-board$/);
      const entry = page
        .getByRole('list', { name: 'Pours' })
        .getByRole('listitem')
        .filter({ has: page.getByRole('link', { name: pieceName, exact: true }) });
      await expect.poll(() => entry.getByText('2 of 2 cups logged', { exact: false }).isVisible()).toBe(true);

      expect(watch.problems).toEqual([]);
      await context.close();
    },
  );
});
