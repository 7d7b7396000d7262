import { env } from '../../config/env';
import { createConnectionWatch } from './connection-watch';

/** Often enough that a phone back on the Wi-Fi sends what waits within seconds; rare enough to cost nothing. */
const probeEveryMs = 5_000;

/** The app's one watch on the connection; the API client tells it when a request found no server. */
export const connection = createConnectionWatch({
  reachServer: async () => {
    await fetch(`${env.apiBasePath}/health`, { cache: 'no-store', credentials: 'omit' });
    return true;
  },
  probeEveryMs,
});
