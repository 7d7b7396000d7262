import type { DataSource } from 'typeorm';
import { formatIsoInstant } from '@gelpoint/core';
import { stringify } from 'csv-stringify/sync';
import { notFound } from '../../http/errors';

/** Columns of the batch log, units in their names; times are ISO 8601 with the shop's UTC offset (2026-12-03T09:15:00-08:00). */
export const batchCsvColumns = [
  'cup',
  'step',
  'mixedAt',
  'mixedBy',
  'lotA',
  'lotB',
  'lotPigment',
  'targetAG',
  'targetBG',
  'targetPigmentG',
  'weighedAG',
  'weighedBG',
  'weighedPigmentG',
  'offRatioPct',
  'ambientTempC',
  'surfaceTempC',
  'rhPct',
  'dewPointC',
  'warnings',
  'notes',
  'voided',
  'batchId',
] as const;

export const readingCsvColumns = ['takenAt', 'tempC', 'source', 'voided'] as const;

interface BatchRow {
  id: string;
  plan_batch_index: number;
  step: string;
  mixed_at: Date;
  mixed_by: string | null;
  lot_a_number: string;
  lot_b_number: string;
  lot_pigment_number: string;
  target_a_g: number;
  target_b_g: number;
  target_pigment_g: number;
  weighed_a_g: number;
  weighed_b_g: number;
  weighed_pigment_g: number;
  off_ratio_pct: number;
  ambient_temp_c: number | null;
  surface_temp_c: number | null;
  rh_pct: number | null;
  dew_point_c: number | null;
  warnings: { code: string }[];
  notes: string;
  voided: boolean;
}

interface ReadingRow {
  taken_at: Date;
  temp_c: number;
  source: string;
  voided: boolean;
}

/** RFC 4180 with CRLF rows; text a spreadsheet would run as a formula gets a leading apostrophe (OWASP CSV injection), numbers never do. */
const csv = (header: readonly string[], rows: unknown[][]) => stringify([[...header], ...rows], { record_delimiter: 'windows', escape_formulas: true });

/** A file name from the piece's name: letters, digits and dashes only, so no header can be bent by it. */
export function exportFileName(pieceName: string, what: 'batches' | 'readings'): string {
  const slug = pieceName
    .normalize('NFKD')
    .replace(/[^A-Za-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60)
    .toLowerCase();
  return `${slug || 'pour'}-${what}.csv`;
}

/** The piece's name, and the shop's zone: times in the files are ISO 8601 with the shop's own offset. */
async function pieceOf(ds: DataSource, shopId: string, pourId: string): Promise<{ name: string; zone: string }> {
  const rows: { name: string; time_zone: string }[] = await ds.query(
    'SELECT pc.name, s.time_zone FROM pours p JOIN pieces pc ON pc.id = p.piece_id JOIN shops s ON s.id = p.shop_id WHERE p.id = $1 AND p.shop_id = $2',
    [pourId, shopId],
  );
  if (!rows[0]) throw notFound('pour');
  return { name: rows[0].name, zone: rows[0].time_zone };
}

/** Every batch of a pour as CSV, in run-sheet order; a voided batch stays in the file, marked. */
export async function batchesCsv(ds: DataSource, shopId: string, pourId: string): Promise<{ fileName: string; text: string }> {
  const piece = await pieceOf(ds, shopId, pourId);
  const rows: BatchRow[] = await ds.query(
    `SELECT b.id, b.plan_batch_index, b.step, b.mixed_at, u.name AS mixed_by, b.lot_a_number, b.lot_b_number, b.lot_pigment_number,
            b.target_a_g, b.target_b_g, b.target_pigment_g, b.weighed_a_g, b.weighed_b_g, b.weighed_pigment_g, b.off_ratio_pct,
            b.ambient_temp_c, b.surface_temp_c, b.rh_pct, b.dew_point_c, b.warnings, b.notes,
            b.voided_at IS NOT NULL AS voided
       FROM pour_batches b LEFT JOIN users u ON u.id = b.mixed_by_id
      WHERE b.pour_id = $1 AND b.shop_id = $2
      ORDER BY b.plan_batch_index`,
    [pourId, shopId],
  );
  const text = csv(
    batchCsvColumns,
    rows.map((b) => [
      b.plan_batch_index + 1,
      b.step,
      formatIsoInstant(b.mixed_at.getTime(), piece.zone),
      b.mixed_by ?? '',
      b.lot_a_number,
      b.lot_b_number,
      b.lot_pigment_number,
      b.target_a_g,
      b.target_b_g,
      b.target_pigment_g,
      b.weighed_a_g,
      b.weighed_b_g,
      b.weighed_pigment_g,
      b.off_ratio_pct,
      b.ambient_temp_c ?? '',
      b.surface_temp_c ?? '',
      b.rh_pct ?? '',
      b.dew_point_c ?? '',
      b.warnings.map((w) => w.code).join(';'),
      b.notes,
      b.voided ? 'true' : 'false',
      b.id,
    ]),
  );
  return { fileName: exportFileName(piece.name, 'batches'), text };
}

/** Every temperature reading of a pour as CSV, oldest first. */
export async function readingsCsv(ds: DataSource, shopId: string, pourId: string): Promise<{ fileName: string; text: string }> {
  const piece = await pieceOf(ds, shopId, pourId);
  const rows: ReadingRow[] = await ds.query(
    `SELECT r.taken_at, r.temp_c, r.source,
            r.voided_at IS NOT NULL AS voided
       FROM temperature_readings r
      WHERE r.pour_id = $1 AND r.shop_id = $2
      ORDER BY r.taken_at`,
    [pourId, shopId],
  );
  const text = csv(
    readingCsvColumns,
    rows.map((r) => [formatIsoInstant(r.taken_at.getTime(), piece.zone), r.temp_c, r.source, r.voided ? 'true' : 'false']),
  );
  return { fileName: exportFileName(piece.name, 'readings'), text };
}
