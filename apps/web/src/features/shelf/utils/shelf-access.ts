import type { Role } from '@gelpoint/contracts';

/** Everyone reads the shelf; only the shop lead changes it (the API answers 403 to anyone else). */
export function mayKeepShelf(role: Role): boolean {
  return role === 'lead';
}
