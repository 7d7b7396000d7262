import type { MeResponse } from '@gelpoint/contracts';
import type { QueryClient } from '@tanstack/react-query';
import { redirect } from 'react-router';
import { landingPath, paths } from '../config/paths';
import { sessionQueryOptions } from '../features/auth/api/get-session';
import { safeReturnTo } from '../lib/return-to';

/**
 * For signed-in pages: the session, or a trip to sign-in that comes back to this very page. Loaders call it before
 * fetching anything else, so a signed-out visit asks the API only who is signed in.
 */
export async function requireSession(queryClient: QueryClient, request: Request): Promise<MeResponse> {
  const session = await queryClient.ensureQueryData(sessionQueryOptions());
  if (session) return session;
  const url = new URL(request.url);
  throw redirect(paths.signIn.getHref({ returnTo: `${url.pathname}${url.search}` }));
}

/** For sign-in and create-a-shop: someone already signed in goes on to where they were heading. */
export async function skipIfSignedIn(queryClient: QueryClient, request: Request): Promise<null> {
  const session = await queryClient.ensureQueryData(sessionQueryOptions());
  if (!session) return null;
  throw redirect(safeReturnTo(new URL(request.url).searchParams.get('returnTo'), landingPath));
}
