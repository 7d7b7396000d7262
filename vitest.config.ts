import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// Processes the tests start through tsx (the API, worker and mail sink, the migrations) get the
// compiler options every workspace shares; see docker-free-scripts/lib.sh.
process.env.TSX_TSCONFIG_PATH ??= fileURLToPath(new URL('./tsconfig.base.json', import.meta.url));

const setup = (file: string) => `./docker-free-scripts/test-setup/${file}`;

// Tests that need PostgreSQL: the API's and the worker's integration tests (the harness, the mail sink process) and
// the db package's tests of the seeded demo. Each project's global set-up runs only when one of its files runs, so
// `npm test -- <file>` prepares just what that file needs.
const databaseTests = [
  'apps/api/src/**/*.test.ts',
  'apps/worker/src/**/*.test.ts',
  'packages/db/src/seed/demo.test.ts',
  // Seeds, backs up and restores databases of its own on the cluster.
  'packages/db/src/backup.test.ts',
  'packages/db/src/local-cluster.test.ts',
];
// Tests of the API that build their own Express app or fake the database: no PostgreSQL.
const apiUnitTests = [
  'apps/api/src/http/compress-answers.test.ts',
  'apps/api/src/http/database-unavailable.test.ts',
  'apps/api/src/http/static-web.test.ts',
  'apps/api/src/http/unstorable-input.test.ts',
];
const cliTests = ['apps/cli/src/**/*.test.ts'];
const browserTests = ['apps/web/e2e/**/*.test.ts'];
const excluded = ['**/node_modules/**', '**/dist/**'];

export default defineConfig({
  test: {
    environment: 'node',
    testTimeout: 30_000,
    hookTimeout: 60_000,
    // A poll waits for a page or a worker to catch up; on a shared 2-core machine 1 s (the default) is too short.
    expect: { poll: { timeout: 10_000, interval: 100 } },
    pool: 'forks',
    // A project's files run one after the other in one process instead of a fresh one each: the imports (Express,
    // TypeORM, playwright-core) are paid once. A file leaves the process as it found it (DEVELOPERS.md, The test
    // projects); measured there, this took the unit project from 134 s to 40 s.
    isolate: false,
    // Vitest's own default (cores − 1 workers) unless GELPOINT_TEST_WORKERS says otherwise. Each worker has a test
    // database of its own (docker-free-scripts/test-setup/provided-env.ts), so files may run side by side; on this
    // 2-core machine two at a time saved only 8 % (the suite is CPU-bound; DEVELOPERS.md has the figures).
    ...(process.env.GELPOINT_TEST_WORKERS ? { maxWorkers: Number(process.env.GELPOINT_TEST_WORKERS) } : {}),
    // mathjs is a thousand small modules: loading them costs a test file about a second. Pre-bundled once a run
    // (esbuild, into node_modules/.vite), every file that converts units loads one file instead; the code is mathjs's own.
    deps: { optimizer: { ssr: { enabled: process.env.GELPOINT_TEST_BUNDLE_MATHJS !== '0', include: ['mathjs'] } } },
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          include: ['packages/*/src/**/*.test.ts', 'apps/web/src/**/*.test.ts', 'apps/mailsink/src/**/*.test.ts', ...apiUnitTests],
          exclude: [...excluded, 'packages/db/src/seed/demo.test.ts', 'packages/db/src/backup.test.ts', 'packages/db/src/local-cluster.test.ts'],
        },
      },
      {
        extends: true,
        // The CLI's tests run the built command: rebuild it first when its sources changed.
        test: { name: 'cli', include: cliTests, exclude: excluded, globalSetup: [setup('build-cli.ts')] },
      },
      {
        extends: true,
        test: {
          name: 'database',
          include: databaseTests,
          exclude: [...excluded, ...apiUnitTests],
          globalSetup: [setup('database-project.ts')],
          setupFiles: [setup('provided-env.ts')],
        },
      },
      {
        extends: true,
        test: {
          name: 'browser',
          include: browserTests,
          exclude: excluded,
          globalSetup: [setup('browser-project.ts')],
          setupFiles: [setup('provided-env.ts')],
        },
      },
    ],
  },
});
