import type { Request, RequestHandler, Response, Router } from 'express';
import type { DataSource } from 'typeorm';
import type { z } from 'zod';
import { rolesFor, type Action, type Role, type RouteBody, type RouteDef, type RouteParams, type RouteQuery, type RouteResponse } from '@gelpoint/contracts';
import { authenticate, type AuthContext } from './auth-context';
import { AppError, fromZod } from './errors';
import { IdempotencyStore, REPLAYED_HEADER, UPLOAD_SHA256_LOCAL, idempotencyKeyOf, requestFingerprint } from './idempotency';

export type { Method } from '@gelpoint/contracts';

/** Who may call a route, resolved: anyone, every signed-in member, or members with one of these roles. */
export type Access = 'public' | 'member' | readonly Role[];

/** The caller as a route sees it: a public route may be called signed out. */
export type CallerOf<R extends RouteDef> = R['access'] extends 'public' ? AuthContext | undefined : AuthContext;

export interface HandlerInput<R extends RouteDef> {
  body: RouteBody<R>;
  query: RouteQuery<R>;
  params: RouteParams<R>;
  auth: CallerOf<R>;
  req: Request;
  res: Response;
}

/**
 * What a handler gives back: the route's response type, checked against its schema. A route that writes its own
 * answer (a stream, a file, a 304) returns undefined; one without a response answers 204.
 */
export type Reply<R extends RouteDef> = R extends { response: z.ZodType }
  ? R extends { contentType: string } | { conditional: true }
    ? RouteResponse<R> | undefined
    : RouteResponse<R>
  : undefined;

export type Handler<R extends RouteDef> = (input: HandlerInput<R>) => Promise<Reply<R>> | Reply<R>;

/** One handler for each route of an area of the route table: a route left out does not type-check. */
export type Handlers<T extends Record<string, RouteDef>> = { [K in keyof T]: Handler<T[K]> };

/** Express middleware a route needs before validation (an upload reader, a rate limit), by route name. */
export type MiddlewareFor<T extends Record<string, RouteDef>> = { [K in keyof T]?: RequestHandler[] };

export interface RegisteredRoute extends Omit<RouteDef, 'access'> {
  name: string;
  fullPath: string;
  access: Access;
  /** The permission the roles come from, when the route needs one. */
  action?: Action;
}

function resolveAccess(access: RouteDef['access']): Access {
  return access === 'public' || access === 'member' ? access : rolesFor(access);
}

type Parsed<S> = S extends z.ZodType ? z.output<S> : undefined;

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

  /** Serves the routes of one area of the contracts' route table, each with its handler. */
  implement<T extends Record<string, RouteDef>>(table: T, handlers: Handlers<T>, middleware: MiddlewareFor<T> = {}): void {
    for (const name of Object.keys(table) as (keyof T & string)[]) this.add(name, table[name]!, handlers[name], middleware[name] ?? []);
  }

  /** Fails at start-up when a route of the table has no handler, so the table and the served API cannot drift. */
  assertServes(table: Record<string, RouteDef>): void {
    const unserved = Object.keys(table).filter((name) => !this.routes.some((r) => r.name === name));
    if (unserved.length) throw new Error(`routes of the table without a handler: ${unserved.join(', ')}`);
  }

  private add<R extends RouteDef>(name: string, spec: R, handler: Handler<R>, middleware: RequestHandler[]): void {
    const fullPath = `/api${spec.path}`;
    if (spec.idempotent && (spec.method !== 'post' || spec.access === 'public'))
      throw new Error(`${fullPath}: only a members' POST can be idempotent (the key belongs to a member)`);
    if (this.routes.some((r) => r.name === name)) throw new Error(`route ${name} is served twice`);
    const access = resolveAccess(spec.access);
    const action = spec.access === 'public' || spec.access === 'member' ? undefined : spec.access;
    this.routes.push({ ...spec, name, fullPath, access, ...(action ? { action } : {}) });
    this.router[spec.method](spec.path, async (req: Request, res: Response) => {
      const auth = await authenticate(req, this.ds, this.jwtSecret);
      const caller = callerFor(spec, auth);
      if (access !== 'public') {
        if (!auth) throw new AppError('unauthorized', 'signed_out', 'you are not signed in; sign in first');
        if (access !== 'member' && !access.includes(auth.role)) {
          throw new AppError('forbidden', 'role_forbidden', `your role (${auth.role}) cannot do this; it needs ${access.join(' or ')}`);
        }
      }
      if (auth) res.locals.memberId = auth.userId;
      for (const mw of middleware) await runMiddleware(mw, req, res);
      const params = parse<R['params']>(spec.params, req.params, 'path');
      const query = parse<R['query']>(spec.query, req.query, 'query');
      const body = parse<R['body']>(spec.body, req.body ?? {}, 'body');
      const input: HandlerInput<R> = { body: body.value, query: query.value, params: params.value, auth: caller, req, res };
      const key = spec.idempotent && auth ? idempotencyKeyOf(req) : undefined;
      if (key && auth) {
        const route = `POST ${fullPath}`;
        const fingerprint = requestFingerprint(route, {
          params: params.seen,
          query: query.seen,
          body: body.value,
          file: req.file,
          fileSha256: res.locals[UPLOAD_SHA256_LOCAL] as string | undefined,
        });
        const answer = await this.idempotency.run(
          { shopId: auth.shopId, userId: auth.userId, key, route, fingerprint },
          async () => ({ status: spec.status ?? 200, body: await handler(input) }),
          (error) => req.log?.warn({ err: error, route }, 'could not keep the answer of an idempotent request'),
        );
        if (answer.replayed) res.setHeader(REPLAYED_HEADER, 'true');
        res.status(answer.status).json(answer.body);
        return;
      }
      const result = await handler(input);
      if (res.headersSent) return;
      if (result === undefined) res.status(204).end();
      else res.status(spec.status ?? 200).json(result);
    });
  }
}

/** A members' route only runs once the caller is known, so its handlers are typed with a caller that is there. */
function callerFor<R extends RouteDef>(spec: R, auth: AuthContext | undefined): CallerOf<R> {
  if (spec.access !== 'public' && !auth) throw new AppError('unauthorized', 'signed_out', 'you are not signed in; sign in first');
  return auth as CallerOf<R>;
}

function runMiddleware(mw: RequestHandler, req: Request, res: Response): Promise<void> {
  return new Promise((resolve, reject) => {
    void mw(req, res, (err?: unknown) => (err ? reject(err) : resolve()));
  });
}

/**
 * The value a handler sees (the schema's output, or nothing when the route takes none) and the value the request
 * carried as far as the route reads it, which is what an idempotent request's fingerprint is made of.
 */
function parse<S extends z.ZodType | undefined>(schema: S, value: unknown, where: 'body' | 'query' | 'path'): { value: Parsed<S>; seen: unknown } {
  if (!schema) return { value: undefined as Parsed<S>, seen: where === 'body' ? undefined : value };
  const r = schema.safeParse(value);
  if (!r.success) throw fromZod(r.error, where);
  return { value: r.data as Parsed<S>, seen: r.data };
}
