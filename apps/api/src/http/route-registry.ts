import type { Request, RequestHandler, Response, Router } from 'express';
import type { DataSource } from 'typeorm';
import type { ZodType } from 'zod';
import type { Role } from '@gelpoint/contracts';
import { authenticate, type AuthContext } from './auth-context';
import { AppError, fromZod } from './errors';
import { IdempotencyStore, REPLAYED_HEADER, UPLOAD_SHA256_LOCAL, idempotencyKeyOf, requestFingerprint } from './idempotency';

export type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

/** Who may call a route: anyone, any signed-in member, or members with one of these roles. */
export type Access = 'public' | 'member' | readonly Role[];

export interface RouteSpec {
  method: Method;
  /** Express path below /api, e.g. `/pieces/:id`. */
  path: string;
  summary: string;
  tag: string;
  access: Access;
  body?: ZodType;
  query?: ZodType;
  params?: ZodType;
  response?: ZodType;
  /** Status on success; a handler returning undefined answers 204. */
  status?: number;
  /** Runs after the caller is known and allowed, before validation: e.g. reading a multipart upload. */
  middleware?: RequestHandler[];
  /** Extra text for the OpenAPI document, e.g. the multipart fields. */
  requestNote?: string;
  /**
   * A create a phone may send twice (its answer lost on a weak connection): with an Idempotency-Key header, the same
   * member's same key gets the first answer again for 24 hours instead of a second record.
   */
  idempotent?: boolean;
  /** The success answer's media type when it is not JSON (an event stream); `response` then describes each event's data. */
  contentType?: string;
  /** The route answers 304 to an If-None-Match that matches its ETag. */
  conditional?: boolean;
}

export interface HandlerInput<A> {
  body: any;
  query: any;
  params: any;
  auth: A;
  req: Request;
  res: Response;
}

type Handler<A> = (input: HandlerInput<A>) => Promise<unknown> | unknown;

export interface RegisteredRoute extends RouteSpec {
  fullPath: string;
}

/** Every route goes through here: validation, authentication and role checks are not optional extras. */
export class RouteRegistry {
  readonly routes: RegisteredRoute[] = [];
  private readonly idempotency: IdempotencyStore;

  constructor(
    private readonly router: Router,
    private readonly ds: DataSource,
    private readonly jwtSecret: string,
  ) {
    this.idempotency = new IdempotencyStore(ds);
  }

  add(spec: RouteSpec & { access: 'public' }, handler: Handler<AuthContext | undefined>): void;
  add(spec: RouteSpec, handler: Handler<AuthContext>): void;
  add(spec: RouteSpec, handler: Handler<any>): void {
    const fullPath = `/api${spec.path}`;
    if (spec.idempotent && (spec.method !== 'post' || spec.access === 'public')) throw new Error(`${fullPath}: only a members' POST can be idempotent (the key belongs to a member)`);
    this.routes.push({ ...spec, fullPath });
    this.router[spec.method](spec.path, async (req: Request, res: Response) => {
      const auth = await authenticate(req, this.ds, this.jwtSecret);
      if (spec.access !== 'public') {
        if (!auth) throw new AppError('unauthorized', 'signed_out', 'you are not signed in; sign in first');
        if (spec.access !== 'member' && !spec.access.includes(auth.role)) {
          throw new AppError('forbidden', 'role_forbidden', `your role (${auth.role}) cannot do this; it needs ${spec.access.join(' or ')}`);
        }
      }
      if (auth) res.locals.memberId = auth.userId;
      for (const mw of spec.middleware ?? []) await runMiddleware(mw, req, res);
      const params = parse(spec.params, req.params, 'path');
      const query = parse(spec.query, req.query, 'query');
      const body = spec.body ? parse(spec.body, req.body ?? {}, 'body') : undefined;
      const key = spec.idempotent && auth ? idempotencyKeyOf(req) : undefined;
      if (key && auth) {
        const route = `POST ${fullPath}`;
        const scope = { shopId: auth.shopId, userId: auth.userId, key, route, fingerprint: requestFingerprint(route, { params, query, body, file: req.file, fileSha256: res.locals[UPLOAD_SHA256_LOCAL] as string | undefined }) };
        const answer = await this.idempotency.run(
          scope,
          async () => ({ status: spec.status ?? 200, body: await handler({ body, query, params, auth, req, res }) }),
          (error) => req.log?.warn({ err: error, route }, 'could not keep the answer of an idempotent request'),
        );
        if (answer.replayed) res.setHeader(REPLAYED_HEADER, 'true');
        res.status(answer.status).json(answer.body);
        return;
      }
      const result = await handler({ body, query, params, auth, req, res });
      if (res.headersSent) return;
      if (result === undefined) res.status(204).end();
      else res.status(spec.status ?? 200).json(result);
    });
  }
}

function runMiddleware(mw: RequestHandler, req: Request, res: Response): Promise<void> {
  return new Promise((resolve, reject) => {
    void mw(req, res, (err?: unknown) => (err ? reject(err) : resolve()));
  });
}

function parse(schema: ZodType | undefined, value: unknown, where: 'body' | 'query' | 'path'): unknown {
  if (!schema) return value;
  const r = schema.safeParse(value);
  if (!r.success) throw fromZod(r.error, where);
  return r.data;
}
