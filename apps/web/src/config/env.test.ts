import { describe, expect, it } from 'vitest';
import { readEnv } from './env';

describe('readEnv', () => {
  it('defaults the API to /api on the same origin', () => {
    expect(readEnv({})).toEqual({ ok: true, env: { apiBasePath: '/api', mode: 'production' } });
  });

  it('drops a trailing slash so paths join cleanly', () => {
    const result = readEnv({ VITE_API_BASE_PATH: '/gelpoint/api/' });
    expect(result.ok && result.env.apiBasePath).toBe('/gelpoint/api');
  });

  it.each(['http://127.0.0.1:8080/api', '//evil.example/api', 'api', '/api?x=1'])('refuses %s because the browser may only talk to its own origin', (value) => {
    const result = readEnv({ VITE_API_BASE_PATH: value });
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.problem.code).toBe('invalid_env');
      expect(result.problem.message).toMatch(/VITE_API_BASE_PATH/);
    }
  });
});
