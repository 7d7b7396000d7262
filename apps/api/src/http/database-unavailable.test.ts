import express from 'express';
import pg from 'pg';
import { pino } from 'pino';
import request from 'supertest';
import { QueryFailedError } from 'typeorm';
import { describe, expect, it } from 'vitest';
import { errorHandler, toAppError } from './errors';

const pgError = (code: string, message: string) => Object.assign(new Error(message), { code, severity: 'FATAL' });

async function refusedConnection(): Promise<unknown> {
  // Port 1 on loopback: nothing listens there, so the connection is refused at once.
  const client = new pg.Client({ host: '127.0.0.1', port: 1, user: 'nobody', database: 'nothing', connectionTimeoutMillis: 2_000 });
  return client.connect().then(
    () => new Error('connected to port 1'),
    (err: unknown) => err,
  );
}

describe('a database that is away', () => {
  it('is a 503 database_unavailable, however the driver reports it', async () => {
    const cases: unknown[] = [
      await refusedConnection(),
      // SQLSTATE, PostgreSQL manual appendix A: 57P01 admin_shutdown, 57P03 cannot_connect_now,
      // 08006 connection_failure, 53300 too_many_connections.
      pgError('57P01', 'terminating connection due to administrator command'),
      pgError('57P03', 'the database system is starting up'),
      pgError('08006', 'connection failure'),
      pgError('53300', 'sorry, too many clients already'),
      new QueryFailedError('SELECT 1', [], pgError('57P01', 'terminating connection due to administrator command')),
      new Error('Connection terminated unexpectedly'),
      new Error('timeout exceeded when trying to connect'),
      new Error('Client has encountered a connection error and is not queryable'),
      Object.assign(new Error('getaddrinfo EAI_AGAIN db.internal'), { code: 'EAI_AGAIN' }),
      new AggregateError([Object.assign(new Error('connect EHOSTUNREACH'), { code: 'EHOSTUNREACH' })], ''),
    ];
    for (const err of cases) {
      expect(toAppError(err), String(err)).toMatchObject({ kind: 'unavailable', code: 'database_unavailable', status: 503 });
    }
  });

  it('leaves failures that are not about reaching the database alone', () => {
    // 23514 check_violation and 42P01 undefined_table: the database answered.
    expect(toAppError(new QueryFailedError('INSERT', [], pgError('23514', 'new row violates check constraint')))).toBeUndefined();
    expect(toAppError(pgError('42P01', 'relation "nowhere" does not exist'))).toBeUndefined();
    expect(toAppError(new Error('something else broke'))).toBeUndefined();
  });

  it('answers with a sentence and a Retry-After, not a 500', async () => {
    const app = express();
    app.get('/', async () => {
      throw await refusedConnection();
    });
    app.use(errorHandler(pino({ level: 'silent' })));
    const res = await request(app).get('/').expect(503);
    expect(res.headers['retry-after']).toBe('5');
    expect(res.body).toEqual({ error: { code: 'database_unavailable', message: 'the database is not reachable right now; try again in a moment' } });
  });
});
