import { useEffect, useRef } from 'react';
import { useBlocker, type Blocker } from 'react-router';

/**
 * Asks before the page is left with unsaved changes: inside the app through the router's blocker (the page shows
 * its own question), and on reload, close or a typed address through the browser's beforeunload prompt. `allow()`
 * lets the next navigation through, for the one a save makes.
 */
export function useLeaveGuard(unsaved: boolean): { blocker: Blocker; allow: (allowed: boolean) => void } {
  const allowed = useRef(false);
  const blocker = useBlocker(({ currentLocation, nextLocation }) => unsaved && !allowed.current && currentLocation.pathname !== nextLocation.pathname);
  useEffect(() => {
    if (!unsaved) return;
    const ask = (event: BeforeUnloadEvent) => {
      if (allowed.current) return;
      event.preventDefault();
      // Older browsers show the prompt only with returnValue set.
      event.returnValue = '';
    };
    window.addEventListener('beforeunload', ask);
    return () => window.removeEventListener('beforeunload', ask);
  }, [unsaved]);
  return {
    blocker,
    allow: (next: boolean) => {
      allowed.current = next;
    },
  };
}
