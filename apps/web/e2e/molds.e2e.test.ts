import { readMouldFile } from '@gelpoint/mesh';
import { describe, expect, it } from 'vitest';
import { encode3mf } from '../../../packages/mesh/test/mould-files';
import { watchedPage } from './support/browser';
import { pocketBlockStl } from './support/test-mould';
import { useBrowserStack } from './support/use-browser-stack';

const e2e = useBrowserStack();
const stack = e2e.stack;

describe('the mould screen in a real browser', () => {
  it('uploads a pocket block as the maker, reads 64 mL at the rim and 32 mL at half depth, and shows it in 3D', { timeout: 90_000 }, async () => {
    const stl = pocketBlockStl({ block: [100, 60, 30], pocket: [80, 40, 20] });
    // Divergence theorem (signed tetrahedra): the solid is the block less the pocket, 100·60·30 − 80·40·20 mm³,
    // so the file is closed and wound outward as the analysis expects.
    expect(stl.signedVolumeMm3).toBeCloseTo(100 * 60 * 30 - 80 * 40 * 20, 6);

    const context = await e2e.browser().newContext({ viewport: { width: 1280, height: 900 } });
    const { page, watch } = await watchedPage(context, stack.baseUrl);
    await page.goto(`${stack.baseUrl}/moulds`);
    await page.waitForURL(/\/sign-in/);
    await page.getByLabel('Email').fill('maker@gelpoint.test');
    await page.getByLabel('Password').fill('gelpoint-demo');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(/\/moulds$/);

    // The quick shape works in the browser alone. CRC Concise Encyclopedia of Mathematics: a right prism holds base × height, 80 × 40 × 20 mm³ = 64 mL.
    const measure = page.getByRole('form', { name: 'Measure the cavity' });
    await measure.getByLabel('Length (mm)').fill('80');
    await measure.getByLabel('Width (mm)').fill('40');
    await measure.getByLabel('Depth (mm)').fill('20');
    await expect.poll(() => measure.getByText('64.0 mL').isVisible()).toBe(true);

    await page.getByRole('link', { name: 'Upload a mould file' }).first().click();
    await page.waitForURL(/\/moulds\/new$/);
    const name = `E2E pocket block ${Date.now()}`;
    const form = page.getByRole('form', { name: 'Upload a mould' });
    await form.getByLabel('Mould file').setInputFiles({ name: 'pocket-block.stl', mimeType: 'model/stl', buffer: stl.bytes });
    await expect.poll(() => form.getByText('Read as millimetres, the mould is 100.0 mm × 60.0 mm × 30.0 mm.').isVisible()).toBe(true);
    await form.getByLabel('Name', { exact: true }).fill(name);
    await form.getByRole('button', { name: 'Upload and measure' }).click();
    await page.waitForURL(/\/moulds\/[0-9a-f-]{36}$/);

    // Prism formula (CRC): the pocket holds 80 × 40 × 20 mm³ = 64 000 mm³ = 64 mL up to its rim, the top of the mould.
    const volume = page.getByTestId('fill-volume');
    await expect.poll(() => volume.textContent(), { timeout: 30_000 }).toBe('64.0 mL');
    await expect.poll(() => page.locator('[data-testid="mold-3d"] canvas').count(), { timeout: 15_000 }).toBe(1);

    const level = page.getByLabel('Fill level', { exact: true });
    // Half the pocket's depth: the level is the resin's height above the pocket floor, 80 × 40 × 10 mm³ = 32 mL.
    await level.fill('10');
    await expect.poll(() => volume.textContent()).toBe('32.0 mL');
    // The floor stands 10 mm above the block's underside, so the surface is at 20 mm in the file's own frame.
    expect(await page.getByTestId('level-in-mould-frame').textContent()).toBe(
      'In the mould file’s own frame: resin surface at 20.0 mm, cavity floor at 10.0 mm.',
    );
    await level.fill('20');
    await expect.poll(() => volume.textContent()).toBe('64.0 mL');

    await page.getByLabel('Layer thickness').fill('6');
    const layers = page.getByRole('table', { name: /Layers from the cavity floor/ });
    // A 20 mm deep pour with at most 6 mm a layer takes ⌈20 / 6⌉ = 4 equal layers, the last ending at the rim.
    await expect.poll(() => layers.getByRole('row').count()).toBe(5);
    await expect.poll(() => layers.getByRole('row').last().getByRole('cell').nth(2).textContent()).toBe('20.0 mm');
    await expect.poll(() => page.getByText(/Layer lines at/).count()).toBe(1);

    await expect.poll(() => page.getByRole('img', { name: 'Resin depth map' }).count()).toBe(1);
    await expect.poll(() => page.getByText('Watertight').isVisible()).toBe(true);

    await page.getByRole('button', { name: 'Delete mould' }).click();
    await page.getByRole('button', { name: 'Delete for good' }).click();
    await page.waitForURL(/\/moulds$/);
    await expect.poll(() => page.getByText(name).count()).toBe(0);
    expect(watch.problems).toEqual([]);
    await context.close();
  });

  it(
    'uploads the same block as a 3MF in inches: the form names the format and the unit the file states, and the report reads it so',
    { timeout: 90_000 },
    async () => {
      const stl = pocketBlockStl({ block: [100, 60, 30], pocket: [80, 40, 20] });
      const read = readMouldFile(stl.bytes);
      if (!read.ok) throw new Error(read.error.message);
      // The block's numbers in inches, the file saying so (NIST SP 811: 1 in = 25.4 mm).
      const threemf = encode3mf({ positions: Float64Array.from(read.value.soup.positions), triangleCount: read.value.soup.triangleCount }, 'inch', 25.4);

      const context = await e2e.browser().newContext({ viewport: { width: 1280, height: 900 } });
      const { page, watch } = await watchedPage(context, stack.baseUrl);
      await page.goto(`${stack.baseUrl}/moulds/new`);
      await page.waitForURL(/\/sign-in/);
      await page.getByLabel('Email').fill('maker@gelpoint.test');
      await page.getByLabel('Password').fill('gelpoint-demo');
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.waitForURL(/\/moulds\/new$/);

      const name = `E2E 3MF block ${Date.now()}`;
      const form = page.getByRole('form', { name: 'Upload a mould' });
      await form.getByLabel('Mould file').setInputFiles({ name: 'pocket-block.3mf', mimeType: 'model/3mf', buffer: Buffer.from(threemf) });
      await expect.poll(() => form.getByText(`This is a 3MF file of ${stl.triangleCount} triangles, in inches as it states.`).isVisible()).toBe(true);
      await expect.poll(() => form.getByLabel('Units in the file').inputValue()).toBe('');
      await expect.poll(() => form.getByRole('option', { name: 'As the file states: inches' }).count()).toBe(1);
      await expect.poll(() => form.getByText('Read as inches, the mould is 100.0 mm × 60.0 mm × 30.0 mm.').isVisible()).toBe(true);
      await form.getByLabel('Name', { exact: true }).fill(name);
      await form.getByRole('button', { name: 'Upload and measure' }).click();
      await page.waitForURL(/\/moulds\/[0-9a-f-]{36}$/);

      // Prism formula (CRC): 80 × 40 × 20 mm³ = 64 mL, whatever unit the file was written in.
      await expect.poll(() => page.getByTestId('fill-volume').textContent(), { timeout: 30_000 }).toBe('64.0 mL');
      await expect.poll(() => page.getByText(/inches \(as the file states\)/).count()).toBe(1);
      await expect.poll(() => page.locator('[data-testid="mold-3d"] canvas').count(), { timeout: 15_000 }).toBe(1);

      await page.getByRole('button', { name: 'Delete mould' }).click();
      await page.getByRole('button', { name: 'Delete for good' }).click();
      await page.waitForURL(/\/moulds$/);
      expect(watch.problems).toEqual([]);
      await context.close();
    },
  );
});
