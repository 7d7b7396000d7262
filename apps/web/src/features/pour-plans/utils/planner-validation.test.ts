import { PourPlanInput } from '@gelpoint/contracts';
import { absorptionPresets } from '@gelpoint/core';
import { describe, expect, it } from 'vitest';
import { newPlannerValues, plannerValuesOf, pourPlanInputOf, type PlannerValues } from './planner-values';
import { checkPlanner, fieldOfIssuePath, plannerResolver } from './planner-validation';
import { benchDeep, benchSeal, benchTeal, testPieceId } from './test-fixtures';

function complete(): PlannerValues {
  const values = newPlannerValues('Tray');
  values.cavity.shape = { ...values.cavity.shape, lengthMm: 300, widthMm: 200, depthMm: 30 };
  values.fillLevelMm = 30;
  values.deepPour = { resinSystemId: benchDeep.id, pigmentId: benchTeal.id, pigmentPct: 2 };
  values.sealCoat = { enabled: true, resinSystemId: benchSeal.id, filmThicknessMm: 0.2, coats: 2, absorption: 'end_grain', absorptionFactor: Number.NaN };
  values.shopTempC = 21;
  values.shopAir = { enabled: true, rhPct: 55, surfaceTempC: 19 };
  values.wood = { enabled: true, lengthMm: 600, widthMm: 300, thicknessMm: 50, pricePerBoardFoot: 9 };
  return values;
}

// Reference for every check here: the API's own zod contract (PourPlanInput), which the server validates with.
describe('checkPlanner', () => {
  it('accepts a complete form and sends what the contract accepts', () => {
    const checked = checkPlanner(complete(), testPieceId);
    expect(checked.ok).toBe(true);
    if (!checked.ok) return;
    expect(PourPlanInput.safeParse(checked.input).success).toBe(true);
    expect(checked.input.sealCoat?.absorptionFactor).toBe(absorptionPresets.end_grain);
    expect(checked.input.cavity).toEqual({ source: 'shape', shape: { kind: 'rectangle', lengthMm: 300, widthMm: 200, depthMm: 30 } });
  });

  it('puts each missing value under its own field, in words the maker can act on', () => {
    const checked = checkPlanner(newPlannerValues(''), testPieceId);
    expect(checked.ok).toBe(false);
    if (checked.ok) return;
    expect(checked.fieldErrors).toMatchObject({
      name: 'name is required',
      'cavity.shape.lengthMm': 'length must be a number (mm)',
      'cavity.shape.depthMm': 'depth must be a number (mm)',
      fillLevelMm: 'fill level must be a number (mm)',
      'deepPour.resinSystemId': 'choose the product for the deep pour',
      shopTempC: 'shop temperature must be a number (°C)',
    });
  });

  it('leaves switched-off parts out instead of asking for them', () => {
    const values = complete();
    values.sealCoat = { ...values.sealCoat, enabled: false, filmThicknessMm: Number.NaN };
    values.shopAir = { enabled: false, rhPct: Number.NaN, surfaceTempC: Number.NaN };
    values.wood = { ...values.wood, enabled: false, lengthMm: Number.NaN };
    const checked = checkPlanner(values, testPieceId);
    expect(checked.ok && checked.input).toMatchObject({ sealCoat: null, shopAir: null, wood: null });
  });

  it('shows cup-waste and absorption trouble under the fields that hold them', () => {
    const values = complete();
    values.cupWaste = { unit: 'mL', amount: Number.NaN };
    values.sealCoat.absorption = '';
    const checked = checkPlanner(values, testPieceId);
    expect(!checked.ok && checked.fieldErrors['cupWaste.amount']).toBe('cup waste must be a number from 0 to 500');
    expect(!checked.ok && checked.fieldErrors['sealCoat.absorptionFactor']).toBe('choose how much the wood soaks up, or enter a factor from 1 to 5');
  });

  it('keeps the contract’s own sentence where it has one', () => {
    const values = complete();
    values.overPourPct = 150;
    const checked = checkPlanner(values, testPieceId);
    expect(!checked.ok && checked.fieldErrors.overPourPct).toBe('over-pour must be at most 50 %');
  });

  it('maps contract paths onto form fields', () => {
    expect(fieldOfIssuePath(['cupWaste', 'volumeMl'])).toBe('cupWaste.amount');
    expect(fieldOfIssuePath(['cavity'])).toBe('cavity.source');
    expect(fieldOfIssuePath(['cavity', 'shape', 'diameterMm'])).toBe('cavity.shape.diameterMm');
  });
});

describe('plannerValuesOf', () => {
  it('reads a saved plan back into the same request', () => {
    const checked = checkPlanner(complete(), testPieceId);
    if (!checked.ok) throw new Error('expected a complete form');
    const again = checkPlanner(plannerValuesOf(checked.input), testPieceId);
    expect(again.ok && again.input).toEqual(checked.input);
  });

  it('keeps a factor that is no preset as the shop’s own', () => {
    const values = complete();
    values.sealCoat = { ...values.sealCoat, absorption: 'custom', absorptionFactor: 1.42 };
    const checked = checkPlanner(values, testPieceId);
    if (!checked.ok) throw new Error('expected a complete form');
    expect(plannerValuesOf(checked.input).sealCoat).toMatchObject({ absorption: 'custom', absorptionFactor: 1.42 });
  });

  it('reads a mould cavity and a cup waste by volume', () => {
    const values = complete();
    values.cavity = { ...values.cavity, source: 'mold', moldId: benchDeep.id, dam: 'box' };
    values.cupWaste = { unit: 'mL', amount: 12 };
    const input = PourPlanInput.parse(pourPlanInputOf(values, testPieceId));
    expect(plannerValuesOf(input)).toMatchObject({ cavity: { source: 'mold', moldId: benchDeep.id, dam: 'box' }, cupWaste: { unit: 'mL', amount: 12 } });
  });
});

describe('plannerResolver', () => {
  it('hands react-hook-form nested errors and, when clean, the contract’s values', async () => {
    const resolve = plannerResolver(testPieceId);
    const options = { fields: {}, shouldUseNativeValidation: false } as const;
    const bad = await resolve(newPlannerValues(''), undefined, options);
    expect((bad.errors as { cavity?: { shape?: { lengthMm?: { message?: string } } } }).cavity?.shape?.lengthMm?.message).toBe('length must be a number (mm)');
    const good = await resolve(complete(), undefined, options);
    expect(good.errors).toEqual({});
    expect((good.values as { pieceId?: string }).pieceId).toBe(testPieceId);
  });
});
