import { createDataSource } from '../data-source';

const ds = createDataSource({ applicationName: 'gelpoint-migrate' });
await ds.initialize();
try {
  const ran = await ds.runMigrations({ transaction: 'each' });
  console.log(ran.length ? `migrated: ${ran.map((m) => m.name).join(', ')}` : 'migrations: up to date');
} finally {
  await ds.destroy();
}
