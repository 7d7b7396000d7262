import { buildTargets } from './build-targets';

/** Vitest's global set-up: the built CLI is brought up to date (a no-op when it is) before any test runs it. */
export default function buildCli(): void {
  buildTargets('cli');
}
