import type { Browser, BrowserContext, Page } from 'playwright-core';
import { deleteMould, uploadAnalysedMould, type StorageState } from './app-session';
import { domNodeCount, firstContentfulPaintMs, observeLongTasks, pageTimeWhen, timeClick, timeToInteractiveMs } from './page-timing';
import { pocketBlockStl } from './pocket-block-stl';
import { recordScripts, totalGzipBytes, totalRawBytes, type ScriptLoad } from './script-loads';

const viewport = { width: 1280, height: 900 };

/** A fresh context (empty cache) that starts signed in, watching long tasks and failing on page errors. */
async function freshPage(browser: Browser, state: StorageState): Promise<{ context: BrowserContext; page: Page; errors: string[] }> {
  const context = await browser.newContext({ storageState: state, viewport });
  await observeLongTasks(context);
  const page = await context.newPage();
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  return { context, page, errors };
}

function mustBeClean(errors: string[], where: string): void {
  if (errors.length) throw new Error(`page errors on ${where}: ${errors.join('; ')}`);
}

export interface HomeRun {
  scripts: ScriptLoad[];
  gzipBytes: number;
  rawBytes: number;
  fcpMs: number;
  contentMs: number;
  /** Null when the main thread never went quiet for the whole window (see timeToInteractiveMs). */
  ttiMs: number | null;
  longestTaskMs: number;
  domNodes: number;
}

/**
 * The signed-in home (Today) loaded cold: the JS fetched until the app is idle, first contentful
 * paint, the time the list of what is due is on screen and the approximate time to interactive.
 */
export async function measureHome(browser: Browser, baseUrl: string, state: StorageState, quietMs: number): Promise<HomeRun> {
  const { context, page, errors } = await freshPage(browser, state);
  try {
    const recorder = recordScripts(page);
    await page.goto(`${baseUrl}/today`, { waitUntil: 'commit' });
    const contentMs = await pageTimeWhen(
      page,
      () => document.getElementById('today-due') !== null || document.body.innerText.includes('Nothing due in the next 24 hours'),
      null,
    );
    const tti = await timeToInteractiveMs(page, contentMs, quietMs);
    recorder.stop();
    const scripts = await recorder.loads();
    const fcpMs = await firstContentfulPaintMs(page);
    if (fcpMs === null) throw new Error('Chromium reported no first-contentful-paint entry');
    mustBeClean(errors, 'the home page');
    return {
      scripts,
      gzipBytes: totalGzipBytes(scripts),
      rawBytes: totalRawBytes(scripts),
      fcpMs,
      contentMs,
      ttiMs: tti.ttiMs,
      longestTaskMs: tti.longestTaskMs,
      domNodes: await domNodeCount(page),
    };
  } finally {
    await context.close();
  }
}

export interface ListRun {
  listMs: number;
  rows: number;
  domNodes: number;
  pageChangeMs: number;
  pageChangeLongestTaskMs: number;
  filterMs: number;
  filterLongestTaskMs: number;
  threeLoaded: boolean;
}

async function apiTotal(page: Page, path: string): Promise<number> {
  return page.evaluate(async (p) => ((await (await fetch(p)).json()) as { total: number }).total, path);
}

/**
 * The cure board loaded cold with every pour of the big shop open: the first page of cards on
 * screen, how many the page draws, then "Next page" and the "Ready today" filter, each timed from
 * the click to the frame that shows the new answer.
 */
export async function measureCureBoard(browser: Browser, baseUrl: string, state: StorageState): Promise<ListRun> {
  const { context, page, errors } = await freshPage(browser, state);
  try {
    const recorder = recordScripts(page);
    await page.goto(`${baseUrl}/cure-board`, { waitUntil: 'commit' });
    const listMs = await pageTimeWhen(page, () => document.querySelectorAll('ul[aria-label="Pours"] > li').length > 0, null);
    const rows = await page.locator('ul[aria-label="Pours"] > li').count();
    const domNodes = await domNodeCount(page);

    const before = await page.locator('ul[aria-label="Pours"] > li h2').first().textContent();
    const next = page.getByRole('navigation', { name: 'Pages of the cure board' }).getByRole('link', { name: 'Next page' });
    const pageChange = await timeClick(
      next,
      (b: string | null) => document.querySelector('ul[aria-label="Pours"] > li h2')?.textContent !== b && document.body.innerText.includes('Page 2 of'),
      before,
    );

    const readyToday = await apiTotal(page, '/api/pours?status=active&readyToday=true&limit=1');
    await page.getByLabel('Ready today').check();
    const filter = await timeClick(
      page.getByRole('search', { name: 'Filter the cure board' }).getByRole('button', { name: 'Show' }),
      (expected: number) => {
        if (expected === 0) return document.body.innerText.includes('No pours match');
        const status = document.querySelector('main p[role="status"]')?.textContent ?? '';
        return status.startsWith(`${expected} pour`) && status.includes('ready today');
      },
      readyToday,
    );
    recorder.stop();
    const threeLoaded = (await recorder.loads()).some((l) => l.isThree);
    mustBeClean(errors, 'the cure board');
    return {
      listMs,
      rows,
      domNodes,
      pageChangeMs: pageChange.ms,
      pageChangeLongestTaskMs: pageChange.longestTaskMs,
      filterMs: filter.ms,
      filterLongestTaskMs: filter.longestTaskMs,
      threeLoaded,
    };
  } finally {
    await context.close();
  }
}

/** The shelf's lots tab loaded cold with the big shop's lots: first page, "Next page", then a search for one product's part B lots. */
export async function measureShelfLots(browser: Browser, baseUrl: string, state: StorageState, search: string): Promise<ListRun> {
  const { context, page, errors } = await freshPage(browser, state);
  try {
    const recorder = recordScripts(page);
    await page.goto(`${baseUrl}/shelf?tab=lots`, { waitUntil: 'commit' });
    const rowsSelector = 'table:has(caption) tbody tr';
    const listMs = await pageTimeWhen(page, (sel: string) => document.querySelectorAll(sel).length > 0, rowsSelector);
    const rows = await page.locator(rowsSelector).count();
    const domNodes = await domNodeCount(page);

    const before = await page.locator(`${rowsSelector} td, ${rowsSelector} th`).first().textContent();
    const next = page.getByRole('navigation', { name: 'Pages of lots' }).getByRole('link', { name: 'Next page' });
    const pageChange = await timeClick(
      next,
      ({ sel, b }: { sel: string; b: string | null }) =>
        document.querySelector(`${sel} td, ${sel} th`)?.textContent !== b && document.body.innerText.includes('Page 2 of'),
      { sel: rowsSelector, b: before },
    );

    const matching = await apiTotal(page, `/api/shelf/lots?q=${encodeURIComponent(search)}&limit=1`);
    await page.getByRole('search', { name: 'Search the shelf' }).getByLabel('Search').fill(search);
    const filter = await timeClick(
      page.getByRole('search', { name: 'Search the shelf' }).getByRole('button', { name: 'Show' }),
      (expected: number) => {
        if (expected === 0) return document.body.innerText.includes('Nothing matches');
        const status = document.querySelector('main p[role="status"]')?.textContent ?? '';
        return status.startsWith(`${expected} lot`) && status.includes('match');
      },
      matching,
    );
    recorder.stop();
    const threeLoaded = (await recorder.loads()).some((l) => l.isThree);
    mustBeClean(errors, 'the shelf');
    return {
      listMs,
      rows,
      domNodes,
      pageChangeMs: pageChange.ms,
      pageChangeLongestTaskMs: pageChange.longestTaskMs,
      filterMs: filter.ms,
      filterLongestTaskMs: filter.longestTaskMs,
      threeLoaded,
    };
  } finally {
    await context.close();
  }
}

export interface MouldRun {
  /** Pages other than the mould's that loaded three.js (should be none). */
  threeElsewhere: string[];
  otherPages: string[];
  threeOnMould: ScriptLoad | null;
  /** From navigation to the 3D canvas on screen. */
  sceneMs: number;
}

/** Pages a maker opens besides a mould's; none of them may fetch three.js. */
export const pagesWithoutThree = ['/today', '/pieces', '/moulds', '/pour-plans', '/cure-board', '/shelf', '/shelf?tab=lots', '/team', '/shop-settings'];

/**
 * Uploads a small analysed mould, opens every other page cold and checks none fetched three.js,
 * then opens the mould's page cold and times it until the 3D canvas is drawn.
 */
export async function measureMouldRoute(browser: Browser, baseUrl: string, makerState: StorageState): Promise<MouldRun> {
  const { context, page, errors } = await freshPage(browser, makerState);
  let mouldId: string | undefined;
  try {
    await page.goto(`${baseUrl}/today`);
    mouldId = await uploadAnalysedMould(page, pocketBlockStl(), `Bench pocket block ${Date.now()}`);
    const threeElsewhere: string[] = [];
    for (const path of pagesWithoutThree) {
      const visit = await freshPage(browser, makerState);
      try {
        const recorder = recordScripts(visit.page);
        await visit.page.goto(`${baseUrl}${path}`, { waitUntil: 'networkidle' });
        recorder.stop();
        if ((await recorder.loads()).some((l) => l.isThree)) threeElsewhere.push(path);
        mustBeClean(visit.errors, path);
      } finally {
        await visit.context.close();
      }
    }
    const visit = await freshPage(browser, makerState);
    try {
      const recorder = recordScripts(visit.page);
      await visit.page.goto(`${baseUrl}/moulds/${mouldId}`, { waitUntil: 'commit' });
      const sceneMs = await pageTimeWhen(visit.page, () => document.querySelector('[data-testid="mold-3d"] canvas') !== null, null);
      recorder.stop();
      const threeOnMould = (await recorder.loads()).find((l) => l.isThree) ?? null;
      mustBeClean(visit.errors, 'the mould page');
      return { threeElsewhere, otherPages: pagesWithoutThree, threeOnMould, sceneMs };
    } finally {
      await visit.context.close();
    }
  } finally {
    if (mouldId) await deleteMould(page, mouldId);
    mustBeClean(errors, 'the mould upload');
    await context.close();
  }
}
