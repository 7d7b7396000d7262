import type { Response } from 'express';
import type { DataSource } from 'typeorm';
import { stringify } from 'csv-stringify/sync';
import { auditText } from '@gelpoint/contracts';
import { formatIsoInstant, shopLocalDate } from '@gelpoint/core';
import { auditQuery, olderThan, pageOf, type AuditFilters } from './audit-query';
import { namedEvents } from './audit-names';

const CHUNK = 1000;

export const auditCsvColumns = ['at', 'actor', 'event', 'action', 'objectType', 'objectId', 'objectName', 'detail'] as const;

/** RFC 4180 fields with CRLF rows; a cell that a spreadsheet would run as a formula gets a leading apostrophe (OWASP CSV injection). */
export const csvRows = (rows: readonly (readonly unknown[])[]) => stringify(rows as unknown[][], { record_delimiter: 'windows', escape_formulas: true });

/**
 * Every event the filters pass, newest first, written to the answer as CSV a thousand at a time, so an export of a
 * long history holds no more than one chunk in memory.
 */
export async function writeAuditCsv(ds: DataSource, shopId: string, filters: AuditFilters, res: Response): Promise<void> {
  // Times are ISO 8601 with the shop's own offset, the file named for the shop's date.
  const zone = ((await ds.query('SELECT time_zone FROM shops WHERE id = $1', [shopId])) as { time_zone: string }[])[0]?.time_zone ?? 'UTC';
  const chunk = async (cursor: { before: string; beforeId: string } | null) => {
    const qb = auditQuery(ds, shopId, filters);
    if (cursor) olderThan(qb, cursor.before, cursor.beforeId);
    const page = await pageOf(qb, CHUNK);
    return { page, events: await namedEvents(ds.manager, shopId, page.rows) };
  };
  // The first chunk is read before anything is sent, so a failing query still answers with a proper error.
  let next = await chunk(null);
  res.status(200);
  res.setHeader('Content-Type', 'text/csv; charset=utf-8');
  res.setHeader('Content-Disposition', `attachment; filename="gelpoint-audit-${shopLocalDate(Date.now(), zone)}.csv"`);
  res.write(csvRows([auditCsvColumns]));
  for (;;) {
    const { page, events } = next;
    if (events.length) {
      res.write(
        csvRows(
          events.map((e) => [
            formatIsoInstant(Date.parse(e.at), zone),
            e.actor?.name ?? '',
            auditText({ action: e.action, objectType: e.objectType, objectName: e.objectName, detail: e.detail, actorName: e.actor?.name ?? null }),
            e.action,
            e.objectType,
            e.objectId ?? '',
            e.objectName ?? '',
            JSON.stringify(e.detail),
          ]),
        ),
      );
    }
    if (page.rows.length < CHUNK || !page.last) break;
    next = await chunk(page.last);
  }
  res.end();
}
