import { QueryClient } from '@tanstack/react-query';
import { describe, expect, it } from 'vitest';
import { shouldPersistQuery } from './query-persister';

describe('shouldPersistQuery', () => {
  it('keeps finished answers and leaves out failures, opted-out queries and file bytes', async () => {
    const client = new QueryClient();
    await client.prefetchQuery({ queryKey: ['pour'], queryFn: () => ({ id: 'p' }) });
    await client.prefetchQuery({ queryKey: ['stl'], queryFn: () => new ArrayBuffer(8) });
    await client.prefetchQuery({ queryKey: ['secret'], queryFn: () => 1, meta: { persist: false } });
    await client.prefetchQuery({ queryKey: ['broken'], queryFn: () => Promise.reject(new Error('x')), retry: false });
    const keep = (key: string) => shouldPersistQuery(client.getQueryCache().find({ queryKey: [key] })!);
    expect(['pour', 'stl', 'secret', 'broken'].map(keep)).toEqual([true, false, false, false]);
  });
});
