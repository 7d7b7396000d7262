import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { databaseUrl } from './config';
import { entities } from './entities';
import { migrations } from './migrations';

export interface DataSourceOptions {
  url?: string;
  /** Pool size per process; several API and worker processes share one database. */
  poolSize?: number;
  applicationName?: string;
}

export function createDataSource(opts: DataSourceOptions = {}): DataSource {
  return new DataSource({
    type: 'postgres',
    url: opts.url ?? databaseUrl(),
    entities,
    migrations,
    synchronize: false,
    uuidExtension: 'pgcrypto',
    installExtensions: false,
    migrationsRun: false,
    migrationsTableName: 'schema_migrations',
    // Query logging would print parameters (password hashes, tokens); failures reach our own error log.
    logging: false,
    extra: {
      max: opts.poolSize ?? 10,
      application_name: opts.applicationName ?? 'gelpoint',
      // A dropped database connection must surface as an error, not a request that hangs.
      connectionTimeoutMillis: 5_000,
      idleTimeoutMillis: 30_000,
      statement_timeout: 30_000,
    },
  });
}

/** Connect, retrying while the database is starting or briefly away. */
export async function connectDataSource(ds: DataSource, attempts = 20, delayMs = 500): Promise<DataSource> {
  for (let i = 1; ; i++) {
    try {
      return await ds.initialize();
    } catch (err) {
      if (i >= attempts) throw err;
      await new Promise((r) => setTimeout(r, delayMs));
    }
  }
}
