import express from 'express';
import multer from 'multer';
import { parseIsoInstant, readCureLog } from '@gelpoint/core';
import { AddReadingsRequest, pourRoutes as routes } from '@gelpoint/contracts';
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

export const MAX_PHOTO_BYTES = 8 * 1024 * 1024;

const csvBody = express.text({ type: ['text/csv', 'text/plain'], limit: '2mb' });

function photoUpload(): express.RequestHandler {
  const handler = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_PHOTO_BYTES, files: 1, fields: 8, fieldSize: 4096 } }).single('photo');
  return (req, res, next) => {
    if (!req.is('multipart/form-data'))
      return next(
        new AppError('bad_request', 'multipart_required', 'send the cure check as multipart/form-data (fields stage, note…, optional file part "photo")'),
      );
    handler(req, res, (err?: unknown) => {
      if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE')
        return next(new AppError('payload_too_large', 'photo_too_large', 'the photo is larger than 8 MB; send a smaller picture'));
      if (err) return next(new AppError('bad_request', 'bad_upload', 'the upload could not be read; send it again'));
      next();
    });
  };
}

export function pourRoutes(api: RouteRegistry, pours: Pours, log: PourLog, uploadLimit: express.RequestHandler): void {
  api.implement(
    routes,
    {
      listPours: ({ auth, query }) => pours.list(auth.shopId, query),
      startPour: ({ auth, body }) => pours.start(auth, body.pourPlanId, body.notifyUserIds),
      getPour: ({ auth, params }) => pours.get(auth.shopId, params.id),
      logBatch: ({ auth, params, body }) => log.logBatch(auth, params.id, body),
      addReadings: ({ auth, params, body }) => log.addReadings(auth.shopId, params.id, body.readings, 'manual', auth, body.confirmUnusual),
      listReadings: async ({ auth, params }) => ({ items: await log.listReadings(auth.shopId, params.id) }),
      voidReading: ({ auth, params, body }) => log.voidReading(auth, params.id, params.readingId, body.reason),
      voidBatch: ({ auth, params, body }) => log.voidBatch(auth, params.id, params.batchId, body.reason),
      importReadingsCsv: async ({ auth, params, query, req }) => {
        const text: unknown = req.body;
        if (typeof text !== 'string' || text.trim() === '')
          throw new AppError('bad_request', 'csv_missing', 'send the log as text/csv with lines "time,tempC"');
        const parsed = readCureLog(text);
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
          throw new AppError(
            'unprocessable',
            'csv_invalid',
            `The temperature log was not imported: the reading ${where}: ${what}. Fix these rows and import it again.`,
            fields,
          );
        }
        const added = await log.addReadings(auth.shopId, params.id, checked.data.readings, 'csv', auth, query.confirmUnusual === 'true');
        return { ...added, unit: parsed.value.unit };
      },
      addCureCheck: async ({ auth, params, body, req }) => {
        let photo: { bytes: Buffer; type: string } | null = null;
        if (req.file) {
          const type = sniffImageType(req.file.buffer);
          if (!type)
            throw new AppError('unprocessable', 'photo_not_image', 'the photo must be a JPEG, PNG or WebP picture', { photo: 'JPEG, PNG or WebP only' });
          photo = { bytes: req.file.buffer, type };
        }
        return pours.addCheck(auth, params.id, body, photo);
      },
      cureCheckPhoto: async ({ auth, params, res }) => {
        const photo = await pours.photo(auth.shopId, params.id, params.checkId);
        res.setHeader('Content-Type', photo.type);
        res.setHeader('Content-Disposition', 'inline; filename="cure-check"');
        res.setHeader('Cache-Control', 'private, max-age=86400');
        res.status(200).end(photo.bytes);
        return undefined;
      },
      releasePour: ({ auth, params }) => pours.release(auth, params.id),
      markMachined: ({ auth, params, body }) => pours.machined(auth, params.id, body),
      today: ({ auth }) => pours.today(auth.shopId),
      markReminderDone: ({ auth, params }) => pours.markDone(auth, params.id),
      issueIngestToken: async ({ auth }) => ({ token: await pours.issueIngestToken(auth) }),
      ingestReadings: async ({ body, req }) => {
        const token = req.get('x-gelpoint-ingest-token');
        if (!token || token.length > 200)
          throw new AppError('unauthorized', 'ingest_token_missing', 'send the shop thermometer token in the X-Gelpoint-Ingest-Token header');
        const shopId = await pours.shopOfIngestToken(token);
        if (!shopId) throw new AppError('unauthorized', 'ingest_token_invalid', 'this thermometer token is not valid; issue a new one in the shop settings');
        return log.addReadings(shopId, body.pourId, body.readings, 'sensor', null, body.confirmUnusual);
      },
    },
    { importReadingsCsv: [uploadLimit, csvBody], addCureCheck: [uploadLimit, photoUpload()] },
  );
}
