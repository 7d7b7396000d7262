import { z } from 'zod';
import { Id, Timestamp, UserRef, instant } from './common';

export const AuditEvent = z.object({
  id: Id,
  at: Timestamp,
  actor: UserRef.nullable(),
  action: z.string().describe('dotted verb, e.g. piece.create, member.update'),
  objectType: z.string(),
  objectId: z.string().nullable(),
  detail: z.record(z.string(), z.unknown()),
});
export type AuditEvent = z.infer<typeof AuditEvent>;

export const AuditListQuery = z
  .object({
    objectType: z.string().max(40).optional(),
    objectId: z.string().max(80).optional(),
    limit: z.coerce.number().int().min(1).max(200).default(50),
    before: instant('before').optional(),
  })
  .strict();

export const AuditList = z.object({ items: z.array(AuditEvent) });
