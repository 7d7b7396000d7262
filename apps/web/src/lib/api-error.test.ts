import { describe, expect, it } from 'vitest';
import { errorFromResponse } from './api-error';

describe('errorFromResponse', () => {
  it('keeps the API error body as it is', () => {
    const error = errorFromResponse(401, JSON.stringify({ error: { code: 'invalid_credentials', message: 'That e-mail and password do not match.' } }));
    expect(error).toMatchObject({ status: 401, code: 'invalid_credentials', message: 'That e-mail and password do not match.', fields: {} });
  });

  it('falls back to a sentence about the status when the body is not ours (a proxy page)', () => {
    const error = errorFromResponse(403, '<html><body>Forbidden</body></html>');
    expect(error.code).toBe('forbidden');
    expect(error.message).toMatch(/role can't do this/);
  });

  // RFC 9110 §15.6: the 5xx class means the server failed; the person can only retry later.
  it.each([500, 502, 503, 504])('names status %i in the message for a 5xx without a body', (status) => {
    const error = errorFromResponse(status, '');
    expect(error.code).toBe('server_error');
    expect(error.message).toContain(String(status));
  });

  it('ignores a body that has an error key of the wrong shape', () => {
    const error = errorFromResponse(400, JSON.stringify({ error: 'nope' }));
    expect(error.code).toBe('bad_request');
  });

  it('gives an unknown 4xx its own code', () => {
    expect(errorFromResponse(418, '').code).toBe('http_418');
  });
});
