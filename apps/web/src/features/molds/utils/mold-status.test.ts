import { MoldStatus } from '@gelpoint/contracts';
import { describe, expect, it } from 'vitest';
import { analysisPollInterval, moldStatusWords } from './mold-status';

describe('moldStatusWords', () => {
  it('names every status the API knows, each with its own word', () => {
    expect(Object.keys(moldStatusWords).sort()).toEqual([...MoldStatus.options].sort());
    const labels = MoldStatus.options.map((status) => moldStatusWords[status].label);
    expect(new Set(labels).size).toBe(labels.length);
  });
});

describe('analysisPollInterval', () => {
  it('polls while queued or analysing and stops when ready or failed', () => {
    expect(analysisPollInterval('queued')).toBeGreaterThan(0);
    expect(analysisPollInterval('analysing')).toBeGreaterThan(0);
    expect(analysisPollInterval('ready')).toBe(false);
    expect(analysisPollInterval('failed')).toBe(false);
    expect(analysisPollInterval(undefined)).toBe(false);
  });
});
