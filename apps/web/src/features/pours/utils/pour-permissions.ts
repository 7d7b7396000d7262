import type { Role } from '@gelpoint/contracts';

/** The API's own rules for pours; screens only hide what it would refuse. */
export function mayRelease(role: Role): boolean {
  return role === 'lead';
}

export function mayMarkMachined(role: Role): boolean {
  return role === 'lead' || role === 'maker';
}
