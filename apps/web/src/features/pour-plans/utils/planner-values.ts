import type { PourPlanInput, QuickShape } from '@gelpoint/contracts';
import { absorptionPresets, type AbsorptionPreset } from '@gelpoint/core';
import type { z } from 'zod';
import type { PourPlanInput as PourPlanInputSchema } from '@gelpoint/contracts';

export type SavedPlanInput = z.output<typeof PourPlanInputSchema>;
export type ShapeKind = QuickShape['kind'];
export type AbsorptionChoice = AbsorptionPreset | 'custom';

/**
 * What the planner form holds. Field names follow the contract's paths wherever they can, so the contract's
 * messages land under the field they are about. Numbers left empty are NaN (required) or null (optional).
 */
export interface PlannerValues {
  name: string;
  cavity: {
    source: 'shape' | 'mold';
    shape: {
      kind: ShapeKind;
      lengthMm: number;
      widthMm: number;
      depthMm: number;
      diameterMm: number;
      areaMm2: number;
      averageDepthMm: number;
      maxDepthMm: number | null;
      perimeterMm: number | null;
    };
    moldId: string;
    dam: 'outline' | 'box';
  };
  fillLevelMm: number;
  deepPour: { resinSystemId: string; pigmentId: string; pigmentPct: number };
  sealCoat: { enabled: boolean; resinSystemId: string; filmThicknessMm: number; coats: number; absorption: AbsorptionChoice | ''; absorptionFactor: number };
  overPourPct: number;
  cupWaste: { unit: 'g' | 'mL'; amount: number };
  shopTempC: number;
  shopAir: { enabled: boolean; rhPct: number; surfaceTempC: number };
  wood: { enabled: boolean; lengthMm: number; widthMm: number; thicknessMm: number; pricePerBoardFoot: number };
}

const empty = Number.NaN;

/** A new plan: the contract's own defaults for the margins, everything about the piece left for the maker. */
export function newPlannerValues(name: string): PlannerValues {
  return {
    name,
    cavity: {
      source: 'shape',
      shape: {
        kind: 'rectangle',
        lengthMm: empty,
        widthMm: empty,
        depthMm: empty,
        diameterMm: empty,
        areaMm2: empty,
        averageDepthMm: empty,
        maxDepthMm: null,
        perimeterMm: null,
      },
      moldId: '',
      dam: 'outline',
    },
    fillLevelMm: empty,
    deepPour: { resinSystemId: '', pigmentId: '', pigmentPct: 0 },
    sealCoat: { enabled: false, resinSystemId: '', filmThicknessMm: empty, coats: 1, absorption: '', absorptionFactor: empty },
    overPourPct: 5,
    cupWaste: { unit: 'g', amount: 5 },
    shopTempC: empty,
    shopAir: { enabled: false, rhPct: empty, surfaceTempC: empty },
    wood: { enabled: false, lengthMm: empty, widthMm: empty, thicknessMm: empty, pricePerBoardFoot: empty },
  };
}

function presetOf(factor: number): AbsorptionPreset | undefined {
  return (Object.keys(absorptionPresets) as AbsorptionPreset[]).find((preset) => absorptionPresets[preset] === factor);
}

/** A saved plan's inputs back into the form, for editing. */
export function plannerValuesOf(input: SavedPlanInput): PlannerValues {
  const values = newPlannerValues(input.name);
  values.fillLevelMm = input.fillLevelMm;
  if (input.cavity.source === 'shape') {
    values.cavity.source = 'shape';
    values.cavity.shape = { ...values.cavity.shape, ...input.cavity.shape };
  } else {
    values.cavity.source = 'mold';
    values.cavity.moldId = input.cavity.moldId;
    values.cavity.dam = input.cavity.dam;
  }
  values.deepPour = { resinSystemId: input.deepPour.resinSystemId, pigmentId: input.deepPour.pigmentId ?? '', pigmentPct: input.deepPour.pigmentPct };
  if (input.sealCoat) {
    const preset = presetOf(input.sealCoat.absorptionFactor);
    values.sealCoat = {
      enabled: true,
      resinSystemId: input.sealCoat.resinSystemId,
      filmThicknessMm: input.sealCoat.filmThicknessMm,
      coats: input.sealCoat.coats,
      absorption: preset ?? 'custom',
      absorptionFactor: input.sealCoat.absorptionFactor,
    };
  }
  values.overPourPct = input.overPourPct;
  values.cupWaste = 'massG' in input.cupWaste ? { unit: 'g', amount: input.cupWaste.massG } : { unit: 'mL', amount: input.cupWaste.volumeMl };
  values.shopTempC = input.shopTempC;
  if (input.shopAir) values.shopAir = { enabled: true, ...input.shopAir };
  if (input.wood) values.wood = { enabled: true, ...input.wood };
  return values;
}

function shapeOf(shape: PlannerValues['cavity']['shape']): QuickShape {
  switch (shape.kind) {
    case 'rectangle':
    case 'channel':
      return { kind: shape.kind, lengthMm: shape.lengthMm, widthMm: shape.widthMm, depthMm: shape.depthMm };
    case 'cylinder':
      return { kind: 'cylinder', diameterMm: shape.diameterMm, depthMm: shape.depthMm };
    case 'area_depth':
      return {
        kind: 'area_depth',
        areaMm2: shape.areaMm2,
        averageDepthMm: shape.averageDepthMm,
        ...(shape.maxDepthMm === null ? {} : { maxDepthMm: shape.maxDepthMm }),
        ...(shape.perimeterMm === null ? {} : { perimeterMm: shape.perimeterMm }),
      };
  }
}

/** The request body for the form as it stands; the contract decides whether it is complete. */
export function pourPlanInputOf(values: PlannerValues, pieceId: string): PourPlanInput {
  const seal = values.sealCoat;
  return {
    pieceId,
    name: values.name,
    cavity:
      values.cavity.source === 'shape'
        ? { source: 'shape', shape: shapeOf(values.cavity.shape) }
        : { source: 'mold', moldId: values.cavity.moldId, dam: values.cavity.dam },
    fillLevelMm: values.fillLevelMm,
    deepPour: {
      resinSystemId: values.deepPour.resinSystemId,
      pigmentId: values.deepPour.pigmentId || null,
      pigmentPct: values.deepPour.pigmentId ? values.deepPour.pigmentPct : 0,
    },
    sealCoat: seal.enabled
      ? {
          resinSystemId: seal.resinSystemId,
          filmThicknessMm: seal.filmThicknessMm,
          coats: seal.coats,
          absorptionFactor: seal.absorption === 'custom' || seal.absorption === '' ? seal.absorptionFactor : absorptionPresets[seal.absorption],
        }
      : null,
    overPourPct: values.overPourPct,
    cupWaste: values.cupWaste.unit === 'g' ? { massG: values.cupWaste.amount } : { volumeMl: values.cupWaste.amount },
    shopTempC: values.shopTempC,
    shopAir: values.shopAir.enabled ? { rhPct: values.shopAir.rhPct, surfaceTempC: values.shopAir.surfaceTempC } : null,
    wood: values.wood.enabled
      ? { lengthMm: values.wood.lengthMm, widthMm: values.wood.widthMm, thicknessMm: values.wood.thicknessMm, pricePerBoardFoot: values.wood.pricePerBoardFoot }
      : null,
  };
}
