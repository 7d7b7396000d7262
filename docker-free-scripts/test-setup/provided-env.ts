import { inject } from 'vitest';

// The database and browser projects' global set-up made the databases; the tests (and the processes they start)
// find them where they always have, in the environment. Nothing else of the developer's environment is used.
// Files run side by side in as many workers as the run has (VITEST_POOL_ID counts them from 1), each worker on a test
// database of its own, so one file's rows, jobs and background processes never meet another's.
const urls = inject('testDatabaseUrls');
if (urls?.length) {
  const worker = Number(process.env.VITEST_POOL_ID ?? '1');
  const url = urls[(Number.isInteger(worker) && worker > 0 ? worker - 1 : 0) % urls.length]!;
  process.env.GELPOINT_TEST_DATABASE_URL = process.env.DATABASE_URL = url;
}
const e2e = inject('e2eDatabaseUrl');
if (e2e) process.env.GELPOINT_E2E_DATABASE_URL = e2e;
const template = inject('e2eTemplateDatabase');
if (template) process.env.GELPOINT_E2E_TEMPLATE_DATABASE = template;
