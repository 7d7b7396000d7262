import { describe, expect, it } from 'vitest';
import { createShop, PASSWORD, useHarness } from '../../test-support/harness';

// OWASP ASVS 3.3.1: a session cookie served over TLS carries Secure; over plain loopback (npm start) it
// cannot, or the browser would drop it.
const overTls = useHarness({ GELPOINT_PUBLIC_URL: 'https://gelpoint.example' });
const onLoopback = useHarness();

describe('the session cookie', () => {
  it('is Secure, HttpOnly and SameSite when the app is served over https', async () => {
    const shop = await createShop(overTls);
    const login = await overTls.http().post('/api/auth/login').send({ email: shop.lead.user.email, password: PASSWORD }).expect(200);
    const cookie = String(login.headers['set-cookie']);
    expect(cookie).toMatch(/gp_session=[^;]+;/);
    expect(cookie).toMatch(/;\s*Secure/i);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).toMatch(/Path=\//);
  });

  it('leaves Secure off on plain http so the local stack can sign in', async () => {
    const shop = await createShop(onLoopback);
    const login = await onLoopback.http().post('/api/auth/login').send({ email: shop.lead.user.email, password: PASSWORD }).expect(200);
    expect(String(login.headers['set-cookie'])).not.toMatch(/;\s*Secure/i);
  });
});
