import { z } from 'zod';
import { databaseUrl } from '@gelpoint/db';

const Env = z.object({
  DATABASE_URL: z
    .string()
    .regex(/^postgres(ql)?:\/\//, 'DATABASE_URL must be a postgres:// URL')
    .optional(),
  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
  SMTP_SECURE: z.enum(['true', 'false']).default('false'),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  GELPOINT_PUBLIC_URL: z.url().default('http://127.0.0.1:8080'),
  GELPOINT_MAIL_FROM: z.string().default('Gelpoint <no-reply@gelpoint.local>'),
  GELPOINT_WORKER_CRON: z.string().default('* * * * *'),
  GELPOINT_MAIL_BATCH: z.coerce.number().int().min(1).max(500).default(50),
  GELPOINT_MAIL_RETRY_BASE_S: z.coerce.number().positive().default(30),
  GELPOINT_MAIL_MAX_ATTEMPTS: z.coerce.number().int().min(1).max(100).default(20),
  GELPOINT_MAIL_LEASE_S: z.coerce.number().int().min(5).default(120),
  GELPOINT_MAX_STL_TRIANGLES: z.coerce.number().int().positive().max(20_000_000).default(5_000_000),
  GELPOINT_MAX_UNPACKED_MB: z.coerce.number().positive().max(4096).default(512),
  GELPOINT_ANALYSIS_LEASE_S: z.coerce.number().int().min(30).default(600),
  GELPOINT_WORKER_JOBS: z
    .string()
    .default('reminders,mail,molds')
    .transform((s) =>
      s
        .split(',')
        .map((x) => x.trim())
        .filter(Boolean),
    )
    .pipe(z.array(z.enum(['reminders', 'mail', 'molds'], { message: 'GELPOINT_WORKER_JOBS lists reminders, mail and/or molds' })).min(1)),
  GELPOINT_LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  GELPOINT_SHUTDOWN_GRACE_S: z.coerce.number().positive().max(600).default(25),
});

export interface WorkerConfig {
  databaseUrl: string;
  smtp: { host: string; port: number; secure: boolean; user?: string; password?: string };
  mailFrom: string;
  /** Which kinds of work this worker takes on (a dedicated analysis worker, say). */
  jobs: ('reminders' | 'mail' | 'molds')[];
  publicUrl: string;
  cron: string;
  mail: { batch: number; retryBaseS: number; maxAttempts: number; leaseS: number };
  /** maxUnpackedBytes: the most a 3MF's model part may unpack to (a zip-bomb guard), as the API reads it. */
  molds: { maxTriangles: number; maxUnpackedBytes: number; leaseS: number; maxAttempts: number };
  logLevel: z.infer<typeof Env>['GELPOINT_LOG_LEVEL'];
  /** On SIGTERM, how long the job under way (a mail send) may take before the process exits anyway. */
  shutdownGraceMs: number;
}

export function loadWorkerConfig(raw: NodeJS.ProcessEnv = process.env): WorkerConfig {
  const r = Env.safeParse(raw);
  if (!r.success) throw new Error(`bad configuration — ${r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ')}`);
  const e = r.data;
  return {
    databaseUrl: databaseUrl(raw),
    smtp: { host: e.SMTP_HOST, port: e.SMTP_PORT, secure: e.SMTP_SECURE === 'true', user: e.SMTP_USER, password: e.SMTP_PASSWORD },
    mailFrom: e.GELPOINT_MAIL_FROM,
    jobs: e.GELPOINT_WORKER_JOBS,
    publicUrl: e.GELPOINT_PUBLIC_URL.replace(/\/$/, ''),
    cron: e.GELPOINT_WORKER_CRON,
    mail: {
      batch: e.GELPOINT_MAIL_BATCH,
      retryBaseS: e.GELPOINT_MAIL_RETRY_BASE_S,
      maxAttempts: e.GELPOINT_MAIL_MAX_ATTEMPTS,
      leaseS: e.GELPOINT_MAIL_LEASE_S,
    },
    molds: {
      maxTriangles: e.GELPOINT_MAX_STL_TRIANGLES,
      maxUnpackedBytes: Math.round(e.GELPOINT_MAX_UNPACKED_MB * 1024 * 1024),
      leaseS: e.GELPOINT_ANALYSIS_LEASE_S,
      maxAttempts: 3,
    },
    logLevel: e.GELPOINT_LOG_LEVEL,
    shutdownGraceMs: Math.round(e.GELPOINT_SHUTDOWN_GRACE_S * 1000),
  };
}
