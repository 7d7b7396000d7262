import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import type pg from 'pg';
import { from as copyFrom } from 'pg-copy-streams';
import type { EntityManager } from 'typeorm';

// Slices of the file sent as separate COPY data messages, so a refusal can stop the write between two of them.
const SLICE_BYTES = 1024 * 1024;

/** PostgreSQL manual, COPY, "Binary Format": signature, flags, header extension length, then one tuple's field count. */
function copyHeader(moldId: string, byteLength: number): Buffer {
  const head = Buffer.alloc(11 + 4 + 4 + 2 + 4 + 16 + 4);
  let at = head.write('PGCOPY\n\xff\r\n\0', 0, 'latin1');
  at = head.writeInt32BE(0, at);
  at = head.writeInt32BE(0, at);
  at = head.writeInt16BE(2, at);
  // uuid in text would not do in a binary COPY: the id goes as its 16 bytes.
  at = head.writeInt32BE(16, at);
  const raw = Buffer.from(moldId.replace(/-/g, ''), 'hex');
  if (raw.length !== 16) throw new Error(`not a uuid: ${moldId}`);
  head.set(raw, at);
  head.writeInt32BE(byteLength, at + 16);
  return head;
}

function* copyFrames(moldId: string, bytes: Uint8Array): Generator<Uint8Array> {
  yield copyHeader(moldId, bytes.length);
  for (let at = 0; at < bytes.length; at += SLICE_BYTES) yield Buffer.from(bytes.buffer, bytes.byteOffset + at, Math.min(SLICE_BYTES, bytes.length - at));
  // The end-of-data marker: a field count of -1.
  yield Buffer.from([0xff, 0xff]);
}

/**
 * Writes a mould file's bytes into mold_files, in the caller's transaction, as a binary COPY: the bytes go as they
 * are, with no parameter message built around 50 MB. Aborting `signal` cancels the COPY (the transaction then rolls
 * back as a whole).
 */
export async function storeMoldFile(m: EntityManager, moldId: string, bytes: Uint8Array, signal: AbortSignal): Promise<void> {
  const client = (await m.queryRunner!.connect()) as pg.PoolClient;
  await pipeline(Readable.from(copyFrames(moldId, bytes)), client.query(copyFrom('COPY mold_files (mold_id, bytes) FROM STDIN (FORMAT binary)')), { signal });
}
