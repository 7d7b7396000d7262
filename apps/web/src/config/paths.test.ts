import { matchPath, matchRoutes } from 'react-router';
import { describe, expect, it } from 'vitest';
import { paths } from './paths';

// Reference: React Router's own matchers (matchPath, and matchRoutes, which also decodes) read back every link we build.
describe('paths', () => {
  it('has one pattern per page', () => {
    const patterns = Object.values(paths).map((entry) => entry.path);
    expect(new Set(patterns).size).toBe(patterns.length);
  });

  it('builds a piece link that its pattern matches, with the id intact', () => {
    const id = '0f8c2a4e-7b1d-4c39-9e55-2d6a1b3c4d5e';
    const match = matchPath(paths.piece.path, paths.piece.getHref(id));
    expect(match?.params.pieceId).toBe(id);
  });

  it('keeps an invitation token intact even with characters a path would misread', () => {
    const token = 'abc/def?ghi#jkl_mno-pqr';
    const [match] = matchRoutes([{ path: paths.acceptInvitation.path }], paths.acceptInvitation.getHref(token)) ?? [];
    expect(match?.params.token).toBe(token);
  });

  it('puts the return page into the sign-in link so the WHATWG URL parser reads it back', () => {
    const returnTo = '/pieces?stage=curing&q=oak & ash';
    const url = new URL(paths.signIn.getHref({ returnTo, notice: 'session-ended' }), 'https://shop.example');
    expect(url.pathname).toBe(paths.signIn.path);
    expect(url.searchParams.get('returnTo')).toBe(returnTo);
    expect(url.searchParams.get('notice')).toBe('session-ended');
  });

  it('leaves defaults out of the pieces link', () => {
    expect(paths.pieces.getHref()).toBe('/pieces');
    expect(paths.pieces.getHref({ page: 1, q: '' })).toBe('/pieces');
    const url = new URL(paths.pieces.getHref({ stage: 'curing', q: 'maple', page: 3 }), 'https://shop.example');
    expect(Object.fromEntries(url.searchParams)).toEqual({ stage: 'curing', q: 'maple', page: '3' });
  });

  it('ranks the new-piece page above a piece id, as the router does', () => {
    const routes = [
      { path: paths.piece.path, id: 'piece' },
      { path: paths.newPiece.path, id: 'new' },
    ];
    expect(matchRoutes(routes, paths.newPiece.getHref())?.[0]?.route.id).toBe('new');
  });

  it('builds every parameterless link so its own pattern matches it', () => {
    const simple = [
      paths.home,
      paths.createShop,
      paths.forgotPassword,
      paths.today,
      paths.newPiece,
      paths.moulds,
      paths.pourPlans,
      paths.cureBoard,
      paths.shelf,
      paths.team,
      paths.shopSettings,
    ];
    for (const entry of simple) {
      expect(matchPath(entry.path, entry.getHref())).not.toBeNull();
    }
  });
});
