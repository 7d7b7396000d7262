import { describe, expect, it } from 'vitest';
import { useHarness } from '../test-support/harness';

const h = useHarness({ GELPOINT_WEB_DIST: '/nonexistent-gelpoint-dist' });

describe('HTTP edge', () => {
  it('reports health with the database state', async () => {
    const res = await h.http().get('/api/health').expect(200);
    expect(res.body).toMatchObject({ status: 'ok', database: 'up' });
  });

  it('sends strict security headers on API and page responses', async () => {
    for (const path of ['/api/health', '/some/page']) {
      const res = await h.http().get(path);
      const csp = String(res.headers['content-security-policy']);
      expect(csp).toContain("script-src 'self'");
      expect(csp).not.toContain('unsafe-inline');
      expect(csp).toContain("frame-ancestors 'none'");
      expect(res.headers['x-content-type-options']).toBe('nosniff');
      expect(res.headers['referrer-policy']).toBe('no-referrer');
      expect(res.headers['cross-origin-opener-policy']).toBe('same-origin');
      expect(res.headers['x-powered-by']).toBeUndefined();
    }
  });

  it('answers an unknown API route with a JSON 404', async () => {
    const res = await h.http().get('/api/nope').expect(404);
    expect(res.body.error.code).toBe('no_such_route');
  });

  it('refuses a body over the limit with 413', async () => {
    const res = await h
      .http()
      .post('/api/auth/login')
      .send({ email: 'a@b.test', password: 'x'.repeat(200_000) })
      .expect(413);
    expect(res.body.error.code).toBe('body_too_large');
  });

  it('says plainly when the web app is not built', async () => {
    const res = await h.http().get('/pieces').expect(404);
    expect(res.text).toMatch(/not built/);
  });

  it('publishes an OpenAPI document naming every route', async () => {
    const doc = (await h.http().get('/api/openapi.json').expect(200)).body;
    expect(doc.openapi).toBe('3.0.3');
    for (const r of h.app.registry.routes) {
      const path = r.fullPath.replace(/:([A-Za-z]+)/g, '{$1}');
      expect(doc.paths[path]?.[r.method], `${r.method} ${path}`).toBeDefined();
    }
    const login = doc.paths['/api/auth/login'].post;
    expect(login.requestBody.content['application/json'].schema.required).toEqual(expect.arrayContaining(['email', 'password']));
    expect(doc.paths['/api/pieces/{id}'].get.parameters[0]).toMatchObject({ name: 'id', in: 'path', required: true });
  });
});
