import type { TestProject } from 'vitest/node';
import { E2eStack } from '../../apps/web/e2e/support/stack';
import { buildTargets, serverTargets } from './build-targets';
import { demoDatabases } from './databases';

declare module 'vitest' {
  export interface ProvidedContext {
    sharedStack: { apiPort: number; mailHttpPort: number };
  }
}

/**
 * Global set-up of the browser project: the web build the API serves and the built processes, the demo databases, and
 * one stack (API, worker, mail sink) every browser test file shares; a file keeps it apart from the others by the
 * names of what it makes.
 */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  // No-ops when the builds are up to date (npm test has just built them): the web app the API serves, and the processes.
  buildTargets('web', ...serverTargets);
  const demo = demoDatabases();
  project.provide('e2eDatabaseUrl', demo.url);
  project.provide('e2eTemplateDatabase', demo.template);
  const stack = new E2eStack();
  await stack.start(demo.url);
  project.provide('sharedStack', { apiPort: stack.apiPort, mailHttpPort: stack.mailHttpPort });
  return () => stack.stop();
}
