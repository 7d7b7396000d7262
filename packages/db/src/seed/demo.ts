import type { DataSource, EntityManager } from 'typeorm';
import { Membership, Piece, Shop, User, type PieceStage } from '../entities';
import { hashPassword } from '../passwords';
import { DEMO_PASSWORD, demoPeople as people } from './demo-people';
import { seedDemoMould } from './demo-mould-plan';
import { seedDemoPours } from './demo-pours';
import { seedDemoShelf } from './demo-shelf';

// The demo scenario is invented: a small shop, its three people, a few pieces at different stages and a mould.
export { DEMO_PASSWORD, demoSignIns } from './demo-people';

const pieces: { name: string; wood: string; notes: string; stage: PieceStage; by: string }[] = [
  {
    name: 'River table, 1.8 m',
    wood: 'black walnut slabs',
    notes: 'Two live-edge slabs, channel 140–220 mm wide, about 45 mm deep. Client wants a smoky teal.',
    stage: 'curing',
    by: 'maker@gelpoint.test',
  },
  {
    name: 'Serving tray with lagoon inlay',
    wood: 'hard maple',
    notes: 'CNC pocket 8 mm deep; pearl blue pigment.',
    stage: 'planning',
    by: 'maker@gelpoint.test',
  },
  {
    name: 'Coaster set of six',
    wood: 'cherry offcuts',
    notes: 'Clear pour, seal coat first: end grain on two of them.',
    stage: 'ready',
    by: 'maker@gelpoint.test',
  },
  {
    name: 'Burl bowl, void fill',
    wood: 'oak burl',
    notes: 'Deep voids; pour in thin layers, watch the exotherm.',
    stage: 'pouring',
    by: 'lead@gelpoint.test',
  },
  {
    name: 'Wall clock face',
    wood: 'ash',
    notes: 'Finished and delivered.',
    stage: 'done',
    by: 'lead@gelpoint.test',
  },
];

/** Seeds the demo shop when the database holds no shop yet; returns whether it seeded. */
export async function seedDemo(ds: DataSource): Promise<boolean> {
  return ds.transaction(async (m: EntityManager) => {
    // One seeder at a time: a second start racing the first waits here, then finds the shop.
    await m.query('SELECT pg_advisory_xact_lock(7201)');
    if ((await m.count(Shop)) > 0) return false;
    // A metric shop in Canada: its prices are in Canadian dollars.
    // On the Pacific coast: its clock is Vancouver's, and its unheated nights cool the shop by three degrees.
    const shop = await m.save(
      m.create(Shop, {
        name: 'Kettle Creek Woodworks',
        unitSystem: 'metric',
        scaleResolutionG: 0.1,
        currency: 'CAD',
        timeZone: 'America/Vancouver',
        temperatureProfile: { mode: 'day_night', dayTempC: 21.5, nightTempC: 18.5, dayStartHour: 7, nightStartHour: 19 },
      }),
    );
    const passwordHash = await hashPassword(DEMO_PASSWORD);
    const users = new Map<string, User>();
    for (const p of people) {
      const user = await m.save(m.create(User, { email: p.email, name: p.name, passwordHash }));
      users.set(p.email, user);
      await m.save(m.create(Membership, { userId: user.id, shopId: shop.id, role: p.role, status: 'active' }));
    }
    for (const p of pieces) {
      await m.save(m.create(Piece, { shopId: shop.id, name: p.name, wood: p.wood, notes: p.notes, stage: p.stage, createdById: users.get(p.by)!.id }));
    }
    await seedDemoShelf(m, shop.id);
    await seedDemoPours(m, shop.id, users);
    await seedDemoMould(m, shop.id, users);
    return true;
  });
}
