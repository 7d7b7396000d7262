import type { Role } from '@gelpoint/contracts';

const roleWords: Record<Role, { label: string; duty: string }> = {
  lead: { label: 'Shop lead', duty: 'keeps the shelf and the team, and releases pieces for machining' },
  maker: { label: 'Maker', duty: 'plans pieces, pours and timelines' },
  apprentice: { label: 'Apprentice', duty: 'mixes batches and logs them' },
};

export function roleLabel(role: Role): string {
  return roleWords[role].label;
}

export function roleDuty(role: Role): string {
  return roleWords[role].duty;
}
