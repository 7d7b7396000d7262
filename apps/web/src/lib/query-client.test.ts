import { describe, expect, it } from 'vitest';
import { ApiError } from './api-error';
import { isSessionExpired, shouldRetry } from './query-client';

describe('shouldRetry', () => {
  it('retries an unreachable server and a 5xx, twice at most', () => {
    const down = new ApiError(0, 'network_unreachable', 'x');
    expect(shouldRetry(0, down)).toBe(true);
    expect(shouldRetry(1, new ApiError(503, 'server_error', 'x'))).toBe(true);
    expect(shouldRetry(2, down)).toBe(false);
  });

  // RFC 9110 §15.5: a 4xx means the client erred; the same request gets the same answer.
  it.each([400, 401, 403, 404, 409, 422])('does not retry %i', (status) => {
    expect(shouldRetry(0, new ApiError(status, 'x', 'x'))).toBe(false);
  });

  it('does not retry a bug in the page', () => {
    expect(shouldRetry(0, new TypeError('x'))).toBe(false);
  });
});

describe('isSessionExpired', () => {
  const unauthenticated = new ApiError(401, 'unauthenticated', 'x');

  it('treats a 401 on a signed-in request as the session running out', () => {
    expect(isSessionExpired(unauthenticated, undefined)).toBe(true);
  });

  it('leaves a 401 on a sign-in attempt to the form', () => {
    expect(isSessionExpired(new ApiError(401, 'invalid_credentials', 'x'), { publicRequest: true })).toBe(false);
  });

  it('ignores other statuses', () => {
    expect(isSessionExpired(new ApiError(403, 'forbidden', 'x'), undefined)).toBe(false);
  });
});
