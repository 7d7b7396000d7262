import { describe, expect, it } from 'vitest';
import { loadManifold, outlineDamResin } from '../../../packages/mesh/test/manifold-reference';
import { readBinaryStlIndexed } from '../../../packages/mesh/test/stl-indexed';
import { watchedPage } from './support/browser';
import { signInThroughPage } from './support/sign-in';
import { useBrowserStack } from './support/use-browser-stack';

// Only reads what the seed made (packages/db/src/seed/demo-mould-plan.ts), so the shared demo database will do.
const e2e = useBrowserStack();
const stack = e2e.stack;

describe("the demo shop's mould in a real browser", () => {
  it("is there at the maker's first sign-in: in 3D, with its depth map, its curve and a plan made from it", { timeout: 60_000 }, async () => {
    const context = await e2e.browser().newContext({ viewport: { width: 1280, height: 900 } });
    const { page, watch } = await watchedPage(context, stack.baseUrl);
    page.setDefaultTimeout(10_000);
    await signInThroughPage(page, stack.baseUrl, 'maker@gelpoint.test');
    const nav = page.getByRole('navigation', { name: 'Main' });

    await nav.getByRole('link', { name: 'Moulds' }).click();
    await page.waitForURL(/\/moulds$/);
    await page.getByRole('link', { name: 'Burl bowl blank, lagoon pocket', exact: true }).click();
    await page.waitForURL(/\/moulds\/[0-9a-f-]{36}$/);
    const moldId = /\/moulds\/([0-9a-f-]{36})$/.exec(page.url())![1]!;

    // No worker had to run: the report was stored ready by the seed, so the 3D view opens at once.
    await expect.poll(() => page.locator('[data-testid="mold-3d"] canvas').count(), { timeout: 15_000 }).toBe(1);
    expect(await page.getByText('Watertight').isVisible()).toBe(true);

    // The file as stored, read without the engine: manifold-3d fills its pocket to the rim (the top of the mould).
    const file = await page.request.get(`${stack.baseUrl}/api/molds/${moldId}/stl`);
    expect(file.ok()).toBe(true);
    const stl = readBinaryStlIndexed(new Uint8Array(await file.body()));
    const topMm = stl.bboxMm.max[2];
    const kernel = await loadManifold();
    const resin = outlineDamResin(kernel, stl, topMm);
    const litres = resin.volume() / 1e6;
    resin.delete();
    await expect.poll(() => page.getByTestId('fill-volume').textContent()).toBe(`${litres.toFixed(2)} L`);

    // The deepest resin stands on the file's lowest corner above its underside.
    let floorMm = Infinity;
    for (let v = 2; v < stl.positionsMm.length; v += 3) if (stl.positionsMm[v]! > stl.bboxMm.min[2]) floorMm = Math.min(floorMm, stl.positionsMm[v]!);
    await expect.poll(() => page.getByRole('img', { name: 'Resin depth map' }).count()).toBe(1);
    expect(await page.getByText(`The deepest resin, ${(topMm - floorMm).toFixed(1)} mm,`).isVisible()).toBe(true);
    expect(await page.getByRole('img', { name: 'Volume against fill level, dams along the outline' }).isVisible()).toBe(true);

    await nav.getByRole('link', { name: 'Pour plans' }).click();
    await page.waitForURL(/\/pour-plans$/);
    await page.getByRole('link', { name: 'Lagoon fill to the rim, smoky teal', exact: true }).click();
    await page.waitForURL(/\/pour-plans\/[0-9a-f-]{36}$/);
    const stored = page.getByRole('region', { name: 'The saved plan' });
    // Floor to rim in one layer: the demo deep pour allows 50 mm, so ⌈depth / 50⌉ = 1 layer the whole depth thick.
    await expect.poll(() => stored.getByText(`1 × ${(topMm - floorMm).toFixed(1)} mm`).isVisible()).toBe(true);
    expect(await stored.getByRole('heading', { name: 'Seal coat: Kettle Seal & Coat 1:1' }).isVisible()).toBe(true);
    // The heat forecast drawn over the mould: the map, and the hottest spot named in words.
    const heat = stored.getByRole('figure', { name: 'Forecast peak temperature over the mould' });
    await expect.poll(() => heat.getByRole('img', { name: /^Map of the forecast peak temperature seen from above/ }).count()).toBe(1);
    expect(await heat.getByText(/^Hottest spot: \d+(\.\d)? °C in layer 1/).isVisible()).toBe(true);
    // The same forecast on the mould in 3D, loaded only when chosen: its own legend, and the same hottest spot in words.
    const hottestWords = (await heat.getByText(/^Hottest spot:/).textContent())!;
    await stored.getByRole('radio', { name: 'On the mould in 3D' }).check();
    const heat3d = stored.getByRole('figure', { name: 'Forecast peak temperature on the mould in 3D' });
    await expect.poll(() => heat3d.locator('[data-testid="mold-3d"] canvas').count(), { timeout: 15_000 }).toBe(1);
    expect(await heat3d.getByTestId('heat-legend').isVisible()).toBe(true);
    expect(await heat3d.getByText(hottestWords, { exact: true }).isVisible()).toBe(true);
    expect(await heat3d.getByText(/coloured by the forecast peak .*, an estimate,/).isVisible()).toBe(true);
    expect(await heat.count()).toBe(0);

    expect(watch.problems).toEqual([]);
    await context.close();
  });
});
