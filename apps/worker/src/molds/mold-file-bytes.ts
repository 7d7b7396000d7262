import type pg from 'pg';
import { to as copyTo } from 'pg-copy-streams';
import type { DataSource } from 'typeorm';

// PostgreSQL manual, COPY, "Binary Format": an 11-byte signature, a 32-bit flags field and a 32-bit header
// extension length (then that many bytes); each tuple is a 16-bit field count and, per field, a 32-bit length
// (-1 for NULL) and the field's bytes; a 16-bit -1 ends the data. All integers are big-endian.
const SIGNATURE = Buffer.from('PGCOPY\n\xff\r\n\0', 'latin1');

/**
 * Reads one bytea value from a binary COPY stream straight into a buffer of its own size. A plain SELECT sends the
 * bytes as hex text, twice their size, which node-postgres then decodes as a string: for a 50 MB mould that took
 * seconds; this takes one pass over the raw bytes.
 */
export class ByteaCopyReader {
  private head = Buffer.alloc(0);
  private value: Uint8Array | null | undefined;
  private filled = 0;

  /** Feeds the next chunk of the COPY stream. */
  push(chunk: Buffer): void {
    let rest = chunk;
    if (this.value === undefined) {
      this.head = Buffer.concat([this.head, chunk]);
      const lengthAt = this.valueLengthOffset();
      if (lengthAt === null || this.head.length < lengthAt + 4) return;
      const length = this.head.readInt32BE(lengthAt);
      this.value = length < 0 ? null : new Uint8Array(length);
      rest = this.head.subarray(lengthAt + 4);
      this.head = Buffer.alloc(0);
    }
    if (this.value && this.filled < this.value.length) {
      const take = Math.min(rest.length, this.value.length - this.filled);
      this.value.set(rest.subarray(0, take), this.filled);
      this.filled += take;
    }
  }

  /** Where the first field's length stands, once the header has arrived; null until then. */
  private valueLengthOffset(): number | null {
    if (this.head.length < SIGNATURE.length + 8) return null;
    if (!this.head.subarray(0, SIGNATURE.length).equals(SIGNATURE)) throw new Error('the database answered COPY with an unknown format');
    const extension = this.head.readUInt32BE(SIGNATURE.length + 4);
    const tupleAt = SIGNATURE.length + 8 + extension;
    if (this.head.length < tupleAt + 2) return null;
    const fields = this.head.readInt16BE(tupleAt);
    // -1 here is the end marker: the query found no row.
    if (fields === -1) {
      this.value = null;
      return null;
    }
    if (fields !== 1) throw new Error(`expected one column from COPY, got ${fields}`);
    return tupleAt + 2;
  }

  /** The value, once the stream has ended; null when there was no row or the value was NULL. */
  result(): Uint8Array | null {
    if (this.value === undefined) return null;
    if (this.value && this.filled !== this.value.length) throw new Error(`the COPY stream ended after ${this.filled} of ${this.value.length} bytes`);
    return this.value;
  }
}

/** The stored bytes of a mould's file, or null when it has none. */
export async function readMoldFileBytes(ds: DataSource, moldId: string): Promise<Uint8Array | null> {
  const runner = ds.createQueryRunner();
  try {
    const client = (await runner.connect()) as pg.PoolClient;
    // COPY takes no parameters: the id is quoted by the driver.
    const stream = client.query(copyTo(`COPY (SELECT bytes FROM mold_files WHERE mold_id = ${client.escapeLiteral(moldId)}) TO STDOUT (FORMAT binary)`));
    const reader = new ByteaCopyReader();
    for await (const chunk of stream) reader.push(chunk as Buffer);
    return reader.result();
  } finally {
    await runner.release();
  }
}
