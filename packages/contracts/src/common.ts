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

export const requiredText = (max: number, label: string) =>
  text(max, label).min(1, { message: `${label} is required` });

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

export const Timestamp = z.iso.datetime({ offset: true }).describe('ISO 8601 date-time');

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
