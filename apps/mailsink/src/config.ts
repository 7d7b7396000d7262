import { fileURLToPath } from 'node:url';
import { MailSinkError } from './sink-error';

export interface MailSinkConfig {
  host: string;
  smtpPort: number;
  httpPort: number;
  dataDir: string;
}

export const SMTP_PORT_VARIABLE = 'MAILSINK_SMTP_PORT';
export const HTTP_PORT_VARIABLE = 'MAILSINK_HTTP_PORT';

// <repo>/.data/mailsink, wherever the process is started from.
const DEFAULT_DATA_DIR = fileURLToPath(new URL('../../../.data/mailsink', import.meta.url));

export type ConfigResult = { ok: true; config: MailSinkConfig } | { ok: false; error: MailSinkError };

export function readMailSinkConfig(env: NodeJS.ProcessEnv): ConfigResult {
  const smtpPort = readPort(env, SMTP_PORT_VARIABLE, 2525);
  if (!smtpPort.ok) return smtpPort;
  const httpPort = readPort(env, HTTP_PORT_VARIABLE, 8025);
  if (!httpPort.ok) return httpPort;
  return {
    ok: true,
    config: {
      host: nonEmpty(env.MAILSINK_HOST) ?? '127.0.0.1',
      smtpPort: smtpPort.port,
      httpPort: httpPort.port,
      dataDir: nonEmpty(env.MAILSINK_DATA_DIR) ?? DEFAULT_DATA_DIR,
    },
  };
}

function nonEmpty(value: string | undefined): string | undefined {
  const trimmed = value?.trim();
  return trimmed ? trimmed : undefined;
}

type PortResult = { ok: true; port: number } | { ok: false; error: MailSinkError };

function readPort(env: NodeJS.ProcessEnv, variable: string, fallback: number): PortResult {
  const text = nonEmpty(env[variable]);
  if (text === undefined) return { ok: true, port: fallback };
  const port = /^\d+$/.test(text) ? Number(text) : Number.NaN;
  if (Number.isInteger(port) && port >= 0 && port <= 65535) return { ok: true, port };
  return {
    ok: false,
    error: new MailSinkError('INVALID_CONFIG', `${variable} is "${text}", which is not a port — set it to a whole number from 0 to 65535`),
  };
}
