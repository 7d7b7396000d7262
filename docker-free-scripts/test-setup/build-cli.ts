import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

/** Vitest's global set-up: the built CLI is brought up to date (a no-op when it is) before any test runs it. */
export default function buildCli(): void {
  execFileSync(process.execPath, [fileURLToPath(new URL('../build.mjs', import.meta.url)), 'cli'], { stdio: ['ignore', 'ignore', 'inherit'] });
}
