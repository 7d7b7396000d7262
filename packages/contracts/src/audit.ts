import { z } from 'zod';
import { Id, Timestamp, UserRef, instant, text } from './common';

export const AuditEvent = z.object({
  id: Id,
  at: Timestamp,
  actor: UserRef.nullable().describe('who did it, by their name today (or the name they had then, if they left)'),
  action: z.string().describe('dotted verb, e.g. piece.create, member.update'),
  objectType: z.string(),
  objectId: z.string().nullable(),
  objectName: z.string().nullable().describe('the name of what it was done to: now, while it exists; else as the event recorded it'),
  link: z.string().nullable().describe("the web app's path to the object while it exists, e.g. /shelf/lots/…"),
  detail: z.record(z.string(), z.unknown()),
});
export type AuditEvent = z.infer<typeof AuditEvent>;

const CALENDAR_DATE = /^\d{4}-\d{2}-\d{2}$/;

/**
 * A bound of the audit's date filter: a calendar date (a whole UTC day) or an instant with its offset, which is
 * how the web app sends the reader's own local days.
 */
const dayOrInstant = (label: string) =>
  z.union([z.iso.date({ message: `${label} must be a date like 2026-11-30 or an ISO time with an offset` }), instant(label)], {
    message: `${label} must be a date like 2026-11-30 or an ISO time with an offset, e.g. 2026-11-30T00:00:00-05:00`,
  });

/** Where an audit date filter starts (inclusive) and ends (exclusive), as instants. */
export function auditRange(from: string | undefined, to: string | undefined): { fromAt?: Date; toAt?: Date } {
  const out: { fromAt?: Date; toAt?: Date } = {};
  if (from) out.fromAt = new Date(CALENDAR_DATE.test(from) ? `${from}T00:00:00Z` : from);
  if (to) out.toAt = CALENDAR_DATE.test(to) ? new Date(Date.parse(`${to}T00:00:00Z`) + 86_400_000) : new Date(to);
  return out;
}

const auditFilters = {
  objectType: text(40, 'objectType').optional(),
  objectId: text(80, 'objectId').optional(),
  actorId: Id.optional().describe("only this member's events"),
  action: z
    .string()
    .max(60, { message: 'action must be at most 60 characters' })
    .regex(/^[a-z_]+(\.[a-z_]+)?$/, { message: 'action must be a kind such as lot or an action such as lot.delete' })
    .optional()
    .describe('a whole action (lot.delete) or its kind, the part before the dot (lot)'),
  from: dayOrInstant('from').optional().describe('events at or after this day or instant'),
  to: dayOrInstant('to').optional().describe('events before the end of this day, or before this instant'),
};

const rangeInOrder = (v: { from?: string | undefined; to?: string | undefined }) => {
  const { fromAt, toAt } = auditRange(v.from, v.to);
  return !fromAt || !toAt || fromAt < toAt;
};
const rangeMessage = { message: 'the date range ends before it starts: "to" must be on or after "from"', path: ['to'] };

export const AuditListQuery = z
  .object({
    ...auditFilters,
    limit: z.coerce.number().int().min(1).max(200).default(50),
    before: instant('before').optional().describe('the time of the oldest event already shown'),
    beforeId: Id.optional().describe('and its id, so events of the same instant are neither skipped nor repeated'),
  })
  .strict()
  .refine(rangeInOrder, rangeMessage);

export const AuditExportQuery = z.object(auditFilters).strict().refine(rangeInOrder, rangeMessage);

export const AuditList = z.object({
  items: z.array(AuditEvent),
  next: z.object({ before: z.string(), beforeId: Id }).nullable().describe('the query for the next, older page; null on the last page'),
});
