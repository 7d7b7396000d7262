import { areaDepthCavity, channelCavity, cylinderCavity, fail, ok, rectangleCavity, type QuickShapeCavity, type Result, type UnitSystem } from '@gelpoint/core';
import { shopAreaToMm2 } from './area-format';
import { shopLengthToMm } from './length-input';

export type QuickShapeKind = 'rectangle' | 'channel' | 'cylinder' | 'areaDepth';
export type QuickShapeField = 'length' | 'width' | 'depth' | 'diameter' | 'area' | 'averageDepth' | 'maxDepth' | 'perimeter';
export type TypedShape = Partial<Record<QuickShapeField, string>>;

export interface QuickShapeFieldSpec {
  field: QuickShapeField;
  label: string;
  measure: 'length' | 'area';
  required: boolean;
  hint?: string;
}

const length = (field: QuickShapeField, label: string, hint?: string): QuickShapeFieldSpec => ({
  field,
  label,
  measure: 'length',
  required: true,
  ...(hint ? { hint } : {}),
});

/** What to measure for each shape, in the order a tape measure meets it. */
export const quickShapeFields: Record<QuickShapeKind, readonly QuickShapeFieldSpec[]> = {
  rectangle: [length('length', 'Length'), length('width', 'Width'), length('depth', 'Depth', 'From the floor of the pocket to the level you pour to.')],
  channel: [
    length('length', 'Length', 'Along the channel, dam to dam.'),
    length('width', 'Width', 'Across the channel, wood to wood.'),
    length('depth', 'Depth', 'From the floor of the channel to the level you pour to.'),
  ],
  cylinder: [length('diameter', 'Diameter'), length('depth', 'Depth')],
  areaDepth: [
    { field: 'area', label: 'Outline area', measure: 'area', required: true, hint: 'The area inside the outline, e.g. traced on grid paper.' },
    length('averageDepth', 'Average depth', 'Several depth readings across the cavity, averaged.'),
    { field: 'maxDepth', label: 'Deepest point', measure: 'length', required: false, hint: 'Optional; leave empty if the floor is flat.' },
    { field: 'perimeter', label: 'Outline length', measure: 'length', required: false, hint: 'Optional; improves the wetted area for the seal coat.' },
  ],
};

function readTyped(spec: QuickShapeFieldSpec, typed: TypedShape, unitSystem: UnitSystem): Result<number | undefined> {
  const text = (typed[spec.field] ?? '').trim();
  if (text === '') {
    return spec.required ? fail('shape_dimension_missing', `Enter the ${spec.label.toLowerCase()} to work out the cavity.`) : ok(undefined);
  }
  const value = Number(text);
  if (!Number.isFinite(value) || value <= 0) {
    return fail('shape_dimension_not_positive', `The ${spec.label.toLowerCase()} must be a number above zero; "${text}" is not.`);
  }
  return ok(spec.measure === 'area' ? shopAreaToMm2(value, unitSystem) : shopLengthToMm(value, unitSystem));
}

export type QuickShapeResult = QuickShapeCavity & { wettedAreaEstimated: boolean };

/** The cavity of a measured shape, worked out by core from what was typed in the shop's units. */
export function quickShapeCavity(kind: QuickShapeKind, typed: TypedShape, unitSystem: UnitSystem): Result<QuickShapeResult> {
  const mm: Partial<Record<QuickShapeField, number>> = {};
  for (const spec of quickShapeFields[kind]) {
    const read = readTyped(spec, typed, unitSystem);
    if (!read.ok) return read;
    if (read.value !== undefined) mm[spec.field] = read.value;
  }
  const exact = (result: Result<QuickShapeCavity>): Result<QuickShapeResult> => (result.ok ? ok({ ...result.value, wettedAreaEstimated: false }) : result);
  switch (kind) {
    case 'rectangle':
      return exact(rectangleCavity({ lengthMm: mm.length!, widthMm: mm.width!, depthMm: mm.depth! }));
    case 'channel':
      return exact(channelCavity({ lengthMm: mm.length!, widthMm: mm.width!, depthMm: mm.depth! }));
    case 'cylinder':
      return exact(cylinderCavity({ diameterMm: mm.diameter!, depthMm: mm.depth! }));
    case 'areaDepth':
      return areaDepthCavity({
        areaMm2: mm.area!,
        averageDepthMm: mm.averageDepth!,
        ...(mm.maxDepth === undefined ? {} : { maxDepthMm: mm.maxDepth }),
        ...(mm.perimeter === undefined ? {} : { perimeterMm: mm.perimeter }),
      });
  }
}
