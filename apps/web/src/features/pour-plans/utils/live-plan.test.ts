import { absorptionPresets, convertLength } from '@gelpoint/core';
import { describe, expect, it } from 'vitest';
import { livePourPlan, shapeCavity } from './live-plan';
import { newPlannerValues, type PlannerValues } from './planner-values';
import { checkPlanner } from './planner-validation';
import { benchDeep, benchSeal, benchTeal, testPieceId } from './test-fixtures';

const shelf = { resinSystems: [benchDeep, benchSeal], pigments: [benchTeal], scaleResolutionG: 0.1 };

function trayValues(change: (values: PlannerValues) => void = () => {}): PlannerValues {
  const values = newPlannerValues('Tray, 300 × 200');
  values.cavity.shape = { ...values.cavity.shape, kind: 'rectangle', lengthMm: 300, widthMm: 200, depthMm: 30 };
  values.fillLevelMm = 30;
  values.deepPour.resinSystemId = benchDeep.id;
  values.overPourPct = 5;
  values.cupWaste = { unit: 'g', amount: 0 };
  values.shopTempC = 22;
  change(values);
  return values;
}

function planOf(values: PlannerValues) {
  const checked = checkPlanner(values, testPieceId);
  if (!checked.ok) throw new Error(JSON.stringify(checked.fieldErrors));
  const live = livePourPlan(checked.input, shelf);
  if (!live.ok) throw new Error(live.error.message);
  return live.value.plan;
}

describe('livePourPlan for a 300 × 200 × 30 mm rectangle', () => {
  const plan = planOf(trayValues());

  // CRC Concise Encyclopedia of Mathematics: a right prism holds V = base area × height;
  // 300 × 200 × 30 mm = 1 800 000 mm³ = 1.8 L.
  it('fills the prism volume', () => {
    expect(plan.fill.fillVolumeMl).toBeCloseTo((300 * 200 * 30) / 1000, 9);
  });

  it('needs two layers under a 20 mm limit, each half the volume, over-pour on each', () => {
    expect(plan.layers).toHaveLength(2);
    for (const layer of plan.layers) {
      expect(layer.thicknessMm).toBeCloseTo(15, 9);
      expect(layer.fillVolumeMl).toBeCloseTo((300 * 200 * 15) / 1000, 9);
      expect(layer.pourVolumeMl).toBeCloseTo(900 * 1.05, 9);
    }
    expect(plan.fill.pourVolumeMl).toBeCloseTo(1890, 9);
  });

  // A ratio "2 : 1 by volume" means two millilitres of A to one of B; grams are each part's volume × its density.
  // Shown grams are on the 0.1 g scale, each within one step of the exact amount.
  it('weighs part A and part B from the volume ratio and the densities', () => {
    const layer = plan.layers[0]!;
    const batch = layer.batches[0]!;
    expect(layer.batches).toHaveLength(1);
    expect(Math.abs(batch.partA.grams - 945 * (2 / 3) * 1.16)).toBeLessThanOrEqual(0.1 + 1e-9);
    expect(Math.abs(batch.partB.grams - 945 * (1 / 3) * 0.97)).toBeLessThanOrEqual(0.1 + 1e-9);
    expect(Math.round(batch.partA.grams * 10)).toBe(batch.partA.grams * 10);
  });
});

describe('livePourPlan with a seal coat, pigment and wood', () => {
  const plan = planOf(
    trayValues((v) => {
      v.sealCoat = { enabled: true, resinSystemId: benchSeal.id, filmThicknessMm: 0.2, coats: 2, absorption: 'open_grain', absorptionFactor: Number.NaN };
      v.deepPour.pigmentId = benchTeal.id;
      v.deepPour.pigmentPct = 2;
      v.wood = { enabled: true, lengthMm: 600, widthMm: 300, thicknessMm: 50, pricePerBoardFoot: 10 };
    }),
  );

  // CRC: the lateral area of a right prism is perimeter × height; the seal coat covers floor plus walls.
  it('seals the floor and four walls with the film, the coats and the wood’s absorption', () => {
    const wetted = 300 * 200 + 2 * (300 + 200) * 30;
    expect(plan.sealCoat?.wettedAreaMm2).toBe(wetted);
    expect(plan.sealCoat?.coats).toHaveLength(2);
    expect(plan.sealCoat?.coats[0]?.volumeMl).toBeCloseTo((wetted * 0.2 * absorptionPresets.open_grain) / 1000, 9);
  });

  it('weighs pigment as a share of the resin mass', () => {
    const batch = plan.layers[0]!.batches[0]!;
    expect(Math.abs(batch.pigment.grams - (batch.partA.grams + batch.partB.grams) * 0.02)).toBeLessThanOrEqual(0.1 + 1e-9);
    expect(plan.deepPour.pigmentName).toBe('Bench Teal');
  });

  // NHLA: a board foot is 144 in³; NIST SP 811: 1 in = 25.4 mm exactly.
  it('prices the blank by the board foot', () => {
    const boardFeet = ((600 / 25.4) * (300 / 25.4) * (50 / 25.4)) / 144;
    expect(convertLength(1, 'in', 'mm')).toBe(25.4);
    expect(plan.cost.wood?.boardFeet).toBeCloseTo(boardFeet, 9);
    expect(plan.cost.wood?.cost).toBeCloseTo(boardFeet * 10, 9);
  });
});

describe('livePourPlan refuses what it cannot plan', () => {
  it('asks for a product that is on the shelf', () => {
    const checked = checkPlanner(trayValues(), testPieceId);
    if (!checked.ok) throw new Error('expected a complete form');
    const result = livePourPlan(checked.input, { ...shelf, resinSystems: [] });
    expect(result.ok).toBe(false);
    expect(!result.ok && result.error.code).toBe('product_missing');
  });

  it('passes on core’s refusal of a fill above the shape', () => {
    const checked = checkPlanner(
      trayValues((v) => (v.fillLevelMm = 31)),
      testPieceId,
    );
    if (!checked.ok) throw new Error('expected a complete form');
    const result = livePourPlan(checked.input, shelf);
    expect(!result.ok && result.error.code).toBe('fill_level_above_curve');
  });

  it('waits for the mould’s fill before planning a mould', () => {
    const checked = checkPlanner(
      trayValues((v) => {
        v.cavity.source = 'mold';
        v.cavity.moldId = testPieceId;
      }),
      testPieceId,
    );
    if (!checked.ok) throw new Error(JSON.stringify(checked.fieldErrors));
    expect(livePourPlan(checked.input, shelf).ok).toBe(false);
  });

  it('plans a mould from its curve, the fill level a height above the cavity floor', () => {
    const checked = checkPlanner(
      trayValues((v) => {
        v.cavity.source = 'mold';
        v.cavity.moldId = testPieceId;
        v.fillLevelMm = 30;
      }),
      testPieceId,
    );
    if (!checked.ok) throw new Error(JSON.stringify(checked.fieldErrors));
    // A straight-walled 300 × 200 pocket, its curve sampled from the floor up as the API answers it (prism, CRC).
    const moldFacts = {
      curve: [
        { levelMm: 0, volumeMm3: 0 },
        { levelMm: 15, volumeMm3: 900_000 },
        { levelMm: 30, volumeMm3: 1_800_000 },
      ],
      wettedAreaMm2: 90_000,
      maxDepthMm: 30,
    };
    const result = livePourPlan(checked.input, { ...shelf, moldFacts, moldRimMm: 30 });
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.value.plan.fill.fillVolumeMl).toBeCloseTo(1800, 9);
    expect(result.value.plan.fill.fillLevelMm).toBe(30);
    expect(result.value.plan.layers).toHaveLength(2);
  });

  it('refuses a mould level above the top of the mould, or not above its floor, as the server does', () => {
    const at = (level: number) => {
      const checked = checkPlanner(
        trayValues((v) => {
          v.cavity.source = 'mold';
          v.cavity.moldId = testPieceId;
          v.fillLevelMm = level;
        }),
        testPieceId,
      );
      if (!checked.ok) throw new Error(JSON.stringify(checked.fieldErrors));
      return livePourPlan(checked.input, { ...shelf, moldFacts: null, moldRimMm: 30 });
    };
    expect(at(31)).toMatchObject({ ok: false, error: { code: 'fill_above_report' } });
    expect(at(0)).toMatchObject({ ok: false, error: { code: 'fill_below_floor' } });
    expect(at(30)).toMatchObject({ ok: false, error: { code: 'mold_fill_pending' } });
  });
});

describe('shapeCavity', () => {
  // CRC: a cylinder holds V = π r² h.
  it('gives a cylinder its volume, with the curve starting at the floor', () => {
    const cavity = shapeCavity({ kind: 'cylinder', diameterMm: 100, depthMm: 20 });
    expect(cavity.ok).toBe(true);
    if (!cavity.ok) return;
    expect(cavity.value.curve.at(-1)?.volumeMm3).toBeCloseTo(Math.PI * 50 ** 2 * 20, 6);
    expect(cavity.value.curve[0]).toEqual({ levelMm: 0, volumeMm3: 0 });
    expect(cavity.value.maxDepthMm).toBeUndefined();
  });
});
