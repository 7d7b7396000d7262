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
  offRatioTolerancePct: z.number().describe('weighed A:B may differ from the target by this much before a batch is flagged'),
});
export type Shop = z.infer<typeof Shop>;

export const UpdateShopRequest = z
  .object({
    name: requiredText(120, 'shop name'),
    unitSystem: UnitSystem,
    scaleResolutionG: ScaleResolutionG,
    offRatioTolerancePct: z.number({ message: 'the off-ratio tolerance must be a number (%)' }).min(0.5, { message: 'the off-ratio tolerance must be at least 0.5 %' }).max(20, { message: 'the off-ratio tolerance must be at most 20 %' }),
  })
  .partial()
  .strict();
export type UpdateShopRequest = z.infer<typeof UpdateShopRequest>;
