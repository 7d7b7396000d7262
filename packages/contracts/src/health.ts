import { z } from 'zod';

export const Health = z.object({
  status: z.enum(['ok', 'degraded']),
  database: z.enum(['up', 'down']),
  uptimeS: z.number(),
});
export type Health = z.infer<typeof Health>;
