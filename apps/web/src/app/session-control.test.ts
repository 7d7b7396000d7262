import { QueryClient } from '@tanstack/react-query';
import { describe, expect, it } from 'vitest';
import { authKeys } from '../lib/resources/session';
import { createSessionControl, type SessionRouter } from './session-control';

interface FakeLocation {
  pathname: string;
  search: string;
}

/** Just enough of the router: where it is, where it is going, and a record of what it was told. */
function fakeRouter(location: FakeLocation, heading?: FakeLocation) {
  const moves: Array<{ href: string; sessionAtMove: unknown; piecesAtMove: unknown }> = [];
  let queryClient: QueryClient | undefined;
  const router: SessionRouter = {
    state: { location, navigation: { location: heading } },
    navigate: async (href: string) => {
      moves.push({
        href,
        sessionAtMove: queryClient?.getQueryData(authKeys.session()),
        piecesAtMove: queryClient?.getQueryData(['pieces', 'list']),
      });
    },
  };
  return { router, moves, attach: (client: QueryClient) => (queryClient = client) };
}

const someone = { user: { id: 'u', name: 'Ana', email: 'ana@example.com' } };

describe('createSessionControl', () => {
  it('on sign-out forgets the person before moving, and their shop data after', async () => {
    const queryClient = new QueryClient();
    const { router, moves, attach } = fakeRouter({ pathname: '/pieces', search: '' });
    attach(queryClient);
    queryClient.setQueryData(authKeys.session(), someone);
    queryClient.setQueryData(['pieces', 'list'], { items: [], total: 0 });

    await createSessionControl(queryClient, () => router).signedOut();

    expect(moves).toEqual([{ href: '/sign-in?notice=signed-out', sessionAtMove: null, piecesAtMove: { items: [], total: 0 } }]);
    expect(queryClient.getQueryData(['pieces', 'list'])).toBeUndefined();
    expect(queryClient.getQueryData(authKeys.session())).toBeNull();
  });

  it('forgets the device’s offline copy on sign-out and on expiry, and what was not sent only on sign-out', async () => {
    const forgotten: boolean[] = [];
    const device = { forget: async ({ unsent }: { unsent: boolean }) => void forgotten.push(unsent) };
    const queryClient = new QueryClient();
    const { router } = fakeRouter({ pathname: '/pours/p', search: '' });
    queryClient.setQueryData(authKeys.session(), someone);
    await createSessionControl(queryClient, () => router, device).signedOut();
    queryClient.setQueryData(authKeys.session(), someone);
    createSessionControl(queryClient, () => router, device).expired();
    await new Promise((resolve) => setTimeout(resolve, 0));
    expect(forgotten).toEqual([true, false]);
  });

  it('on expiry comes back to the page being opened, not the one being left', async () => {
    const queryClient = new QueryClient();
    const { router, moves } = fakeRouter({ pathname: '/pieces', search: '' }, { pathname: '/pieces', search: '?page=2' });
    queryClient.setQueryData(authKeys.session(), someone);

    createSessionControl(queryClient, () => router).expired();
    await Promise.resolve();

    expect(moves.map((move) => move.href)).toEqual(['/sign-in?returnTo=%2Fpieces%3Fpage%3D2&notice=session-ended']);
  });

  it('does nothing on expiry when nobody was signed in, since the loaders send visitors to sign in', () => {
    const queryClient = new QueryClient();
    const { router, moves } = fakeRouter({ pathname: '/pieces', search: '' });
    queryClient.setQueryData(authKeys.session(), null);
    createSessionControl(queryClient, () => router).expired();
    expect(moves).toEqual([]);
  });

  it('does nothing on expiry on a public page', () => {
    const queryClient = new QueryClient();
    const { router, moves } = fakeRouter({ pathname: '/invitations/abc', search: '' });
    queryClient.setQueryData(authKeys.session(), someone);
    createSessionControl(queryClient, () => router).expired();
    expect(moves).toEqual([]);
  });

  it('moves only once when several requests find the session gone together', async () => {
    const queryClient = new QueryClient();
    const { router, moves } = fakeRouter({ pathname: '/team', search: '' });
    queryClient.setQueryData(authKeys.session(), someone);
    const control = createSessionControl(queryClient, () => router);
    control.expired();
    control.expired();
    await new Promise((resolve) => setTimeout(resolve, 0));
    expect(moves).toHaveLength(1);
  });
});
