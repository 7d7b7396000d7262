import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { z } from 'zod';
import { databaseUrl } from '@gelpoint/db';

const Env = z.object({
  DATABASE_URL: z
    .string()
    .regex(/^postgres(ql)?:\/\//, 'DATABASE_URL must be a postgres:// URL')
    .optional(),
  // Read by the password hashing in packages/db; checked here so a bad value stops the boot, not a sign-in.
  GELPOINT_SCRYPT_LOG_N: z.coerce.number().int().min(10, 'GELPOINT_SCRYPT_LOG_N must be 10 to 20').max(20, 'GELPOINT_SCRYPT_LOG_N must be 10 to 20').optional(),
  GELPOINT_HOST: z.string().default('127.0.0.1'),
  GELPOINT_API_PORT: z.coerce.number().int().min(0).max(65535).default(8080),
  GELPOINT_PUBLIC_URL: z.url().optional(),
  GELPOINT_JWT_SECRET: z.string().min(32, 'GELPOINT_JWT_SECRET must be at least 32 characters').optional(),
  GELPOINT_DATA_DIR: z.string().optional(),
  GELPOINT_SESSION_HOURS: z.coerce
    .number()
    .positive()
    .max(24 * 90)
    .default(24 * 7),
  GELPOINT_INVITATION_DAYS: z.coerce.number().positive().max(60).default(7),
  GELPOINT_RESET_MINUTES: z.coerce
    .number()
    .positive()
    .max(24 * 60)
    .default(60),
  GELPOINT_LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  GELPOINT_WEB_DIST: z.string().optional(),
  GELPOINT_AUTH_RATE_PER_15MIN: z.coerce.number().int().positive().default(30),
  GELPOINT_TRUST_PROXY: z.string().default('loopback'),
  GELPOINT_MAX_STL_MB: z.coerce.number().positive().max(1024).default(100),
  GELPOINT_MAX_STL_TRIANGLES: z.coerce.number().int().positive().max(20_000_000).default(5_000_000),
  GELPOINT_MAX_UNPACKED_MB: z.coerce.number().positive().max(4096).default(512),
  GELPOINT_UPLOADS_PER_HOUR: z.coerce.number().int().positive().default(60),
  GELPOINT_UPLOAD_QUOTA_MB: z.coerce.number().positive().default(1024),
  GELPOINT_SHUTDOWN_GRACE_S: z.coerce.number().positive().max(600).default(25),
  GELPOINT_EVENTS_HEARTBEAT_S: z.coerce.number().positive().max(300).default(15),
  GELPOINT_ANALYSE_ON_UPLOAD: z.enum(['true', 'false'], 'GELPOINT_ANALYSE_ON_UPLOAD must be true or false').default('true'),
});

export interface Config {
  host: string;
  port: number;
  publicUrl: string;
  jwtSecret: string;
  databaseUrl: string;
  sessionHours: number;
  invitationDays: number;
  resetMinutes: number;
  logLevel: z.infer<typeof Env>['GELPOINT_LOG_LEVEL'];
  webDist: string;
  authRatePer15Min: number;
  trustProxy: string;
  maxStlTriangles: number;
  maxStlBytes: number;
  /** Most bytes a 3MF's model part may unpack to (a zip-bomb guard); all parts together may take a quarter more. */
  maxUnpackedBytes: number;
  /** Moulds, cure-check photos and log imports each member may send per hour. */
  uploadsPerHour: number;
  /** What each member's stored files (STL and photos) may add up to. */
  uploadQuotaBytes: number;
  /** On SIGTERM, how long requests already under way may take to finish before their connections are cut. */
  shutdownGraceMs: number;
  /** How often an event stream with nothing to say sends a comment, so proxies and browsers keep it open. */
  eventsHeartbeatMs: number;
  /** Analyse an upload in the checking thread while it is stored; false leaves every analysis to the workers. */
  analyseOnUpload: boolean;
}

function jwtSecretFrom(env: z.infer<typeof Env>): string {
  if (env.GELPOINT_JWT_SECRET) return env.GELPOINT_JWT_SECRET;
  if (env.GELPOINT_DATA_DIR) {
    try {
      const s = readFileSync(`${env.GELPOINT_DATA_DIR}/jwt-secret`, 'utf8').trim();
      if (s.length >= 32) return s;
    } catch {
      // fall through to the message below
    }
  }
  throw new Error('no JWT secret: set GELPOINT_JWT_SECRET (32+ characters) or start through npm start, which generates one');
}

/** Typed configuration, validated once at boot; a bad value stops the process with a sentence. */
export function loadConfig(raw: NodeJS.ProcessEnv = process.env): Config {
  const parsed = Env.safeParse(raw);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
    throw new Error(`bad configuration — ${lines.join('; ')}`);
  }
  const env = parsed.data;
  return {
    host: env.GELPOINT_HOST,
    port: env.GELPOINT_API_PORT,
    publicUrl: (env.GELPOINT_PUBLIC_URL ?? `http://${env.GELPOINT_HOST}:${env.GELPOINT_API_PORT}`).replace(/\/$/, ''),
    jwtSecret: jwtSecretFrom(env),
    databaseUrl: databaseUrl(raw),
    sessionHours: env.GELPOINT_SESSION_HOURS,
    invitationDays: env.GELPOINT_INVITATION_DAYS,
    resetMinutes: env.GELPOINT_RESET_MINUTES,
    logLevel: env.GELPOINT_LOG_LEVEL,
    webDist: env.GELPOINT_WEB_DIST ?? fileURLToPath(new URL('../../web/dist/', import.meta.url)),
    authRatePer15Min: env.GELPOINT_AUTH_RATE_PER_15MIN,
    trustProxy: env.GELPOINT_TRUST_PROXY,
    maxStlTriangles: env.GELPOINT_MAX_STL_TRIANGLES,
    maxStlBytes: Math.round(env.GELPOINT_MAX_STL_MB * 1024 * 1024),
    maxUnpackedBytes: Math.round(env.GELPOINT_MAX_UNPACKED_MB * 1024 * 1024),
    uploadsPerHour: env.GELPOINT_UPLOADS_PER_HOUR,
    uploadQuotaBytes: Math.round(env.GELPOINT_UPLOAD_QUOTA_MB * 1024 * 1024),
    shutdownGraceMs: Math.round(env.GELPOINT_SHUTDOWN_GRACE_S * 1000),
    eventsHeartbeatMs: Math.round(env.GELPOINT_EVENTS_HEARTBEAT_S * 1000),
    analyseOnUpload: env.GELPOINT_ANALYSE_ON_UPLOAD === 'true',
  };
}
