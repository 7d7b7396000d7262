import type { RequestHandler } from 'express';
import type { DataSource } from 'typeorm';
import { moldRoutes as routes } from '@gelpoint/contracts';
import type { RouteRegistry } from '../../http/route-registry';
import { streamMoldEvents } from './mold-event-stream';
import type { MoldProgressHub } from './mold-progress-hub';
import { stlUpload, uploadedMould } from './mold-upload';
import type { Molds } from './molds.service';

/** RFC 9110 §13.1.2: If-None-Match compares weakly, and `*` matches any current representation. */
function matchesEtag(header: string | undefined, etag: string): boolean {
  if (!header) return false;
  return header.split(',').some((tag) => {
    const t = tag.trim();
    return t === '*' || t.replace(/^W\//, '') === etag;
  });
}

export interface MoldEventsSettings {
  ds: DataSource;
  hub: MoldProgressHub;
  heartbeatMs: number;
}

export function moldRoutes(
  api: RouteRegistry,
  molds: Molds,
  maxStlBytes: number,
  uploadLimit: RequestHandler,
  { ds, hub, heartbeatMs }: MoldEventsSettings,
): void {
  api.implement(
    routes,
    {
      uploadMold: ({ auth, body, res }) => molds.upload(auth, uploadedMould(res), body),
      listMolds: ({ auth, query }) => molds.list(auth.shopId, query),
      getMold: ({ auth, params }) => molds.get(auth.shopId, params.id),
      updateMold: ({ auth, params, body }) => molds.update(auth, params.id, body),
      moldFill: ({ auth, params, query }) =>
        molds.fill(auth.shopId, params.id, { levelMm: query.level, from: query.from, dam: query.dam, withDepthMap: query.depthMap === 'true' }),
      moldLayers: ({ auth, params, query }) => molds.layers(auth.shopId, params.id, { levelsMm: query.levels, from: query.from, dam: query.dam }),
      moldEvents: async ({ auth, params, req, res }) => {
        await streamMoldEvents(ds, hub, heartbeatMs, { shopId: auth.shopId, moldId: params.id }, req, res);
        return undefined;
      },
      moldDepthMap: async ({ auth, params, req, res }) => {
        const { json, etag } = await molds.depthMap(auth.shopId, params.id);
        res.setHeader('ETag', etag);
        // Kept by the browser only, and checked with the server before each use: one analysis, one map, one tag.
        res.setHeader('Cache-Control', 'private, no-cache');
        if (matchesEtag(req.get('if-none-match'), etag)) res.status(304).end();
        else res.status(200).type('application/json').send(json);
        return undefined;
      },
      moldFile: async ({ auth, params, res }) => {
        const { bytes, fileName } = await molds.stl(auth.shopId, params.id);
        // Never rendered by the browser: a download of an opaque type.
        res.setHeader('Content-Type', 'application/octet-stream');
        res.setHeader('Content-Disposition', `attachment; filename="${fileName}"`);
        res.setHeader('Cache-Control', 'private, max-age=3600');
        res.status(200).end(bytes);
        return undefined;
      },
      deleteMold: async ({ auth, params }) => {
        await molds.remove(auth, params.id);
        return undefined;
      },
    },
    { uploadMold: [uploadLimit, molds.warmUp, stlUpload(maxStlBytes)] },
  );
}
