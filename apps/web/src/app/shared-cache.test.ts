import { PourPlanView, type MoldView, type PourPlanInput } from '@gelpoint/contracts';
import { partialMatchKey, QueryClient, QueryObserver, type QueryObserverOptions } from '@tanstack/react-query';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { deleteMold } from '../features/molds/api/delete-mold';
import { moldsQueryOptions } from '../features/molds/api/get-molds';
import { pieceMoldsQueryOptions } from '../features/pour-plans/api/get-piece-molds';
import { updatePourPlan } from '../features/pour-plans/api/update-pour-plan';
import { planChoicesQueryOptions } from '../features/pours/api/get-plan-choices';
import { testPlan } from '../features/pours/utils/test-plan';
import { forgetMold, moldKeys, moldQueryOptions } from '../lib/resources/molds';
import { keepPourPlan, pourPlanKeys, pourPlanQueryOptions } from '../lib/resources/pour-plans';

// Each screen reads a server resource through the shared query options; these checks hold a view of each screen open
// (a real QueryClient, observers as mounted components hold them) over a small in-memory API, change the resource the
// way the screens' mutations do, and look at what every view shows next.

const pieceId = '00000000-0000-4000-8000-0000000000a1';
const moldOf = (id: string, name: string): MoldView => ({
  id,
  name,
  fileName: `${name}.stl`,
  format: 'stl',
  units: 'mm',
  fileUnits: null,
  upAxis: 'z',
  sizeBytes: 684,
  sha256: 'ab'.repeat(32),
  pieceId,
  status: 'failed',
  progress: 1,
  error: { code: 'open', message: 'the test mould is not analysed' },
  report: null,
  createdAt: '2026-11-01T10:00:00.000Z',
  analysedAt: null,
});

const planId = '00000000-0000-4000-8000-0000000000b1';
const planOf = (name: string): PourPlanView => {
  const saved = testPlan();
  return {
    id: planId,
    pieceId,
    moldId: null,
    name,
    inputs: { name },
    productSnapshot: saved.productSnapshot,
    result: PourPlanView.shape.result.parse(saved.result),
    createdBy: null,
    createdAt: '2026-11-01T10:00:00.000Z',
    updatedAt: '2026-11-01T10:00:00.000Z',
  };
};

/** The API as far as these screens use it, kept in memory. */
function fakeApi() {
  const molds = new Map([moldOf('00000000-0000-4000-8000-0000000000c1', 'Tray'), moldOf('00000000-0000-4000-8000-0000000000c2', 'Bowl')].map((m) => [m.id, m]));
  let plan = planOf('First plan');
  const json = (body: unknown, status = 200) => new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
  const fetch = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = new URL(String(input), 'http://shop.test');
    const method = init?.method ?? 'GET';
    const mold = /^\/api\/molds\/([^/]+)$/.exec(url.pathname);
    if (method === 'GET' && url.pathname === '/api/molds') {
      const items = [...molds.values()].filter((m) => !url.searchParams.get('pieceId') || m.pieceId === url.searchParams.get('pieceId'));
      return json({ items: items.map((m) => ({ ...m, report: undefined, fillVolumeToTopMm3: null })), total: items.length });
    }
    if (mold && method === 'GET')
      return molds.has(mold[1]!) ? json(molds.get(mold[1]!)) : json({ error: { code: 'not_found', message: 'no such mould' } }, 404);
    if (mold && method === 'DELETE') {
      molds.delete(mold[1]!);
      return new Response(null, { status: 204 });
    }
    if (url.pathname === `/api/pour-plans/${planId}` && method === 'GET') return json(plan);
    if (url.pathname === `/api/pour-plans/${planId}` && method === 'PUT') {
      const body = JSON.parse(String(init?.body)) as { name: string };
      plan = { ...planOf(body.name), updatedAt: '2026-11-02T10:00:00.000Z' };
      return json(plan);
    }
    return json({ error: { code: 'no_such_route', message: `${method} ${url.pathname}` } }, 404);
  });
  return { fetch };
}

/** A mounted view of a query: it stays subscribed, so an invalidation refetches it as it would on screen. */
async function view<T, K extends readonly unknown[]>(client: QueryClient, options: QueryObserverOptions<T, Error, T, T, K>) {
  const observer = new QueryObserver(client, options);
  const unsubscribe = observer.subscribe(() => undefined);
  await vi.waitFor(() => expect(observer.getCurrentResult().isSuccess).toBe(true));
  return { current: () => observer.getCurrentResult(), unsubscribe };
}

let client: QueryClient;
beforeEach(() => {
  vi.stubGlobal('fetch', fakeApi().fetch);
  client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
});
afterEach(() => {
  client.clear();
  vi.unstubAllGlobals();
});

describe('one cache entry per server resource', () => {
  it('reads a mould once for the moulds area and the planner alike', async () => {
    const moldId = '00000000-0000-4000-8000-0000000000c1';
    await view(client, moldQueryOptions(moldId));
    expect(client.getQueryCache().findAll({ queryKey: moldKeys.detail(moldId), exact: true })).toHaveLength(1);
    expect(client.getQueryCache().findAll({ predicate: (q) => JSON.stringify(q.queryKey).includes(moldId) })).toHaveLength(1);
  });

  it('leaves no view showing a deleted mould: the moulds list, the planner’s list of the piece’s moulds, the mould page', async () => {
    const moldId = '00000000-0000-4000-8000-0000000000c1';
    const mouldsList = await view(client, moldsQueryOptions({ limit: 50, offset: 0 }));
    const plannerList = await view(client, pieceMoldsQueryOptions(pieceId));
    await view(client, moldQueryOptions(moldId));
    expect(plannerList.current().data?.items.map((m) => m.name)).toEqual(['Tray', 'Bowl']);

    await deleteMold(moldId);
    await forgetMold(client, moldId);

    await vi.waitFor(() => expect(plannerList.current().data?.items.map((m) => m.name)).toEqual(['Bowl']));
    expect(mouldsList.current().data?.items.map((m) => m.name)).toEqual(['Bowl']);
    expect(client.getQueryData(moldKeys.detail(moldId))).toBeUndefined();
  });

  it('shows an edited plan on the plan page and on its pour’s run sheet at once, without asking again', async () => {
    const planPage = await view(client, pourPlanQueryOptions(planId));
    const pourRunSheet = await view(client, pourPlanQueryOptions(planId));
    const asked = vi.mocked(globalThis.fetch).mock.calls.length;

    const values = { ...planPage.current().data!.inputs, name: 'Second plan' } as PourPlanInput;
    await keepPourPlan(client, await updatePourPlan({ planId, values }));

    expect(planPage.current().data?.name).toBe('Second plan');
    expect(pourRunSheet.current().data?.name).toBe('Second plan');
    // The PUT itself, and no GET of the plan: its answer is the plan every view shows.
    expect(vi.mocked(globalThis.fetch).mock.calls.length).toBe(asked + 1);
  });

  // Reference: TanStack Query's prefix matcher, which invalidateQueries uses to pick what to refetch.
  it('offers a new pour only plans that still exist: the choices are a page of the plans’ own list', () => {
    expect(partialMatchKey(planChoicesQueryOptions().queryKey, pourPlanKeys.lists())).toBe(true);
  });
});
