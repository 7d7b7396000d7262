import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import type { TestProject } from 'vitest/node';
import { E2eStack } from '../../apps/web/e2e/support/stack';
import { demoDatabases } from './databases';

declare module 'vitest' {
  export interface ProvidedContext {
    sharedStack: { apiPort: number; mailHttpPort: number };
  }
}

/**
 * Global set-up of the browser project: the demo databases, the web build the API serves, and one stack (API, worker,
 * mail sink) every browser test file shares; a file keeps it apart from the others by the names of what it makes.
 */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const demo = demoDatabases();
  project.provide('e2eDatabaseUrl', demo.url);
  project.provide('e2eTemplateDatabase', demo.template);
  // A no-op when the web build is up to date (npm test has just built it).
  execFileSync(process.execPath, [fileURLToPath(new URL('../build.mjs', import.meta.url)), 'web'], { stdio: ['ignore', 'ignore', 'inherit'] });
  const stack = new E2eStack();
  await stack.start(demo.url);
  project.provide('sharedStack', { apiPort: stack.apiPort, mailHttpPort: stack.mailHttpPort });
  return () => stack.stop();
}
