import type { Page } from 'playwright-core';

export interface SmallTarget {
  element: string;
  widthPx: number;
  heightPx: number;
}

export interface SmallScreenReport {
  scrollWidthPx: number;
  viewportWidthPx: number;
  /** Visible controls whose hit area is under the minimum on either side. */
  smallTargets: SmallTarget[];
  targetsMeasured: number;
}

/**
 * Measures every visible control's hit area in CSS pixels. A checkbox or radio counts with its label (a press on
 * the label sets it), and with the box its label's stretched ::after covers. Links inside a sentence are left out:
 * WCAG 2.2 SC 2.5.8 exempts inline targets, whose size the line of text sets.
 */
export async function smallScreenReport(page: Page, minTargetPx = 44): Promise<SmallScreenReport> {
  // No named helpers inside: the test runner's transform would wrap them in a helper the page does not have.
  return page.evaluate((min) => {
    const scroller = document.scrollingElement ?? document.documentElement;
    const smallTargets: { element: string; widthPx: number; heightPx: number }[] = [];
    let targetsMeasured = 0;
    const selector = 'button, a[href], input:not([type="hidden"]), select, textarea, summary, [role="button"], [role="tab"]';
    for (const el of document.querySelectorAll<HTMLElement>(selector)) {
      const box = el.getBoundingClientRect();
      const style = getComputedStyle(el);
      const shown =
        box.width > 0 && box.height > 0 && style.visibility !== 'hidden' && el.closest('[aria-hidden="true"], [inert], dialog:not([open])') === null;
      // Visually hidden until focused (the skip link): it is measured when it shows.
      const clipped = style.position === 'absolute' && box.width <= 1 && box.height <= 1;
      if (!shown || clipped) continue;
      if (el.tagName === 'A') {
        const block = el.closest('p, li, dd, td, th, figcaption, label, legend, span');
        const own = (el.textContent ?? '').trim().length;
        const around = (block?.textContent ?? '').trim().length;
        if (block && around > own + 2 && getComputedStyle(el).display === 'inline') continue;
      }
      let left = box.left;
      let top = box.top;
      let right = box.right;
      let bottom = box.bottom;
      const input = el as HTMLInputElement;
      if (el.tagName === 'INPUT' && (input.type === 'checkbox' || input.type === 'radio')) {
        for (const label of input.labels ?? []) {
          const after = getComputedStyle(label, '::after');
          const stretched = after.content !== 'none' && after.position === 'absolute';
          let area: Element = label;
          if (stretched) {
            for (let node = label.parentElement; node; node = node.parentElement) {
              if (getComputedStyle(node).position !== 'static') {
                area = node;
                break;
              }
            }
          }
          const r = area.getBoundingClientRect();
          left = Math.min(left, r.left);
          top = Math.min(top, r.top);
          right = Math.max(right, r.right);
          bottom = Math.max(bottom, r.bottom);
        }
      }
      targetsMeasured += 1;
      const width = right - left;
      const height = bottom - top;
      // Half a pixel of rounding: 2.75rem is 44 px, but borders and sub-pixel layout can land at 43.99.
      if (width < min - 0.5 || height < min - 0.5) {
        const name = (el.getAttribute('aria-label') ?? el.textContent ?? input.name ?? '').trim().replace(/\s+/g, ' ').slice(0, 40);
        smallTargets.push({
          element: `${el.tagName.toLowerCase()}${input.type ? `[${input.type}]` : ''} "${name}"`,
          widthPx: Math.round(width),
          heightPx: Math.round(height),
        });
      }
    }
    return { scrollWidthPx: scroller.scrollWidth, viewportWidthPx: window.innerWidth, smallTargets, targetsMeasured };
  }, minTargetPx);
}
