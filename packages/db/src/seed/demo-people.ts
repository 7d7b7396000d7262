import type { Role } from '../entities/membership.entity';

// The demo shop's people are invented. Kept apart from the seed itself so that what prints the sign-ins loads no
// mould engine.
export const DEMO_PASSWORD = 'gelpoint-demo';

export const demoPeople: { email: string; name: string; role: Role }[] = [
  { email: 'lead@gelpoint.test', name: 'Rosa Lindqvist', role: 'lead' },
  { email: 'maker@gelpoint.test', name: 'Tomás Okafor', role: 'maker' },
  { email: 'apprentice@gelpoint.test', name: 'Mika Hale', role: 'apprentice' },
];

export const demoSignIns = demoPeople.map(({ email, role }) => ({ email, role, password: DEMO_PASSWORD }));
