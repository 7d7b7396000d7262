import jpeg from 'jpeg-js';
import jsQR from 'jsqr';
import type { BrowserContext, Locator, Page } from 'playwright-core';
import { PNG } from 'pngjs';
import { describe, expect, it, onTestFinished } from 'vitest';
import { watchedPage, type PageWatch } from './support/browser';
import { apiSession, type ApiSession } from './support/api-session';
import { deepPourProduct } from './support/deep-pour-product';
import { signInThroughPage } from './support/sign-in';
import { useBrowserStack } from './support/use-browser-stack';
import { openWifiGap, type WifiGap } from './support/wifi-gap';

// The shop floor: the app installed on a phone, logging through a Wi-Fi gap, QR codes on what is printed, photos
// from the camera. Everything it pours is its own (a product, a piece and plans with unique names).
const e2e = useBrowserStack();
const stack = e2e.stack;
const unique = `${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 6)}`;
/** A page's first load fetches its code and data; on two shared cores that can take a few seconds. */
const firstLoad = { timeout: 15_000 };
const phone = { viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true, deviceScaleFactor: 2 };

interface PourSetup {
  pourId: string;
  planId: string;
  pieceName: string;
  cup: { partA: { grams: number }; partB: { grams: number } };
  maker: ApiSession;
  apprentice: ApiSession;
}

async function planToPour(label: string, start: boolean): Promise<PourSetup> {
  const lead = await apiSession(stack.baseUrl, 'lead@gelpoint.test');
  const maker = await apiSession(stack.baseUrl, 'maker@gelpoint.test');
  const apprentice = await apiSession(stack.baseUrl, 'apprentice@gelpoint.test');
  const product = await lead.post<{ id: string }>('/shelf/resin-systems', deepPourProduct(`Floor ${label} ${unique}`));
  const pieceName = `Floor ${label} ${unique}`;
  const piece = await maker.post<{ id: string }>('/pieces', { name: pieceName });
  const plan = await maker.post<{ id: string; result: { layers: { batches: PourSetup['cup'][] }[] } }>('/pour-plans', {
    pieceId: piece.id,
    name: `Floor plan ${label} ${unique}`,
    cavity: { source: 'shape', shape: { kind: 'rectangle', lengthMm: 200, widthMm: 100, depthMm: 20 } },
    fillLevelMm: 20,
    deepPour: { resinSystemId: product.id },
    overPourPct: 5,
    cupWaste: { massG: 5 },
    shopTempC: 21,
  });
  const pour = start ? await maker.post<{ id: string }>('/pours', { pourPlanId: plan.id, notifyUserIds: [apprentice.userId] }) : { id: '' };
  return { pourId: pour.id, planId: plan.id, pieceName, cup: plan.result.layers[0]!.batches[0]!, maker, apprentice };
}

/** The browser's own complaints about requests it could not make while offline are the point of the test. */
const problemsBesidesOffline = (watch: PageWatch) =>
  watch.problems.filter((p) => !/ERR_INTERNET_DISCONNECTED|ERR_CONNECTION_(REFUSED|RESET|CLOSED)|ERR_EMPTY_RESPONSE|Failed to fetch|net::ERR_FAILED/.test(p));

/**
 * The Wi-Fi gone: the browser told it is offline, and the relay the phone reaches the server through cut, so no request
 * gets out, the service worker's included (the browser's offline emulation alone lets some of those through after a
 * reload, which no phone would).
 */
async function cutNetwork(context: BrowserContext, wifi: WifiGap): Promise<void> {
  await context.setOffline(true);
  await wifi.cut();
}
async function restoreNetwork(context: BrowserContext, wifi: WifiGap): Promise<void> {
  await wifi.restore();
  await context.setOffline(false);
}

async function waitForServiceWorker(page: Page): Promise<void> {
  await page.waitForFunction(() => navigator.serviceWorker?.controller !== null && navigator.serviceWorker?.controller !== undefined, undefined, {
    timeout: 30_000,
  });
}

/** Decodes the QR code in a screenshot with jsQR, on the pixels pngjs reads: independent of the code's maker. */
async function decodeQr(target: Locator): Promise<string | null> {
  const png = PNG.sync.read(await target.screenshot());
  return jsQR(new Uint8ClampedArray(png.data.buffer, png.data.byteOffset, png.data.length), png.width, png.height)?.data ?? null;
}

/** The query keys of the copy the app keeps in IndexedDB for offline reading (none before the app made it). */
function storedQueryKeys(page: Page): Promise<unknown[]> {
  return page.evaluate(async () => {
    const name = 'gelpoint-query-cache';
    // Opening a database that does not exist would create it empty, under the app's feet.
    if (!(await indexedDB.databases()).some((db) => db.name === name)) return [];
    return new Promise<unknown[]>((resolve, reject) => {
      const open = indexedDB.open(name);
      open.onerror = () => reject(open.error);
      open.onsuccess = () => {
        const db = open.result;
        if (!db.objectStoreNames.contains('clients')) {
          db.close();
          resolve([]);
          return;
        }
        const read = db.transaction('clients').objectStore('clients').get('signed-in');
        read.onerror = () => reject(read.error);
        read.onsuccess = () => {
          const stored = read.result as { clientState?: { queries?: { queryKey: unknown }[] } } | undefined;
          db.close();
          resolve((stored?.clientState?.queries ?? []).map((q) => q.queryKey));
        };
      };
    });
  });
}

async function openPhone(baseUrl = stack.baseUrl): Promise<{ context: BrowserContext; page: Page; watch: PageWatch }> {
  const context = await e2e.browser().newContext(phone);
  const { page, watch } = await watchedPage(context, baseUrl);
  return { context, page, watch };
}

describe('the shop floor', () => {
  it('is installable: the page links a manifest with a name, a start, standalone display and our icons, and a service worker takes over', async () => {
    const { context, page, watch } = await openPhone();
    await page.goto(`${stack.baseUrl}/sign-in`);
    const href = await page.locator('link[rel="manifest"]').getAttribute('href');
    expect(href).toBe('/manifest.webmanifest');
    const answer = await page.request.get(new URL(href!, stack.baseUrl).href);
    expect(answer.headers()['content-type']).toMatch(/^application\/manifest\+json/);
    const manifest = (await answer.json()) as { name: string; start_url: string; display: string; icons: { src: string; sizes: string; type: string }[] };
    // W3C Web Application Manifest: the members a browser needs to offer the install.
    expect(manifest.name).toBe('Gelpoint');
    expect(manifest.start_url).toBe('/today');
    expect(manifest.display).toBe('standalone');
    for (const sizePx of [192, 512]) {
      const icon = manifest.icons.find((i) => i.sizes === `${sizePx}x${sizePx}`);
      expect(icon?.type).toBe('image/png');
      const file = await page.request.get(new URL(icon!.src, stack.baseUrl).href);
      expect(file.status()).toBe(200);
      expect(file.headers()['content-type']).toBe('image/png');
      const png = PNG.sync.read(await file.body());
      expect([png.width, png.height]).toEqual([sizePx, sizePx]);
    }
    const worker = await page.request.get(`${stack.baseUrl}/sw.js`);
    expect(worker.headers()['content-type']).toMatch(/javascript/);
    expect(worker.headers()['cache-control']).toBe('no-cache');
    await waitForServiceWorker(page);
    expect(await page.evaluate(async () => (await navigator.serviceWorker.ready).scope)).toBe(`${stack.baseUrl}/`);
    expect(watch.problems).toEqual([]);
    await context.close();
  });

  it('keeps a batch and a reading logged offline through a reload and sends each exactly once when the connection returns', { timeout: 120_000 }, async () => {
    const setup = await planToPour('offline', true);
    const wifi = await openWifiGap(stack.baseUrl);
    onTestFinished(() => wifi.close());
    const { context, page, watch } = await openPhone(wifi.url);
    await signInThroughPage(page, wifi.url, 'apprentice@gelpoint.test');
    await page.goto(`${wifi.url}/pours/${setup.pourId}`);
    await expect.poll(() => page.getByRole('heading', { level: 1, name: setup.pieceName }).isVisible(), firstLoad).toBe(true);
    await waitForServiceWorker(page);
    // The copy of the page's data is written to IndexedDB a moment after the page settles.
    await expect.poll(() => storedQueryKeys(page)).toContainEqual(['pours', 'detail', setup.pourId]);

    await cutNetwork(context, wifi);
    const card = page.getByRole('region', { name: /^Cup 1 of/ });
    await card.getByRole('button', { name: 'Start mixing' }).click();
    const form = card.getByRole('form', { name: 'Log cup 1' });
    await form.getByLabel('Lot number of part A').fill(`A-${unique}`);
    await form.getByLabel('Lot number of part B').fill(`B-${unique}`);
    await form.getByLabel('Part A weighed (g)').fill(setup.cup.partA.grams.toFixed(1));
    await form.getByLabel('Part B weighed (g)').fill(setup.cup.partB.grams.toFixed(1));
    await form.getByRole('button', { name: 'Log this batch' }).click();
    await expect.poll(() => card.getByText('Kept on this phone').isVisible()).toBe(true);

    const reading = page.getByRole('form', { name: 'Add a temperature reading' });
    await reading.getByLabel('Temperature (°C)').fill('21.5');
    await reading.getByRole('button', { name: 'Add reading' }).click();
    await expect.poll(() => reading.getByText(/Reading kept on this phone/).isVisible()).toBe(true);
    const waiting = page.getByRole('region', { name: 'Not sent yet' });
    await expect.poll(() => waiting.getByText('2 entries wait to be sent').isVisible()).toBe(true);
    await expect.poll(() => page.getByText(/^offline — as of \d\d:\d\d$/).isVisible()).toBe(true);

    // A reload with the network still cut: the app comes from the service worker, the pour from the stored copy,
    // and the two entries from the phone's outbox. Chromium's offline emulation does not hold navigator.onLine false
    // across the reload, much as a phone on Wi-Fi with no way out reads as online: the app learns it from a request.
    await page.reload();
    await expect.poll(() => page.getByRole('heading', { level: 1, name: setup.pieceName }).isVisible(), { timeout: 20_000 }).toBe(true);
    await expect.poll(() => page.getByText(/^offline — as of \d\d:\d\d$/).isVisible()).toBe(true);
    await expect.poll(() => waiting.getByText('2 entries wait to be sent').isVisible()).toBe(true);
    const before = await setup.apprentice.get<{ batches: unknown[]; readings: unknown[] }>(`/pours/${setup.pourId}`);
    expect([before.batches.length, before.readings.length]).toEqual([0, 0]);

    await restoreNetwork(context, wifi);
    await expect.poll(() => waiting.isVisible(), { timeout: 30_000 }).toBe(false);
    await expect.poll(() => card.textContent(), { timeout: 15_000 }).toMatch(/Logged[\s\S]*Mixed by/);
    const pour = await setup.apprentice.get<{ batches: { lotA: string }[]; readings: { tempC: number }[] }>(`/pours/${setup.pourId}`);
    expect(pour.batches).toHaveLength(1);
    expect(pour.batches[0]!.lotA).toBe(`A-${unique}`);
    expect(pour.readings.map((r) => r.tempC)).toEqual([21.5]);
    expect(problemsBesidesOffline(watch)).toEqual([]);
    await context.close();
  });

  it('keeps an entry the server refuses on the phone, in plain words, until the person discards it', { timeout: 90_000 }, async () => {
    const setup = await planToPour('refused', true);
    const wifi = await openWifiGap(stack.baseUrl);
    onTestFinished(() => wifi.close());
    const { context, page, watch } = await openPhone(wifi.url);
    await signInThroughPage(page, wifi.url, 'apprentice@gelpoint.test');
    await page.goto(`${wifi.url}/pours/${setup.pourId}`);
    await expect.poll(() => page.getByRole('heading', { level: 1, name: setup.pieceName }).isVisible(), firstLoad).toBe(true);
    await cutNetwork(context, wifi);
    const card = page.getByRole('region', { name: /^Cup 1 of/ });
    await card.getByRole('button', { name: 'Log this batch' }).click();
    const form = card.getByRole('form', { name: 'Log cup 1' });
    await form.getByLabel('Lot number of part A').fill(`RA-${unique}`);
    await form.getByLabel('Lot number of part B').fill(`RB-${unique}`);
    await form.getByLabel('Part A weighed (g)').fill(setup.cup.partA.grams.toFixed(1));
    await form.getByLabel('Part B weighed (g)').fill(setup.cup.partB.grams.toFixed(1));
    await form.getByRole('button', { name: 'Log this batch' }).click();
    await expect.poll(() => card.getByText('Kept on this phone').isVisible()).toBe(true);

    // Meanwhile the maker logs the same cup from the bench computer.
    await setup.maker.post(`/pours/${setup.pourId}/batches`, { planBatchIndex: 0, weighedAG: setup.cup.partA.grams, weighedBG: setup.cup.partB.grams });
    await restoreNetwork(context, wifi);
    const panel = page.getByRole('region', { name: 'Not sent yet' });
    await expect.poll(() => panel.getByText('1 entry needs you').isVisible(), { timeout: 30_000 }).toBe(true);
    await expect.poll(() => panel.getByText(/already logged/).isVisible()).toBe(true);
    await page.reload();
    await expect.poll(() => panel.getByText('1 entry needs you').isVisible(), { timeout: 20_000 }).toBe(true);
    await panel.getByRole('button', { name: 'Discard…' }).click();
    await panel.getByRole('button', { name: 'Discard it' }).click();
    await expect.poll(() => panel.isVisible()).toBe(false);
    const pour = await setup.apprentice.get<{ batches: { mixedBy: { name: string } }[] }>(`/pours/${setup.pourId}`);
    expect(pour.batches).toHaveLength(1);
    expect(problemsBesidesOffline(watch)).toEqual([]);
    await context.close();
  });

  it('prints QR codes that open the pour once it is started, and the plan before, landing there after sign-in', { timeout: 120_000 }, async () => {
    const started = await planToPour('printed', true);
    const planned = await planToPour('unstarted', false);
    const desk = await e2e.browser().newContext({ viewport: { width: 1200, height: 900 }, deviceScaleFactor: 2 });
    const { page, watch } = await watchedPage(desk, stack.baseUrl);
    await signInThroughPage(page, stack.baseUrl, 'maker@gelpoint.test');
    await page.emulateMedia({ media: 'print' });

    await page.goto(`${stack.baseUrl}/pour-plans/${started.planId}/run-sheet`);
    const card = page.locator('.run-sheet-card').first();
    await expect.poll(() => card.locator('img[alt^="QR code"]').isVisible(), firstLoad).toBe(true);
    const pourUrl = `${stack.baseUrl}/pours/${started.pourId}`;
    expect(await decodeQr(card)).toBe(pourUrl);
    expect(await decodeQr(page.locator('.run-sheet-label').first())).toBe(pourUrl);

    await page.goto(`${stack.baseUrl}/pour-plans/${planned.planId}/run-sheet`);
    await expect.poll(() => page.locator('.run-sheet-card img[alt^="QR code"]').first().isVisible(), firstLoad).toBe(true);
    expect(await decodeQr(page.locator('.run-sheet-card').first())).toBe(`${stack.baseUrl}/pour-plans/${planned.planId}`);
    expect(watch.problems).toEqual([]);
    await desk.close();

    // Scanned on a phone that is not signed in: sign in first, then straight to the pour.
    const { context, page: phonePage } = await openPhone();
    await phonePage.goto(pourUrl);
    await phonePage.waitForURL(/\/sign-in/);
    await phonePage.getByLabel('Email').fill('apprentice@gelpoint.test');
    await phonePage.getByLabel('Password').fill('gelpoint-demo');
    await phonePage.getByRole('button', { name: 'Sign in' }).click();
    await phonePage.waitForURL(new RegExp(`/pours/${started.pourId}$`));
    await expect.poll(() => phonePage.getByRole('heading', { level: 1, name: started.pieceName }).isVisible(), firstLoad).toBe(true);
    await context.close();
  });

  it('takes a cure-check photo from the camera, downscales it to 1600 px in the browser and sends it as JPEG', { timeout: 90_000 }, async () => {
    const setup = await planToPour('camera', true);
    const { context, page, watch } = await openPhone();
    await signInThroughPage(page, stack.baseUrl, 'apprentice@gelpoint.test');
    await page.goto(`${stack.baseUrl}/pours/${setup.pourId}`);
    const check = page.getByRole('form', { name: 'Add a cure check' });
    const input = check.getByLabel('Photo');
    expect(await input.getAttribute('accept')).toBe('image/*');
    expect(await input.getAttribute('capture')).toBe('environment');

    // A 3000 × 2000 picture, as a camera gives (a gradient, so it is not a flat colour).
    const big = new PNG({ width: 3000, height: 2000 });
    for (let i = 0; i < big.width * big.height; i += 1) {
      big.data[i * 4] = (i % big.width) % 256;
      big.data[i * 4 + 1] = Math.floor(i / big.width) % 256;
      big.data[i * 4 + 2] = 120;
      big.data[i * 4 + 3] = 255;
    }
    await check.getByLabel('What the resin was like').selectOption('liquid');
    await input.setInputFiles({ name: 'camera.png', mimeType: 'image/png', buffer: PNG.sync.write(big) });
    await check.getByRole('button', { name: 'Save the check' }).click();
    await expect.poll(() => check.getByText('Cure check saved.').isVisible(), { timeout: 30_000 }).toBe(true);

    const pour = await setup.apprentice.get<{ checks: { id: string; hasPhoto: boolean }[] }>(`/pours/${setup.pourId}`);
    expect(pour.checks).toHaveLength(1);
    const photo = await page.request.get(`${stack.baseUrl}/api/pours/${setup.pourId}/checks/${pour.checks[0]!.id}/photo`);
    expect(photo.headers()['content-type']).toBe('image/jpeg');
    // Decoded by jpeg-js, an independent JPEG decoder: 3000 × 2000 brought to 1600 on the long side is 1600 × 1067.
    const decoded = jpeg.decode(await photo.body(), { useTArray: true });
    expect([decoded.width, decoded.height]).toEqual([1600, 1067]);
    expect(watch.problems).toEqual([]);
    await context.close();
  });

  it('puts the calendar link on the phone: shown, copied, as a QR code, and replaced so the old one stops', { timeout: 90_000 }, async () => {
    const apprentice = await apiSession(stack.baseUrl, 'apprentice@gelpoint.test');
    const context = await e2e.browser().newContext({ ...phone, permissions: ['clipboard-read', 'clipboard-write'] });
    const { page, watch } = await watchedPage(context, stack.baseUrl);
    await signInThroughPage(page, stack.baseUrl, 'apprentice@gelpoint.test');
    await page.goto(`${stack.baseUrl}/account`);
    const panel = page.getByRole('region', { name: 'Calendar on your phone' });
    const field = panel.getByLabel('Your calendar link');
    const { calendarUrl } = await apprentice.get<{ calendarUrl: string }>('/me');
    await expect.poll(() => field.inputValue(), firstLoad).toBe(calendarUrl);
    expect(await field.getAttribute('readonly')).not.toBeNull();

    const qr = panel.getByRole('img', { name: 'QR code of your calendar link' });
    await expect.poll(() => qr.isVisible()).toBe(true);
    expect(await decodeQr(qr)).toBe(calendarUrl);
    expect(await panel.getByRole('link', { name: 'Subscribe on this device' }).getAttribute('href')).toBe(calendarUrl.replace(/^https?:/, 'webcal:'));

    await panel.getByRole('button', { name: 'Copy the link' }).click();
    await expect.poll(() => panel.getByRole('status').filter({ hasText: 'Copied' }).isVisible()).toBe(true);
    expect(await page.evaluate(() => navigator.clipboard.readText())).toBe(calendarUrl);

    const feed = await page.request.get(calendarUrl);
    expect(feed.status()).toBe(200);
    expect(feed.headers()['content-type']).toMatch(/^text\/calendar/);
    await panel.getByRole('button', { name: 'New link…' }).click();
    const dialog = page.getByRole('dialog', { name: 'Make a new calendar link?' });
    await expect.poll(() => dialog.getByText(/stops working at once/).isVisible()).toBe(true);
    await dialog.getByRole('button', { name: 'Make a new link' }).click();
    await expect.poll(() => panel.getByText('The old link no longer works.', { exact: false }).isVisible()).toBe(true);
    const renewed = (await apprentice.get<{ calendarUrl: string }>('/me')).calendarUrl;
    expect(renewed).not.toBe(calendarUrl);
    await expect.poll(() => field.inputValue()).toBe(renewed);
    await expect.poll(() => decodeQr(qr)).toBe(renewed);
    expect((await page.request.get(calendarUrl)).status()).toBe(404);
    expect((await page.request.get(renewed)).status()).toBe(200);
    // The old link's 404 is the point; the page itself asked for nothing that failed.
    expect(watch.problems).toEqual([]);
    await context.close();
  });
});
