import { partialMatchKey } from '@tanstack/react-query';
import { describe, expect, it } from 'vitest';
import { pieceKeys } from './keys';

// Reference: TanStack Query's own prefix matcher, which invalidateQueries uses to pick what to refetch.
describe('pieceKeys', () => {
  const list = pieceKeys.list({ stage: 'curing', limit: 25, offset: 0 });
  const detail = pieceKeys.detail('5f3c1c2e-0000-4000-8000-000000000001');

  it('lets one invalidation of lists() reach every filtered list and no detail', () => {
    expect(partialMatchKey(list, pieceKeys.lists())).toBe(true);
    expect(partialMatchKey(detail, pieceKeys.lists())).toBe(false);
  });

  it('puts everything under all', () => {
    expect(partialMatchKey(list, pieceKeys.all)).toBe(true);
    expect(partialMatchKey(detail, pieceKeys.all)).toBe(true);
  });

  it('keeps two filters apart', () => {
    const other = pieceKeys.list({ stage: 'ready', limit: 25, offset: 0 });
    expect(partialMatchKey(other, list)).toBe(false);
  });
});
