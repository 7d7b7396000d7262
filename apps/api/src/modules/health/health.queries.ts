import type { DataSource } from 'typeorm';

/** Whether the database answers a trivial query within the time given. */
export async function databaseReachable(ds: DataSource, timeoutMs: number): Promise<boolean> {
  let timer: NodeJS.Timeout | undefined;
  try {
    await Promise.race([ds.query('SELECT 1'), new Promise((_, reject) => (timer = setTimeout(() => reject(new Error('timeout')), timeoutMs)))]);
    return true;
  } catch {
    return false;
  } finally {
    clearTimeout(timer);
  }
}
