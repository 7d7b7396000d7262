import { describe, expect, it } from 'vitest';
import { deepPourFromMm, moldCautions } from './mold-cautions';

const calm = { maxDepthMm: 20, trappedAirMm3: 0, maxLayerMm: null, layersNeeded: null, unitSystem: 'metric' as const };

describe('moldCautions', () => {
  it('always carries the SDS/TDS line, and nothing else for a shallow, vented pocket', () => {
    expect(moldCautions(calm).map((c) => c.code)).toEqual(['follow_sds_tds']);
  });

  it('asks to vent or re-orient when air would be trapped, saying how much', () => {
    const [first] = moldCautions({ ...calm, trappedAirMm3: 1500 });
    expect(first?.code).toBe('trapped_air');
    expect(first?.message).toContain('1.5 mL');
    expect(first?.message).toMatch(/vent/);
  });

  it('warns about exotherm past the common-practice deep-pour depth', () => {
    // Common practice: about 25 mm (1 in) in one pour is where deep-pour products and layers start.
    const codes = moldCautions({ ...calm, maxDepthMm: 40 }).map((c) => c.code);
    expect(codes).toContain('deep_pour_exotherm');
    expect(moldCautions({ ...calm, maxDepthMm: deepPourFromMm }).map((c) => c.code)).not.toContain('deep_pour_exotherm');
  });

  it('names the layers needed when the maker typed a layer limit the depth exceeds', () => {
    const cautions = moldCautions({ ...calm, maxDepthMm: 20, maxLayerMm: 6, layersNeeded: 4 });
    const layered = cautions.find((c) => c.code === 'deeper_than_layer');
    expect(layered?.severity).toBe('danger');
    expect(layered?.message).toContain('4 layers');
    expect(layered?.message).toContain('6.0 mm');
  });

  it('speaks inches in a US shop', () => {
    // NIST SP 811: 1 in = 25.4 mm, so 50.8 mm is 2.000 in.
    const deep = moldCautions({ ...calm, maxDepthMm: 50.8, unitSystem: 'us' }).find((c) => c.code === 'deep_pour_exotherm');
    expect(deep?.message).toContain('2.000 in');
  });
});
