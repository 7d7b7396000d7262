import type { DestinationStream } from 'pino';
import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { createApp } from './app';
import { createLogger, withoutTokens } from './logger';
import { PASSWORD, type Harness, useHarness } from './test-support/harness';
import { newMarker, stockShop, type StockedShop } from './test-support/stocked-shop';

// Everything the API logs at debug level while people sign in, invite, join, reset a password, feed
// readings with the thermometer token and upload a mould, through the real app: no line may hold
// any of the secrets those requests carried.
const h = useHarness();
const lines: string[] = [];
const secrets = new Map<string, string>();
let shop: StockedShop;
const NEW_PASSWORD = 'a reset password nobody logs';

function remember(what: string, value: string | undefined) {
  if (value) secrets.set(value, what);
}

function cookieValues(setCookie: string[] | string | undefined): string[] {
  const list = Array.isArray(setCookie) ? setCookie : setCookie ? [setCookie] : [];
  return list.map((c) => c.split(';')[0]!.split('=').slice(1).join('=')).filter((v) => v.length > 0);
}

beforeAll(async () => {
  const stream: DestinationStream = { write: (chunk: string) => void lines.push(...chunk.split('\n').filter(Boolean)) };
  const logged = createApp({ ds: h.ds, config: h.config, logger: createLogger('debug', stream) });
  const via: Harness = { ...h, app: logged, http: () => supertest.agent(logged.app) };
  const http = via.http;

  // Sign-up of the lead, invitations sent and accepted for a maker and an apprentice, a mould upload,
  // a password reset asked for, a second sign-in and a thermometer token: all through the logged app.
  shop = await stockShop(via, newMarker('logs'));
  for (const s of [shop.lead, shop.spareLead, shop.maker, shop.apprentice]) remember('a session token', s.token);
  remember('the invitation token', shop.invitationToken);
  remember('the reset token', shop.resetToken);
  remember('the thermometer token', shop.ingestToken);
  remember('the password', PASSWORD);
  remember('the new password', NEW_PASSWORD);

  // The web app's way: a session cookie and the CSRF header.
  const login = await http().post('/api/auth/login').send({ email: shop.lead.user.email, password: PASSWORD }).expect(200);
  remember('a session token', (login.body as { token: string }).token);
  const cookies = cookieValues(login.headers['set-cookie']);
  expect(cookies.length, 'the sign-in should set the session cookie').toBeGreaterThan(0);
  for (const c of cookies) remember('the session cookie', c);
  await http().post('/api/pieces').set('Cookie', `gp_session=${cookies[0]}`).set('X-Gelpoint-Csrf', '1').send({ name: 'Logged piece' }).expect(201);

  // Link tokens in the API's paths and in the web app's deep links.
  await http().get(`/api/invitations/${shop.invitationToken}`).expect(200);
  await http().get(`/invitations/${shop.invitationToken}`);
  await http().get(`/reset-password?token=${shop.resetToken}`);
  await http().post(`/api/invitations/${shop.invitationToken}/accept`).send({ name: 'Late joiner', password: PASSWORD });
  await http().post('/api/auth/password-reset/confirm').send({ token: shop.resetToken, password: NEW_PASSWORD }).expect(204);

  await http()
    .post('/api/ingest/readings')
    .set('X-Gelpoint-Ingest-Token', shop.ingestToken)
    .send({ pourId: shop.ids.pour, readings: [{ at: new Date(Date.now() - 1_800_000).toISOString(), tempC: 21.5 }] })
    .expect(202);

  // Every invitation and reset link mailed during the flows, including the ones member() accepted.
  const mails: { body_text: string }[] = await h.ds.query(`SELECT body_text FROM outbound_mail WHERE shop_id = $1 OR to_address = ANY($2)`, [
    shop.shopId,
    [shop.maker.user.email, shop.lead.user.email],
  ]);
  for (const { body_text } of mails) {
    for (const m of body_text.matchAll(/\/invitations\/([A-Za-z0-9_-]+)/g)) remember('an invitation token', m[1]);
    for (const m of body_text.matchAll(/reset-password\?token=([A-Za-z0-9_-]+)/g)) remember('a reset token', m[1]);
  }
});

describe('what the API logs', () => {
  it('logged the requests at all (so the checks below look at something)', () => {
    expect(lines.length).toBeGreaterThan(25);
    const urls = lines.map((l) => (JSON.parse(l) as { req?: { url?: string } }).req?.url).filter(Boolean);
    expect(urls).toContain('/api/invitations/[redacted]/accept');
    expect(urls).toContain('/reset-password?token=[redacted]');
    expect(urls).toContain('/api/ingest/readings');
    expect(urls).toContain('/api/molds');
  });

  it('holds none of the passwords, session tokens, cookies, invitation, reset or thermometer tokens', () => {
    expect(secrets.size).toBeGreaterThan(8);
    for (const [value, what] of secrets) {
      const leaking = lines.filter((l) => l.includes(value));
      expect(leaking, `${what} appears in ${leaking.length} log line(s): ${leaking[0]?.slice(0, 300)}`).toEqual([]);
    }
  });

  it('replaces every credential header, in both directions, by a marker', () => {
    const seen = new Set<string>();
    for (const line of lines) {
      const entry = JSON.parse(line) as { req?: { headers?: Record<string, unknown> }; res?: { headers?: Record<string, unknown> } };
      const headers: Record<string, unknown> = {
        ...entry.req?.headers,
        ...(entry.res?.headers?.['set-cookie'] ? { 'set-cookie': entry.res.headers['set-cookie'] } : {}),
      };
      for (const name of ['authorization', 'cookie', 'x-gelpoint-csrf', 'x-gelpoint-ingest-token', 'set-cookie']) {
        if (headers[name] === undefined) continue;
        seen.add(name);
        expect(headers[name], `${name} in ${line.slice(0, 200)}`).toBe('[redacted]');
      }
    }
    expect([...seen].sort()).toEqual(['authorization', 'cookie', 'set-cookie', 'x-gelpoint-csrf', 'x-gelpoint-ingest-token']);
  });
});

describe('withoutTokens', () => {
  it('keeps the route readable and hides only the tokens', () => {
    expect(withoutTokens('/api/invitations/abc_DEF-123/accept')).toBe('/api/invitations/[redacted]/accept');
    expect(withoutTokens('/API/Invitations/abc')).toBe('/API/Invitations/[redacted]');
    expect(withoutTokens('/reset-password?token=xyz&from=mail')).toBe('/reset-password?token=[redacted]&from=mail');
    expect(withoutTokens('/api/shop/invitations/7f0c2a4e-1d2b-4c3d-8e9f-001122334455')).toBe('/api/shop/invitations/7f0c2a4e-1d2b-4c3d-8e9f-001122334455');
    expect(withoutTokens('/api/pieces?page=2')).toBe('/api/pieces?page=2');
  });
});
