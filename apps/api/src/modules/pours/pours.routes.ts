import express from 'express';
import multer from 'multer';
import { z } from 'zod';
import { parseIsoInstant, readCureLog } from '@gelpoint/core';
import {
  AddReadingsRequest,
  BatchParams,
  BatchView,
  CsvImportQuery,
  CureCheckFields,
  CureCheckView,
  Id,
  IngestReadingsRequest,
  IngestToken,
  LogBatchRequest,
  MachinedRequest,
  PourList,
  PourListQuery,
  PourView,
  ReadingList,
  ReadingParams,
  ReadingsAdded,
  ReadingView,
  ReminderView,
  StartPourRequest,
  TodayView,
  VoidRequest,
  Warning,
} from '@gelpoint/contracts';
import { AppError } from '../../http/errors';
import type { RouteRegistry } from '../../http/route-registry';
import type { PourLog } from './pour-log.service';
import { sniffImageType } from './photo-type';
import type { Pours } from './pours.service';

/** A time core's reader accepted, written as the canonical UTC instant the API's contract and the database take. */
function utcInstant(at: string): string {
  const ms = parseIsoInstant(at);
  return ms.ok ? new Date(ms.value).toISOString() : at;
}

const IdParams = z.object({ id: Id });
const CheckParams = z.object({ id: Id, checkId: Id });
export const MAX_PHOTO_BYTES = 8 * 1024 * 1024;

const csvBody = express.text({ type: ['text/csv', 'text/plain'], limit: '2mb' });

function photoUpload(): express.RequestHandler {
  const handler = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_PHOTO_BYTES, files: 1, fields: 8, fieldSize: 4096 } }).single('photo');
  return (req, res, next) => {
    if (!req.is('multipart/form-data')) return next(new AppError('bad_request', 'multipart_required', 'send the cure check as multipart/form-data (fields stage, note…, optional file part "photo")'));
    handler(req, res, (err?: unknown) => {
      if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') return next(new AppError('payload_too_large', 'photo_too_large', 'the photo is larger than 8 MB; send a smaller picture'));
      if (err) return next(new AppError('bad_request', 'bad_upload', 'the upload could not be read; send it again'));
      next();
    });
  };
}

export function pourRoutes(api: RouteRegistry, pours: Pours, log: PourLog, uploadLimit: express.RequestHandler): void {
  api.add({ method: 'get', path: '/pours', tag: 'pours', summary: 'The cure board: pours with their stage, progress and next event', access: 'member', query: PourListQuery, response: PourList }, ({ auth, query }) =>
    pours.list(auth.shopId, query),
  );
  api.add({ method: 'post', path: '/pours', tag: 'pours', summary: 'Start pouring a plan', access: 'member', body: StartPourRequest, response: PourView, status: 201, idempotent: true }, ({ auth, body }) =>
    pours.start(auth, body.pourPlanId, body.notifyUserIds),
  );
  api.add({ method: 'get', path: '/pours/:id', tag: 'pours', summary: 'A pour: batches, readings, checks, cure status and reminders', access: 'member', params: IdParams, response: PourView }, ({ auth, params }) =>
    pours.get(auth.shopId, params.id),
  );
  api.add(
    { method: 'post', path: '/pours/:id/batches', tag: 'pours', summary: 'Log a mixed batch: lots, weighed grams, temperatures, humidity', access: 'member', params: IdParams, body: LogBatchRequest, response: z.object({ batch: BatchView, warnings: z.array(Warning) }), status: 201, idempotent: true },
    ({ auth, params, body }) => log.logBatch(auth, params.id, body),
  );
  api.add(
    {
      method: 'post',
      path: '/pours/:id/readings',
      tag: 'pours',
      summary: 'Add temperature readings (all or none; unusual values need confirmUnusual)',
      access: 'member',
      params: IdParams,
      body: AddReadingsRequest,
      response: ReadingsAdded,
      idempotent: true,
    },
    ({ auth, params, body }) => log.addReadings(auth.shopId, params.id, body.readings, 'manual', auth, body.confirmUnusual),
  );
  api.add(
    { method: 'get', path: '/pours/:id/readings', tag: 'pours', summary: 'Every reading of a pour, with who logged it and how, voided ones included', access: 'member', params: IdParams, response: ReadingList },
    async ({ auth, params }) => ({ items: await log.listReadings(auth.shopId, params.id) }),
  );
  api.add(
    {
      method: 'delete',
      path: '/pours/:id/readings/:readingId',
      tag: 'pours',
      summary: 'Void a reading with a reason (the logger or a lead); it stays in the history, out of the cure',
      access: 'member',
      params: ReadingParams,
      body: VoidRequest,
      response: ReadingView,
    },
    ({ auth, params, body }) => log.voidReading(auth, params.id, params.readingId, body.reason),
  );
  api.add(
    {
      method: 'post',
      path: '/pours/:id/batches/:batchId/void',
      tag: 'pours',
      summary: 'Void a logged cup with a reason (the person who mixed it or a lead); its grams go back to the lots',
      access: 'member',
      params: BatchParams,
      body: VoidRequest,
      response: BatchView,
    },
    ({ auth, params, body }) => log.voidBatch(auth, params.id, params.batchId, body.reason),
  );
  api.add(
    {
      method: 'post',
      path: '/pours/:id/readings/csv',
      tag: 'pours',
      summary: 'Import a time,tempC (or time,tempF) log (text/csv): all rows or none',
      access: 'member',
      params: IdParams,
      query: CsvImportQuery,
      middleware: [uploadLimit, csvBody],
      response: ReadingsAdded,
      idempotent: true,
    },
    async ({ auth, params, query, req }) => {
      if (typeof req.body !== 'string' || req.body.trim() === '') throw new AppError('bad_request', 'csv_missing', 'send the log as text/csv with lines "time,tempC"');
      const parsed = readCureLog(req.body);
      if (!parsed.ok) {
        const fields = Object.fromEntries((parsed.error.issues ?? []).slice(0, 200).map((i) => [`row ${(i as { row?: number }).row ?? '?'}`, i.message]));
        throw new AppError('unprocessable', 'csv_invalid', parsed.error.message, fields);
      }
      // The same limits as readings sent as JSON: a number is not yet a plausible temperature. Each time goes in as the
      // instant core read (in UTC): the log may write it in any form core's one reader takes.
      const instants = parsed.value.readings.map((r) => ({ at: utcInstant(r.at), tempC: Math.round(r.tempC * 1000) / 1000 }));
      const checked = AddReadingsRequest.safeParse({ readings: instants });
      if (!checked.success) {
        const fields = Object.fromEntries(
          checked.error.issues.slice(0, 200).map((i) => {
            const reading = typeof i.path[1] === 'number' ? parsed.value.readings[i.path[1]] : undefined;
            return [reading ? `at ${reading.at}` : 'readings', i.message];
          }),
        );
        const [where, what] = Object.entries(fields)[0]!;
        throw new AppError('unprocessable', 'csv_invalid', `The temperature log was not imported: the reading ${where}: ${what}. Fix these rows and import it again.`, fields);
      }
      const added = await log.addReadings(auth.shopId, params.id, checked.data.readings, 'csv', auth, query.confirmUnusual === 'true');
      return { ...added, unit: parsed.value.unit };
    },
  );
  api.add(
    { method: 'post', path: '/pours/:id/checks', tag: 'pours', summary: 'Record a cure check (multipart: stage, hardnessShoreD, note, optional photo)', access: 'member', params: IdParams, middleware: [uploadLimit, photoUpload()], body: CureCheckFields, response: CureCheckView, status: 201, idempotent: true },
    async ({ auth, params, body, req }) => {
      let photo: { bytes: Buffer; type: string } | null = null;
      if (req.file) {
        const type = sniffImageType(req.file.buffer);
        if (!type) throw new AppError('unprocessable', 'photo_not_image', 'the photo must be a JPEG, PNG or WebP picture', { photo: 'JPEG, PNG or WebP only' });
        photo = { bytes: req.file.buffer, type };
      }
      return pours.addCheck(auth, params.id, body, photo);
    },
  );
  api.add({ method: 'get', path: '/pours/:id/checks/:checkId/photo', tag: 'pours', summary: "A cure check's photo", access: 'member', params: CheckParams }, async ({ auth, params, res }) => {
    const photo = await pours.photo(auth.shopId, params.id, params.checkId);
    res.setHeader('Content-Type', photo.type);
    res.setHeader('Content-Disposition', 'inline; filename="cure-check"');
    res.setHeader('Cache-Control', 'private, max-age=86400');
    res.status(200).end(photo.bytes);
    return undefined;
  });
  api.add({ method: 'post', path: '/pours/:id/release', tag: 'pours', summary: 'Release the piece for machining (only when the logged cure says it is ready)', access: ['lead'], params: IdParams, response: PourView }, ({ auth, params }) =>
    pours.release(auth, params.id),
  );
  api.add(
    { method: 'post', path: '/pours/:id/machined', tag: 'pours', summary: 'Mark the piece machined and schedule its finish coats', access: ['lead', 'maker'], params: IdParams, body: MachinedRequest, response: PourView },
    ({ auth, params, body }) => pours.machined(auth, params.id, body),
  );
  api.add({ method: 'get', path: '/today', tag: 'pours', summary: 'What is due in the next 24 hours, and what is overdue and not done', access: 'member', response: TodayView }, ({ auth }) => pours.today(auth.shopId));
  api.add(
    { method: 'post', path: '/reminders/:id/done', tag: 'pours', summary: 'Mark a reminder done (any member; who and when are kept)', access: 'member', params: IdParams, response: ReminderView, idempotent: true },
    ({ auth, params }) => pours.markDone(auth, params.id),
  );

  api.add(
    { method: 'post', path: '/shop/ingest-token', tag: 'pours', summary: 'Issue a new token for the shop thermometer (the old one stops working); shown once', access: ['lead'], response: IngestToken, status: 201 },
    async ({ auth }) => ({ token: await pours.issueIngestToken(auth) }),
  );
  api.add(
    { method: 'post', path: '/ingest/readings', tag: 'pours', summary: 'A shop thermometer posts readings with the X-Gelpoint-Ingest-Token header', access: 'public', body: IngestReadingsRequest, response: ReadingsAdded, status: 202 },
    async ({ body, req }) => {
      const token = req.get('x-gelpoint-ingest-token');
      if (!token || token.length > 200) throw new AppError('unauthorized', 'ingest_token_missing', 'send the shop thermometer token in the X-Gelpoint-Ingest-Token header');
      const shopId = await pours.shopOfIngestToken(token);
      if (!shopId) throw new AppError('unauthorized', 'ingest_token_invalid', 'this thermometer token is not valid; issue a new one in the shop settings');
      return log.addReadings(shopId, body.pourId, body.readings, 'sensor', null, body.confirmUnusual);
    },
  );
}
