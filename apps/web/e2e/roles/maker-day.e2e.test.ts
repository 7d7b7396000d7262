import { describe, expect, it } from 'vitest';
import { watchedPage } from '../support/browser';
import { saveScreenshot } from '../support/screenshots';
import { signInThroughPage } from '../support/sign-in';
import { pocketBlockStl, type PocketBlock } from '../support/test-mould';
import { useBrowserStack } from '../support/use-browser-stack';

// A fresh demo shop (packages/db/src/seed/demo.ts): the maker's sign-in and the shelf's two Kettle products come from it.
const e2e = useBrowserStack({ freshDemoFor: 'maker' });
const stack = e2e.stack;

// A 200 × 120 × 70 mm blank with a 160 × 80 × 60 mm pocket: its floor stands 10 mm above the underside.
const blank: PocketBlock = { block: [200, 120, 70], pocket: [160, 80, 60] };

describe("a maker's day in the browser", () => {
  it('creates a piece, uploads its mould, reads the cavity report, plans a sealed two-layer pour and opens its run sheet', { timeout: 60_000 }, async () => {
    const stl = pocketBlockStl(blank);
    // Divergence theorem (signed tetrahedra): the solid is the block less the pocket, 200·120·70 − 160·80·60 mm³,
    // so the file is closed and wound outward as the analysis expects.
    expect(stl.signedVolumeMm3).toBeCloseTo(200 * 120 * 70 - 160 * 80 * 60, 6);

    const context = await e2e.browser().newContext({ viewport: { width: 1280, height: 900 } });
    const { page, watch } = await watchedPage(context, stack.baseUrl);
    page.setDefaultTimeout(10_000);
    await signInThroughPage(page, stack.baseUrl, 'maker@gelpoint.test');
    const nav = page.getByRole('navigation', { name: 'Main' });

    await nav.getByRole('link', { name: 'Pieces' }).click();
    await page.waitForURL(/\/pieces$/);
    await page.getByRole('link', { name: 'New piece' }).click();
    const pieceName = 'Walnut serving board with a resin well';
    const newPiece = page.getByRole('form', { name: 'New piece' });
    await newPiece.getByLabel('Name', { exact: true }).fill(pieceName);
    await newPiece.getByLabel('Wood', { exact: true }).fill('black walnut, 32 mm');
    await page.getByRole('button', { name: 'Create piece' }).click();
    await page.waitForURL(/\/pieces\/[0-9a-f-]{36}$/);
    await expect.poll(() => page.getByRole('heading', { level: 1, name: pieceName }).isVisible()).toBe(true);

    await page.getByRole('link', { name: 'Upload its mould' }).click();
    await page.waitForURL(/\/moulds\/new\?pieceId=/);
    const upload = page.getByRole('form', { name: 'Upload a mould' });
    await upload.getByLabel('Mould file').setInputFiles({ name: 'serving-board.stl', mimeType: 'model/stl', buffer: stl.bytes });
    await expect.poll(() => upload.getByText('Read as millimetres, the mould is 200.0 mm × 120.0 mm × 70.0 mm.').isVisible()).toBe(true);
    // The upload came from the piece, so the mould is already tied to it.
    expect(await upload.getByLabel('Piece', { exact: true }).locator('option:checked').textContent()).toBe(pieceName);
    await upload.getByLabel('Name', { exact: true }).fill('Serving board, routed well');
    await upload.getByRole('button', { name: 'Upload and measure' }).click();
    await page.waitForURL(/\/moulds\/[0-9a-f-]{36}$/);

    // The worker measures the cavity; the report opens at the top of the mould, the pocket's rim.
    // CRC Concise Encyclopedia of Mathematics, right prism: V = base × height = 160 × 80 × 60 mm³ = 768 000 mm³ = 768 mL.
    const volume = page.getByTestId('fill-volume');
    await expect.poll(() => volume.textContent(), { timeout: 30_000 }).toBe('768.0 mL');
    await expect.poll(() => page.locator('[data-testid="mold-3d"] canvas').count(), { timeout: 15_000 }).toBe(1);
    expect(await page.getByText('Watertight').isVisible()).toBe(true);
    // Wetted area of an open box: floor l·w plus walls 2(l + w)·h = 12 800 + 28 800 mm² = 416 cm² at the rim.
    const wetted = page.getByText('Wetted area (for the seal coat)').locator('xpath=following-sibling::dd[1]');
    expect(await wetted.textContent()).toBe('416.0 cm²');

    // Half the pocket's depth: 30 mm of resin above the pocket floor, 160 × 80 × 30 mm³ = 384 mL,
    // and the wetted area 12 800 + 2(160 + 80)·30 = 27 200 mm² = 272 cm².
    const level = page.getByLabel('Fill level', { exact: true });
    await level.fill('30');
    await expect.poll(() => volume.textContent()).toBe('384.0 mL');
    await expect.poll(() => wetted.textContent()).toBe('272.0 cm²');
    // The slider's End key takes the level back to the top of the mould.
    await page.getByRole('slider', { name: 'Fill level, slider' }).press('End');
    await expect.poll(() => volume.textContent()).toBe('768.0 mL');
    expect(await level.inputValue()).toBe('60.0');
    await saveScreenshot(page, 'cavity-report');

    await page.getByRole('link', { name: `For ${pieceName}` }).click();
    await page.waitForURL(/\/pieces\/[0-9a-f-]{36}$/);
    await page.getByRole('link', { name: 'Plan a pour' }).click();
    await page.waitForURL(/\/pour-plans\/new$/);

    const planner = page.getByRole('form', { name: 'Pour plan' });
    await planner.getByLabel('Plan name', { exact: true }).fill('Clear well, two layers');
    // The whole choice card is the target, as on a touch screen.
    await planner.getByText("The piece's mould", { exact: true }).click();
    expect(await planner.getByLabel("The piece's mould").isChecked()).toBe(true);
    await planner.getByLabel('Mould', { exact: true }).selectOption({ label: 'Serving board, routed well' });
    // The rim: 60 mm of resin above the pocket floor, the same datum as the cavity report's fill level.
    await planner.getByLabel('Fill level (mm)', { exact: true }).fill('60');
    const deep = planner.getByLabel('Deep-pour product', { exact: true });
    await deep.selectOption((await deep.locator('option', { hasText: 'Kettle Deep Pour 2:1' }).getAttribute('value'))!);
    await planner.getByText('Seal the wood first', { exact: true }).click();
    expect(await planner.getByLabel('Seal the wood first', { exact: true }).isChecked()).toBe(true);
    const seal = planner.getByLabel('Seal-coat product', { exact: true });
    await seal.selectOption((await seal.locator('option', { hasText: 'Kettle Seal & Coat 1:1' }).getAttribute('value'))!);
    await planner.getByLabel('Film thickness (mm)', { exact: true }).fill('0.15');
    await planner.getByLabel('Coats', { exact: true }).fill('1');
    await planner.getByLabel('How much the wood soaks up', { exact: true }).selectOption('open_grain');
    await planner.getByLabel('Over-pour (% of each layer)', { exact: true }).fill('5');
    await planner.getByLabel('Shop temperature (°C)', { exact: true }).fill('21');

    // The same 768 mL as the cavity report; 60 mm of resin under the product's 50 mm limit is ⌈60 / 50⌉ = 2 layers of 30 mm.
    const live = page.getByRole('region', { name: 'Live numbers of this plan' });
    await expect.poll(() => live.getByText('2 × 30.0 mm').isVisible(), { timeout: 10_000 }).toBe(true);
    expect(await live.getByText('768.0 mL').first().isVisible()).toBe(true);
    // With 5 % over-pour: 768 × 1.05 = 806.4 mL.
    expect(await live.getByText('806.4 mL').first().isVisible()).toBe(true);
    expect(await live.getByRole('heading', { name: 'Layer 1 of 2' }).isVisible()).toBe(true);
    expect(await live.getByRole('heading', { name: 'Layer 2 of 2' }).isVisible()).toBe(true);
    expect(await live.getByRole('heading', { name: 'Seal coat: Kettle Seal & Coat 1:1' }).isVisible()).toBe(true);
    await saveScreenshot(page, 'pour-planner');

    await planner.getByRole('button', { name: 'Save pour plan' }).click();
    await page.waitForURL(/\/pour-plans\/[0-9a-f-]{36}$/);
    const stored = page.getByRole('region', { name: 'The saved plan' });
    await expect.poll(() => stored.getByText('2 × 30.0 mm').isVisible()).toBe(true);

    await page.getByRole('link', { name: 'Run sheet' }).click();
    await page.waitForURL(/\/run-sheet$/);
    // One seal-coat cup, then one cup a layer: every cup is far under the product's 6 kg batch limit.
    await expect.poll(() => page.getByRole('article', { name: 'Cup 1 of 3' }).isVisible()).toBe(true);
    expect(await page.getByRole('article', { name: 'Cup 2 of 3' }).getByText('Layer 1 · batch 1 of 1').isVisible()).toBe(true);
    // Each cup is its resin's mass plus the 5 g left in a scraped cup. Mass = volume × density, split by the volume
    // ratio, with the demo data sheets' densities (A 1.13 / B 0.98 g/mL for the 1:1 seal coat, 1.15 / 0.97 for the 2:1).
    // Seal coat: film volume = wetted area × film × absorption (common practice) = 41 600 mm² × 0.15 mm × 1.30.
    const sealMl = (41_600 * 0.15 * 1.3) / 1000;
    const sealCupG = (sealMl / 2) * 1.13 + (sealMl / 2) * 0.98 + 5;
    // A layer: 384 mL with 5 % over-pour.
    const layerMl = 384 * 1.05;
    const layerCupG = ((layerMl * 2) / 3) * 1.15 + (layerMl / 3) * 0.97 + 5;
    expect(
      await page
        .getByRole('article', { name: 'Cup 1 of 3' })
        .getByText(`${sealCupG.toFixed(1)} g`, { exact: true })
        .isVisible(),
    ).toBe(true);
    // Core rounds a cup on ratio to the 0.1 g scale (the smaller part to a whole step, the larger from the ratio), which
    // moves a 444 g cup by a few tenths of a gram at most.
    const layerCupShown = await page
      .getByRole('article', { name: 'Cup 2 of 3' })
      .getByText(/^\d+\.\d g$/)
      .last()
      .textContent();
    expect(Math.abs(Number.parseFloat(layerCupShown ?? '') - layerCupG)).toBeLessThan(0.5);
    expect(await page.getByRole('article', { name: 'Cup 3 of 3' }).getByText('Layer 2 · batch 1 of 1').isVisible()).toBe(true);
    expect(await page.getByRole('navigation', { name: 'Main' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Print' }).isVisible()).toBe(true);
    await saveScreenshot(page, 'run-sheet', { from: page.getByRole('heading', { name: 'Cups', exact: true }) });
    const pdf = await page.pdf({ format: 'A4' });
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');

    expect(watch.problems).toEqual([]);
    await context.close();
  });
});
