import { z } from 'zod';
import { Id } from '../common';
import type { Action } from '../permissions';

export type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

/** Who may call a route: anyone, any signed-in member, or the roles the permission table gives this action. */
export type Access = 'public' | 'member' | Action;

/** One endpoint of the HTTP API: what it takes, what it answers and who may call it. */
export interface RouteDef {
  method: Method;
  /** Express path below /api, e.g. `/pieces/:id`. */
  path: string;
  summary: string;
  tag: string;
  access: Access;
  params?: z.ZodType;
  query?: z.ZodType;
  body?: z.ZodType;
  /** The success answer; absent when the route answers 204 or sends a file of its own. */
  response?: z.ZodType;
  /** Status on success; a route without a response answers 204. */
  status?: number;
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
  /** The answer is written by the route itself (a file, CSV, calendar): not JSON, so typed clients do not read it. */
  raw?: boolean;
}

/** Keeps each route's literal types (method, path, schemas) while checking it against RouteDef. */
export const route = <const R extends RouteDef>(r: R): R => r;

export const IdParams = z.object({ id: Id });

type Out<S> = S extends z.ZodType ? z.output<S> : undefined;
type In<S> = S extends z.ZodType ? z.input<S> : undefined;

/** What the server reads from a request of this route, after validation. */
export type RouteParams<R extends RouteDef> = Out<R['params']>;
export type RouteQuery<R extends RouteDef> = Out<R['query']>;
export type RouteBody<R extends RouteDef> = Out<R['body']>;
/** What a client may send (before defaults and coercions). */
export type RouteParamsInput<R extends RouteDef> = In<R['params']>;
export type RouteQueryInput<R extends RouteDef> = In<R['query']>;
export type RouteBodyInput<R extends RouteDef> = In<R['body']>;
/** The success answer's body. */
export type RouteResponse<R extends RouteDef> = Out<R['response']>;
