import jwt from 'jsonwebtoken';
import { describe, expect, it } from 'vitest';
import { PASSWORD, bearer, createShop, uniqueEmail, useHarness } from '../../test-support/harness';

const h = useHarness();

describe('registration and sign-in', () => {
  it('creates a shop with its lead and signs in', async () => {
    const email = uniqueEmail('reg');
    const res = await h
      .http()
      .post('/api/auth/register')
      .send({ shopName: 'Birch Hollow', name: 'Ada', email: email.toUpperCase(), password: PASSWORD })
      .expect(201);
    expect(res.body.role).toBe('lead');
    expect(res.body.user.email).toBe(email);
    expect(res.body.shop).toMatchObject({ name: 'Birch Hollow', unitSystem: 'metric', scaleResolutionG: 0.1 });
    const me = await h.http().get('/api/me').set(bearer(res.body)).expect(200);
    expect(me.body).toMatchObject({ role: 'lead', shop: { id: res.body.shop.id }, shops: [{ shopId: res.body.shop.id, role: 'lead' }] });
  });

  it('refuses a second account with the same e-mail, whatever its case', async () => {
    const email = uniqueEmail('dup');
    await h.http().post('/api/auth/register').send({ shopName: 'One', name: 'A', email, password: PASSWORD }).expect(201);
    const res = await h
      .http()
      .post('/api/auth/register')
      .send({ shopName: 'Two', name: 'B', email: ` ${email.toUpperCase()} `, password: PASSWORD })
      .expect(409);
    expect(res.body.error.code).toBe('email_taken');
    const shops = await h.ds.query(`SELECT count(*)::int AS n FROM shops WHERE name = 'Two'`);
    expect(shops[0].n).toBe(0);
  });

  it('says what is wrong with a bad form, field by field', async () => {
    const res = await h.http().post('/api/auth/register').send({ shopName: '', name: 'A', email: 'not-an-email', password: 'short' }).expect(400);
    expect(res.body.error.code).toBe('invalid_input');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'password', 'shopName']);
    expect(res.body.error.fields.password).toMatch(/at least 8/);
  });

  it('refuses common passwords and ones built from the e-mail (OWASP ASVS 6.2.4)', async () => {
    for (const [password, why] of [
      ['password1', 'commonly used'],
      ['qwertyuiop', 'commonly used'],
      ['sawdust-fan@example.test', 'e-mail'],
    ] as const) {
      const res = await h.http().post('/api/auth/register').send({ shopName: 'S', name: 'N', email: 'sawdust-fan@example.test', password }).expect(400);
      expect(res.body.error.code).toBe('weak_password');
      expect(res.body.error.fields.password).toMatch(why);
    }
  });

  it('answers malformed JSON with a 400, not a 500', async () => {
    const res = await h.http().post('/api/auth/login').set('Content-Type', 'application/json').send('{"email": ').expect(400);
    expect(res.body.error.code).toBe('malformed_json');
  });

  it('gives the same answer for a wrong password and an unknown e-mail', async () => {
    const shop = await createShop(h);
    const wrong = await h.http().post('/api/auth/login').send({ email: shop.lead.user.email, password: 'not the password' }).expect(401);
    const unknown = await h
      .http()
      .post('/api/auth/login')
      .send({ email: uniqueEmail('nobody'), password: 'whatever it is' })
      .expect(401);
    expect(wrong.body).toEqual(unknown.body);
    const ok = await h.http().post('/api/auth/login').send({ email: shop.lead.user.email, password: PASSWORD }).expect(200);
    expect(ok.body.token).toEqual(expect.any(String));
  });
});

describe('tokens', () => {
  it('ends the session for good at sign-out', async () => {
    const shop = await createShop(h);
    await h.http().get('/api/me').set(bearer(shop.lead)).expect(200);
    await h.http().post('/api/auth/logout').set(bearer(shop.lead)).expect(204);
    const res = await h.http().get('/api/me').set(bearer(shop.lead)).expect(401);
    expect(res.body.error.code).toBe('signed_out');
  });

  it('refuses unsigned, tampered, foreign-key and expired tokens', async () => {
    const shop = await createShop(h);
    const claims = jwt.decode(shop.lead.token) as jwt.JwtPayload;
    const b64 = (o: object) => Buffer.from(JSON.stringify(o)).toString('base64url');
    const unsigned = `${b64({ alg: 'none', typ: 'JWT' })}.${b64(claims)}.`;
    const [head, , sig] = shop.lead.token.split('.');
    const tampered = `${head}.${b64({ ...claims, sub: '00000000-0000-4000-8000-000000000000' })}.${sig}`;
    const foreign = jwt.sign({ sid: claims.sid }, 'some-other-secret-entirely-0123456789abcdef', {
      subject: claims.sub,
      issuer: 'gelpoint',
      audience: 'gelpoint-api',
    });
    const expired = jwt.sign({ sid: claims.sid, exp: Math.floor(Date.now() / 1000) - 60 }, h.config.jwtSecret, {
      subject: claims.sub,
      issuer: 'gelpoint',
      audience: 'gelpoint-api',
    });
    for (const [token, code] of [
      [unsigned, 'bad_token'],
      [tampered, 'bad_token'],
      [foreign, 'bad_token'],
      [expired, 'session_expired'],
    ] as const) {
      const res = await h
        .http()
        .get('/api/me')
        .set({ Authorization: `Bearer ${token}` })
        .expect(401);
      expect(res.body.error.code).toBe(code);
    }
    await h.http().get('/api/me').set({ Authorization: 'Basic abc' }).expect(401);
  });

  it('keeps the web session in an HttpOnly cookie and asks cookie-driven changes for the CSRF header', async () => {
    const shop = await createShop(h);
    const agent = h.http();
    const login = await agent.post('/api/auth/login').send({ email: shop.lead.user.email, password: PASSWORD }).expect(200);
    const cookie = String(login.headers['set-cookie']);
    expect(cookie).toMatch(/gp_session=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    await agent.get('/api/me').expect(200);
    const refused = await agent.patch('/api/shop').send({ name: 'Renamed' }).expect(403);
    expect(refused.body.error.code).toBe('csrf_header_missing');
    await agent.patch('/api/shop').set('X-Gelpoint-Csrf', '1').send({ name: 'Renamed' }).expect(200);
    const foreign = await agent.patch('/api/shop').set('X-Gelpoint-Csrf', '1').set('Origin', 'https://evil.example').send({ name: 'Evil' }).expect(403);
    expect(foreign.body.error.code).toBe('cross_site_request');
    await agent.post('/api/auth/logout').set('X-Gelpoint-Csrf', '1').expect(204);
    await agent.get('/api/me').expect(401);
  });

  it('lets a member of two shops switch between them', async () => {
    const a = await createShop(h, 'Shop A');
    const b = await createShop(h, 'Shop B');
    const email = uniqueEmail('both');
    // The lead of B invites the lead of A as a maker.
    await h.http().post('/api/shop/invitations').set(bearer(b.lead)).send({ email: a.lead.user.email, role: 'maker' }).expect(201);
    const rows = await h.ds.query(`SELECT body_text FROM outbound_mail WHERE to_address = $1 ORDER BY created_at DESC LIMIT 1`, [a.lead.user.email]);
    const token = /\/invitations\/([A-Za-z0-9_-]+)/.exec(rows[0].body_text)![1];
    const preview = await h.http().get(`/api/invitations/${token}`).expect(200);
    expect(preview.body).toMatchObject({ shopName: 'Shop B', role: 'maker', accountExists: true });
    await h.http().post(`/api/invitations/${token}/accept`).send({ password: 'wrong password' }).expect(401);
    await h.http().post(`/api/invitations/${token}/accept`).send({ password: PASSWORD }).expect(200);
    const me = await h.http().get('/api/me').set(bearer(a.lead)).expect(200);
    expect(me.body.shops.map((s: { shopName: string }) => s.shopName).sort()).toEqual(['Shop A', 'Shop B']);
    const switched = await h.http().post('/api/auth/switch-shop').set(bearer(a.lead)).send({ shopId: b.shopId }).expect(200);
    expect(switched.body).toMatchObject({ role: 'maker', shop: { id: b.shopId } });
    await h.http().get('/api/me').set(bearer(a.lead)).expect(401);
    const other = await createShop(h, 'Not yours');
    await h.http().post('/api/auth/switch-shop').set(bearer(switched.body)).send({ shopId: other.shopId }).expect(403);
    expect(email).toContain('@');
  });
});

describe('password reset', () => {
  it('mails a one-time link that sets a new password and signs out everywhere', async () => {
    const shop = await createShop(h);
    const email = shop.lead.user.email;
    const res = await h.http().post('/api/auth/password-reset').send({ email }).expect(202);
    const unknown = await h
      .http()
      .post('/api/auth/password-reset')
      .send({ email: uniqueEmail('ghost') })
      .expect(202);
    expect(unknown.body).toEqual(res.body);
    const rows = await h.ds.query(`SELECT body_text, subject, message_id FROM outbound_mail WHERE to_address = $1`, [email]);
    expect(rows).toHaveLength(1);
    expect(rows[0].message_id).toMatch(/^<[0-9a-f-]+@127\.0\.0\.1>$/);
    const token = /reset-password\?token=([A-Za-z0-9_-]+)/.exec(rows[0].body_text)![1]!;
    await h.http().post('/api/auth/password-reset/confirm').send({ token, password: 'short' }).expect(400);
    await h.http().post('/api/auth/password-reset/confirm').send({ token, password: 'a brand new secret' }).expect(204);
    await h.http().get('/api/me').set(bearer(shop.lead)).expect(401);
    await h.http().post('/api/auth/login').send({ email, password: PASSWORD }).expect(401);
    await h.http().post('/api/auth/login').send({ email, password: 'a brand new secret' }).expect(200);
    const again = await h.http().post('/api/auth/password-reset/confirm').send({ token, password: 'yet another secret' }).expect(410);
    expect(again.body.error.code).toBe('reset_used');
  });

  it('refuses an expired link', async () => {
    const shop = await createShop(h);
    await h.http().post('/api/auth/password-reset').send({ email: shop.lead.user.email }).expect(202);
    await h.ds.query(`UPDATE password_resets SET expires_at = now() - interval '1 minute' WHERE user_id = $1`, [shop.lead.user.id]);
    const rows = await h.ds.query(`SELECT body_text FROM outbound_mail WHERE to_address = $1`, [shop.lead.user.email]);
    const token = /reset-password\?token=([A-Za-z0-9_-]+)/.exec(rows[0].body_text)![1];
    const res = await h.http().post('/api/auth/password-reset/confirm').send({ token, password: 'a brand new secret' }).expect(410);
    expect(res.body.error.code).toBe('reset_expired');
  });
});
