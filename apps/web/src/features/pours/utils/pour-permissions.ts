import type { Role } from '@gelpoint/contracts';

/** The API's own rules for pours; screens only hide what it would refuse. */
export function mayRelease(role: Role): boolean {
  return role === 'lead';
}

export function mayMarkMachined(role: Role): boolean {
  return role === 'lead' || role === 'maker';
}

/** Who may void an entry: the person who logged it, or a lead (the API checks the same). */
export function mayVoid(viewer: { userId: string; role: Role }, loggedBy: { id: string } | null): boolean {
  return viewer.role === 'lead' || (loggedBy !== null && loggedBy.id === viewer.userId);
}
