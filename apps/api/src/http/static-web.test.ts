import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import express from 'express';
import supertest from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { securityHeaders } from './security-headers';
import { staticWeb } from './static-web';

// The installable app's own files, served as a browser must get them: the service worker and the manifest
// revalidated on every check (RFC 9111 §5.2.2.4 no-cache; the Service Workers spec's update check), never immutable
// (RFC 8246), the manifest with its media type (W3C Web Application Manifest, "application/manifest+json"), and a
// Content-Security-Policy that lets the page register the worker and read the manifest (CSP Level 3 worker-src and
// manifest-src).
let dist = '';
let http: () => supertest.Agent;

beforeAll(() => {
  dist = mkdtempSync(join(tmpdir(), 'gelpoint-static-'));
  mkdirSync(join(dist, 'assets'));
  writeFileSync(join(dist, 'index.html'), '<!doctype html><link rel="manifest" href="/manifest.webmanifest"><title>Gelpoint</title>');
  writeFileSync(join(dist, 'sw.js'), 'self.addEventListener("fetch", () => {});');
  writeFileSync(join(dist, 'workbox-835c8c05.js'), 'define([], () => {});');
  writeFileSync(join(dist, 'manifest.webmanifest'), JSON.stringify({ name: 'Gelpoint', start_url: '/today', display: 'standalone' }));
  writeFileSync(join(dist, 'favicon.svg'), '<svg xmlns="http://www.w3.org/2000/svg"/>');
  const app = express();
  app.use(securityHeaders());
  app.use(staticWeb(dist));
  http = () => supertest.agent(app);
});

afterAll(() => rmSync(dist, { recursive: true, force: true }));

describe('serving the installable app', () => {
  it('sends the service worker as JavaScript, revalidated on every check and never immutable', async () => {
    const res = await http().get('/sw.js').expect(200);
    expect(res.headers['content-type']).toMatch(/^(application|text)\/javascript/);
    expect(res.headers['cache-control']).toBe('no-cache');
    expect(res.headers['cache-control']).not.toMatch(/immutable|max-age=[1-9]/);
  });

  it('sends the manifest with its media type, revalidated', async () => {
    const res = await http().get('/manifest.webmanifest').expect(200);
    expect(res.headers['content-type']).toBe('application/manifest+json; charset=utf-8');
    expect(res.headers['cache-control']).toBe('no-cache');
    expect(JSON.parse(res.text)).toMatchObject({ name: 'Gelpoint', display: 'standalone' });
  });

  it('lets the hashed worker runtime be cached for good, and other files for an hour as before', async () => {
    expect((await http().get('/workbox-835c8c05.js').expect(200)).headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect((await http().get('/favicon.svg').expect(200)).headers['cache-control']).toBe('public, max-age=3600');
  });

  it('allows the worker and the manifest from our own origin only', async () => {
    const csp = (await http().get('/today').expect(200)).headers['content-security-policy'] as string;
    const directive = (name: string) =>
      csp
        .split(';')
        .map((d) => d.trim())
        .find((d) => d.startsWith(`${name} `));
    expect(directive('worker-src')?.split(' ')).toContain("'self'");
    expect(directive('manifest-src')).toBe("manifest-src 'self'");
  });
});
