import { z } from 'zod';

// Only same-origin API paths: the API's Content-Security-Policy allows `connect-src 'self'` and nothing else.
const ApiBasePath = z
  .string()
  .trim()
  .regex(/^\/(?!\/)[A-Za-z0-9/_-]*$/, {
    message: 'VITE_API_BASE_PATH must be a same-origin path such as /api (starting with one slash, no host)',
  })
  .transform((path) => (path.length > 1 ? path.replace(/\/+$/, '') : path));

const RawEnv = z.object({
  VITE_API_BASE_PATH: ApiBasePath.default('/api'),
  MODE: z.string().default('production'),
});

export interface WebEnv {
  apiBasePath: string;
  mode: string;
}

export interface EnvProblem {
  code: 'invalid_env';
  message: string;
}

export type EnvResult = { ok: true; env: WebEnv } | { ok: false; problem: EnvProblem };

export function readEnv(raw: Record<string, unknown>): EnvResult {
  const parsed = RawEnv.safeParse(raw);
  if (!parsed.success) {
    const detail = parsed.error.issues.map((issue) => issue.message).join('; ');
    return {
      ok: false,
      problem: { code: 'invalid_env', message: `The web app was built with a bad setting: ${detail}. Fix it and build again.` },
    };
  }
  return { ok: true, env: { apiBasePath: parsed.data.VITE_API_BASE_PATH, mode: parsed.data.MODE } };
}

export class EnvError extends Error {
  override readonly name = 'EnvError';
  readonly code: EnvProblem['code'];

  constructor(problem: EnvProblem) {
    super(problem.message);
    this.code = problem.code;
  }
}

function loadEnv(): WebEnv {
  const result = readEnv(import.meta.env);
  if (!result.ok) throw new EnvError(result.problem);
  return result.env;
}

export const env: WebEnv = loadEnv();
