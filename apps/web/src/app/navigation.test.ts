import { matchRoutes } from 'react-router';
import { describe, expect, it } from 'vitest';
import { paths } from '../config/paths';
import { navigationFor } from './navigation';

describe('navigationFor', () => {
  it('shows a lead every area, team, audit and settings included', () => {
    expect(navigationFor('lead').map((item) => item.label)).toEqual([
      'Today',
      'Pieces',
      'Moulds',
      'Pour plans',
      'Cure board',
      'Shelf',
      'Team',
      'Audit',
      'Shop settings',
    ]);
  });

  it.each(['maker', 'apprentice'] as const)('keeps the lead-only areas out of the %s menu', (role) => {
    const keys = navigationFor(role).map((item) => item.key);
    expect(keys).toEqual(['today', 'pieces', 'moulds', 'pourPlans', 'cureBoard', 'shelf']);
  });

  // Reference: React Router's matcher; every menu entry must land on a route pattern of its own.
  it('points every entry at a known page', () => {
    const routes = Object.entries(paths).map(([id, entry]) => ({ id, path: entry.path }));
    for (const item of navigationFor('lead')) {
      const [match] = matchRoutes(routes, item.href) ?? [];
      expect(match?.route.id).toBe(item.key);
    }
  });
});
