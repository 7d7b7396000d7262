/**
 * Web performance bench: `npm run bench:web` (docker-free-scripts/bench-web.sh builds the app, makes
 * the big shop's database and runs this). The whole stack runs as for the browser tests, on free
 * ports against that database; Chromium measures the signed-in app and the big lists. Each measure
 * runs GELPOINT_WEBBENCH_RUNS times (default 5) and the median is printed with the range of runs.
 * Exits 1 when a budget is broken.
 */
import { launchBrowser } from '../e2e/support/browser';
import { demoPassword } from '../e2e/support/sign-in';
import { E2eStack } from '../e2e/support/stack';
import { signedInState } from './app-session';
import { budgets } from './budgets';
import { brokenBudgets, bytesRow, checkRow, countRow, markdownTable, median, msRow, type FigureRow } from './figures';
import { measureCureBoard, measureHome, measureMouldRoute, measureShelfLots, type HomeRun, type ListRun } from './measures';

const runs = Math.max(1, Number(process.env.GELPOINT_WEBBENCH_RUNS ?? 5));
// Lighthouse waits for a 5 s window without long tasks; the same window is used here.
const quietMs = 5_000;
// One product's part B lots: a search the shelf answers from the lot number.
const lotSearch = 'BRI-B';

const started = performance.now();
const stack = new E2eStack();
await stack.start();
const browser = await launchBrowser();
let status = 0;
try {
  const lead = await signedInState(browser, stack.baseUrl, 'lead@gelpoint.test', demoPassword);
  const maker = await signedInState(browser, stack.baseUrl, 'maker@gelpoint.test', demoPassword);

  const home: HomeRun[] = [];
  const board: ListRun[] = [];
  const shelf: ListRun[] = [];
  for (let i = 0; i < runs; i++) {
    home.push(await measureHome(browser, stack.baseUrl, lead, quietMs));
    board.push(await measureCureBoard(browser, stack.baseUrl, lead));
    shelf.push(await measureShelfLots(browser, stack.baseUrl, lead, lotSearch));
    process.stderr.write(`run ${i + 1} of ${runs}: home, cure board and shelf measured\n`);
  }
  const mould = await measureMouldRoute(browser, stack.baseUrl, maker);

  const pick = <T, K extends keyof T>(list: T[], key: K) => list.map((r) => r[key] as number);
  const threeBefore = [
    ...(home.some((h) => h.scripts.some((s) => s.isThree)) ? ['/today'] : []),
    ...(board.some((b) => b.threeLoaded) ? ['/cure-board'] : []),
    ...(shelf.some((s) => s.threeLoaded) ? ['/shelf?tab=lots'] : []),
    ...mould.threeElsewhere,
  ];
  const rows: FigureRow[] = [
    bytesRow('initial JS of the signed-in home, gzip', pick(home, 'gzipBytes'), budgets.initialJsGzipBytes),
    bytesRow('initial JS of the signed-in home, as served', pick(home, 'rawBytes')),
    checkRow(
      'three.js before the mould route',
      threeBefore.length === 0,
      threeBefore.length ? `loaded on ${[...new Set(threeBefore)].join(', ')}` : `none (${mould.otherPages.length} pages)`,
      'none',
    ),
    checkRow(
      'three.js on the mould route',
      mould.threeOnMould !== null,
      mould.threeOnMould ? `${(mould.threeOnMould.gzipBytes / 1000).toFixed(1)} kB gzip, lazily` : 'not loaded',
      'loaded',
    ),
    msRow('home: first contentful paint', pick(home, 'fcpMs'), budgets.firstContentfulPaintMs),
    msRow('home: list of what is due on screen', pick(home, 'contentMs')),
    msRow(
      'home: time to interactive (approx.)',
      home.map((h) => h.ttiMs ?? Infinity),
      budgets.timeToInteractiveMs,
    ),
    countRow('home: DOM elements', pick(home, 'domNodes'), budgets.domNodes),
    msRow('cure board (500 pours): first page on screen', pick(board, 'listMs'), budgets.listRenderedMs),
    countRow('cure board: cards drawn', pick(board, 'rows'), budgets.rowsAtOnce),
    countRow('cure board: DOM elements', pick(board, 'domNodes'), budgets.domNodes),
    msRow('cure board: next page', pick(board, 'pageChangeMs'), budgets.interactionMs),
    msRow('cure board: "Ready today" filter', pick(board, 'filterMs'), budgets.interactionMs),
    msRow('shelf lots (1,000 lots): first page on screen', pick(shelf, 'listMs'), budgets.listRenderedMs),
    countRow('shelf lots: rows drawn', pick(shelf, 'rows'), budgets.rowsAtOnce),
    countRow('shelf lots: DOM elements', pick(shelf, 'domNodes'), budgets.domNodes),
    msRow('shelf lots: next page', pick(shelf, 'pageChangeMs'), budgets.interactionMs),
    msRow(`shelf lots: search "${lotSearch}"`, pick(shelf, 'filterMs'), budgets.interactionMs),
    msRow('mould page: 3D view drawn (1 run)', [mould.sceneMs]),
  ];

  const chunks = [...home[0]!.scripts].sort((a, b) => b.gzipBytes - a.gzipBytes);
  console.log(`\nJavaScript the signed-in home fetched (first run, ${chunks.length} files):`);
  for (const c of chunks)
    console.log(`  ${c.name.padEnd(40)} ${(c.rawBytes / 1000).toFixed(1).padStart(7)} kB  ${(c.gzipBytes / 1000).toFixed(1).padStart(6)} kB gzip`);
  const longest = (list: { longestTaskMs: number }[]) => Math.round(median(list.map((r) => r.longestTaskMs)));
  console.log(
    `\nLongest main-thread task (median of runs): home ${longest(home)} ms; cure board next page ${Math.round(median(pick(board, 'pageChangeLongestTaskMs')))} ms, filter ${Math.round(median(pick(board, 'filterLongestTaskMs')))} ms; shelf next page ${Math.round(median(pick(shelf, 'pageChangeLongestTaskMs')))} ms, search ${Math.round(median(pick(shelf, 'filterLongestTaskMs')))} ms (0 = no task over 50 ms).`,
  );
  console.log(`\n${markdownTable(rows)}\n`);
  console.log('Budgets:');
  for (const b of Object.values(budgets)) console.log(`  ${b.source}`);
  const broken = brokenBudgets(rows);
  console.log(`\n${runs} runs of each measure, median shown; ${Math.round((performance.now() - started) / 1000)} s in all.`);
  if (broken.length) {
    console.log(`\nBROKEN: ${broken.map((r) => `${r.measure} (${r.value}, budget ${r.budget})`).join('; ')}`);
    status = 1;
  } else {
    console.log('Every budget is kept.');
  }
} catch (err) {
  console.error(err);
  status = 2;
} finally {
  await browser.close();
  await stack.stop();
}
process.exit(status);
