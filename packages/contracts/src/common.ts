import { z } from 'zod';

export const roles = ['lead', 'maker', 'apprentice'] as const;
export const Role = z.enum(roles).describe('lead keeps the shelf and the team; maker plans pieces; apprentice mixes and logs');
export type Role = z.infer<typeof Role>;

export const Id = z.uuid({ message: 'must be an id (a UUID)' });

/** Trimmed text with a length cap, so a huge string is a 400, not a stored megabyte. */
export const text = (max: number, label: string) =>
  z
    .string({ message: `${label} must be text` })
    .trim()
    .max(max, { message: `${label} must be at most ${max} characters` })
    // PostgreSQL text cannot hold U+0000; refused here, the answer names the field.
    .refine((s) => !s.includes('\u0000'), { message: `${label} contains a NUL character (U+0000); remove it` });

export const requiredText = (max: number, label: string) => text(max, label).min(1, { message: `${label} is required` });

export const Email = z
  .string({ message: 'email must be text' })
  .trim()
  .toLowerCase()
  .max(254, { message: 'email must be at most 254 characters' })
  .pipe(z.email({ message: 'email must look like name@example.com' }));

export const Password = z
  .string({ message: 'password must be text' })
  .min(8, { message: 'password must be at least 8 characters' })
  .max(200, { message: 'password must be at most 200 characters' });

const OFFSET = /(?:Z|([+-])(\d{2}):?(\d{2}))$/;

/**
 * An ISO 8601 instant a shop's records can hold: years 1900–2999 and offsets within ±14:00, the widest
 * in use (IANA tz database, Pacific/Kiritimati); PostgreSQL refuses year 0000 and offsets past ±15:59.
 */
export const instant = (label = 'time') =>
  z.iso.datetime({ offset: true, message: `${label} must be an ISO time with Z or an offset, e.g. 2026-11-01T14:30:00Z` }).refine(
    (s) => {
      const year = Number(s.slice(0, 4));
      const offset = OFFSET.exec(s);
      const offsetMin = offset?.[1] ? Number(offset[2]) * 60 + Number(offset[3]) : 0;
      return year >= 1900 && year <= 2999 && offsetMin <= 14 * 60;
    },
    { message: `${label} must fall between the years 1900 and 2999, with an offset of at most ±14:00` },
  );

export const Timestamp = instant().describe('ISO 8601 date-time');

export const ErrorBody = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    fields: z.record(z.string(), z.string()).optional(),
  }),
});
export type ErrorBody = z.infer<typeof ErrorBody>;

export const UserRef = z.object({ id: Id, name: z.string() });
export type UserRef = z.infer<typeof UserRef>;
