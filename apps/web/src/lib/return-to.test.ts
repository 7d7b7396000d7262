import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { safeReturnTo } from './return-to';

const home = '/today';

describe('safeReturnTo', () => {
  it('keeps a path with its search', () => {
    expect(safeReturnTo('/pieces?stage=curing&q=oak', home)).toBe('/pieces?stage=curing&q=oak');
  });

  // RFC 3986 §4.2: "//host/path" is a network-path reference, i.e. another origin.
  it.each([
    '//evil.example/x',
    '/\\evil.example',
    'https://evil.example/',
    'javascript:alert(1)',
    'pieces',
    '',
    '/\t/evil.example',
    '/..//evil.example',
    '/./%2e%2e//evil.example',
  ])('sends %j to the fallback', (candidate) => {
    expect(safeReturnTo(candidate, home)).toBe(home);
  });

  it('treats missing values as the fallback', () => {
    expect(safeReturnTo(null, home)).toBe(home);
    expect(safeReturnTo(undefined, home)).toBe(home);
  });

  // Reference: the WHATWG URL parser (Node's URL). Whatever comes out must resolve to the page's own origin.
  it('never yields a target on another origin, for any string', () => {
    const origin = 'https://shop.example';
    fc.assert(
      fc.property(
        fc.oneof(
          fc.string(),
          fc.webUrl(),
          fc.string().map((s) => `/${s}`),
          fc.string().map((s) => `//${s}`),
          fc.string().map((s) => `/..//${s}`),
        ),
        (candidate) => {
          const target = safeReturnTo(candidate, home);
          expect(new URL(target, origin).origin).toBe(origin);
        },
      ),
      { numRuns: 2000 },
    );
  });
});
