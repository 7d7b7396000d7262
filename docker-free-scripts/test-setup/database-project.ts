import type { TestProject } from 'vitest/node';
import { demoDatabases, freshTestDatabase } from './databases';

declare module 'vitest' {
  export interface ProvidedContext {
    testDatabaseUrl: string;
    e2eDatabaseUrl: string;
    e2eTemplateDatabase: string;
  }
}

/** Global set-up of the database project: PostgreSQL, a fresh migrated test database, and the seeded demo. */
export default function setup(project: TestProject): void {
  project.provide('testDatabaseUrl', freshTestDatabase());
  // The seed's own test reads the demo as the seed wrote it.
  const demo = demoDatabases();
  project.provide('e2eDatabaseUrl', demo.url);
  project.provide('e2eTemplateDatabase', demo.template);
}
