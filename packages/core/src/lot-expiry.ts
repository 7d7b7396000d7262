import { shopLocalDate } from './shop-time';

/**
 * A lot is past its date once the shop's own calendar has moved beyond its expiry date: a lot marked "use by
 * 3 Dec" is good all of 3 Dec in the shop, whatever the date in UTC. `atMs` comes from the caller's clock and
 * `zone` is the shop's IANA zone.
 */
export function lotExpired(expiresOn: string | null, atMs: number, zone: string): boolean {
  return expiresOn !== null && expiresOn < shopLocalDate(atMs, zone);
}
