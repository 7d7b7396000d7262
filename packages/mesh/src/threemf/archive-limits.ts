import { Inflate } from 'fflate';
import { fail, ok, type Result } from '../result';
import { entryData, type ZipEntry } from './zip-directory';

/**
 * Limits against zip bombs: a small archive whose parts unpack to gigabytes. Each is checked
 * against the sizes the archive states before anything is unpacked, and again while unpacking,
 * because a hostile archive may state small sizes and hold large ones.
 */
export interface ArchiveLimits {
  /** Largest packed part read (bytes). */
  maxPackedPartBytes: number;
  /** Largest unpacked part read (bytes). */
  maxPartBytes: number;
  /** Most bytes unpacked from one archive, all parts together. */
  maxTotalBytes: number;
  /** Most unpacked bytes per packed byte. */
  maxRatio: number;
}

/**
 * A 3MF's model XML takes about 80 bytes per triangle (a triangle line and half a vertex line), so
 * 512 MB holds some 6 million triangles, more than the 5 million the engine takes by default.
 * XML of coordinates packs about 3 to 10 to 1 with deflate; 100 to 1 is far beyond any model and
 * well below the 1032 to 1 deflate reaches on repeated bytes (common practice for such limits).
 */
export const defaultArchiveLimits: ArchiveLimits = {
  maxPackedPartBytes: 256 * 2 ** 20,
  maxPartBytes: 512 * 2 ** 20,
  maxTotalBytes: 640 * 2 ** 20,
  maxRatio: 100,
};

/** The limits for a given largest unpacked part: all parts together may take a quarter more. */
export function archiveLimitsFor(maxPartBytes: number): ArchiveLimits {
  return { ...defaultArchiveLimits, maxPartBytes, maxTotalBytes: Math.round(1.25 * maxPartBytes) };
}

/** Below this many unpacked bytes the ratio is not judged: small parts pack unevenly. */
const ratioSlackBytes = 2 ** 20;
/** Packed bytes handed to the inflater at a time: at most ~16 MB can come out of one step. */
const stepBytes = 16 * 1024;

const megabytes = (n: number): string => (n < 2 ** 20 ? `${Math.round(n / 1024)} kB` : `${Math.round(n / 2 ** 20)} MB`);

/** Unpacked bytes so far across one archive. */
export class ArchiveBudget {
  unpackedBytes = 0;
  constructor(readonly limits: ArchiveLimits) {}
}

function tooLarge(part: string, limit: string): Result<never> {
  return fail(
    'threemf_too_large',
    `The 3MF's part "${part.slice(0, 60)}" unpacks to more than ${limit}, more than Gelpoint reads from one file (a guard against zip bombs); simplify the mesh or export it as binary STL.`,
  );
}

function checkStated(entry: ZipEntry, budget: ArchiveBudget): Result<void> {
  const { limits } = budget;
  if (entry.encrypted) {
    return fail('threemf_unsupported', `The 3MF's part "${entry.name.slice(0, 60)}" is encrypted; export the mould again without protection.`);
  }
  if (entry.method !== 0 && entry.method !== 8) {
    return fail(
      'threemf_unsupported',
      `The 3MF's part "${entry.name.slice(0, 60)}" is packed with zip method ${entry.method}, but a 3MF may only store or deflate its parts; export the mould again.`,
    );
  }
  if (entry.compressedSize > limits.maxPackedPartBytes) {
    return fail(
      'threemf_too_large',
      `The 3MF's part "${entry.name.slice(0, 60)}" is larger than ${megabytes(limits.maxPackedPartBytes)} packed, more than Gelpoint reads from one file; simplify the mesh or export it as binary STL.`,
    );
  }
  if (entry.uncompressedSize > limits.maxPartBytes) return tooLarge(entry.name, megabytes(limits.maxPartBytes));
  if (budget.unpackedBytes + entry.uncompressedSize > limits.maxTotalBytes)
    return tooLarge(entry.name, `${megabytes(limits.maxTotalBytes)} with the other parts`);
  if (entry.uncompressedSize > ratioSlackBytes && entry.uncompressedSize > limits.maxRatio * entry.compressedSize) return tooDense(entry.name, limits.maxRatio);
  return ok(undefined);
}

function tooDense(part: string, ratio: number): Result<never> {
  return fail(
    'threemf_compression_ratio',
    `The 3MF's part "${part.slice(0, 60)}" unpacks to more than ${ratio} times its packed size, far more than any real model packs, so it was refused as a possible zip bomb; export the mould again from your CAD program.`,
  );
}

/**
 * Hands the unpacked bytes of one entry to `sink` in pieces, stopping as soon as a limit is
 * passed: the inflater gets 16 kB of packed data at a time, so no more than about 16 MB is ever
 * unpacked beyond a limit. `sink` returns a refusal to stop early (e.g. bad XML).
 */
export function unpackEntry(bytes: Uint8Array, entry: ZipEntry, budget: ArchiveBudget, sink: (chunk: Uint8Array) => Result<void>): Result<void> {
  const stated = checkStated(entry, budget);
  if (!stated.ok) return stated;
  const data = entryData(bytes, entry);
  if (!data.ok) return data;
  const packed = data.value;
  const { limits } = budget;
  let unpacked = 0;
  /** Packed bytes handed to the inflater so far. */
  let consumed = 0;
  let refusal: Result<void> | null = null;
  const take = (chunk: Uint8Array): void => {
    if (refusal || chunk.length === 0) return;
    unpacked += chunk.length;
    budget.unpackedBytes += chunk.length;
    if (unpacked > limits.maxPartBytes) refusal = tooLarge(entry.name, megabytes(limits.maxPartBytes));
    else if (budget.unpackedBytes > limits.maxTotalBytes) refusal = tooLarge(entry.name, `${megabytes(limits.maxTotalBytes)} with the other parts`);
    else if (entry.method === 8 && unpacked > ratioSlackBytes && unpacked > limits.maxRatio * consumed) refusal = tooDense(entry.name, limits.maxRatio);
    else {
      const r = sink(chunk);
      if (!r.ok) refusal = r;
    }
  };

  if (entry.method === 0) {
    for (let at = 0; at < packed.length && !refusal; at += stepBytes) take(packed.subarray(at, Math.min(packed.length, at + stepBytes)));
    return refusal ?? ok(undefined);
  }
  const inflater = new Inflate((chunk) => take(chunk));
  try {
    for (let at = 0; at < packed.length && !refusal; at += stepBytes) {
      consumed = Math.min(packed.length, at + stepBytes);
      inflater.push(packed.subarray(at, consumed), consumed === packed.length);
    }
    if (packed.length === 0) inflater.push(new Uint8Array(0), true);
  } catch {
    return fail(
      'threemf_invalid',
      `The 3MF's part "${entry.name.slice(0, 60)}" cannot be unpacked (its deflate data is damaged); export the mould again and upload the whole file.`,
    );
  }
  return refusal ?? ok(undefined);
}

/** The whole unpacked entry, for the small parts (relationships). */
export function unpackSmallEntry(bytes: Uint8Array, entry: ZipEntry, budget: ArchiveBudget, maxBytes: number): Result<Uint8Array> {
  const pieces: Uint8Array[] = [];
  let size = 0;
  const read = unpackEntry(bytes, entry, budget, (chunk) => {
    size += chunk.length;
    if (size > maxBytes)
      return fail(
        'threemf_invalid',
        `The 3MF's part "${entry.name.slice(0, 60)}" is larger than ${megabytes(maxBytes)}, far more than such a part holds; export the mould again.`,
      );
    pieces.push(chunk.slice());
    return ok(undefined);
  });
  if (!read.ok) return read;
  const all = new Uint8Array(size);
  let at = 0;
  for (const p of pieces) {
    all.set(p, at);
    at += p.length;
  }
  return ok(all);
}
