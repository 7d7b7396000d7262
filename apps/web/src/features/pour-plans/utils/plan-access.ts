import type { Role } from '@gelpoint/contracts';

/** Makers and the shop lead plan pours; an apprentice mixes from the run sheet (the API answers 403 otherwise). */
export function mayPlanPours(role: Role): boolean {
  return role === 'lead' || role === 'maker';
}
