import { describe, expect, it } from 'vitest';
import { cellSolid } from '../test/moulds';
import { analysisOf, unwrap } from '../test/pipeline';
import { readAnalysis } from './analysis-codec';
import { cavityFloorMm } from './cavity-floor';
import { PLAN_CURVE_POINTS, planCavityFacts } from './plan-cavity-facts';

// A 100 × 60 × 30 mm block with an 80 × 40 mm pocket floored at z = 10: below a level z the pocket holds a prism,
// V = 80 × 40 × (z − 10) mm³ (CRC Standard Mathematical Tables, right prism: base area × height).
const block = cellSolid([0, 10, 90, 100], [0, 10, 50, 60], [0, 10, 30], (i, j, k) => !(i === 1 && j === 1 && k === 1));
const prismMm3 = (levelMm: number) => 80 * 40 * Math.max(0, levelMm - 10);

describe('a mould as a plan’s cavity', () => {
  const model = unwrap(readAnalysis(analysisOf(block)));
  const floorMm = unwrap(cavityFloorMm(model));

  it('samples the volume evenly from the floor to the fill level, on the prism', () => {
    expect(floorMm).toBeCloseTo(10, 6);
    const facts = unwrap(planCavityFacts(model, 'outline', floorMm, 25));
    expect(facts.curve).toHaveLength(PLAN_CURVE_POINTS);
    expect(facts.curve[0]).toMatchObject({ levelMm: floorMm, volumeMm3: 0 });
    expect(facts.curve.at(-1)!.levelMm).toBeCloseTo(25, 9);
    for (const p of facts.curve) expect(p.volumeMm3).toBeCloseTo(prismMm3(p.levelMm), 3);
    expect(facts.maxDepthMm).toBeCloseTo(15, 6);
    // Pocket floor plus walls up to the level: 80 × 40 + 2 × (80 + 40) × 15 mm².
    expect(facts.wettedAreaMm2).toBeCloseTo(3200 + 2 * 120 * 15, 3);
  });

  it('gives the depth map at the fill level: 15 mm of resin over the pocket, none over the rim', () => {
    const { depthMap } = unwrap(planCavityFacts(model, 'outline', floorMm, 25));
    const depths = Array.from(depthMap.depthsMm);
    expect(Math.max(...depths)).toBeCloseTo(15, 4);
    const wet = depths.filter((d) => d > 0).length * depthMap.cellMm[0] * depthMap.cellMm[1];
    expect(wet).toBeGreaterThan(0.9 * 3200);
    expect(wet).toBeLessThan(1.1 * 3200);
  });

  it('keeps levels rising when the level is the floor itself: one point, holding nothing', () => {
    const facts = unwrap(planCavityFacts(model, 'outline', floorMm, floorMm));
    expect(facts.curve).toEqual([{ levelMm: floorMm, volumeMm3: 0 }]);
  });
});
