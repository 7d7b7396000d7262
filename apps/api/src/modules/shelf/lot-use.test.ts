import { describe, expect, it } from 'vitest';
import { bearer, createShop, useHarness } from '../../test-support/harness';
import { loggedPour } from '../../test-support/logged-pour';

const h = useHarness();

describe('where a lot went', () => {
  it('lists every batch mixed from a lot, newest first, with its pour, piece, part, grams, mixer and time', async () => {
    const w = await loggedPour(h, 'lotuse');
    const lead = bearer(w.shop.lead);
    expect(w.logged.length).toBeGreaterThanOrEqual(2);
    const newestFirst = [...w.logged].sort((p, q) => q.mixedAt.localeCompare(p.mixedAt));

    for (const [lotId, part, grams] of [
      [w.lots.a, 'A', (r: (typeof w.logged)[number]) => r.weighedAG],
      [w.lots.b, 'B', (r: (typeof w.logged)[number]) => r.weighedBG],
      [w.lots.pigment, 'pigment', (r: (typeof w.logged)[number]) => r.weighedPigmentG],
    ] as const) {
      // Any member reads it: the apprentice tracing a bad lot is the usual case.
      const res = await h.http().get(`/api/shelf/lots/${lotId}/uses`).set(bearer(w.apprentice)).expect(200);
      expect(res.body.total).toBe(w.logged.length);
      expect(res.body.items).toHaveLength(w.logged.length);
      res.body.items.forEach((use: Record<string, unknown>, i: number) => {
        const want = newestFirst[i]!;
        expect(use).toMatchObject({
          pourId: w.pourId,
          piece: { id: w.piece.id, name: w.piece.name },
          planName: w.plan.name,
          part,
          planBatchIndex: want.planBatchIndex,
          mixedAt: want.mixedAt,
          mixedBy: { id: want.mixedBy.user.id, name: want.mixedBy.user.name },
          voided: false,
        });
        expect(use.weighedG).toBe(grams(want));
        expect(use.step).toMatch(/^layer:\d+$/);
      });
    }

    // The lot's stock was drawn down by exactly the grams listed against it.
    const lotA = (await h.http().get(`/api/shelf/lots/${w.lots.a}`).set(lead).expect(200)).body;
    const usedA = w.logged.reduce((sum, r) => sum + r.weighedAG, 0);
    expect(lotA.remainingG).toBeCloseTo(20_000 - usedA, 6);

    const paged = await h.http().get(`/api/shelf/lots/${w.lots.a}/uses`).query({ limit: 1, offset: 1 }).set(lead).expect(200);
    expect(paged.body.total).toBe(w.logged.length);
    expect(paged.body.items.map((u: { planBatchIndex: number }) => u.planBatchIndex)).toEqual([newestFirst[1]!.planBatchIndex]);
  });

  it('answers an empty list for a lot nobody used, and 404 for another shop’s lot or no lot at all', async () => {
    const w = await loggedPour(h, 'lotspare');
    const unused = await h.http().get(`/api/shelf/lots/${w.lots.spareA}/uses`).set(bearer(w.shop.lead)).expect(200);
    expect(unused.body).toEqual({ items: [], total: 0 });
    const other = await createShop(h, 'Other shop');
    const foreign = await h.http().get(`/api/shelf/lots/${w.lots.a}/uses`).set(bearer(other.lead)).expect(404);
    expect(foreign.body.error.message).toMatch(/lot/);
    await h.http().get('/api/shelf/lots/00000000-0000-4000-8000-000000000000/uses').set(bearer(w.shop.lead)).expect(404);
    await h.http().get(`/api/shelf/lots/${w.lots.a}/uses`).query({ limit: 0 }).set(bearer(w.shop.lead)).expect(400);
  });

  it('keeps the record of a batch once its lot is deleted from the shelf: the batch still names the lot number', async () => {
    const w = await loggedPour(h, 'lotgone');
    await h.http().delete(`/api/shelf/lots/${w.lots.a}`).set(bearer(w.shop.lead)).expect(204);
    await h.http().get(`/api/shelf/lots/${w.lots.a}/uses`).set(bearer(w.shop.lead)).expect(404);
    const pour = (await h.http().get(`/api/pours/${w.pourId}`).set(bearer(w.shop.lead)).expect(200)).body;
    expect(pour.batches).toHaveLength(w.logged.length);
    expect(pour.batches.every((b: { lotA: string }) => b.lotA === 'lotgone-A-1')).toBe(true);
  });
});
