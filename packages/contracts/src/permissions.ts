import type { Role } from './common';

/**
 * What each role may do in a shop. The API derives each route's roles from this table and the web hides what the
 * API would refuse with the same table, so the two cannot drift apart. Reading is open to every member.
 */
export const permissions = {
  'piece:create': ['lead', 'maker'],
  'piece:edit': ['lead', 'maker'],
  'piece:delete': ['lead'],
  'mold:change': ['lead', 'maker'],
  'plan:change': ['lead', 'maker'],
  'pour:release': ['lead'],
  'pour:machined': ['lead', 'maker'],
  /** Voiding a cup or a reading someone else logged; the person who logged it may always void their own. */
  'entry:void-others': ['lead'],
  'shelf:keep': ['lead'],
  'team:manage': ['lead'],
  'shop:manage': ['lead'],
  'audit:read': ['lead'],
} as const satisfies Record<string, readonly Role[]>;

export type Action = keyof typeof permissions;

export const actions = Object.keys(permissions) as Action[];

export function rolesFor(action: Action): readonly Role[] {
  return permissions[action];
}

export function can(role: Role, action: Action): boolean {
  return rolesFor(action).includes(role);
}

/** A cup or a reading may be voided by the person who logged it, or by a role allowed to void anyone's. */
export function mayVoidEntry(viewer: { userId: string; role: Role }, loggedById: string | null): boolean {
  return can(viewer.role, 'entry:void-others') || (loggedById !== null && loggedById === viewer.userId);
}
