import { MoldStatus } from '@gelpoint/contracts';
import { describe, expect, it } from 'vitest';
import { moldStatusWords } from './mold-status';

describe('moldStatusWords', () => {
  it('names every status the API knows, each with its own word', () => {
    expect(Object.keys(moldStatusWords).sort()).toEqual([...MoldStatus.options].sort());
    const labels = MoldStatus.options.map((status) => moldStatusWords[status].label);
    expect(new Set(labels).size).toBe(labels.length);
  });
});
