import type { Response } from 'express';
import type { DataSource } from 'typeorm';
import { pourExportRoutes as routes } from '@gelpoint/contracts';
import type { RouteRegistry } from '../../http/route-registry';
import { batchesCsv, readingsCsv } from './pour-export';

function sendCsv(res: Response, file: { fileName: string; text: string }): undefined {
  res.setHeader('Content-Type', 'text/csv; charset=utf-8');
  res.setHeader('Content-Disposition', `attachment; filename="${file.fileName}"`);
  res.status(200).send(file.text);
  return undefined;
}

export function pourExportRoutes(api: RouteRegistry, ds: DataSource): void {
  api.implement(routes, {
    batchesCsv: async ({ auth, params, res }) => sendCsv(res, await batchesCsv(ds, auth.shopId, params.id)),
    readingsCsv: async ({ auth, params, res }) => sendCsv(res, await readingsCsv(ds, auth.shopId, params.id)),
  });
}
