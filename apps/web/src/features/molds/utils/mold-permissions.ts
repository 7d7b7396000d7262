import type { Role } from '@gelpoint/contracts';

// The mould routes accept uploads and deletions from the shop lead and makers; apprentices read reports.
const changers: readonly Role[] = ['lead', 'maker'];

export function mayChangeMolds(role: Role): boolean {
  return changers.includes(role);
}
