import { matchRoutes } from 'react-router';
import { describe, expect, it } from 'vitest';
import { paths } from '../config/paths';
import { navigationFor } from './navigation';

const roles = ['lead', 'maker', 'apprentice'] as const;

// The areas the server keeps to a shop's lead: the team (GET /shop/invitations, access ['lead'] in
// apps/api/src/modules/team/team.routes.ts), the audit (GET /audit, apps/api/src/modules/audit/audit.routes.ts) and the
// shop's settings (PATCH /shop, apps/api/src/modules/shop/shop.routes.ts). A member who opened one would only be refused.
const leadOnlyHrefs = [paths.team.getHref(), paths.audit.getHref(), paths.shopSettings.getHref()];

describe('navigationFor', () => {
  it('offers a maker and an apprentice every area but the lead-only ones, and a lead all of them', () => {
    const lead = navigationFor('lead').map((item) => item.href);
    expect(lead).toEqual(expect.arrayContaining(leadOnlyHrefs));
    for (const role of ['maker', 'apprentice'] as const) {
      expect(navigationFor(role).map((item) => item.href)).toEqual(lead.filter((href) => !leadOnlyHrefs.includes(href)));
    }
  });

  it.each(roles)('gives the %s one entry a page, each with its own name', (role) => {
    const menu = navigationFor(role);
    expect(menu.length).toBeGreaterThan(0);
    expect(new Set(menu.map((item) => item.href)).size).toBe(menu.length);
    expect(new Set(menu.map((item) => item.label)).size).toBe(menu.length);
    for (const item of menu) expect(item.label.trim()).not.toBe('');
  });

  // Reference: React Router's matcher; every menu entry must land on a route pattern of its own.
  it.each(roles)('points every entry of the %s menu at a known page', (role) => {
    const routes = Object.entries(paths).map(([id, entry]) => ({ id, path: entry.path }));
    for (const item of navigationFor(role)) {
      const [match] = matchRoutes(routes, item.href) ?? [];
      expect(match?.route.id).toBe(item.key);
    }
  });

  it('starts every menu on the day’s work', () => {
    for (const role of roles) expect(navigationFor(role)[0]?.href).toBe(paths.today.getHref());
  });
});
