import type { BrowserContext, Locator, Page } from 'playwright-core';

/** Long tasks (over 50 ms on the main thread) as the page's PerformanceObserver saw them, in page time. */
interface LongTask {
  startMs: number;
  endMs: number;
}

declare global {
  interface Window {
    gelpointBenchLongTasks?: LongTask[];
  }
}

/**
 * Registers a `longtask` PerformanceObserver in every page of the context before any of the app's
 * scripts run, so no long task is missed.
 */
export async function observeLongTasks(context: BrowserContext): Promise<void> {
  await context.addInitScript(() => {
    const tasks: { startMs: number; endMs: number }[] = [];
    window.gelpointBenchLongTasks = tasks;
    new PerformanceObserver((list) => {
      for (const e of list.getEntries()) tasks.push({ startMs: e.startTime, endMs: e.startTime + e.duration });
    }).observe({ type: 'longtask', buffered: true });
  });
}

/**
 * The source of a script that, in the page, optionally clicks the element marked `data-bench-click`,
 * then checks `done` every animation frame and resolves with the page times of the start and of the
 * first frame where it held. The predicate and its argument are written into the script's text:
 * the driver compiles it, where the app's CSP (no eval in the page) does not apply.
 */
function watchScript<A>(done: (arg: A) => boolean, arg: A, click: boolean, timeoutMs: number): string {
  return `new Promise((resolve, reject) => {
    const holds = (${done.toString()});
    const arg = ${JSON.stringify(arg)};
    const startMs = performance.now();
    if (${String(click)}) {
      const el = document.querySelector('[data-bench-click]');
      el.removeAttribute('data-bench-click');
      el.click();
    }
    const check = () => {
      if (holds(arg)) resolve({ startMs, endMs: performance.now() });
      else if (performance.now() - startMs > ${timeoutMs}) reject(new Error('the page did not show what was awaited within ${timeoutMs} ms'));
      else requestAnimationFrame(check);
    };
    check();
  })`;
}

/**
 * Waits, checking every animation frame, until `predicate` holds in the page, and returns the page
 * time (ms since navigation start) of the first frame it held in.
 */
export async function pageTimeWhen<A>(page: Page, predicate: (arg: A) => boolean, arg: A, timeoutMs = 20_000): Promise<number> {
  const { endMs } = (await page.evaluate(watchScript(predicate, arg, false, timeoutMs))) as { endMs: number };
  return endMs;
}

export async function firstContentfulPaintMs(page: Page): Promise<number | null> {
  return page.evaluate(() => performance.getEntriesByName('first-contentful-paint', 'paint')[0]?.startTime ?? null);
}

export async function domNodeCount(page: Page): Promise<number> {
  return page.evaluate(() => document.getElementsByTagName('*').length);
}

/**
 * Time to interactive, approximated: the main content is in the page at `contentMs` and painted by
 * first contentful paint; from the later of the two the main thread is watched until it has gone
 * `quietMs` without a long task. The answer is that floor, or the end of the last long task before
 * the quiet window if later. (Lighthouse starts from first contentful paint alone and also asks for
 * at most two requests in flight; the network is not watched here.) A page that never goes quiet
 * within `giveUpMs` answers null rather than a number it did not reach.
 */
export async function timeToInteractiveMs(
  page: Page,
  contentMs: number,
  quietMs: number,
  giveUpMs = 15_000,
): Promise<{ ttiMs: number | null; longTasks: number; longestTaskMs: number }> {
  for (;;) {
    const { nowMs, fcpMs, tasks } = await page.evaluate(() => ({
      nowMs: performance.now(),
      fcpMs: performance.getEntriesByName('first-contentful-paint', 'paint')[0]?.startTime ?? null,
      tasks: window.gelpointBenchLongTasks ?? [],
    }));
    const floor = Math.max(contentMs, fcpMs ?? Infinity);
    const from = Math.max(floor, ...tasks.map((t) => t.endMs));
    const longestTaskMs = Math.max(0, ...tasks.map((t) => t.endMs - t.startMs));
    if (nowMs - from >= quietMs) return { ttiMs: from, longTasks: tasks.length, longestTaskMs };
    if (nowMs - contentMs > giveUpMs) return { ttiMs: null, longTasks: tasks.length, longestTaskMs };
    await page.waitForTimeout(Number.isFinite(from) ? Math.min(250, quietMs - (nowMs - from) + 10) : 250);
  }
}

/** The longest main-thread task that began at or after `sinceMs`, 0 when none reached 50 ms. */
export async function longestTaskSinceMs(page: Page, sinceMs: number): Promise<number> {
  return page.evaluate(
    (since) => (window.gelpointBenchLongTasks ?? []).filter((t) => t.startMs >= since).reduce((m, t) => Math.max(m, t.endMs - t.startMs), 0),
    sinceMs,
  );
}

/**
 * Clicks the element and watches for `done` in one script inside the page, so no driver round trip
 * falls in the timed span; returns the ms from the click to the first animation frame where `done`
 * held, and the longest task in between.
 */
export async function timeClick<A>(target: Locator, done: (arg: A) => boolean, arg: A, timeoutMs = 20_000): Promise<{ ms: number; longestTaskMs: number }> {
  await target.evaluate((el) => el.setAttribute('data-bench-click', ''));
  const page = target.page();
  const { startMs, endMs } = (await page.evaluate(watchScript(done, arg, true, timeoutMs))) as { startMs: number; endMs: number };
  return { ms: endMs - startMs, longestTaskMs: await longestTaskSinceMs(page, startMs) };
}
