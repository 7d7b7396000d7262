import { roles } from '@gelpoint/contracts';
import { describe, expect, it } from 'vitest';
import { can } from './authorization';

describe('can', () => {
  it('lets makers create and edit pieces but not delete them', () => {
    expect(can('maker', 'piece:create')).toBe(true);
    expect(can('maker', 'piece:edit')).toBe(true);
    expect(can('maker', 'piece:delete')).toBe(false);
  });

  it('keeps apprentices read-only on pieces', () => {
    expect(can('apprentice', 'piece:create')).toBe(false);
    expect(can('apprentice', 'piece:edit')).toBe(false);
  });

  it('gives the team, the shop settings and the audit to leads alone', () => {
    for (const permission of ['team:manage', 'shop:manage', 'audit:read'] as const) {
      expect(roles.filter((role) => can(role, permission))).toEqual(['lead']);
    }
  });
});
