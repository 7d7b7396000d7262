import { hashKey, type QueryClient } from '@tanstack/react-query';
import { createContext, useContext, type ReactNode } from 'react';
import { paths } from '../config/paths';
import { authKeys } from '../lib/resources/session';

export interface SessionControl {
  /** After sign-in, registration or joining: go where the person was heading. */
  signedIn(returnTo: string): Promise<void>;
  /** After the shop switch: start again on Today, with the new shop's data. */
  shopSwitched(): Promise<void>;
  /** After an intentional sign-out. */
  signedOut(): Promise<void>;
  /** The API said the session is gone: sign in again and come back here. */
  expired(): void;
}

const publicPaths: readonly string[] = [paths.signIn.path, paths.createShop.path, paths.forgotPassword.path, paths.resetPassword.path];

interface SessionPlace {
  pathname: string;
  search: string;
}

// Only what is used of the router that router.tsx creates (a DataRouter fits it); naming it here, instead of importing
// its type, keeps router.tsx → route modules → this file free of a cycle, and a test's router can be this much.
export interface SessionRouter {
  navigate(href: string, options: { replace: boolean }): Promise<void>;
  state: { location: SessionPlace; navigation: { location?: SessionPlace } };
}

export interface DeviceData {
  /** Deletes what the device keeps of the shop for offline use; `unsent` also what was logged and not sent. */
  forget(options: { unsent: boolean }): Promise<void>;
}

const keepNothing: DeviceData = { forget: async () => undefined };

export function createSessionControl(queryClient: QueryClient, getRouter: () => SessionRouter, device: DeviceData = keepNothing): SessionControl {
  let leaving = false;
  const sessionHash = hashKey(authKeys.session());

  // Forget the person first, so the sign-in page does not bounce back; drop their shop's data once the frame is gone,
  // and the copy kept on the device with it. What was logged offline stays through an expired session (the same
  // person signs in again to send it) and goes with a deliberate sign-out.
  const leave = async (href: string, unsent: boolean) => {
    if (leaving) return;
    leaving = true;
    try {
      queryClient.setQueryData(authKeys.session(), null);
      await getRouter().navigate(href, { replace: true });
      queryClient.removeQueries({ predicate: (query) => query.queryHash !== sessionHash });
      await device.forget({ unsent });
    } finally {
      leaving = false;
    }
  };

  return {
    signedIn: async (returnTo) => {
      await getRouter().navigate(returnTo, { replace: true });
    },
    shopSwitched: async () => {
      await getRouter().navigate(paths.today.getHref(), { replace: true });
    },
    signedOut: () => leave(paths.signIn.getHref({ notice: 'signed-out' }), true),
    expired: () => {
      // Nobody was signed in to begin with: the loaders already send the visitor to sign in.
      if (!queryClient.getQueryData(authKeys.session())) return;
      // Mid-navigation, come back to the page that was being opened rather than the one being left.
      const { navigation, location } = getRouter().state;
      const { pathname, search } = navigation.location ?? location;
      if (publicPaths.includes(pathname) || pathname.startsWith('/invitations/')) return;
      void leave(paths.signIn.getHref({ returnTo: `${pathname}${search}`, notice: 'session-ended' }), false);
    },
  };
}

const SessionControlContext = createContext<SessionControl | null>(null);

export function SessionControlProvider({ control, children }: { control: SessionControl; children: ReactNode }) {
  return <SessionControlContext.Provider value={control}>{children}</SessionControlContext.Provider>;
}

export function useSessionControl(): SessionControl {
  const control = useContext(SessionControlContext);
  if (!control) throw new Error('useSessionControl needs SessionControlProvider above it in the tree.');
  return control;
}
