import type { MeResponse } from '@gelpoint/contracts';
import { createContext, useContext, type ReactNode } from 'react';
import { setDisplayTimeZone } from '../lib/display-zone';

const SignedInSessionContext = createContext<MeResponse | null>(null);

/** Inside the app frame there is always a session; pages read it from here instead of checking for null. */
export function SignedInSessionProvider({ session, children }: { session: MeResponse; children: ReactNode }) {
  // Every time on screen is in the shop's zone; set before the pages below format any.
  setDisplayTimeZone(session.shop.timeZone);
  return <SignedInSessionContext.Provider value={session}>{children}</SignedInSessionContext.Provider>;
}

export function useSignedInSession(): MeResponse {
  const session = useContext(SignedInSessionContext);
  if (!session) throw new Error('useSignedInSession is only for pages inside the app frame.');
  return session;
}
