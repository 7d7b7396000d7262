import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type axe from 'axe-core';
import type { Page } from 'playwright-core';

interface RestLook {
  outline: string;
  shadow: string;
}

// What these checks put on the page's window: axe-core once its source is evaluated, and each focusable element's
// look before anything was focused. Both are absent until then.
declare global {
  interface Window {
    axe?: typeof axe;
    __restLook?: Map<Element, RestLook>;
  }
}

// axe-core is run from the installed file, not from a CDN. page.addScriptTag would add an inline <script> that the
// API's CSP (script-src 'self') refuses; page.evaluate goes through the DevTools protocol, which CSP does not govern,
// so the pages are checked with their real headers and no bypassCSP context.
const axeSource = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');

export interface Finding {
  page: string;
  role: string;
  rule: string;
  impact: string;
  help: string;
  targets: string[];
}

/** WCAG 2.1 A and AA rules of axe; serious and critical findings fail the check. */
export async function axeFindings(page: Page, where: { page: string; role: string }): Promise<Finding[]> {
  await page.evaluate(axeSource);
  const violations = await page.evaluate(async () => {
    if (!window.axe) throw new Error('axe-core did not load into the page');
    const result = await window.axe.run(document, {
      runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'] },
      resultTypes: ['violations'],
    });
    return result.violations.map((v) => ({ id: v.id, impact: v.impact ?? 'unknown', help: v.help, targets: v.nodes.map((n) => n.target.join(' ')) }));
  });
  return violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => ({ ...where, rule: v.id, impact: v.impact, help: v.help, targets: v.targets.slice(0, 5) }));
}

export interface FocusProblem {
  page: string;
  element: string;
}

/**
 * Tabs through the page and compares each focused element's outline and shadow with its look before anything was
 * focused: a keyboard user must see where they are on every stop.
 */
export async function focusProblems(page: Page, name: string, maxStops = 60): Promise<{ stops: number; problems: FocusProblem[] }> {
  await page.evaluate(() => {
    // No named helpers inside: the test runner's transform would wrap them in a helper the page does not have.
    const rest = new Map<Element, RestLook>();
    for (const el of document.querySelectorAll('a[href], button, input, select, textarea, summary, [tabindex]')) {
      const s = getComputedStyle(el);
      rest.set(el, { outline: `${s.outlineStyle} ${s.outlineWidth} ${s.outlineColor}`, shadow: s.boxShadow });
    }
    window.__restLook = rest;
    (document.activeElement as HTMLElement | null)?.blur();
  });
  const problems: FocusProblem[] = [];
  const seen = new Set<string>();
  let stops = 0;
  for (let i = 0; i < maxStops; i += 1) {
    await page.keyboard.press('Tab');
    const stop = await page.evaluate(() => {
      const el = document.activeElement;
      if (!el || el === document.body) return null;
      const s = getComputedStyle(el);
      if (!window.__restLook) throw new Error('the look at rest was not taken before tabbing');
      const before = window.__restLook.get(el);
      const outlineWidth = s.outlineStyle === 'none' ? 0 : parseFloat(s.outlineWidth);
      const shadowChanged = before !== undefined && s.boxShadow !== before.shadow && s.boxShadow !== 'none';
      const outlineShown = outlineWidth >= 2 && (before === undefined || `${s.outlineStyle} ${s.outlineWidth} ${s.outlineColor}` !== before.outline);
      const label = `${el.tagName.toLowerCase()}${el.id ? `#${el.id}` : ''} "${(el.getAttribute('aria-label') ?? el.textContent ?? '').trim().slice(0, 40)}"`;
      const path: string[] = [];
      for (let node: Element | null = el; node && node !== document.body; node = node.parentElement)
        path.push(`${node.tagName}:${[...(node.parentElement?.children ?? [])].indexOf(node)}`);
      return { key: path.join('/'), label, visible: outlineShown || shadowChanged };
    });
    if (!stop) continue;
    if (seen.has(stop.key)) break;
    seen.add(stop.key);
    stops += 1;
    if (!stop.visible) problems.push({ page: name, element: stop.label });
  }
  return { stops, problems };
}
