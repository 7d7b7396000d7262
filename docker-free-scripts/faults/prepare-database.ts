// Migrates the fault-check database and seeds the demo shop in one process (one start instead of two).
import { createDataSource } from '@gelpoint/db';
import { seedDemo } from '@gelpoint/db/seed';

const ds = createDataSource({ applicationName: 'gelpoint-fault-check' });
await ds.initialize();
try {
  await ds.runMigrations({ transaction: 'each' });
  if (!(await seedDemo(ds))) throw new Error('the fault-check database already held a shop; it should be fresh');
} finally {
  await ds.destroy();
}
