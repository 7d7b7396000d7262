import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// Processes the tests start through tsx (the API, worker and mail sink, the migrations) get the
// compiler options every workspace shares; see docker-free-scripts/lib.sh.
process.env.TSX_TSCONFIG_PATH ??= fileURLToPath(new URL('./tsconfig.base.json', import.meta.url));

export default defineConfig({
  test: {
    include: ['packages/*/src/**/*.test.ts', 'apps/*/src/**/*.test.ts', 'apps/*/e2e/**/*.test.ts'],
    exclude: ['**/node_modules/**', '**/dist/**'],
    environment: 'node',
    testTimeout: 30_000,
    hookTimeout: 60_000,
    // A poll waits for a page or a worker to catch up; on a shared 2-core machine 1 s (the default) is too short.
    expect: { poll: { timeout: 10_000, interval: 100 } },
    pool: 'forks',
    // The CLI's tests run the built command: rebuild it first when its sources changed.
    globalSetup: ['./docker-free-scripts/vitest-build-cli.ts'],
  },
});
