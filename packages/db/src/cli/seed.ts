import { createDataSource } from '../data-source';
import { seedDemo } from '../seed/demo';

const ds = createDataSource({ applicationName: 'gelpoint-seed' });
await ds.initialize();
try {
  console.log((await seedDemo(ds)) ? 'seeded the demo shop' : 'seed: the database already holds a shop; left as it is');
} finally {
  await ds.destroy();
}
