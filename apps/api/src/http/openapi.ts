import { z } from 'zod';
import { ErrorBody } from '@gelpoint/contracts';
import type { RegisteredRoute } from './route-registry';

const schema = (s: z.ZodType, io: 'input' | 'output') => z.toJSONSchema(s, { io, unrepresentable: 'any', target: 'openapi-3.0' });

function accessText(r: RegisteredRoute): string {
  if (r.access === 'public') return 'No sign-in needed.';
  if (r.access === 'member') return 'Any signed-in member of the shop.';
  return `Roles: ${r.access.join(', ')}.`;
}

/** The OpenAPI document, built from the contracts' route table as the registry serves it: the same schemas validate the requests. */
export function openApiDocument(routes: RegisteredRoute[], serverUrl: string) {
  const paths: Record<string, Record<string, unknown>> = {};
  for (const r of routes) {
    const path = r.fullPath.replace(/:([A-Za-z]+)/g, '{$1}');
    const parameters: unknown[] = [];
    for (const [where, s] of [
      ['path', r.params],
      ['query', r.query],
    ] as const) {
      if (!s || !(s instanceof z.ZodObject)) continue;
      for (const [name, field] of Object.entries(s.shape as Record<string, z.ZodType>)) {
        parameters.push({ name, in: where, required: where === 'path' || !field.safeParse(undefined).success, schema: schema(field, 'input') });
      }
    }
    if (r.idempotent) {
      parameters.push({
        name: 'Idempotency-Key',
        in: 'header',
        required: false,
        description:
          'A key of your own (a UUID) for this one entry: sent again within 24 hours, it answers the first answer again (header Idempotent-Replayed: true) instead of creating a second record; the same key with a different request is a 422.',
        schema: { type: 'string', minLength: 1, maxLength: 255 },
      });
    }
    const success = String(r.status ?? (r.response && !(r.response instanceof z.ZodUndefined) ? 200 : 204));
    const responses: Record<string, unknown> = {
      [success]:
        r.response && success !== '204'
          ? { description: 'OK', content: { [r.contentType ?? 'application/json']: { schema: schema(r.response, 'output') } } }
          : { description: 'Done, no content' },
      ...(r.conditional ? { '304': { description: 'Not modified: the If-None-Match header named the current ETag' } } : {}),
      '4XX': { description: 'What was wrong, and how to fix it', content: { 'application/json': { schema: schema(ErrorBody, 'output') } } },
    };
    (paths[path] ??= {})[r.method] = {
      operationId: r.name,
      summary: r.summary,
      description: accessText(r),
      tags: [r.tag],
      ...(r.access === 'public' ? { security: [] } : {}),
      ...(parameters.length ? { parameters } : {}),
      ...(r.body ? { requestBody: { required: true, content: { 'application/json': { schema: schema(r.body, 'input') } } } } : {}),
      responses,
    };
  }
  return {
    openapi: '3.0.3',
    info: { title: 'Gelpoint API', version: '0.1.0', description: 'Cavity reports, pour plans, cure logs and the shop behind them.' },
    servers: [{ url: serverUrl }],
    components: {
      securitySchemes: { bearer: { type: 'http', scheme: 'bearer', bearerFormat: 'JWT' }, cookie: { type: 'apiKey', in: 'cookie', name: 'gp_session' } },
    },
    security: [{ bearer: [] }, { cookie: [] }],
    paths,
  };
}
