import { onlineManager } from '@tanstack/react-query';

export interface ConnectionWatchOptions {
  /** True when the server answered at all (any status): the connection is back. */
  reachServer: () => Promise<boolean>;
  probeEveryMs: number;
  /** The query library's idea of the connection, which the outbox and the offline notice follow. */
  online?: Pick<typeof onlineManager, 'isOnline' | 'setOnline' | 'subscribe'>;
}

export interface ConnectionWatch {
  /** A request found no server: the phone is offline, whatever the browser's online flag says. */
  unreachable: () => void;
  stop: () => void;
}

/**
 * The browser's online flag only knows whether a network is joined (WHATWG HTML, "navigator.onLine": true unless the
 * browser knows it cannot reach the network), so a phone on shop Wi-Fi with no way out reads as online. A request
 * that does not reach the server is the surer sign: from then on the app counts itself offline and asks the server
 * every little while, until it answers or the browser reports the network back.
 */
export function createConnectionWatch({ reachServer, probeEveryMs, online = onlineManager }: ConnectionWatchOptions): ConnectionWatch {
  let timer: ReturnType<typeof setTimeout> | undefined;
  let unsubscribe: (() => void) | undefined;

  const stopProbing = () => {
    if (timer) clearTimeout(timer);
    timer = undefined;
    unsubscribe?.();
    unsubscribe = undefined;
  };

  const probe = async () => {
    timer = undefined;
    let reached: boolean;
    try {
      reached = await reachServer();
    } catch {
      reached = false;
    }
    if (!unsubscribe) return;
    if (reached) {
      stopProbing();
      online.setOnline(true);
    } else {
      timer = setTimeout(() => void probe(), probeEveryMs);
    }
  };

  return {
    unreachable: () => {
      if (online.isOnline()) online.setOnline(false);
      if (unsubscribe) return;
      // The browser's own "online" event ends the watch as well as a probe that got through.
      unsubscribe = online.subscribe((isOnline) => {
        if (isOnline) stopProbing();
      });
      timer = setTimeout(() => void probe(), probeEveryMs);
    },
    stop: stopProbing,
  };
}
