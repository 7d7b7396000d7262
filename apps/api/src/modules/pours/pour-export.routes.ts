import type { Response } from 'express';
import type { DataSource } from 'typeorm';
import { z } from 'zod';
import { Id } from '@gelpoint/contracts';
import type { RouteRegistry } from '../../http/route-registry';
import { batchesCsv, readingsCsv } from './pour-export';

const IdParams = z.object({ id: Id });

function sendCsv(res: Response, file: { fileName: string; text: string }): undefined {
  res.setHeader('Content-Type', 'text/csv; charset=utf-8');
  res.setHeader('Content-Disposition', `attachment; filename="${file.fileName}"`);
  res.status(200).send(file.text);
  return undefined;
}

export function pourExportRoutes(api: RouteRegistry, ds: DataSource): void {
  api.add(
    { method: 'get', path: '/pours/:id/batches.csv', tag: 'pours', summary: "A pour's batches as CSV (text/csv): lots, target and weighed grams, temperatures, humidity, who and when (ISO 8601 UTC)", access: 'member', params: IdParams },
    async ({ auth, params, res }) => sendCsv(res, await batchesCsv(ds, auth.shopId, params.id)),
  );
  api.add(
    { method: 'get', path: '/pours/:id/readings.csv', tag: 'pours', summary: "A pour's temperature readings as CSV (text/csv): takenAt (ISO 8601 UTC), tempC, source", access: 'member', params: IdParams },
    async ({ auth, params, res }) => sendCsv(res, await readingsCsv(ds, auth.shopId, params.id)),
  );
}
