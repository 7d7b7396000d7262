const probeOrigin = 'https://gelpoint.invalid';

/**
 * Accepts a page to come back to after signing in only when it stays on this site: a path such as
 * `/pieces?stage=curing`. Anything that could leave the origin (`//host`, `https:`, `\\host`, `javascript:`) is
 * replaced by the fallback, so a crafted sign-in link cannot send someone elsewhere.
 */
export function safeReturnTo(candidate: string | null | undefined, fallback: string): string {
  if (!candidate || !candidate.startsWith('/') || candidate.startsWith('//') || candidate.startsWith('/\\')) return fallback;
  // Control characters (C0 and DEL) in a path can split a header or hide a scheme from a later reader.
  // eslint-disable-next-line no-control-regex
  if (/[\u0000-\u001f\u007f]/.test(candidate)) return fallback;
  let url: URL;
  try {
    url = new URL(candidate, probeOrigin);
  } catch {
    return fallback;
  }
  if (url.origin !== probeOrigin) return fallback;
  const target = `${url.pathname}${url.search}${url.hash}`;
  // Dot segments can collapse into a network-path reference: "/..//host" normalises to "//host".
  if (target.startsWith('//')) return fallback;
  return target;
}
