import { formatLength, formatWeighedMass, plannedBatches, type PourPlan, type ScaleResolutionG, type UnitSystem } from '@gelpoint/core';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { apiSession, type ApiSession } from './support/api-session';
import { watchedPage } from './support/browser';
import { deepPourProduct } from './support/deep-pour-product';
import { demoEmail, demoIds, settle, signIn } from './support/main-pages';
import { useBrowserStack } from './support/use-browser-stack';

// A demo database of this file's own, seeded just now (packages/db/src/seed): its river table plan has a seal coat and a deep pour.
const e2e = useBrowserStack({ freshDemoFor: 'print' });
const stack = e2e.stack;

// Paper sizes: ISO 216 A4 is 210 × 297 mm, ANSI/ASME Y14.1 Letter is 8.5 × 11 in; 1 in = 25.4 mm (NIST SP 811) = 72 PDF points = 96 CSS px.
const paper = {
  A4: { widthMm: 210, heightMm: 297 },
  Letter: { widthMm: 8.5 * 25.4, heightMm: 11 * 25.4 },
} as const;
// The run sheet's own @page margin (run-sheet.css).
const marginMm = 12;
const mmToPt = (mm: number) => (mm / 25.4) * 72;
const mmToPx = (mm: number) => (mm / 25.4) * 96;

/**
 * Pages of a PDF as Chromium writes it: one uncompressed page dictionary with its MediaBox each. There is no PDF
 * library at the root, so the text is checked in the print layout below rather than pulled out of the PDF.
 */
function pdfPages(pdf: Buffer): { widthPt: number; heightPt: number }[] {
  const text = pdf.toString('latin1');
  const boxes = [...text.matchAll(/\/Type\s*\/Page\b(?!s)[^]*?\/MediaBox\s*\[\s*([\d.]+)\s+([\d.]+)\s+([\d.]+)\s+([\d.]+)\s*\]/g)];
  return boxes.map((m) => ({ widthPt: Number(m[3]) - Number(m[1]), heightPt: Number(m[4]) - Number(m[2]) }));
}

interface PrintLayout {
  scrollWidthPx: number;
  overflowing: string[];
  tallestBlockPx: number;
  navShown: boolean;
  cardTexts: string[];
  labelTexts: string[];
}

/** The sheet laid out as print media on the page's printable width: what overflows, how tall the unbreakable blocks are. */
async function printLayout(
  page: Page,
  widthPx: number,
  heightPx: number,
  root = '.run-sheet',
  navSelector = 'nav[aria-label="Run sheet"]',
): Promise<PrintLayout> {
  await page.emulateMedia({ media: 'print' });
  await page.setViewportSize({ width: Math.floor(widthPx), height: Math.floor(heightPx) });
  const layout = await page.evaluate(
    ({ width, root, navSelector }) => {
      const overflowing: string[] = [];
      for (const el of document.querySelectorAll(`${root} *`)) {
        const box = el.getBoundingClientRect();
        if (box.width > 0 && (box.right > width + 0.5 || box.left < -0.5))
          overflowing.push(`${el.tagName.toLowerCase()} "${(el.textContent ?? '').trim().slice(0, 40)}" ${Math.round(box.left)}–${Math.round(box.right)} px`);
      }
      const blocks = [...document.querySelectorAll<HTMLElement>('.run-sheet-card, .run-sheet-label, .run-sheet aside')];
      const nav = document.querySelector(navSelector);
      return {
        scrollWidthPx: (document.scrollingElement ?? document.documentElement).scrollWidth,
        overflowing: overflowing.slice(0, 10),
        tallestBlockPx: Math.max(...blocks.map((b) => b.getBoundingClientRect().height)),
        navShown: nav !== null && getComputedStyle(nav).display !== 'none',
        cardTexts: [...document.querySelectorAll<HTMLElement>('.run-sheet-card')].map((c) => c.innerText),
        labelTexts: [...document.querySelectorAll<HTMLElement>('.run-sheet-label')].map((c) => c.innerText),
      };
    },
    { width: widthPx, root, navSelector },
  );
  await page.emulateMedia({ media: null });
  return layout;
}

describe('printing the run sheet and its cup labels', () => {
  it(
    'prints on A4 and US Letter: the right paper, a sensible page count, nothing past the margins, every cup’s grams on its card and label',
    { timeout: 90_000 },
    async () => {
      const context = await e2e.browser().newContext({ viewport: { width: 1280, height: 900 } });
      const { page, watch } = await watchedPage(context, stack.baseUrl);
      page.setDefaultTimeout(20_000);
      await signIn(page, stack.baseUrl, 'apprentice');
      const { planId } = await demoIds(page, stack.baseUrl);
      const saved = (await (await page.request.get(`${stack.baseUrl}/api/pour-plans/${planId}`)).json()) as { result: PourPlan };
      const shop = (await (await page.request.get(`${stack.baseUrl}/api/shop`)).json()) as { unitSystem: UnitSystem; scaleResolutionG: ScaleResolutionG };
      const cups = plannedBatches(saved.result);
      expect(cups.length).toBeGreaterThanOrEqual(2);
      const grams = (g: number) => formatWeighedMass(g, shop.unitSystem, saved.result.resolution.grams).text;
      expect(shop.scaleResolutionG).toBe(saved.result.resolution.grams);

      await page.goto(`${stack.baseUrl}/pour-plans/${planId}/run-sheet`);
      await settle(page);
      await expect.poll(() => page.locator('.run-sheet-label').count()).toBe(cups.length);

      for (const format of ['A4', 'Letter'] as const) {
        const size = paper[format];
        const pdf = await page.pdf({ format });
        expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
        const pages = pdfPages(pdf);
        // Cups and labels run on from page to page: no card per page, no blank runs of paper.
        expect(pages.length).toBeGreaterThanOrEqual(1);
        expect(pages.length).toBeLessThanOrEqual(Math.ceil(cups.length / 2) + 1);
        for (const p of pages) {
          // Chromium rounds the sheet to whole CSS pixels: within a point of the standard size.
          expect(Math.abs(p.widthPt - mmToPt(size.widthMm))).toBeLessThan(1.5);
          expect(Math.abs(p.heightPt - mmToPt(size.heightMm))).toBeLessThan(1.5);
        }

        const printable = { widthPx: mmToPx(size.widthMm - 2 * marginMm), heightPx: mmToPx(size.heightMm - 2 * marginMm) };
        const layout = await printLayout(page, printable.widthPx, printable.heightPx);
        expect(layout.overflowing, `${format}: nothing runs past the margins`).toEqual([]);
        expect(layout.scrollWidthPx).toBeLessThanOrEqual(Math.floor(printable.widthPx));
        expect(layout.navShown).toBe(false);
        // Every card and label fits on one sheet, so break-inside: avoid can keep it whole.
        expect(layout.tallestBlockPx).toBeLessThan(printable.heightPx);
        expect(layout.labelTexts).toHaveLength(cups.length);
        // Mixing order is the plan's batch order (core's plannedBatches); each label and card shows that cup's A and B.
        cups.forEach((cup, i) => {
          const a = grams(cup.partA.grams);
          const b = grams(cup.partB.grams);
          expect(layout.labelTexts[i]).toContain(`A ${a} · B ${b}`);
          expect(layout.labelTexts[i]).toContain(`cup ${i + 1} of ${cups.length}`);
          expect(layout.cardTexts[i]).toContain(a);
          expect(layout.cardTexts[i]).toContain(b);
          if (cup.pigment.grams > 0) expect(layout.labelTexts[i]).toContain(`pigment ${grams(cup.pigment.grams)}`);
        });
      }
      await page.setViewportSize({ width: 1280, height: 900 });
      expect(watch.problems).toEqual([]);
      await context.close();
    },
  );
});

/** A product whose 10 mm layer limit splits a 30 mm pocket into three layers, and a plan of it: one cup per layer. */
async function threeCupPlan(lead: ApiSession, maker: ApiSession, label: string): Promise<{ pieceId: string; planId: string; productId: string }> {
  const product = await lead.post<{ id: string }>('/shelf/resin-systems', { ...deepPourProduct(`Print ${label}`), maxLayerMm: 10 });
  const piece = await maker.post<{ id: string }>('/pieces', { name: `Serving board ${label}`, wood: 'walnut' });
  const plan = await maker.post<{ id: string; result: PourPlan }>('/pour-plans', {
    pieceId: piece.id,
    name: `Three layers ${label}`,
    cavity: { source: 'shape', shape: { kind: 'rectangle', lengthMm: 200, widthMm: 100, depthMm: 30 } },
    fillLevelMm: 30,
    deepPour: { resinSystemId: product.id },
    overPourPct: 5,
    cupWaste: { massG: 5 },
    shopTempC: 21,
  });
  expect(plannedBatches(plan.result)).toHaveLength(3);
  return { pieceId: piece.id, planId: plan.id, productId: product.id };
}

describe('a short run sheet and a cure record', () => {
  it('prints a plan of three cups on one A4 page and one Letter page, each cup with its level and its wait, no pigment line', { timeout: 90_000 }, async () => {
    const lead = await apiSession(stack.baseUrl, demoEmail('lead'));
    const maker = await apiSession(stack.baseUrl, demoEmail('maker'));
    const { planId } = await threeCupPlan(lead, maker, 'sheet');
    const saved = await maker.get<{ result: PourPlan }>(`/pour-plans/${planId}`);
    const context = await e2e.browser().newContext({ viewport: { width: 1280, height: 900 } });
    const { page, watch } = await watchedPage(context, stack.baseUrl);
    page.setDefaultTimeout(20_000);
    await signIn(page, stack.baseUrl, 'apprentice');
    await page.goto(`${stack.baseUrl}/pour-plans/${planId}/run-sheet`);
    await settle(page);
    await expect.poll(() => page.locator('.run-sheet-card').count()).toBe(3);

    for (const format of ['A4', 'Letter'] as const) {
      const pages = pdfPages(await page.pdf({ format }));
      expect(pages, `${format}: one sheet of paper`).toHaveLength(1);
      expect(Math.abs(pages[0]!.heightPt - mmToPt(paper[format].heightMm))).toBeLessThan(1.5);
    }
    const cards = await page.locator('.run-sheet-card').allInnerTexts();
    // Three equal 10 mm layers of a rectangular pocket stand 10, 20 and 30 mm above its floor (a right prism fills evenly).
    [10, 20, 30].forEach((levelMm, i) => expect(cards[i]).toContain(`Fill to ${formatLength(levelMm, 'metric').text} above the cavity floor`));
    expect(cards[0]).not.toMatch(/ after /);
    // Each later layer waits on the one below within the product's recoat window: 12–30 h on the data sheet at 22 °C,
    // a little longer at the plan's 21 °C (common practice: Q10 ≈ 2, so 2^0.1 ≈ 1.07 ×). The sheet shows core's hours to the minute.
    const deep = saved.result.shopTimes.deepPour;
    expect(deep.nextLayerOpensH).toBeGreaterThan(12);
    expect(deep.nextLayerOpensH).toBeLessThan(13.5);
    for (const [i, card] of cards.slice(1).entries()) {
      const shown = /pour (\d+) h(?: (\d+) min)? to (\d+) h(?: (\d+) min)? after layer (\d)/.exec(card);
      expect(shown, card).not.toBeNull();
      const hours = (h: string, m: string | undefined) => Number(h) + Number(m ?? 0) / 60;
      expect(Math.abs(hours(shown![1]!, shown![2]) - deep.nextLayerOpensH)).toBeLessThanOrEqual(1 / 60);
      expect(Math.abs(hours(shown![3]!, shown![4]) - deep.nextLayerClosesH)).toBeLessThanOrEqual(1 / 60);
      expect(Number(shown![5])).toBe(i + 1);
    }
    // An unpigmented cup has no pigment amount and no pigment-lot line to fill in.
    for (const card of cards) expect(card).not.toMatch(/pigment/i);
    // The demo shop counts in Canadian dollars (ISO 4217 CAD); the reader's locale picks the symbol.
    expect(await page.locator('.run-sheet > header').innerText()).toMatch(/cost (CA)?\$\d+\.\d{2}/);
    expect(watch.problems).toEqual([]);
    await context.close();
  });

  it('prints the cure record of a piece of one pour on one A4 page, with lots, weights, temperatures, checks and release', { timeout: 120_000 }, async () => {
    const lead = await apiSession(stack.baseUrl, demoEmail('lead'));
    const maker = await apiSession(stack.baseUrl, demoEmail('maker'));
    const apprentice = await apiSession(stack.baseUrl, demoEmail('apprentice'));
    const { pieceId, planId, productId } = await threeCupPlan(lead, maker, 'record');
    const lotA = await lead.post<{ id: string }>('/shelf/lots', {
      part: 'A',
      resinSystemId: productId,
      lotNumber: 'REC-A-0412',
      quantityG: 4000,
      receivedOn: '2026-10-01',
    });
    const lotB = await lead.post<{ id: string }>('/shelf/lots', {
      part: 'B',
      resinSystemId: productId,
      lotNumber: 'REC-B-0077',
      quantityG: 2000,
      receivedOn: '2026-10-01',
    });
    const pour = await apprentice.post<{ id: string }>('/pours', { pourPlanId: planId });
    const plan = await apprentice.get<{ result: PourPlan }>(`/pour-plans/${planId}`);
    const hour = 3_600_000;
    const start = Math.floor(Date.now() / hour) * hour - 12 * 24 * hour;
    const weighed: { a: number; b: number }[] = [];
    for (const [i, cup] of plannedBatches(plan.result).entries()) {
      const a = Math.round((cup.partA.grams + 0.4) * 10) / 10;
      const b = Math.round((cup.partB.grams - 0.3) * 10) / 10;
      weighed.push({ a, b });
      await apprentice.post(`/pours/${pour.id}/batches`, {
        planBatchIndex: cup.index,
        mixedAt: new Date(start + i * 14 * hour).toISOString(),
        lotAId: lotA.id,
        lotBId: lotB.id,
        weighedAG: a,
        weighedBG: b,
        ambientTempC: 21,
        rhPct: 45,
        confirmUnusual: true,
      });
    }
    const readings = Array.from({ length: 48 }, (_, k) => ({ at: new Date(start + k * 6 * hour).toISOString(), tempC: k === 7 ? 18.4 : k === 30 ? 23.6 : 21 }));
    await apprentice.post(`/pours/${pour.id}/readings`, { readings });
    const checkForm = new FormData();
    checkForm.set('stage', 'machinable');
    checkForm.set('hardnessShoreD', '82');
    checkForm.set('note', 'rings when tapped');
    const login = await fetch(`${stack.baseUrl}/api/auth/login`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: demoEmail('lead'), password: 'gelpoint-demo' }),
    });
    const { token } = (await login.json()) as { token: string };
    const checked = await fetch(`${stack.baseUrl}/api/pours/${pour.id}/checks`, {
      method: 'POST',
      headers: { Authorization: `Bearer ${token}` },
      body: checkForm,
    });
    expect(checked.status).toBe(201);
    await lead.post(`/pours/${pour.id}/release`, {});

    const context = await e2e.browser().newContext({ viewport: { width: 1280, height: 900 } });
    const { page, watch } = await watchedPage(context, stack.baseUrl);
    page.setDefaultTimeout(20_000);
    await signIn(page, stack.baseUrl, 'lead');
    await page.goto(`${stack.baseUrl}/pieces/${pieceId}`);
    await page.getByRole('link', { name: 'Cure record' }).click();
    await page.waitForURL(/\/pieces\/[^/]+\/record$/);
    await settle(page);
    await expect.poll(() => page.locator('.cure-record-pour').count()).toBe(1);

    const pages = pdfPages(await page.pdf({ format: 'A4' }));
    expect(pages, 'one sheet of A4').toHaveLength(1);
    expect(Math.abs(pages[0]!.widthPt - mmToPt(paper.A4.widthMm))).toBeLessThan(1.5);
    expect(Math.abs(pages[0]!.heightPt - mmToPt(paper.A4.heightMm))).toBeLessThan(1.5);

    const text = await page.locator('.cure-record').innerText();
    expect(text).toContain('Serving board record');
    expect(text).toMatch(/Deep pour:\s*Print record — lots REC-A-0412, REC-B-0077/);
    const rows = await page.locator('.cure-record-pour tbody tr').allInnerTexts();
    // Each cup: its lots, the grams weighed beside the plan's, who mixed it.
    for (const [i, w] of weighed.entries()) {
      expect(rows[i]).toContain('REC-A-0412 / REC-B-0077');
      expect(rows[i]).toContain(`${w.a.toFixed(1)} g`);
      expect(rows[i]).toContain(`${w.b.toFixed(1)} g`);
      expect(rows[i]).toContain('Mika Hale');
    }
    // The lowest and highest of the readings logged above.
    expect(text).toMatch(/48 readings/);
    expect(text).toContain('lowest 18.4 °C');
    expect(text).toContain('highest 23.6 °C');
    expect(text).toMatch(/Hard enough to machine\s+82\s+Rosa Lindqvist\s+rings when tapped/);
    expect(text).toMatch(/Released for machining by Rosa Lindqvist on /);
    const layout = await printLayout(
      page,
      mmToPx(paper.A4.widthMm - 2 * marginMm),
      mmToPx(paper.A4.heightMm - 2 * marginMm),
      '.cure-record',
      'nav[aria-label="Cure record"]',
    );
    expect(layout.overflowing, 'nothing runs past the margins').toEqual([]);
    expect(layout.navShown).toBe(false);

    // The demo's river table: one pour with a seal coat, pigment and a long temperature log, on one sheet too.
    const { pieceId: riverTable } = await demoIds(page, stack.baseUrl);
    await page.goto(`${stack.baseUrl}/pieces/${riverTable}/record`);
    await settle(page);
    await expect.poll(() => page.locator('.cure-record-pour').count()).toBe(1);
    for (const format of ['A4', 'Letter'] as const) expect(pdfPages(await page.pdf({ format })), `river table on ${format}`).toHaveLength(1);
    expect(await page.locator('.cure-record').innerText()).toMatch(/Seal coat:[\s\S]*Deep pour:[\s\S]*Pigment:/);
    expect(watch.problems).toEqual([]);
    await context.close();
  });
});
