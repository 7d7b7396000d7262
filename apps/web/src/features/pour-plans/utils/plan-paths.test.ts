import { matchRoutes } from 'react-router';
import { describe, expect, it } from 'vitest';
import { paths } from '../../../config/paths';

const id = '0f8c2a4e-7b1d-4c39-9e55-2d6a1b3c4d5e';

// Reference: React Router's own matcher, ranking the patterns as the router does.
describe('pour plan and shelf paths', () => {
  const routes = Object.entries(paths).map(([name, entry]) => ({ id: name, path: entry.path }));
  const pageOf = (href: string) => matchRoutes(routes, href)?.[0];

  it.each([
    [paths.newPourPlan.getHref(id), 'newPourPlan'],
    [paths.pourPlan.getHref(id), 'pourPlan'],
    [paths.editPourPlan.getHref(id), 'editPourPlan'],
    [paths.runSheet.getHref(id), 'runSheet'],
    [paths.newResinSystem.getHref(), 'newResinSystem'],
    [paths.resinSystem.getHref(id), 'resinSystem'],
    [paths.newPigment.getHref(), 'newPigment'],
    [paths.pigment.getHref(id), 'pigment'],
    [paths.newLot.getHref(), 'newLot'],
    [paths.lot.getHref(id), 'lot'],
  ])('sends %s to its own page', (href, name) => {
    expect(pageOf(href)?.route.id).toBe(name);
  });

  it('keeps the ids intact', () => {
    expect(pageOf(paths.runSheet.getHref(id))?.params.planId).toBe(id);
    expect(pageOf(paths.newPourPlan.getHref(id))?.params.pieceId).toBe(id);
  });

  it('leaves defaults out of the list links', () => {
    expect(paths.pourPlans.getHref({ page: 1 })).toBe('/pour-plans');
    expect(paths.shelf.getHref({ tab: 'resin-systems', page: 1, dir: 'descending' })).toBe('/shelf');
  });
});
