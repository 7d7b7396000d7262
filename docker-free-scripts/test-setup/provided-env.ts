import { inject } from 'vitest';

// The database and browser projects' global set-up made the databases; the tests (and the processes they start)
// find them where they always have, in the environment. Nothing else of the developer's environment is used.
const url = inject('testDatabaseUrl');
if (url) process.env.GELPOINT_TEST_DATABASE_URL = process.env.DATABASE_URL = url;
const e2e = inject('e2eDatabaseUrl');
if (e2e) process.env.GELPOINT_E2E_DATABASE_URL = e2e;
const template = inject('e2eTemplateDatabase');
if (template) process.env.GELPOINT_E2E_TEMPLATE_DATABASE = template;
