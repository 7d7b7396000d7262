import type { LotView, PigmentView, ResinSystemView } from '@gelpoint/contracts';
import { beforeAll, describe, expect, it } from 'vitest';
import { resinInput } from '../../test-support/fixtures';
import { bearer, createShop, useHarness, type ShopFixture } from '../../test-support/harness';

const h = useHarness();

// The reference order is computed here with ECMAScript's Array.prototype.sort (stable since ES2019) over the
// whole shelf, read in one request; the API must give the same order page by page. UUIDs compare as their
// lower-case hex text, which is PostgreSQL's byte order for uuid. Lot numbers and names are ASCII, where
// comparing lower-cased UTF-16 code units and PostgreSQL's "C" collation agree.
type Dir = 'asc' | 'desc';
type Key = string | number | null;

const LOT_COUNT = 60;
const PAGE = 50;

function referenceOrder<T extends { id: string }>(rows: readonly T[], keyOf: (row: T) => Key, dir: Dir): T[] {
  const sign = dir === 'asc' ? 1 : -1;
  const cmp = (a: string | number, b: string | number) => (a < b ? -1 : a > b ? 1 : 0);
  return [...rows].sort((p, q) => {
    const a = keyOf(p);
    const b = keyOf(q);
    if (a === null || b === null) {
      if (a !== b) return a === null ? 1 : -1;
    } else if (a !== b) return sign * cmp(a, b);
    return sign * cmp(p.id, q.id);
  });
}

// expired, then used up, then low, then in stock: the order the state column promises.
const stateRank = (l: LotView) => (l.expired ? 0 : l.remainingG <= 0 ? 1 : l.low ? 2 : 3);

const lotKeys: Record<string, (l: LotView) => Key> = {
  lotNumber: (l) => l.lotNumber.toLowerCase(),
  product: (l) => l.productName.toLowerCase(),
  part: (l) => l.part,
  remaining: (l) => l.remainingG,
  received: (l) => l.receivedOn,
  expires: (l) => l.expiresOn,
  state: stateRank,
};

let shop: ShopFixture;
let other: ShopFixture;
let shelf: LotView[];
let otherLotIds: Set<string>;

const addDays = (iso: string, days: number) => new Date(Date.parse(`${iso}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);

async function post<T>(who: ShopFixture, path: string, body: object): Promise<T> {
  return (await h.http().post(path).set(bearer(who.lead)).send(body).expect(201)).body as T;
}

async function lotPage(query: Record<string, string | number>, who = shop): Promise<{ items: LotView[]; total: number }> {
  return (await h.http().get('/api/shelf/lots').query(query).set(bearer(who.lead)).expect(200)).body;
}

/** Every lot, walking the pages with offset in steps of `limit`. */
async function walk(query: Record<string, string>, limit: number): Promise<LotView[]> {
  const out: LotView[] = [];
  for (let offset = 0; ; offset += limit) {
    const page = await lotPage({ ...query, limit, offset });
    out.push(...page.items);
    if (offset + limit >= page.total) return out;
  }
}

beforeAll(async () => {
  shop = await createShop(h, 'Sorted shelf');
  other = await createShop(h, 'Neighbour shelf');
  const resins = [];
  for (const name of ['Stillwater Deep 50', 'amber cast', 'Tabletop Clear'])
    resins.push((await post<ResinSystemView>(shop, '/api/shelf/resin-systems', resinInput({ name }))).id);
  const pigment = (
    await post<PigmentView>(shop, '/api/shelf/pigments', {
      name: 'Teal mica',
      kind: 'powder',
      densityGPerMl: 2.8,
      recommendedPct: 1,
      maxPct: 3,
      pricePerPack: 9,
      packSizeG: 25,
    })
  ).id;
  for (let i = 0; i < LOT_COUNT; i++) {
    const part = (['A', 'B', 'pigment'] as const)[i % 3]!;
    const expired = i % 11 === 3;
    const receivedOn = expired ? addDays('2019-01-01', i) : addDays('2026-01-01', (i * 7) % 40);
    const lot = await post<LotView>(shop, '/api/shelf/lots', {
      part,
      resinSystemId: part === 'pigment' ? null : resins[i % resins.length],
      pigmentId: part === 'pigment' ? pigment : null,
      lotNumber: `${i % 2 ? 'lot' : 'LOT'}-${String((i * 37) % LOT_COUNT).padStart(3, '0')}`,
      // 37 and 30 share no factor, so every quantity occurs exactly twice: the id has to break the ties.
      quantityG: 1000 + ((i * 37) % 30) * 10,
      receivedOn,
      // Every seventh lot never expires; the others expire on one of 45 dates, several on the same day.
      expiresOn: i % 7 === 0 ? null : expired ? addDays('2020-01-01', i % 5) : addDays('2031-01-01', (i * 13) % 45),
    });
    if (i % 9 === 4)
      await h
        .http()
        .patch(`/api/shelf/lots/${lot.id}`)
        .set(bearer(shop.lead))
        .send({ remainingG: i % 2 ? 0 : 40 + i })
        .expect(200);
  }
  // The neighbour's lots would sort first in every direction (tiny, early, late) if they leaked in.
  const theirs = (await post<ResinSystemView>(other, '/api/shelf/resin-systems', resinInput({ name: 'AAA neighbour' }))).id;
  otherLotIds = new Set();
  for (const [quantityG, expiresOn] of [
    [1, '2026-02-01'],
    [9_000_000, '2099-12-31'],
  ] as const) {
    otherLotIds.add(
      (
        await post<LotView>(other, '/api/shelf/lots', {
          part: 'A',
          resinSystemId: theirs,
          lotNumber: '000-neighbour',
          quantityG,
          receivedOn: '2026-01-01',
          expiresOn,
        })
      ).id,
    );
  }
  shelf = (await lotPage({ limit: 500 })).items;
}, 60_000);

describe('lots sorted on the server', () => {
  it('holds the whole shelf to sort: more lots than one page, ties and undated lots among them', () => {
    expect(shelf).toHaveLength(LOT_COUNT);
    expect(new Set(shelf.map((l) => l.remainingG)).size).toBeLessThan(LOT_COUNT);
    expect(shelf.some((l) => l.expiresOn === null)).toBe(true);
    expect(new Set(shelf.map(stateRank))).toEqual(new Set([0, 1, 2, 3]));
  });

  it('puts the globally smallest remaining stock on the first page, and the largest when descending', async () => {
    const up = await lotPage({ sort: 'remaining', dir: 'asc', limit: PAGE });
    expect(up.total).toBe(LOT_COUNT);
    expect(up.items.map((l) => l.id)).toEqual(
      referenceOrder(shelf, lotKeys.remaining!, 'asc')
        .slice(0, PAGE)
        .map((l) => l.id),
    );
    const smallest = Math.min(...shelf.map((l) => l.remainingG));
    expect(up.items[0]!.remainingG).toBe(smallest);

    const down = await lotPage({ sort: 'remaining', dir: 'desc', limit: PAGE });
    expect(down.items.map((l) => l.id)).toEqual(
      referenceOrder(shelf, lotKeys.remaining!, 'desc')
        .slice(0, PAGE)
        .map((l) => l.id),
    );
    expect(down.items[0]!.remainingG).toBe(Math.max(...shelf.map((l) => l.remainingG)));
  });

  it('keeps lots that never expire last in both directions', async () => {
    const undated = shelf.filter((l) => l.expiresOn === null).length;
    for (const dir of ['asc', 'desc'] as const) {
      const all = await walk({ sort: 'expires', dir }, PAGE);
      expect(
        all.slice(-undated).every((l) => l.expiresOn === null),
        dir,
      ).toBe(true);
      expect(
        all.slice(0, -undated).every((l) => l.expiresOn !== null),
        dir,
      ).toBe(true);
    }
    const dated = shelf
      .map((l) => l.expiresOn)
      .filter((d): d is string => d !== null)
      .sort();
    expect((await lotPage({ sort: 'expires', dir: 'asc', limit: 1 })).items[0]!.expiresOn).toBe(dated[0]);
    expect((await lotPage({ sort: 'expires', dir: 'desc', limit: 1 })).items[0]!.expiresOn).toBe(dated.at(-1));
  });

  it('continues the same order across pages, every column both ways, without repeats or gaps', async () => {
    for (const [sort, keyOf] of Object.entries(lotKeys)) {
      for (const dir of ['asc', 'desc'] as const) {
        const walked = await walk({ sort, dir }, 7);
        expect(new Set(walked.map((l) => l.id)).size, `${sort} ${dir}`).toBe(LOT_COUNT);
        expect(
          walked.map((l) => l.id),
          `${sort} ${dir}`,
        ).toEqual(referenceOrder(shelf, keyOf, dir).map((l) => l.id));
      }
    }
  });

  it('sorts by state worst first: expired, used up, low, in stock', async () => {
    const ranks = (await walk({ sort: 'state' }, PAGE)).map(stateRank);
    expect(ranks).toEqual([...ranks].sort((a, b) => a - b));
    expect(ranks[0]).toBe(0);
    expect(ranks.at(-1)).toBe(3);
  });

  it('sorts within the filters and keeps expiry order when no column is chosen', async () => {
    const lowOnes = await lotPage({ status: 'low', sort: 'remaining', dir: 'desc', limit: PAGE });
    const reference = referenceOrder(
      shelf.filter((l) => l.remainingG < l.quantityG * 0.1),
      lotKeys.remaining!,
      'desc',
    );
    expect(lowOnes.items.map((l) => l.id)).toEqual(reference.map((l) => l.id));
    expect((await walk({}, 13)).map((l) => l.id)).toEqual(referenceOrder(shelf, lotKeys.expires!, 'asc').map((l) => l.id));
  });

  it('never shows another shop’s lots, however the list is sorted', async () => {
    for (const [sort, dir] of [
      ['remaining', 'asc'],
      ['remaining', 'desc'],
      ['expires', 'asc'],
      ['expires', 'desc'],
      ['product', 'asc'],
      ['lotNumber', 'asc'],
    ] as const) {
      const page = await lotPage({ sort, dir, limit: PAGE });
      expect(page.total).toBe(LOT_COUNT);
      expect(
        page.items.filter((l) => otherLotIds.has(l.id)),
        `${sort} ${dir}`,
      ).toEqual([]);
    }
    const theirs = await lotPage({ sort: 'remaining', dir: 'asc' }, other);
    expect(theirs.items.map((l) => l.id).sort()).toEqual([...otherLotIds].sort());
  });

  it('refuses a column or direction it does not know, saying which are allowed', async () => {
    for (const query of [
      { sort: 'colour' },
      { sort: 'name' },
      { dir: 'sideways' },
      { sort: 'remaining', dir: 'DESC' },
      { sort: 'l.remaining_g; drop table lots' },
    ]) {
      const res = await h.http().get('/api/shelf/lots').query(query).set(bearer(shop.lead)).expect(400);
      expect(res.body.error.code, JSON.stringify(query)).toBe('invalid_input');
      expect(res.body.error.message.length).toBeGreaterThan(10);
    }
  });
});

describe('products sorted on the server', () => {
  it('orders resin systems and pigments by the chosen column across pages, and refuses the other list’s columns', async () => {
    const maker = await createShop(h, 'Products shelf');
    for (let i = 0; i < 12; i++) {
      await post(
        maker,
        '/api/shelf/resin-systems',
        resinInput({
          name: `${i % 2 ? 'resin' : 'Resin'} ${String.fromCharCode(97 + ((i * 5) % 12))}`,
          potLifeMin: 20 + (i % 4) * 10,
          pricePerKit: 50 + i * 3,
          kitSizeG: 1000 + (i % 3) * 500,
        }),
      );
      await post(maker, '/api/shelf/pigments', {
        name: `Pigment ${i}`,
        kind: (['powder', 'paste', 'liquid'] as const)[i % 3],
        densityGPerMl: 1 + (i % 3),
        recommendedPct: 1,
        maxPct: 2 + (i % 5),
        pricePerPack: 5 + i,
        packSizeG: 10 + (i % 4) * 15,
      });
    }
    const list = async <T>(path: string, query: Record<string, string | number>) =>
      (await h.http().get(path).query(query).set(bearer(maker.lead)).expect(200)).body as { items: T[]; total: number };
    const walkProducts = async <T>(path: string, query: Record<string, string>) => {
      const out: T[] = [];
      for (let offset = 0; offset < 12; offset += 5) out.push(...(await list<T>(path, { ...query, limit: 5, offset })).items);
      return out;
    };
    const resins = (await list<ResinSystemView>('/api/shelf/resin-systems', { limit: 500 })).items;
    const pigments = (await list<PigmentView>('/api/shelf/pigments', { limit: 500 })).items;

    const resinKeys: Record<string, (r: ResinSystemView) => Key> = {
      name: (r) => r.name.toLowerCase(),
      use: (r) => r.use,
      potLife: (r) => r.potLifeMin,
      maxLayer: (r) => r.maxLayerMm,
      maxBatch: (r) => r.maxBatchG,
      pricePerKg: (r) => r.pricePerKit / r.kitSizeG,
    };
    for (const [sort, keyOf] of Object.entries(resinKeys)) {
      for (const dir of ['asc', 'desc'] as const) {
        const walked = await walkProducts<ResinSystemView>('/api/shelf/resin-systems', { sort, dir });
        expect(
          walked.map((r) => r.id),
          `${sort} ${dir}`,
        ).toEqual(referenceOrder(resins, keyOf, dir).map((r) => r.id));
      }
    }
    const pigmentKeys: Record<string, (p: PigmentView) => Key> = {
      name: (p) => p.name.toLowerCase(),
      kind: (p) => p.kind,
      recommendedLoading: (p) => p.recommendedPct,
      maxLoading: (p) => p.maxPct,
      pricePerKg: (p) => p.pricePerPack / p.packSizeG,
    };
    for (const [sort, keyOf] of Object.entries(pigmentKeys)) {
      for (const dir of ['asc', 'desc'] as const) {
        const walked = await walkProducts<PigmentView>('/api/shelf/pigments', { sort, dir });
        expect(
          walked.map((p) => p.id),
          `${sort} ${dir}`,
        ).toEqual(referenceOrder(pigments, keyOf, dir).map((p) => p.id));
      }
    }
    expect((await walkProducts<ResinSystemView>('/api/shelf/resin-systems', {})).map((r) => r.id)).toEqual(
      referenceOrder(resins, resinKeys.name!, 'asc').map((r) => r.id),
    );

    await h.http().get('/api/shelf/resin-systems').query({ sort: 'kind' }).set(bearer(maker.lead)).expect(400);
    await h.http().get('/api/shelf/pigments').query({ sort: 'potLife' }).set(bearer(maker.lead)).expect(400);
    await h.http().get('/api/shelf/pigments').query({ sort: 'name', dir: 'up' }).set(bearer(maker.lead)).expect(400);
    // Another shop's products stay out of every sorted list.
    expect((await list<ResinSystemView>('/api/shelf/resin-systems', { sort: 'name', limit: 500 })).items.some((r) => r.name === 'AAA neighbour')).toBe(false);
  });
});
