import type { RequestHandler } from 'express';
import { z } from 'zod';
import type { DataSource } from 'typeorm';
import { FillQuery, Id, LayerVolumes, LayerVolumesQuery, MoldDepthMap, MoldFill, MoldList, MoldListQuery, MoldProgressEvent, MoldUploadFields, MoldView, UpdateMoldRequest } from '@gelpoint/contracts';
import type { RouteRegistry } from '../../http/route-registry';
import { streamMoldEvents } from './mold-event-stream';
import type { MoldProgressHub } from './mold-progress-hub';
import { stlUpload, uploadedMould } from './mold-upload';
import type { Molds } from './molds.service';

const IdParams = z.object({ id: Id });

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

export function moldRoutes(api: RouteRegistry, molds: Molds, maxStlBytes: number, uploadLimit: RequestHandler, { ds, hub, heartbeatMs }: MoldEventsSettings): void {
  api.add(
    {
      method: 'post',
      path: '/molds',
      tag: 'molds',
      summary: "Upload a mould file, STL, 3MF or OBJ told apart by content (multipart: file, units, up, name, pieceId; without units a 3MF is read in its own unit, other files in mm); the analysis runs in the background",
      access: ['lead', 'maker'],
      middleware: [uploadLimit, molds.warmUp, stlUpload(maxStlBytes)],
      body: MoldUploadFields,
      response: MoldView,
      status: 202,
      idempotent: true,
    },
    ({ auth, body, res }) => molds.upload(auth, uploadedMould(res), body),
  );
  api.add({ method: 'get', path: '/molds', tag: 'molds', summary: 'Moulds of the shop, newest first', access: 'member', query: MoldListQuery, response: MoldList }, ({ auth, query }) => molds.list(auth.shopId, query));
  api.add({ method: 'get', path: '/molds/:id', tag: 'molds', summary: 'A mould: analysis status and progress, and its cavity report when ready', access: 'member', params: IdParams, response: MoldView }, ({ auth, params }) =>
    molds.get(auth.shopId, params.id),
  );
  api.add(
    {
      method: 'patch',
      path: '/molds/:id',
      tag: 'molds',
      summary: "Rename a mould, attach it to a piece (pieceId) or detach it (null), or correct its units or up axis: a new frame reads the stored file again in the background, as an upload does",
      access: ['lead', 'maker'],
      params: IdParams,
      body: UpdateMoldRequest,
      response: MoldView,
    },
    ({ auth, params, body }) => molds.update(auth, params.id, body),
  );
  api.add(
    {
      method: 'get',
      path: '/molds/:id/fill',
      tag: 'molds',
      summary: "Fill at a level with a dam, from the stored analysis. The level is the height of the resin surface above the cavity floor (from=floor, the default) or in the mould's own frame (from=mould); the answer gives it both ways",
      access: 'member',
      params: IdParams,
      query: FillQuery,
      response: MoldFill,
    },
    ({ auth, params, query }) => molds.fill(auth.shopId, params.id, { levelMm: query.level, from: query.from, dam: query.dam, withDepthMap: query.depthMap === 'true' }),
  );
  api.add(
    {
      method: 'get',
      path: '/molds/:id/layers',
      tag: 'molds',
      summary: "Volume of each layer between the given levels (mm above the cavity floor, or in the mould's frame with from=mould)",
      access: 'member',
      params: IdParams,
      query: LayerVolumesQuery,
      response: LayerVolumes,
    },
    ({ auth, params, query }) => molds.layers(auth.shopId, params.id, { levelsMm: query.levels, from: query.from, dam: query.dam }),
  );
  api.add(
    {
      method: 'get',
      path: '/molds/:id/events',
      tag: 'molds',
      summary:
        "The mould's analysis as it runs, as Server-Sent Events: its state now, then each change (`progress` events), and a last `ready` or `failed` event, after which the stream closes; each event's data is {status, progress, error}. Comment lines keep a quiet stream open",
      access: 'member',
      params: IdParams,
      response: MoldProgressEvent,
      contentType: 'text/event-stream',
    },
    async ({ auth, params, req, res }) => {
      await streamMoldEvents(ds, hub, heartbeatMs, { shopId: auth.shopId, moldId: params.id }, req, res);
      return undefined;
    },
  );
  api.add(
    {
      method: 'get',
      path: '/molds/:id/depth-map',
      tag: 'molds',
      summary: "The depth map of the report's fill to the top (resin thickness per column, with the report's dam). Carries a strong ETag: send it back in If-None-Match and an unchanged map answers 304 with no body",
      access: 'member',
      params: IdParams,
      response: MoldDepthMap,
      conditional: true,
    },
    async ({ auth, params, req, res }) => {
      const { json, etag } = await molds.depthMap(auth.shopId, params.id);
      res.setHeader('ETag', etag);
      // Kept by the browser only, and checked with the server before each use: one analysis, one map, one tag.
      res.setHeader('Cache-Control', 'private, no-cache');
      if (matchesEtag(req.get('if-none-match'), etag)) res.status(304).end();
      else res.status(200).type('application/json').send(json);
      return undefined;
    },
  );
  api.add({ method: 'get', path: '/molds/:id/stl', tag: 'molds', summary: 'The uploaded mould file (STL, 3MF or OBJ) as it came, as a download', access: 'member', params: IdParams }, async ({ auth, params, res }) => {
    const { bytes, fileName } = await molds.stl(auth.shopId, params.id);
    // Never rendered by the browser: a download of an opaque type.
    res.setHeader('Content-Type', 'application/octet-stream');
    res.setHeader('Content-Disposition', `attachment; filename="${fileName}"`);
    res.setHeader('Cache-Control', 'private, max-age=3600');
    res.status(200).end(bytes);
    return undefined;
  });
  api.add(
    {
      method: 'delete',
      path: '/molds/:id',
      tag: 'molds',
      summary:
        "Delete a mould and its file. Refused with 409, naming the plans, while pour plans take their cavity from it (rather than archived: a plan is worked out again from its mould's analysis whenever it is saved, so the mould must stay whole until the maker has moved or deleted those plans)",
      access: ['lead', 'maker'],
      params: IdParams,
    },
    async ({ auth, params }) => {
      await molds.remove(auth, params.id);
      return undefined;
    },
  );
}
