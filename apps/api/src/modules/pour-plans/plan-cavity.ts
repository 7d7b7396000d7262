import { areaDepthCavity, channelCavity, cylinderCavity, rectangleCavity, type PlanCavity, type Result } from '@gelpoint/core';
import type { QuickShape } from '@gelpoint/contracts';

/** A quick shape's cavity in the pour plan's terms (levels from its floor), from packages/core. */
export function quickShapeCavity(shape: QuickShape): Result<PlanCavity> {
  const { kind, ...dimensions } = shape;
  switch (kind) {
    case 'rectangle':
      return rectangleCavity(dimensions as Omit<Extract<QuickShape, { kind: 'rectangle' }>, 'kind'>);
    case 'channel':
      return channelCavity(dimensions as Omit<Extract<QuickShape, { kind: 'channel' }>, 'kind'>);
    case 'cylinder':
      return cylinderCavity(dimensions as Omit<Extract<QuickShape, { kind: 'cylinder' }>, 'kind'>);
    case 'area_depth':
      return areaDepthCavity(dimensions as Omit<Extract<QuickShape, { kind: 'area_depth' }>, 'kind'>);
  }
}
