import { describe, expect, it } from 'vitest';
import { lotStateOf, lotStateWords } from './lot-status';

describe('lotStateOf', () => {
  it('puts expiry first, then what is left', () => {
    expect(lotStateOf({ expired: true, low: false, remainingG: 900 })).toBe('expired');
    expect(lotStateOf({ expired: false, low: true, remainingG: 0 })).toBe('used_up');
    expect(lotStateOf({ expired: false, low: true, remainingG: 40 })).toBe('low');
    expect(lotStateOf({ expired: false, low: false, remainingG: 900 })).toBe('in_stock');
  });

  it('gives every state its own words and its own shape, so colour never carries it alone', () => {
    const states = Object.values(lotStateWords);
    expect(new Set(states.map((s) => s.label)).size).toBe(states.length);
    expect(new Set(states.map((s) => s.shape)).size).toBe(states.length);
  });
});
