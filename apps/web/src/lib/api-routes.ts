import {
  apiRoutes,
  type ApiRoutes,
  type RouteBodyInput,
  type RouteDef,
  type RouteParamsInput,
  type RouteQueryInput,
  type RouteResponse,
} from '@gelpoint/contracts';
import type { z } from 'zod';
import { api, type ApiClient, type QueryValue, type RequestOptions } from './api-client';

/** The routes that answer JSON (or nothing): files, CSV and streams are fetched by URL, not through here. */
export type JsonRouteName = { [K in keyof ApiRoutes]: ApiRoutes[K] extends { raw: true } | { contentType: string } ? never : K }[keyof ApiRoutes];

type Part<Key extends string, T> = [T] extends [undefined] ? { [P in Key]?: undefined } : { [P in Key]: T };

/** What a call of a route sends: its path parameters, query and body, each typed by the route's own schema. */
export type RouteArgs<R extends RouteDef> = Part<'params', RouteParamsInput<R>> & Part<'query', RouteQueryInput<R>> & Part<'body', RouteBodyInput<R>>;

/** The route's path with its parameters filled in, each encoded: `/molds/:id` → `/molds/3f…`. */
export function routePath(path: string, params: unknown): string {
  const values = new Map(Object.entries(typeof params === 'object' && params !== null ? params : {}));
  return path.replace(/:([A-Za-z]+)/g, (_m, name: string) => {
    const value: unknown = values.get(name);
    if (value === undefined || value === null) throw new Error(`${path} needs the path parameter ${name}`);
    return encodeURIComponent(String(value));
  });
}

function queryOf(query: unknown): Record<string, QueryValue> {
  const out: Record<string, QueryValue> = {};
  for (const [name, value] of Object.entries(typeof query === 'object' && query !== null ? query : {})) {
    if (value === undefined || value === null) continue;
    out[name] = Array.isArray(value) ? value.join(',') : typeof value === 'object' ? JSON.stringify(value) : (value as QueryValue);
  }
  return out;
}

/**
 * Calls one route of the contracts' table: the path, method, body and answer are the table's, so a change to a
 * route's contract shows up here as a type error rather than at run time.
 */
export async function callRoute<K extends JsonRouteName>(
  name: K,
  args: RouteArgs<ApiRoutes[K]>,
  options: RequestOptions = {},
  client: ApiClient = api,
): Promise<RouteResponse<ApiRoutes[K]>> {
  const route: RouteDef = apiRoutes[name];
  const path = routePath(route.path, args.params);
  const query = queryOf(args.query);
  const opts: RequestOptions = Object.keys(query).length ? { ...options, query } : options;
  const answer = await send(client, route, path, args.body, opts);
  return answer as RouteResponse<ApiRoutes[K]>;
}

async function send(client: ApiClient, route: RouteDef, path: string, body: unknown, options: RequestOptions): Promise<unknown> {
  const schema: z.ZodType | undefined = route.response;
  switch (route.method) {
    case 'get':
      if (!schema) throw new Error(`${route.path} answers no JSON`);
      return client.get(path, schema, options);
    case 'post':
      if (!schema) return client.postWithoutContent(path, body, options);
      // An action without fields (release, a new token) still sends an empty JSON object, as a form would.
      return client.post(path, body ?? {}, schema, options);
    case 'put':
      if (!schema) throw new Error(`${route.path} answers no JSON`);
      return client.put(path, body, schema, options);
    case 'patch':
      if (!schema) throw new Error(`${route.path} answers no JSON`);
      return client.patch(path, body, schema, options);
    case 'delete':
      if (!schema) return client.delete(path, options);
      return client.deleteWith(path, body, schema, options);
  }
}
