import type { EntityManager } from 'typeorm';
import { AppError } from '../../http/errors';

export const DEFAULT_UPLOAD_QUOTA_BYTES = 1024 * 1024 * 1024;

interface UsedRow {
  used: string;
}

/**
 * What one member may keep in the shop's storage: their moulds' STL files and cure-check photos
 * (OWASP File Upload Cheat Sheet: a per-user quota so one account cannot fill the disk).
 */
export class UploadQuota {
  constructor(readonly bytes: number = DEFAULT_UPLOAD_QUOTA_BYTES) {}

  /**
   * Inside the transaction that stores the file: a lock per member makes two uploads at once count
   * one after the other, so together they cannot pass the quota.
   */
  async reserve(m: EntityManager, userId: string, addBytes: number): Promise<void> {
    await m.query('SELECT pg_advisory_xact_lock(hashtextextended($1, 0))', [`upload-quota:${userId}`]);
    const rows = (await m.query(
      `SELECT (SELECT coalesce(sum(size_bytes), 0) FROM molds WHERE created_by_id = $1)
            + (SELECT coalesce(sum(octet_length(photo)), 0) FROM cure_checks WHERE checked_by_id = $1) AS used`,
      [userId],
    )) as UsedRow[];
    const used = Number(rows[0]?.used ?? 0);
    if (used + addBytes > this.bytes) {
      const mb = (n: number) => (n / 1024 / 1024).toFixed(1);
      throw new AppError(
        'payload_too_large',
        'upload_quota_exceeded',
        `your files already use ${mb(used)} MB of your ${mb(this.bytes)} MB allowance and this one needs ${mb(addBytes)} MB; delete moulds you no longer need, or ask whoever runs your Gelpoint server for a larger allowance`,
      );
    }
  }
}
