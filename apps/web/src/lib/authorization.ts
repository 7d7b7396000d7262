import type { Role } from '@gelpoint/contracts';

/**
 * What each role may do, so screens hide what the server would refuse anyway. The server stays the authority;
 * this only keeps people from pressing buttons that can only fail.
 */
const grants = {
  'piece:create': ['lead', 'maker'],
  'piece:edit': ['lead', 'maker'],
  'piece:delete': ['lead'],
  'team:manage': ['lead'],
  'shop:manage': ['lead'],
  'audit:read': ['lead'],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof grants;

export function can(role: Role, permission: Permission): boolean {
  return (grants[permission] as readonly Role[]).includes(role);
}
