import { describe, expect, it } from 'vitest';
import { formDefaultsOf, valuesKey } from './form-defaults';
import { newPlannerValues } from './planner-values';

describe('formDefaultsOf', () => {
  it('starts empty numbers as empty boxes and keeps the rest', () => {
    const defaults = formDefaultsOf(newPlannerValues('Tray'));
    expect(defaults.fillLevelMm).toBeUndefined();
    expect(defaults.cavity?.shape?.lengthMm).toBeUndefined();
    expect(defaults.cavity?.shape?.maxDepthMm).toBeNull();
    expect(defaults.overPourPct).toBe(5);
    expect(defaults.cupWaste).toEqual({ unit: 'g', amount: 5 });
    expect(defaults.name).toBe('Tray');
  });
});

describe('valuesKey', () => {
  // Reference: JSON.stringify alone writes NaN and a missing value both as null, and would hide the change.
  it('tells an empty number from nothing and from zero', () => {
    expect(JSON.stringify({ a: Number.NaN })).toBe(JSON.stringify({ a: null }));
    expect(valuesKey({ a: Number.NaN })).not.toBe(valuesKey({ a: null }));
    expect(valuesKey({ a: undefined })).not.toBe(valuesKey({ a: 0 }));
  });
});
