import { PourPlanInput } from '@gelpoint/contracts';
import { describe, expect, it } from 'vitest';
import { livePourPlan } from './live-plan';
import { baseQuantity, basePlannerValues, quantityOfField, shownLimit, shownPlannerValues, shownQuantity, shownUnitNames } from './planner-units';
import { checkPlanner } from './planner-validation';
import { newPlannerValues, plannerValuesOf, type PlannerValues } from './planner-values';
import { benchDeep, benchSeal, testPieceId } from './test-fixtures';

// Reference for every factor here: NIST SP 811 (2008), appendix B: 1 in = 25.4 mm exactly, so 1 in² = 645.16 mm²
// and 1 in³ = 16.387064 mL; 1 oz (avoirdupois) = 1 lb / 16 = 453.59237 g / 16 = 28.349523125 g exactly;
// 1 US fl oz = 29.5735295625 mL exactly; t/°F = t/°C × 9/5 + 32.
const mmPerIn = 25.4;
const mm2PerIn2 = 645.16;
const mlPerIn3 = 16.387064;
const gPerOz = 28.349523125;
const mlPerFlOz = 29.5735295625;
const fahrenheitOf = (tempC: number) => (tempC * 9) / 5 + 32;

/** A saved US plan: a 10 × 5 in tray, 1 in deep, at 68 °F, with numbers stored in mm and °C. */
function savedTray(change: (values: PlannerValues) => void = () => {}): PlannerValues {
  const values = newPlannerValues('Walnut tray');
  values.cavity.shape = { ...values.cavity.shape, kind: 'rectangle', lengthMm: 10 * mmPerIn, widthMm: 5 * mmPerIn, depthMm: 1 * mmPerIn };
  values.fillLevelMm = 1 * mmPerIn;
  values.deepPour.resinSystemId = benchDeep.id;
  values.shopTempC = 20;
  values.cupWaste = { unit: 'g', amount: gPerOz };
  change(values);
  return values;
}

describe('shownQuantity and baseQuantity', () => {
  it('convert lengths, areas, temperatures and cup waste by the exact definitions', () => {
    expect(shownQuantity(254, 'length', 'us')).toBe(10);
    expect(baseQuantity(10, 'length', 'us')).toBe(254);
    expect(shownQuantity(mm2PerIn2 * 50, 'area', 'us')).toBe(50);
    expect(baseQuantity(1, 'area', 'us')).toBe(mm2PerIn2);
    expect(shownQuantity(20, 'temperature', 'us')).toBe(fahrenheitOf(20));
    expect(shownQuantity(-30, 'temperature', 'us')).toBe(fahrenheitOf(-30));
    expect(baseQuantity(fahrenheitOf(37), 'temperature', 'us')).toBe(37);
    expect(baseQuantity(1, 'mass', 'us')).toBe(gPerOz);
    expect(shownQuantity(mlPerFlOz * 2, 'volume', 'us')).toBe(2);
    expect(baseQuantity(1, 'volume', 'us')).toBe(mlPerFlOz);
  });

  it('round as shown: inches to thousandths, °F to tenths, in² and oz to hundredths', () => {
    expect(shownQuantity(300, 'length', 'us')).toBe(11.811); // 300 / 25.4 = 11.81102…
    expect(shownQuantity(21.37, 'temperature', 'us')).toBe(70.5); // 21.37 × 1.8 + 32 = 70.466
    expect(shownQuantity(100_000, 'area', 'us')).toBe(155); // 100 000 / 645.16 = 155.0003…
    expect(shownQuantity(5, 'mass', 'us')).toBe(0.18); // 5 / 28.349523125 = 0.17637…
  });

  it('give typed inches back in mm without floating-point noise', () => {
    expect(baseQuantity(1.1, 'length', 'us')).toBe(27.94);
    expect(baseQuantity(11.811, 'length', 'us')).toBe(299.9994);
  });

  it('leave metric numbers and empty boxes alone', () => {
    expect(shownQuantity(300, 'length', 'metric')).toBe(300);
    expect(baseQuantity(21.37, 'temperature', 'metric')).toBe(21.37);
    expect(baseQuantity(Number.NaN, 'length', 'us')).toBeNaN();
  });
});

describe('shownLimit', () => {
  it('rounds a contract limit inwards, so the shown limit itself passes the contract', () => {
    // 10 000 mm = 393.7007… in: 393.701 in would be 10 000.005 mm, over the contract's maximum.
    const max = shownLimit(10_000, 'length', 'us', 'max');
    expect(max).toBe(393.7);
    expect(baseQuantity(max, 'length', 'us')).toBeLessThanOrEqual(10_000);
    expect(baseQuantity(max + 0.001, 'length', 'us')).toBeGreaterThan(10_000);
    expect(shownLimit(-30, 'temperature', 'us', 'min')).toBe(fahrenheitOf(-30));
    expect(shownLimit(60, 'temperature', 'us', 'max')).toBe(fahrenheitOf(60));
  });
});

describe('shownPlannerValues', () => {
  it('shows a saved US plan in inches, °F and ounces, and leaves unit-free numbers as they are', () => {
    const shown = shownPlannerValues(savedTray(), 'us');
    expect(shown.cavity.shape).toMatchObject({ lengthMm: 10, widthMm: 5, depthMm: 1 });
    expect(shown.fillLevelMm).toBe(1);
    expect(shown.shopTempC).toBe(68);
    expect(shown.cupWaste).toEqual({ unit: 'g', amount: 1 });
    expect(shown.overPourPct).toBe(5);
    expect(shown.cavity.shape.maxDepthMm).toBeNull();
    expect(shown.cavity.shape.diameterMm).toBeNaN();
  });

  it('shows a metric shop exactly the values it was given', () => {
    const values = savedTray();
    expect(shownPlannerValues(values, 'metric')).toBe(values);
  });

  it('keeps the seal coat’s film in mm, for lack of a thousandth-of-an-inch unit in core', () => {
    const shown = shownPlannerValues(
      savedTray((v) => (v.sealCoat = { ...v.sealCoat, enabled: true, resinSystemId: benchSeal.id, filmThicknessMm: 0.2 })),
      'us',
    );
    expect(shown.sealCoat.filmThicknessMm).toBe(0.2);
    expect(quantityOfField('sealCoat.filmThicknessMm', shown)).toBeNull();
  });
});

describe('basePlannerValues', () => {
  it('does not move a saved plan by a rounding step when it is opened and saved unchanged', () => {
    // Chosen so every shown value is rounded: 300 mm → 11.811 in, 21.37 °C → 70.5 °F, 5 g → 0.18 oz.
    const saved = savedTray((v) => {
      v.cavity.shape = { ...v.cavity.shape, kind: 'area_depth', areaMm2: 123_457, averageDepthMm: 17.3, maxDepthMm: 31.1, perimeterMm: null };
      v.fillLevelMm = 17.3;
      v.shopTempC = 21.37;
      v.shopAir = { enabled: true, rhPct: 55, surfaceTempC: 19.9 };
      v.wood = { enabled: true, lengthMm: 300, widthMm: 211, thicknessMm: 33, pricePerBoardFoot: 9 };
      v.cupWaste = { unit: 'g', amount: 5 };
    });
    const first = checkPlanner(saved, testPieceId);
    if (!first.ok) throw new Error(JSON.stringify(first.fieldErrors));
    const origin = plannerValuesOf(first.input);
    const shown = shownPlannerValues(origin, 'us');
    expect(basePlannerValues(shown, { unitSystem: 'us', origin })).toEqual(origin);
    // Without the origin the rounded numbers would drift: the test above would catch a lost origin.
    expect(basePlannerValues(shown, { unitSystem: 'us' }).wood.lengthMm).toBe(299.9994);
    const again = checkPlanner(shown, testPieceId, { unitSystem: 'us', origin });
    expect(again.ok && again.input).toEqual(first.input);
  });

  it('converts what the maker changed and keeps the rest', () => {
    const origin = savedTray((v) => (v.wood = { enabled: true, lengthMm: 300, widthMm: 211, thicknessMm: 33, pricePerBoardFoot: 9 }));
    const shown = shownPlannerValues(origin, 'us');
    shown.cavity.shape.lengthMm = 12;
    shown.shopTempC = 70;
    const base = basePlannerValues(shown, { unitSystem: 'us', origin });
    expect(base.cavity.shape.lengthMm).toBe(304.8); // 12 × 25.4, which floating point alone makes 304.79999999999995
    expect(base.shopTempC).toBeCloseTo(((70 - 32) * 5) / 9, 6);
    expect(base.wood).toEqual(origin.wood);
  });

  it('reads the same cup-waste amount anew once it is measured instead of weighed', () => {
    const origin = savedTray();
    const shown = shownPlannerValues(origin, 'us');
    shown.cupWaste.unit = 'mL';
    expect(basePlannerValues(shown, { unitSystem: 'us', origin }).cupWaste).toEqual({ unit: 'mL', amount: mlPerFlOz });
  });

  it('leaves empty boxes empty', () => {
    const shown = shownPlannerValues(newPlannerValues('New'), 'us');
    // The form hands an untouched box over as nothing at all, which PlannerValues has no word for.
    Reflect.deleteProperty(shown, 'fillLevelMm');
    const base = basePlannerValues(shown, { unitSystem: 'us' });
    expect(base.fillLevelMm).toBeUndefined();
    expect(base.cavity.shape.lengthMm).toBeNaN();
    expect(base.cavity.shape.perimeterMm).toBeNull();
  });
});

describe('checkPlanner in a US shop', () => {
  function typedTray(change: (values: PlannerValues) => void = () => {}): PlannerValues {
    const values = newPlannerValues('Typed in inches');
    values.cavity.shape = { ...values.cavity.shape, kind: 'rectangle', lengthMm: 10, widthMm: 5, depthMm: 1 };
    values.fillLevelMm = 1;
    values.deepPour.resinSystemId = benchDeep.id;
    values.shopTempC = 68;
    values.cupWaste = { unit: 'g', amount: 0 };
    change(values);
    return values;
  }

  it('sends the contract mm and °C, and the live plan fills 10 × 5 × 1 in = 50 in³', () => {
    const checked = checkPlanner(typedTray(), testPieceId, { unitSystem: 'us' });
    if (!checked.ok) throw new Error(JSON.stringify(checked.fieldErrors));
    expect(PourPlanInput.safeParse(checked.input).success).toBe(true);
    expect(checked.input.cavity).toEqual({ source: 'shape', shape: { kind: 'rectangle', lengthMm: 254, widthMm: 127, depthMm: 25.4 } });
    expect(checked.input.shopTempC).toBe(20);
    const live = livePourPlan(checked.input, { resinSystems: [benchDeep], pigments: [], scaleResolutionG: 0.1 });
    expect(live.ok && live.value.plan.fill.fillVolumeMl).toBeCloseTo(50 * mlPerIn3, 6);
  });

  it('states its limits in inches and °F', () => {
    const checked = checkPlanner(
      typedTray((v) => {
        v.cavity.shape.lengthMm = 400;
        v.fillLevelMm = Number.NaN;
        v.shopTempC = 150;
        v.shopAir = { enabled: true, rhPct: 50, surfaceTempC: 200 };
      }),
      testPieceId,
      { unitSystem: 'us' },
    );
    expect(!checked.ok && checked.fieldErrors).toMatchObject({
      // 6000 mm = 236.2204… in (NIST SP 811: 1 in = 25.4 mm), shown inwards to hundredths.
      'cavity.shape.lengthMm': 'length must be at most 236.22 in',
      fillLevelMm: 'fill level must be a number (in)',
      shopTempC: `shop temperature must be at most ${fahrenheitOf(60)} °F`,
      'shopAir.surfaceTempC': `the surface temperature must be a number from \u2212${-fahrenheitOf(-30)} to ${fahrenheitOf(80)} °F`,
    });
  });

  it('states the cup-waste range in ounces', () => {
    const checked = checkPlanner(
      typedTray((v) => (v.cupWaste = { unit: 'g', amount: Number.NaN })),
      testPieceId,
      { unitSystem: 'us' },
    );
    // 500 g / 28.349523125 g/oz = 17.637… oz (NIST SP 811), shown inwards to hundredths.
    expect(!checked.ok && checked.fieldErrors['cupWaste.amount']).toBe(`cup waste must be a number from 0 to ${Math.floor((500 / gPerOz) * 100) / 100} oz`);
  });

  it('says the shown units by name', () => {
    expect(shownUnitNames('us')).toEqual({ length: 'in', area: 'in²', temperature: '°F', mass: 'oz', volume: 'fl oz' });
    expect(shownUnitNames('metric')).toEqual({ length: 'mm', area: 'mm²', temperature: '°C', mass: 'g', volume: 'mL' });
  });
});
