import { describe, expect, it } from 'vitest';
import { readMailSinkConfig } from './config';

describe('readMailSinkConfig', () => {
  it('uses loopback, 2525, 8025 and <repo>/.data/mailsink when nothing is set', () => {
    const read = readMailSinkConfig({});
    expect(read.ok).toBe(true);
    if (!read.ok) return;
    expect(read.config).toMatchObject({ host: '127.0.0.1', smtpPort: 2525, httpPort: 8025 });
    expect(read.config.dataDir.endsWith('/.data/mailsink')).toBe(true);
    expect(read.config.dataDir).not.toContain('apps');
  });

  it('takes every setting from the environment', () => {
    const read = readMailSinkConfig({
      MAILSINK_HOST: '0.0.0.0',
      MAILSINK_SMTP_PORT: '0',
      MAILSINK_HTTP_PORT: '65535',
      MAILSINK_DATA_DIR: '/tmp/sink',
    });
    expect(read).toEqual({ ok: true, config: { host: '0.0.0.0', smtpPort: 0, httpPort: 65535, dataDir: '/tmp/sink' } });
  });

  it.each(['abc', '-1', '65536', '25.5', '2e3'])('refuses MAILSINK_SMTP_PORT=%s with a sentence naming the variable', (value) => {
    const read = readMailSinkConfig({ MAILSINK_SMTP_PORT: value });
    expect(read.ok).toBe(false);
    if (read.ok) return;
    expect(read.error.code).toBe('INVALID_CONFIG');
    expect(read.error.message).toContain(`MAILSINK_SMTP_PORT is "${value}"`);
  });
});
