import type { EntityManager } from 'typeorm';

/** A finished mould analysis as the database keeps it (each part as JSON text), with the reading it was made in. */
export interface FinishedMoldAnalysis {
  units: string;
  up: string;
  analysisJson: string;
  reportJson: string;
  depthMapJson: string;
  triangles: number;
}

/** The mould is still in the reading ($2 units, $3 up axis) an outcome was made in. */
const sameReading = 'AND units = $2 AND up_axis = $3';

/**
 * Stores a finished analysis and marks the mould ready, only while the mould is still in the reading the analysis
 * was made in (units or an up axis corrected meanwhile queue it again, and this result is of the old reading).
 * `whileQueued`: only while no worker has claimed it either (the API's own analysis of an upload gives way).
 * `m`: a transaction's manager, or the data source's.
 */
export async function storeMoldAnalysis(m: Pick<EntityManager, 'query'>, id: string, a: FinishedMoldAnalysis, whileQueued = false): Promise<void> {
  await m.query(
    `UPDATE molds SET status = 'ready', progress = 1, analysis = $4, report = $5, depth_map = $6, triangle_count = $7, analysed_at = now(),
            error_code = NULL, error_message = NULL, locked_until = NULL, updated_at = now()
      WHERE id = $1 ${sameReading}${whileQueued ? ` AND status = 'queued'` : ''}`,
    [id, a.units, a.up, a.analysisJson, a.reportJson, a.depthMapJson, a.triangles],
  );
}

/** The engine's refusal of a mould (a coded reason a person can act on), stored on the same condition of its reading. */
export async function storeMoldRefusal(
  m: Pick<EntityManager, 'query'>,
  id: string,
  reading: { units: string; up: string },
  refusal: { code: string; message: string },
): Promise<void> {
  await m.query(
    `UPDATE molds SET status = 'failed', error_code = $4, error_message = $5, progress = 1, locked_until = NULL, updated_at = now() WHERE id = $1 ${sameReading}`,
    [id, reading.units, reading.up, refusal.code, refusal.message],
  );
}
