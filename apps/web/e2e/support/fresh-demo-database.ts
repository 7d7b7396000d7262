import { execFile } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { join } from 'node:path';
import { promisify } from 'node:util';

const run = promisify(execFile);
const root = join(import.meta.dirname, '../../../..');

export interface FreshDemoDatabase {
  name: string;
  /** The app user's URL of the new database, for the stack's DATABASE_URL. */
  url: string;
  drop: () => Promise<void>;
}

/** Runs SQL as the cluster's superuser through lib.sh, which knows where its password lives. */
async function asSuperuser(sql: string): Promise<void> {
  await run('bash', ['-c', 'source docker-free-scripts/lib.sh && superuser_psql -c "$1"', 'superuser-sql', sql], {
    cwd: root,
    env: { ...process.env, PGOPTIONS: '-c client_min_messages=warning' },
  });
}

const quoted = (identifier: string) => `"${identifier.replaceAll('"', '""')}"`;

/**
 * A database of its own for one flow: a copy of the demo the browser project's set-up migrated and seeded into a
 * template at the start of the run. Not a copy of gelpoint_e2e: a copy fails while any other test is connected to
 * the source, and would carry whatever those tests changed there; nobody connects to the template. The seed's times
 * are relative to when it ran, minutes ago, so "due in the next hours" stays true.
 */
export async function freshDemoDatabase(flow: string): Promise<FreshDemoDatabase> {
  const base = process.env.GELPOINT_E2E_DATABASE_URL;
  const template = process.env.GELPOINT_E2E_TEMPLATE_DATABASE;
  if (!base || !template) throw new Error('GELPOINT_E2E_DATABASE_URL is not set: run the browser tests through npm test');
  if (!/^[a-z0-9_]+$/.test(flow)) throw new Error(`the flow name "${flow}" must be lower-case letters, digits and underscores`);
  const name = `gelpoint_e2e_${flow}_${randomBytes(4).toString('hex')}`;
  const url = new URL(base);
  url.pathname = `/${name}`;
  const owner = decodeURIComponent(url.username);
  await asSuperuser(`CREATE DATABASE ${quoted(name)} OWNER ${quoted(owner)} TEMPLATE ${quoted(template)}`);
  return { name, url: url.toString(), drop: () => asSuperuser(`DROP DATABASE IF EXISTS ${quoted(name)} WITH (FORCE)`) };
}
