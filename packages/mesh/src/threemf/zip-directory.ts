import { fail, ok, type Result } from '../result';

/**
 * The central directory of a zip archive (PKWARE APPNOTE.TXT §4.3.12–4.3.16), ZIP64 included
 * (§4.3.14, §4.5.3), which a 3MF reader must accept. Only the directory is read here: names, sizes
 * and where each entry's data starts, so the caller can check the sizes before inflating anything.
 */
export interface ZipEntry {
  /** The entry's name as stored, e.g. "3D/3dmodel.model". */
  name: string;
  /** 0 stored, 8 deflated (the only two a 3MF may use). */
  method: number;
  encrypted: boolean;
  compressedSize: number;
  /** As the directory states it; a hostile archive may lie, so inflating counts for itself. */
  uncompressedSize: number;
  /** Offset of the entry's local header. */
  localHeaderOffset: number;
}

const endOfDirectorySignature = 0x06054b50;
const zip64LocatorSignature = 0x07064b50;
const zip64EndSignature = 0x06064b50;
const directorySignature = 0x02014b50;
const localHeaderSignature = 0x04034b50;
const maxEntries = 100_000;
/** The end record is 22 bytes plus a comment of at most 65,535. */
const endSearchSpan = 22 + 0xffff;

const broken = (what: string): Result<never> =>
  fail(
    'threemf_invalid',
    `The 3MF's zip structure is damaged (${what}); the upload or export was probably cut short, so export the mould again and upload the whole file.`,
  );

function u64(view: DataView, at: number): number {
  const value = view.getUint32(at, true) + view.getUint32(at + 4, true) * 2 ** 32;
  return Number.isSafeInteger(value) ? value : Number.POSITIVE_INFINITY;
}

/** Part names compare without a leading slash, with %-escapes decoded and ASCII case folded (OPC part names). */
export function partKey(name: string): string {
  let decoded = name;
  try {
    decoded = decodeURIComponent(name);
  } catch {
    // A stray % is kept as written.
  }
  return decoded.replace(/\\/g, '/').replace(/^\/+/, '').toLowerCase();
}

export function readZipDirectory(bytes: Uint8Array): Result<Map<string, ZipEntry>> {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  let end = -1;
  for (let at = bytes.length - 22; at >= 0 && at >= bytes.length - endSearchSpan; at--) {
    if (view.getUint32(at, true) === endOfDirectorySignature) {
      end = at;
      break;
    }
  }
  if (end < 0) return broken('no end-of-directory record');
  let entryCount = view.getUint16(end + 10, true);
  let directorySize = view.getUint32(end + 12, true);
  let directoryOffset = view.getUint32(end + 16, true);
  if (entryCount === 0xffff || directorySize === 0xffffffff || directoryOffset === 0xffffffff) {
    const locator = end - 20;
    if (locator < 0 || view.getUint32(locator, true) !== zip64LocatorSignature) return broken('a ZIP64 archive without its locator');
    const record = u64(view, locator + 8);
    if (!(record + 56 <= bytes.length) || view.getUint32(record, true) !== zip64EndSignature) return broken('a ZIP64 end record out of place');
    entryCount = u64(view, record + 32);
    directorySize = u64(view, record + 40);
    directoryOffset = u64(view, record + 48);
  }
  if (!(directoryOffset + directorySize <= bytes.length)) return broken('the directory lies outside the file');
  if (entryCount > maxEntries) return broken(`${entryCount} entries`);

  const entries = new Map<string, ZipEntry>();
  const names = new TextDecoder('utf-8');
  let at = directoryOffset;
  for (let i = 0; i < entryCount; i++) {
    if (at + 46 > bytes.length || view.getUint32(at, true) !== directorySignature) return broken('a directory entry out of place');
    const flags = view.getUint16(at + 8, true);
    const method = view.getUint16(at + 10, true);
    let compressedSize = view.getUint32(at + 20, true);
    let uncompressedSize = view.getUint32(at + 24, true);
    const nameLength = view.getUint16(at + 28, true);
    const extraLength = view.getUint16(at + 30, true);
    const commentLength = view.getUint16(at + 32, true);
    let localHeaderOffset = view.getUint32(at + 42, true);
    const nameStart = at + 46;
    const extraStart = nameStart + nameLength;
    const next = extraStart + extraLength + commentLength;
    if (next > bytes.length) return broken('a directory entry runs past the end');
    // APPNOTE §4.5.3: the ZIP64 extra field holds, in this order, only the sizes that overflowed.
    for (let x = extraStart; x + 4 <= extraStart + extraLength;) {
      const id = view.getUint16(x, true);
      const size = view.getUint16(x + 2, true);
      if (id === 0x0001) {
        let field = x + 4;
        const fieldEnd = field + size;
        const take = (): number => {
          if (field + 8 > fieldEnd) return Number.POSITIVE_INFINITY;
          const v = u64(view, field);
          field += 8;
          return v;
        };
        if (uncompressedSize === 0xffffffff) uncompressedSize = take();
        if (compressedSize === 0xffffffff) compressedSize = take();
        if (localHeaderOffset === 0xffffffff) localHeaderOffset = take();
      }
      x += 4 + size;
    }
    const name = names.decode(bytes.subarray(nameStart, extraStart));
    if (!(localHeaderOffset + 30 <= bytes.length)) return broken(`the entry "${name.slice(0, 60)}" starts outside the file`);
    entries.set(partKey(name), { name, method, encrypted: (flags & 1) === 1, compressedSize, uncompressedSize, localHeaderOffset });
    at = next;
  }
  return ok(entries);
}

/** The packed bytes of an entry: after its local header, whose name and extra lengths may differ from the directory's. */
export function entryData(bytes: Uint8Array, entry: ZipEntry): Result<Uint8Array> {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const at = entry.localHeaderOffset;
  if (view.getUint32(at, true) !== localHeaderSignature) return broken(`the entry "${entry.name.slice(0, 60)}" has no local header`);
  const start = at + 30 + view.getUint16(at + 26, true) + view.getUint16(at + 28, true);
  if (!(start + entry.compressedSize <= bytes.length)) return broken(`the entry "${entry.name.slice(0, 60)}" runs past the end of the file`);
  return ok(bytes.subarray(start, start + entry.compressedSize));
}
