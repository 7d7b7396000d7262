import { describe, expect, it } from 'vitest';
import { actions, can, mayVoidEntry } from './permissions';
import { apiRoutes } from './routes';

// The roles as the product describes them (design/product.md, "for three people"): the maker plans pieces and
// uploads moulds, the lead keeps the shelf and releases pieces, the apprentice mixes and logs.
describe('permission table', () => {
  it('lets the lead do everything a shop needs', () => {
    expect(actions.filter((a) => !can('lead', a))).toEqual([]);
  });

  it('lets the maker plan a piece: upload moulds and plan pours, but not keep the shelf or release a piece', () => {
    expect(can('maker', 'mold:change')).toBe(true);
    expect(can('maker', 'plan:change')).toBe(true);
    expect(can('maker', 'shelf:keep')).toBe(false);
    expect(can('maker', 'pour:release')).toBe(false);
  });

  it('keeps the apprentice to mixing and logging: no action of the table is theirs', () => {
    expect(actions.filter((a) => can('apprentice', a))).toEqual([]);
  });

  it('lets anyone void what they logged themselves, and only the lead what others logged', () => {
    expect(mayVoidEntry({ userId: 'u1', role: 'apprentice' }, 'u1')).toBe(true);
    expect(mayVoidEntry({ userId: 'u1', role: 'maker' }, 'u2')).toBe(false);
    expect(mayVoidEntry({ userId: 'u1', role: 'apprentice' }, null)).toBe(false);
    expect(mayVoidEntry({ userId: 'u1', role: 'lead' }, 'u2')).toBe(true);
  });

  it('names an action of the table for every route not open to all members, so no route invents its own roles', () => {
    const known = new Set<string>(['public', 'member', ...actions]);
    expect(
      Object.entries(apiRoutes)
        .filter(([, r]) => !known.has(r.access))
        .map(([name]) => name),
    ).toEqual([]);
  });
});

describe('route table', () => {
  it('has one route per method and path', () => {
    const keys = Object.values(apiRoutes).map((r) => `${r.method} ${r.path}`);
    expect(new Set(keys).size).toBe(keys.length);
  });

  it('declares the path parameters its params schema reads', () => {
    for (const [name, r] of Object.entries(apiRoutes)) {
      const inPath = [...r.path.matchAll(/:([A-Za-z]+)/g)].map((m) => m[1]).sort();
      const declared = 'params' in r && r.params ? Object.keys(r.params.shape).sort() : [];
      expect({ name, inPath }).toEqual({ name, inPath: declared });
    }
  });
});
