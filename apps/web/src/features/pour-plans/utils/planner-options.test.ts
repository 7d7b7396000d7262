import { absorptionPresets } from '@gelpoint/core';
import { describe, expect, it } from 'vitest';
import { absorptionOptions, pigmentOptions, productOptions } from './planner-options';
import { benchDeep, benchSeal, benchTeal } from './test-fixtures';

describe('planner options', () => {
  it('offers the shelf, and an archived product only while the plan still names it', () => {
    const archived = { ...benchSeal, archived: true };
    expect(productOptions([benchDeep, archived], '', 'metric').map((o) => o.value)).toEqual([benchDeep.id]);
    const kept = productOptions([benchDeep, archived], archived.id, 'metric');
    expect(kept.map((o) => o.value)).toEqual([benchDeep.id, archived.id]);
    expect(kept[1]?.label).toContain('archived');
    expect(kept[0]?.label).toBe('Bench Deep 20 (deep pour, layers up to 20.0 mm)');
    expect(pigmentOptions([{ ...benchTeal, archived: true }], '')).toEqual([]);
  });

  // NIST SP 811: 20 mm is 20 / 25.4 = 0.787 in.
  it('writes a product’s layer limit in the shop’s units', () => {
    expect(productOptions([benchDeep], '', 'us')[0]?.label).toContain('0.787 in');
  });

  it('offers every absorption preset core knows, with its factor, and the shop’s own', () => {
    expect(absorptionOptions.map((o) => o.value)).toEqual([...Object.keys(absorptionPresets), 'custom']);
    expect(absorptionOptions.find((o) => o.value === 'end_grain')?.label).toContain('× 2.00');
  });
});
