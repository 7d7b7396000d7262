import { QueryClient, QueryObserver, hashKey } from '@tanstack/react-query';
import { describe, expect, it, vi } from 'vitest';
import { ensurePieceRecord } from '../../features/pours/api/get-piece-record';
import { lotChoicesQueryOptions } from '../../features/pours/api/get-lot-choices';
import { refreshAfterSent } from '../../features/pours/api/refresh-after-sent';
import { refreshPour } from '../../features/pours/api/refresh-pour';
import { lotQueryOptions } from '../../features/shelf/api/get-lot';
import { lotUsesQueryOptions } from '../../features/shelf/api/get-lot-uses';
import { lotsQueryOptions } from '../../features/shelf/api/get-lots';
import { lotListQueryOptions, refreshLots } from './lots';
import { pourPlanQueryOptions } from './pour-plans';
import { piecePoursQueryOptions, pourQueryOptions } from './pours';

// Reference: TanStack Query's own cache (QueryClient, QueryObserver), which decides what invalidateQueries marks
// stale and refetches; nothing here reimplements its key matching.

const pieceId = '5f3c1c2e-0000-4000-8000-0000000000a1';
const pourId = '5f3c1c2e-0000-4000-8000-0000000000b1';
const planId = '5f3c1c2e-0000-4000-8000-0000000000c1';
const resinId = '5f3c1c2e-0000-4000-8000-0000000000d1';
const noLots = { items: [], total: 0 };

const shelfTab = lotsQueryOptions({ part: 'A', limit: 50, offset: 0 });
const lotPicker = lotChoicesQueryOptions({ part: 'A', productId: resinId });

const isStale = (client: QueryClient, queryKey: readonly unknown[]) => client.getQueryState(queryKey)?.isInvalidated === true;

describe('lists of lots', () => {
  it('are one entry per query for the shelf and the mixing form alike', () => {
    expect(shelfTab.queryKey).toEqual(lotListQueryOptions({ part: 'A', limit: 50, offset: 0 }).queryKey);
    expect(lotPicker.queryKey).toEqual(lotListQueryOptions({ part: 'A', productId: resinId, status: 'all', limit: 100 }).queryKey);
    // The same query asked by either is the same cache entry, whatever order its fields were written in.
    expect(hashKey(lotListQueryOptions({ limit: 100, status: 'all', productId: resinId, part: 'A' }).queryKey)).toBe(hashKey(lotPicker.queryKey));
  });

  it('go stale together when a lot, a cup or a product changes them', async () => {
    const client = new QueryClient();
    client.setQueryData(shelfTab.queryKey, noLots);
    client.setQueryData(lotPicker.queryKey, noLots);
    await refreshLots(client);
    expect(isStale(client, shelfTab.queryKey)).toBe(true);
    expect(isStale(client, lotPicker.queryKey)).toBe(true);
  });

  it('take each lot’s own page and the batches that drew on it along, which a logged or voided cup changes too', async () => {
    const client = new QueryClient();
    const lotId = '5f3c1c2e-0000-4000-8000-0000000000e1';
    const lotPage = lotQueryOptions(lotId);
    const uses = lotUsesQueryOptions(lotId, 0);
    // In the cache as a page that has asked for them would leave them.
    client.getQueryCache().build(client, { queryKey: lotPage.queryKey });
    client.getQueryCache().build(client, { queryKey: uses.queryKey });
    expect([isStale(client, lotPage.queryKey), isStale(client, uses.queryKey)]).toEqual([false, false]);
    await refreshLots(client);
    expect(isStale(client, lotPage.queryKey)).toBe(true);
    expect(isStale(client, uses.queryKey)).toBe(true);
  });

  it('are asked again at once where a page shows one', async () => {
    const client = new QueryClient();
    let asked = 0;
    const answer = () => {
      asked += 1;
      return noLots;
    };
    const observer = new QueryObserver(client, { ...lotPicker, queryFn: answer });
    const stop = observer.subscribe(() => {});
    await vi.waitFor(() => expect(observer.getCurrentResult().isSuccess).toBe(true));
    expect(asked).toBe(1);
    await refreshLots(client);
    expect(asked).toBe(2);
    stop();
  });

  it('are refreshed when the phone has sent cups it kept offline', async () => {
    const client = new QueryClient();
    client.setQueryData(shelfTab.queryKey, noLots);
    client.setQueryData(lotPicker.queryKey, noLots);
    await refreshAfterSent(client, pourId);
    expect(isStale(client, shelfTab.queryKey)).toBe(true);
    expect(isStale(client, lotPicker.queryKey)).toBe(true);
  });
});

describe("a piece's pours and a pour's log", () => {
  // Only what the record's loader reads of each answer (ids); the key, not the answer, is what is checked here.
  function clientHolding() {
    const client = new QueryClient();
    client.setQueryData([...piecePoursQueryOptions(pieceId).queryKey], { items: [{ id: pourId, startedAt: '2026-11-02T10:00:00.000Z' }], total: 1 });
    client.setQueryData([...pourQueryOptions(pourId).queryKey], { id: pourId, pourPlanId: planId });
    client.setQueryData([...pourPlanQueryOptions(planId).queryKey], { id: planId });
    return client;
  }

  it('are read by the cure record under the keys the piece page, the pour page and the plan page read them by', async () => {
    const client = clientHolding();
    await ensurePieceRecord(client, pieceId);
    const held = client
      .getQueryCache()
      .getAll()
      .map((q) => q.queryHash)
      .sort();
    const shared = [piecePoursQueryOptions(pieceId), pourQueryOptions(pourId), pourPlanQueryOptions(planId)].map((o) => hashKey(o.queryKey)).sort();
    // Nothing fetched and no entry of the record's own: it found everything where the other pages keep it.
    expect(held).toEqual(shared);
  });

  it('go stale, the record with them, when anything is logged against the pour', async () => {
    const client = clientHolding();
    await refreshPour(client, pourId);
    expect(isStale(client, piecePoursQueryOptions(pieceId).queryKey)).toBe(true);
    expect(isStale(client, pourQueryOptions(pourId).queryKey)).toBe(true);
    // The plan a pour followed does not change with its log.
    expect(isStale(client, pourPlanQueryOptions(planId).queryKey)).toBe(false);
  });

  it('go stale when the phone has sent what it kept, for a pour it could not name too', async () => {
    const client = clientHolding();
    await refreshAfterSent(client, null);
    expect(isStale(client, piecePoursQueryOptions(pieceId).queryKey)).toBe(true);
    expect(isStale(client, pourQueryOptions(pourId).queryKey)).toBe(true);
  });
});
