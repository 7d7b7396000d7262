import { binaryStl, pocketMouldTriangles } from '../src/test-support/pocket-mould';
import { must } from './api-client';

const hour = 3_600_000;
export const DEMO_PASSWORD = 'gelpoint-demo';

export interface Tokens {
  lead: string;
  maker: string;
  apprentice: string;
}

export interface RunSheetBatch {
  index: number;
  layer: number;
  partAG: number;
  partBG: number;
}

export interface BoardScenario {
  moldId: string;
  /** The cavity's floor and top (mm, the mould's own frame): /fill is asked for levels between them with from=mould. */
  floorMm: number;
  topMm: number;
  planIds: string[];
  pourIds: string[];
  reminderPourId: string;
  resinSystemId: string;
}

interface PlanBody {
  id: string;
  result: { layers: { batches: { index: number; partA: { grams: number }; partB: { grams: number }; pour: { layer?: number } }[] }[] };
}

export async function signIn(base: string, email: string): Promise<string> {
  const s = await must<{ token: string }>(200, base, 'POST', '/auth/login', { json: { email, password: DEMO_PASSWORD } });
  return s.token;
}

/** Runs `work` over `items` with at most `width` at a time (the set-up is not what is measured). */
async function inGroups<T, R>(items: T[], width: number, work: (item: T, i: number) => Promise<R>): Promise<R[]> {
  const out: R[] = [];
  for (let i = 0; i < items.length; i += width) out.push(...(await Promise.all(items.slice(i, i + width).map((x, j) => work(x, i + j)))));
  return out;
}

export const runSheetOf = (plan: PlanBody): RunSheetBatch[] =>
  plan.result.layers.flatMap((l) => l.batches.map((b) => ({ index: b.index, layer: b.pour.layer ?? 0, partAG: b.partA.grams, partBG: b.partB.grams })));

// A tray blank, 300 × 200 × 60 mm, with a 260 × 160 mm pocket down to 10 mm above its base.
const TRAY = { outer: [300, 200, 60] as [number, number, number], pocket: [20, 20, 280, 180] as [number, number, number, number], floorZ: 10 };

// An invented deep-pour product for the bench shop (demo data): thin layers and small cups give a
// run sheet with many batches, so the write bench has distinct cups to log.
const benchResin = {
  name: 'Bench Deep 25',
  use: 'deep_pour',
  mixRatio: { a: 2, b: 1, basis: 'volume' },
  densityAGPerMl: 1.16,
  densityBGPerMl: 0.98,
  potLifeMin: 40,
  gelTimeH: 6,
  tackFreeH: 14,
  recoatWindow: { earliestH: 10, latestH: 30 },
  demoldH: 36,
  fullCureH: 168,
  referenceTempC: 22,
  minWorkTempC: 16,
  maxWorkTempC: 30,
  maxLayerMm: 25,
  maxBatchG: 1000,
  pricePerKit: 110,
  kitSizeG: 4500,
  shelfLifeMonths: 12,
};

async function waitForAnalysis(base: string, token: string, moldId: string, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const m = await must<{ status: string; error: unknown }>(200, base, 'GET', `/molds/${moldId}`, { token });
    if (m.status === 'ready') return;
    if (m.status === 'failed') throw new Error(`the bench mould could not be analysed: ${JSON.stringify(m.error)}`);
    if (Date.now() > deadline) throw new Error(`the bench mould was still ${m.status} after ${timeoutMs} ms; are the workers running?`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

const csvLog = (fromMs: number, toMs: number, stepMs: number, tempAt: (i: number) => number) => {
  const lines = ['time,tempC'];
  for (let t = fromMs, i = 0; t <= toMs; t += stepMs, i++) lines.push(`${new Date(t).toISOString()},${tempAt(i).toFixed(1)}`);
  return `${lines.join('\n')}\n`;
};

/**
 * What the cure board shows while it is measured: a tray mould analysed by a worker, `boardPours`
 * pieces each with its plan from that mould, the first layer logged six hours ago and six hours of
 * five-minute readings; and one pour whose whole run sheet was logged long ago, so its demold and
 * ready-to-machine reminders are due now.
 */
export async function prepareBoard(apis: string[], t: Tokens, boardPours: number): Promise<BoardScenario> {
  const [a, b] = [apis[0]!, apis[1]!];
  const piece = await must<{ id: string }>(201, b, 'POST', '/pieces', { token: t.maker, json: { name: 'Bench tray 1' } });
  const form = new FormData();
  form.append('units', 'mm');
  form.append('up', 'z');
  form.append('name', 'Bench tray pocket');
  form.append('pieceId', piece.id);
  form.append('file', new Blob([new Uint8Array(binaryStl(pocketMouldTriangles(TRAY)))], { type: 'application/octet-stream' }), 'bench-tray.stl');
  const mold = await must<{ id: string }>(202, a, 'POST', '/molds', { token: t.maker, form });
  const resin = await must<{ id: string }>(201, a, 'POST', '/shelf/resin-systems', { token: t.lead, json: benchResin });
  await waitForAnalysis(b, t.maker, mold.id, 90_000);

  const pieceIds = [
    piece.id,
    ...(await inGroups(
      Array.from({ length: boardPours }, (_, i) => i + 2),
      4,
      async (n) => (await must<{ id: string }>(201, n % 2 ? a : b, 'POST', '/pieces', { token: t.maker, json: { name: `Bench tray ${n}` } })).id,
    )),
  ];
  const reminderPieceId = pieceIds.pop()!;
  const planFor = (pieceId: string, i: number) =>
    must<PlanBody>(201, i % 2 ? a : b, 'POST', '/pour-plans', {
      token: t.maker,
      json: {
        pieceId,
        name: `Tray pocket, level 55 mm (${i + 1})`,
        cavity: { source: 'mold', moldId: mold.id },
        fillLevelMm: 55,
        levelFrom: 'mould',
        deepPour: { resinSystemId: resin.id },
        overPourPct: 5,
        shopTempC: 21,
      },
    });
  const plans = await inGroups(pieceIds, 4, planFor);

  const now = Date.now();
  const pourIds = await inGroups(plans, 4, async (plan, i) => {
    const base = i % 2 ? a : b;
    const pour = await must<{ id: string }>(201, base, 'POST', '/pours', { token: t.apprentice, json: { pourPlanId: plan.id } });
    for (const cup of runSheetOf(plan).filter((c) => c.layer === 0)) {
      await must(201, base, 'POST', `/pours/${pour.id}/batches`, {
        token: t.apprentice,
        json: {
          planBatchIndex: cup.index,
          mixedAt: new Date(now - 6 * hour).toISOString(),
          weighedAG: cup.partAG,
          weighedBG: cup.partBG,
          lotANumber: 'BD25-A-0412',
          lotBNumber: 'BD25-B-0412',
          ambientTempC: 21,
          surfaceTempC: 20,
          rhPct: 45,
        },
      });
    }
    await must(200, base, 'POST', `/pours/${pour.id}/readings/csv`, {
      token: t.apprentice,
      csv: csvLog(now - 6 * hour, now - 60_000, 5 * 60_000, (k) => 20.5 + Math.sin(k / 9)),
    });
    return pour.id;
  });

  const reminderPlan = await planFor(reminderPieceId, plans.length);
  const reminderPour = await must<{ id: string }>(201, a, 'POST', '/pours', { token: t.apprentice, json: { pourPlanId: reminderPlan.id } });
  for (const cup of runSheetOf(reminderPlan)) {
    await must(201, b, 'POST', `/pours/${reminderPour.id}/batches`, {
      token: t.apprentice,
      json: { planBatchIndex: cup.index, mixedAt: new Date(now - 400 * hour).toISOString(), weighedAG: cup.partAG, weighedBG: cup.partBG },
    });
  }
  return {
    moldId: mold.id,
    floorMm: TRAY.floorZ,
    topMm: TRAY.outer[2],
    planIds: plans.map((p) => p.id),
    pourIds,
    reminderPourId: reminderPour.id,
    resinSystemId: resin.id,
  };
}

export interface WriteScenario {
  pourIds: string[];
  runSheet: RunSheetBatch[];
}

/** Pours for the write bench: a long river-table channel whose run sheet has many cups, started `count` times. */
export async function prepareWritePours(apis: string[], t: Tokens, resinSystemId: string, count: number): Promise<WriteScenario> {
  const piece = await must<{ id: string }>(201, apis[1]!, 'POST', '/pieces', { token: t.maker, json: { name: 'Bench river table' } });
  const plan = await must<PlanBody>(201, apis[0]!, 'POST', '/pour-plans', {
    token: t.maker,
    json: {
      pieceId: piece.id,
      name: 'Channel, 1.8 m × 300 mm × 50 mm',
      cavity: { source: 'shape', shape: { kind: 'channel', lengthMm: 1800, widthMm: 300, depthMm: 50 } },
      fillLevelMm: 50,
      deepPour: { resinSystemId },
      overPourPct: 5,
      shopTempC: 21,
    },
  });
  const pourIds = await inGroups(
    Array.from({ length: count }, (_, i) => i),
    8,
    async (i) => (await must<{ id: string }>(201, apis[i % 2]!, 'POST', '/pours', { token: t.apprentice, json: { pourPlanId: plan.id } })).id,
  );
  return { pourIds, runSheet: runSheetOf(plan) };
}
