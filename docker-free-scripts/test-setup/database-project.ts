import { availableParallelism } from 'node:os';
import type { TestProject } from 'vitest/node';
import { buildTargets, serverTargets } from './build-targets';
import { demoDatabases, freshTestDatabases } from './databases';

declare module 'vitest' {
  export interface ProvidedContext {
    /** One test database per test worker; a file takes the one of the worker it runs in (VITEST_POOL_ID). */
    testDatabaseUrls: string[];
    e2eDatabaseUrl: string;
    e2eTemplateDatabase: string;
  }
}

/**
 * Global set-up of the database project: PostgreSQL, a fresh migrated test database per worker, the seeded demo, and
 * the built API, worker and mail sink its tests start as processes.
 */
export default function setup(project: TestProject): void {
  buildTargets(...serverTargets);
  // As many as vitest starts workers: its maxWorkers, or its default of cores − 1.
  const workers = project.vitest.config.maxWorkers || Math.max(availableParallelism() - 1, 1);
  project.provide('testDatabaseUrls', freshTestDatabases(workers));
  // The seed's own test reads the demo as the seed wrote it.
  const demo = demoDatabases();
  project.provide('e2eDatabaseUrl', demo.url);
  project.provide('e2eTemplateDatabase', demo.template);
}
