import { formatWeighedMass, plannedBatches, type PourPlan, type ScaleResolutionG, type UnitSystem } from '@gelpoint/core';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { watchedPage } from './support/browser';
import { demoIds, settle, signIn } from './support/main-pages';
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
async function printLayout(page: Page, widthPx: number, heightPx: number): Promise<PrintLayout> {
  await page.emulateMedia({ media: 'print' });
  await page.setViewportSize({ width: Math.floor(widthPx), height: Math.floor(heightPx) });
  const layout = await page.evaluate((width) => {
    const overflowing: string[] = [];
    for (const el of document.querySelectorAll('.run-sheet *')) {
      const box = el.getBoundingClientRect();
      if (box.width > 0 && (box.right > width + 0.5 || box.left < -0.5)) overflowing.push(`${el.tagName.toLowerCase()} "${(el.textContent ?? '').trim().slice(0, 40)}" ${Math.round(box.left)}–${Math.round(box.right)} px`);
    }
    const blocks = [...document.querySelectorAll<HTMLElement>('.run-sheet-card, .run-sheet-label, .run-sheet aside')];
    const nav = document.querySelector('nav[aria-label="Run sheet"]');
    return {
      scrollWidthPx: (document.scrollingElement ?? document.documentElement).scrollWidth,
      overflowing: overflowing.slice(0, 10),
      tallestBlockPx: Math.max(...blocks.map((b) => b.getBoundingClientRect().height)),
      navShown: nav !== null && getComputedStyle(nav).display !== 'none',
      cardTexts: [...document.querySelectorAll<HTMLElement>('.run-sheet-card')].map((c) => c.innerText),
      labelTexts: [...document.querySelectorAll<HTMLElement>('.run-sheet-label')].map((c) => c.innerText),
    };
  }, widthPx);
  await page.emulateMedia({ media: 'screen' });
  return layout;
}

describe('printing the run sheet and its cup labels', () => {
  it('prints on A4 and US Letter: the right paper, a sensible page count, nothing past the margins, every cup’s grams on its card and label', { timeout: 90_000 }, async () => {
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
      // The cups, then the labels from a page of their own: at least two pages, and no blank runs of paper.
      expect(pages.length).toBeGreaterThanOrEqual(2);
      expect(pages.length).toBeLessThanOrEqual(cups.length + 2);
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
  });
});
