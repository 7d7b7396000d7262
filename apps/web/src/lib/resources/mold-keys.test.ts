import { partialMatchKey } from '@tanstack/react-query';
import { describe, expect, it } from 'vitest';
import { moldKeys } from './molds';

// Reference: TanStack Query's own prefix matcher, which invalidateQueries and removeQueries use.
describe('moldKeys', () => {
  const moldId = '5f3c1c2e-0000-4000-8000-000000000001';
  const list = moldKeys.list({ limit: 50, offset: 0 });
  const fill = moldKeys.fill(moldId, { levelMm: 30, dam: 'outline', depthMap: false });

  it('lets one invalidation of lists() reach every list and no mould', () => {
    expect(partialMatchKey(list, moldKeys.lists())).toBe(true);
    expect(partialMatchKey(moldKeys.detail(moldId), moldKeys.lists())).toBe(false);
  });

  it('forgets a mould’s fills, layers, depth map and STL with the mould', () => {
    expect(partialMatchKey(fill, moldKeys.detail(moldId))).toBe(true);
    expect(partialMatchKey(moldKeys.stl(moldId), moldKeys.detail(moldId))).toBe(true);
    expect(partialMatchKey(moldKeys.depthMap(moldId, '2026-11-01T10:00:00.000Z'), moldKeys.detail(moldId))).toBe(true);
    expect(partialMatchKey(moldKeys.layers(moldId, { levelsMm: [10, 20], dam: 'box' }), moldKeys.detail(moldId))).toBe(true);
  });

  it('keeps the answers of two analyses of one mould apart', () => {
    const before = moldKeys.fill(moldId, { levelMm: 30, dam: 'outline', depthMap: false }, '2026-11-01T10:00:00.000Z');
    const after = moldKeys.fill(moldId, { levelMm: 30, dam: 'outline', depthMap: false }, '2026-11-01T10:05:00.000Z');
    expect(partialMatchKey(after, before)).toBe(false);
    expect(partialMatchKey(after, moldKeys.detail(moldId))).toBe(true);
  });

  it('keeps two levels and two dams apart', () => {
    expect(partialMatchKey(moldKeys.fill(moldId, { levelMm: 20, dam: 'outline', depthMap: false }), fill)).toBe(false);
    expect(partialMatchKey(moldKeys.fill(moldId, { levelMm: 30, dam: 'box', depthMap: false }), fill)).toBe(false);
  });
});
