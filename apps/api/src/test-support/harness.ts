import { randomUUID } from 'node:crypto';
import { pino } from 'pino';
import supertest from 'supertest';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll } from 'vitest';
import { createDataSource } from '@gelpoint/db';
import type { Role, SessionResponse } from '@gelpoint/contracts';
import { createApp, type GelpointApp } from '../app';
import { loadConfig, type Config } from '../config';

/** The integration tests run against the real PostgreSQL that npm test prepares, never the dev database. */
export function testDatabaseUrl(): string {
  const url = process.env.GELPOINT_TEST_DATABASE_URL;
  if (!url) throw new Error('GELPOINT_TEST_DATABASE_URL is not set: run the tests through npm test, which creates the test database');
  return url;
}

export interface Harness {
  ds: DataSource;
  config: Config;
  app: GelpointApp;
  http: () => supertest.Agent;
}

export function useHarness(overrides: Record<string, string> = {}): Harness {
  const h = {} as Harness;
  beforeAll(async () => {
    // A lower hash cost keeps the suites quick; passwords.test.ts checks the production default.
    process.env.GELPOINT_SCRYPT_LOG_N = '12';
    h.config = loadConfig({
      ...process.env,
      GELPOINT_JWT_SECRET: 'test-secret-that-is-long-enough-for-hs256-0123456789',
      GELPOINT_PUBLIC_URL: 'http://127.0.0.1:8080',
      GELPOINT_AUTH_RATE_PER_15MIN: '100000',
      ...overrides,
      DATABASE_URL: testDatabaseUrl(),
    });
    h.ds = createDataSource({ url: h.config.databaseUrl, poolSize: 4, applicationName: 'gelpoint-test' });
    await h.ds.initialize();
    h.app = createApp({ ds: h.ds, config: h.config, logger: pino({ level: 'silent' }) });
    h.http = () => supertest.agent(h.app.app);
  });
  afterAll(async () => {
    h.app?.close();
    await h.ds?.destroy();
  });
  return h;
}

export const uniqueEmail = (label: string) => `${label}-${randomUUID().slice(0, 8)}@example.test`;
export const PASSWORD = 'correct horse battery';

export interface ShopFixture {
  shopId: string;
  lead: SessionResponse;
  member: (role: Role) => Promise<SessionResponse>;
}

export const bearer = (s: { token: string }) => ({ Authorization: `Bearer ${s.token}` });

/** The raw token of the newest mail to an address, read from the queued message's link. */
export async function linkTokenFor(ds: DataSource, to: string, path: 'invitations' | 'reset-password'): Promise<string> {
  const rows: { body_text: string }[] = await ds.query(`SELECT body_text FROM outbound_mail WHERE to_address = $1 ORDER BY created_at DESC LIMIT 1`, [to]);
  const body = rows[0]?.body_text ?? '';
  const m = path === 'invitations' ? /\/invitations\/([A-Za-z0-9_-]+)/.exec(body) : /reset-password\?token=([A-Za-z0-9_-]+)/.exec(body);
  if (!m) throw new Error(`no ${path} link in the mail to ${to}`);
  return m[1]!;
}

/** A new shop with its lead; `member(role)` invites and signs in one more person through the real routes. */
export async function createShop(h: Harness, name = 'Test shop'): Promise<ShopFixture> {
  const res = await h
    .http()
    .post('/api/auth/register')
    .send({ shopName: name, name: 'Lead Person', email: uniqueEmail('lead'), password: PASSWORD })
    .expect(201);
  const lead = res.body as SessionResponse;
  // Tests run at any hour of the day: a shop made here has no quiet hours, so each reminder keeps its own time.
  // The quiet-hours tests set them.
  await h.ds.query('UPDATE shops SET quiet_from_hour = day_start_hour WHERE id = $1', [lead.shop.id]);
  return {
    shopId: lead.shop.id,
    lead,
    member: async (role: Role) => {
      const email = uniqueEmail(role);
      await h.http().post('/api/shop/invitations').set(bearer(lead)).send({ email, role }).expect(201);
      const token = await linkTokenFor(h.ds, email, 'invitations');
      const accepted = await h
        .http()
        .post(`/api/invitations/${token}/accept`)
        .send({ name: `${role} person`, password: PASSWORD })
        .expect(200);
      return accepted.body as SessionResponse;
    },
  };
}
