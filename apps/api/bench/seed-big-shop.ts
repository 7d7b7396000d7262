/**
 * Adds the big shop's pours and lots to a freshly seeded database (DATABASE_URL):
 * `node --import tsx apps/api/bench/seed-big-shop.ts [pours] [lots]` (npm run bench:web runs it).
 */
import { createDataSource } from '@gelpoint/db';
import { seedBigShop } from './big-shop';

const [pours = 500, lots = 1000] = process.argv.slice(2).map(Number);
const ds = createDataSource({ applicationName: 'gelpoint-webbench-seed' });
await ds.initialize();
try {
  const started = performance.now();
  const s = await seedBigShop(ds, { pours, lots });
  console.log(
    `added to ${s.shopName}: ${s.pours} open pours (${s.pieces} pieces, ${s.pourPlans} plans, ${s.batches} batches, ${s.readings} readings, ${s.reminders} reminders) and ${s.lots} lots in ${Math.round(performance.now() - started)} ms`,
  );
} finally {
  await ds.destroy();
}
