import { createHash } from 'node:crypto';
import type { Request } from 'express';
import type { DataSource } from 'typeorm';
import { AppError } from './errors';

export const IDEMPOTENCY_HEADER = 'Idempotency-Key';
/** Set on an answer that was stored from an earlier request with the same key, not made just now. */
export const REPLAYED_HEADER = 'Idempotent-Replayed';

/** A replay within this time gets the first answer; the rows live an hour longer before the sweep takes them. */
const KEEP_HOURS = 24;
const SWEEP_AFTER_HOURS = KEEP_HOURS + 1;
const SWEEP_EVERY_MS = 10 * 60_000;
/** How long a replay waits for the first request with its key to finish before it says so. */
const WAIT_FOR_FIRST_MS = 15_000;
const POLL_MS = 75;
/** A claim this old without an answer belongs to a request that died half-way (the process stopped). */
const ABANDONED_AFTER_S = 120;

// RFC 9110 §5.5 field values are visible ASCII; a key is an opaque token the client made (a UUID in our app).
const keyPattern = /^[\x21-\x7e]{1,255}$/;

export interface IdempotentAnswer {
  status: number;
  body: unknown;
  replayed: boolean;
}

/**
 * Where an upload middleware that hashes the file as it streams leaves its SHA-256 (hex), so the fingerprint of the
 * request covers the file without hashing it twice.
 */
export const UPLOAD_SHA256_LOCAL = 'uploadSha256';

/** What identifies "the same request": its route, parameters, query, validated body and the uploaded file, if one came. */
export function requestFingerprint(
  route: string,
  parts: { params: unknown; query: unknown; body: unknown; file?: { buffer: Buffer } | undefined; fileSha256?: string | undefined },
): string {
  const hash = createHash('sha256');
  hash
    .update(route)
    .update('\0')
    .update(canonicalJson({ params: parts.params, query: parts.query, body: parts.body ?? null }));
  const fileDigest = parts.fileSha256 ?? (parts.file ? createHash('sha256').update(parts.file.buffer).digest('hex') : undefined);
  if (fileDigest) hash.update('\0file\0').update(fileDigest);
  return hash.digest('hex');
}

/** JSON with object keys in order, so two bodies that differ only in key order count as the same. */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) => {
    if (!v || typeof v !== 'object' || Array.isArray(v) || Buffer.isBuffer(v)) return v;
    const sorted: Record<string, unknown> = {};
    for (const k of Object.keys(v).sort()) sorted[k] = (v as Record<string, unknown>)[k];
    return sorted;
  });
}

/** The key a request carries, or undefined; a malformed one is a 400 rather than silently ignored. */
export function idempotencyKeyOf(req: Request): string | undefined {
  const raw = req.get(IDEMPOTENCY_HEADER);
  if (raw === undefined) return undefined;
  const key = raw.trim();
  if (!keyPattern.test(key)) {
    throw new AppError('bad_request', 'bad_idempotency_key', 'the Idempotency-Key header must be 1 to 255 visible characters without spaces, such as a UUID');
  }
  return key;
}

interface KeyRow {
  route: string;
  fingerprint: string;
  status_code: number | null;
  response_body: unknown;
  age_s: number;
}

export interface IdempotencyScope {
  shopId: string;
  userId: string;
  key: string;
  route: string;
  fingerprint: string;
}

/**
 * Runs a create at most once per (member, key). The first request inserts a claim before it runs; a replay finds
 * the claim, waits for its answer and returns that same status and body. Two replays at once cannot both create:
 * only one INSERT of the primary key succeeds. A create that fails leaves nothing behind (it ran in one
 * transaction), so its claim is dropped and the same key may be sent again.
 */
export class IdempotencyStore {
  private sweptAt = 0;

  constructor(private readonly ds: DataSource) {}

  async run(
    scope: IdempotencyScope,
    create: () => Promise<{ status: number; body: unknown }>,
    onStoreFailure: (error: unknown) => void = () => undefined,
  ): Promise<IdempotentAnswer> {
    this.sweepNowAndThen();
    const deadline = Date.now() + WAIT_FOR_FIRST_MS;
    for (;;) {
      if (await this.claim(scope)) break;
      const row = await this.find(scope);
      if (!row) continue; // the first request failed and let go of the key: claim it again
      if (row.route !== scope.route || row.fingerprint !== scope.fingerprint) {
        throw new AppError(
          'unprocessable',
          'idempotency_key_reused',
          'this Idempotency-Key was already used for a different request in the last 24 hours; send a new key with a changed entry',
        );
      }
      if (row.status_code !== null) return { status: row.status_code, body: row.response_body, replayed: true };
      if (row.age_s > ABANDONED_AFTER_S) {
        throw new AppError(
          'conflict',
          'idempotency_unfinished',
          'an earlier request with this Idempotency-Key stopped before it answered; check whether the entry was saved, then send it again with a new key',
        );
      }
      if (Date.now() > deadline) {
        throw new AppError(
          'conflict',
          'idempotency_in_progress',
          'the first request with this Idempotency-Key is still being processed; send it again in a moment',
        );
      }
      await new Promise((resolve) => setTimeout(resolve, POLL_MS));
    }

    let answer: { status: number; body: unknown };
    try {
      answer = await create();
    } catch (error) {
      await this.release(scope).catch(onStoreFailure);
      throw error;
    }
    try {
      await this.ds.query(
        `UPDATE idempotency_keys SET status_code = $4, response_body = $5::json, completed_at = now()
          WHERE shop_id = $1 AND user_id = $2 AND key = $3`,
        [scope.shopId, scope.userId, scope.key, answer.status, JSON.stringify(answer.body ?? null)],
      );
    } catch (error) {
      // The record exists; the caller still gets its answer. A replay will find the claim unanswered and say so.
      onStoreFailure(error);
    }
    return { ...answer, replayed: false };
  }

  /** Inserts the claim, or takes over a row older than the retention; true when this request now owns the key. */
  private async claim(scope: IdempotencyScope): Promise<boolean> {
    const rows: unknown[] = await this.ds.query(
      `INSERT INTO idempotency_keys AS k (shop_id, user_id, key, route, fingerprint)
       VALUES ($1, $2, $3, $4, $5)
       ON CONFLICT (shop_id, user_id, key) DO UPDATE
         SET route = EXCLUDED.route, fingerprint = EXCLUDED.fingerprint, status_code = NULL, response_body = NULL, created_at = now(), completed_at = NULL
         WHERE k.created_at < now() - make_interval(hours => $6)
       RETURNING 1`,
      [scope.shopId, scope.userId, scope.key, scope.route, scope.fingerprint, KEEP_HOURS],
    );
    return rows.length === 1;
  }

  private async find(scope: IdempotencyScope): Promise<KeyRow | undefined> {
    const rows: KeyRow[] = await this.ds.query(
      `SELECT route, fingerprint, status_code, response_body, extract(epoch FROM now() - created_at)::float8 AS age_s
         FROM idempotency_keys WHERE shop_id = $1 AND user_id = $2 AND key = $3`,
      [scope.shopId, scope.userId, scope.key],
    );
    return rows[0];
  }

  private async release(scope: IdempotencyScope): Promise<void> {
    await this.ds.query('DELETE FROM idempotency_keys WHERE shop_id = $1 AND user_id = $2 AND key = $3 AND status_code IS NULL', [
      scope.shopId,
      scope.userId,
      scope.key,
    ]);
  }

  private sweepNowAndThen(): void {
    if (Date.now() - this.sweptAt < SWEEP_EVERY_MS) return;
    this.sweptAt = Date.now();
    this.ds.query('DELETE FROM idempotency_keys WHERE created_at < now() - make_interval(hours => $1)', [SWEEP_AFTER_HOURS]).catch(() => undefined);
  }
}
