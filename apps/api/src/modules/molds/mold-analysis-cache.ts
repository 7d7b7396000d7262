import type { EntityManager } from 'typeorm';
import { MOLD_ANALYSIS_CHANNEL } from '@gelpoint/db';
import { readAnalysis, type CavityModel } from '@gelpoint/mesh';
import { AppError, notFound } from '../../http/errors';
import { RecentlyUsed } from './recently-used';

/**
 * Decoded analyses, most recently used kept. Only a cache: any API instance rebuilds an entry from the
 * database, so nothing here is needed by another instance.
 */
export class AnalysisCache {
  private readonly entries: RecentlyUsed<CavityModel>;

  constructor(capacity = 16) {
    this.entries = new RecentlyUsed(capacity);
  }

  async model(m: EntityManager, shopId: string, moldId: string): Promise<CavityModel> {
    const rows: { status: string; analysed_at: Date | null }[] = await m.query('SELECT status, analysed_at FROM molds WHERE id = $1 AND shop_id = $2', [
      moldId,
      shopId,
    ]);
    const row = rows[0];
    if (!row) throw notFound('mould');
    if (row.status !== 'ready' || !row.analysed_at) {
      throw new AppError(
        'conflict',
        'mold_not_ready',
        row.status === 'failed'
          ? 'this mould could not be analysed; see its error and upload a corrected file'
          : 'the cavity report is not ready yet; try again in a moment',
      );
    }
    const key = `${moldId}@${row.analysed_at.toISOString()}`;
    const hit = this.entries.get(key);
    if (hit) return hit;
    const [{ analysis }] = (await m.query('SELECT analysis FROM molds WHERE id = $1', [moldId])) as [{ analysis: unknown }];
    const decoded = readAnalysis(analysis);
    if (!decoded.ok && decoded.error.code === 'analysis_outdated') {
      // Written by an older engine: the worker analyses it again from the stored file.
      await m.query(
        `UPDATE molds SET status = 'queued', attempts = 0, progress = 0, locked_until = NULL, updated_at = now() WHERE id = $1 AND status = 'ready'`,
        [moldId],
      );
      await m.query('SELECT pg_notify($1, $2)', [MOLD_ANALYSIS_CHANNEL, moldId]);
      throw new AppError('conflict', 'mold_not_ready', 'the cavity report is being worked out again with the current engine; try again in a moment');
    }
    if (!decoded.ok) throw new AppError('conflict', 'analysis_unreadable', 'the stored analysis of this mould cannot be read; upload the mould again');
    this.entries.set(key, decoded.value);
    return decoded.value;
  }
}
