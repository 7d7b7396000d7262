import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

// The test set-up runs the same shell helpers as npm start (lib.sh knows the cluster, its port and the
// superuser's password), so a test run and the scripts never disagree about where the databases are.
const root = fileURLToPath(new URL('../..', import.meta.url));

function libSh(script: string, ...args: string[]): string {
  return execFileSync('bash', ['-c', `source docker-free-scripts/lib.sh && ${script}`, 'test-setup', ...args], {
    cwd: root,
    env: { ...process.env, PGOPTIONS: '-c client_min_messages=warning' },
    stdio: ['ignore', 'pipe', 'inherit'],
    encoding: 'utf8',
  });
}

/** The built migrate or seed script (the projects' set-up brings the db build up to date first; see build-targets.ts). */
function dbScript(script: 'migrate' | 'seed', url: string): void {
  execFileSync(process.execPath, [`packages/db/dist/cli/${script}.js`], {
    cwd: root,
    env: { ...process.env, DATABASE_URL: url },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
}

const urlOf = (name: string) => libSh('db_url "$1"', name);

/**
 * The databases the API, worker and db integration tests use, one per test worker so that files running side by side
 * never see each other's rows or jobs: a migrated template made once a run, copied for each worker.
 */
export function freshTestDatabases(workers: number): string[] {
  const template = 'gelpoint_test_template';
  libSh('pg_start >&2 && ensure_database "$1" --fresh', template);
  dbScript('migrate', urlOf(template));
  return Array.from({ length: workers }, (_, i) => {
    const name = `gelpoint_test_${i + 1}`;
    libSh('superuser_psql -c "DROP DATABASE IF EXISTS $1 WITH (FORCE)" -c "CREATE DATABASE $1 OWNER \\"$GELPOINT_DB_USER\\" TEMPLATE $2"', name, template);
    return urlOf(name);
  });
}

export interface DemoDatabases {
  /** gelpoint_e2e: the demo the shared browser stack serves and the seed's own test reads. */
  url: string;
  /** The demo as the seed left it, which nobody connects to, so a flow can copy it in a moment. */
  template: string;
}

let demo: DemoDatabases | undefined;

/**
 * Migrates and seeds the demo once a run, into a template, and copies it to gelpoint_e2e. A flow that needs the demo
 * as it is (freshDemoDatabase) copies the template too, instead of migrating and seeding again; the seed's times are
 * relative to now and a run lasts minutes, so "due in the next hours" stays true.
 */
export function demoDatabases(): DemoDatabases {
  if (demo) return demo;
  const template = 'gelpoint_e2e_template';
  libSh('pg_start >&2 && ensure_database "$1" --fresh', template);
  const templateUrl = urlOf(template);
  dbScript('migrate', templateUrl);
  dbScript('seed', templateUrl);
  libSh(
    'superuser_psql -c "DROP DATABASE IF EXISTS gelpoint_e2e WITH (FORCE)" -c "CREATE DATABASE gelpoint_e2e OWNER \\"$GELPOINT_DB_USER\\" TEMPLATE $1"',
    template,
  );
  demo = { url: urlOf('gelpoint_e2e'), template };
  return demo;
}
