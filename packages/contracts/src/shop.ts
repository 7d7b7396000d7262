import { z } from 'zod';
import { Id, requiredText } from './common';

export const UnitSystem = z.enum(['metric', 'us']);
export type UnitSystem = z.infer<typeof UnitSystem>;

export const ScaleResolutionG = z.union([z.literal(0.1), z.literal(1)], {
  message: 'scale resolution must be 0.1 or 1 (grams)',
});

export const Shop = z.object({
  id: Id,
  name: z.string(),
  unitSystem: UnitSystem,
  scaleResolutionG: z.number(),
});
export type Shop = z.infer<typeof Shop>;

export const UpdateShopRequest = z
  .object({
    name: requiredText(120, 'shop name'),
    unitSystem: UnitSystem,
    scaleResolutionG: ScaleResolutionG,
  })
  .partial()
  .strict();
export type UpdateShopRequest = z.infer<typeof UpdateShopRequest>;
