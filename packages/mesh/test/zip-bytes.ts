/**
 * Byte-level zip surgery for the tests (PKWARE APPNOTE.TXT §4.3): edit a central directory entry
 * as a hostile or unusual writer would, and write a ZIP64 archive, which fflate does not.
 */
const directorySignature = 0x02014b50;

/** Offset of the central directory entry of `name`, found by its signature and name. */
export function directoryEntryOffset(zip: Uint8Array, name: string): number {
  const view = new DataView(zip.buffer, zip.byteOffset, zip.byteLength);
  const wanted = new TextEncoder().encode(name);
  for (let at = 0; at + 46 <= zip.length; at++) {
    if (view.getUint32(at, true) !== directorySignature) continue;
    const length = view.getUint16(at + 28, true);
    if (length !== wanted.length) continue;
    if (wanted.every((b, i) => zip[at + 46 + i] === b)) return at;
  }
  throw new Error(`no directory entry for ${name}`);
}

/** A copy of the archive whose directory states `size` as the entry's unpacked size. */
export function withStatedSize(zip: Uint8Array, name: string, size: number): Uint8Array {
  const out = zip.slice();
  new DataView(out.buffer).setUint32(directoryEntryOffset(out, name) + 24, size, true);
  return out;
}

/** A copy of the archive with the entry's general-purpose flags and method changed. */
export function withFlagsAndMethod(zip: Uint8Array, name: string, flags: number, method: number): Uint8Array {
  const out = zip.slice();
  const at = directoryEntryOffset(out, name);
  const view = new DataView(out.buffer);
  view.setUint16(at + 8, flags, true);
  view.setUint16(at + 10, method, true);
  return out;
}

/**
 * A ZIP64 archive of stored entries (APPNOTE §4.3.14–4.3.15, §4.5.3): every size and offset in
 * the directory is 0xFFFFFFFF and the real values sit in the ZIP64 extra field, and the end
 * record points to a ZIP64 end record through its locator, as some 3MF writers always do.
 */
export function zip64Stored(files: Record<string, Uint8Array>): Uint8Array {
  const chunks: Uint8Array[] = [];
  let offset = 0;
  const push = (b: Uint8Array): void => {
    chunks.push(b);
    offset += b.length;
  };
  const entries: { name: Uint8Array; offset: number; size: number }[] = [];
  for (const [name, data] of Object.entries(files)) {
    const n = new TextEncoder().encode(name);
    const local = new DataView(new ArrayBuffer(30));
    local.setUint32(0, 0x04034b50, true);
    local.setUint16(4, 45, true);
    local.setUint16(26, n.length, true);
    entries.push({ name: n, offset, size: data.length });
    push(new Uint8Array(local.buffer));
    push(n);
    push(data);
  }
  const directoryStart = offset;
  for (const e of entries) {
    const header = new DataView(new ArrayBuffer(46));
    header.setUint32(0, directorySignature, true);
    header.setUint16(4, 45, true);
    header.setUint16(6, 45, true);
    header.setUint32(20, 0xffffffff, true);
    header.setUint32(24, 0xffffffff, true);
    header.setUint16(28, e.name.length, true);
    header.setUint16(30, 28, true);
    header.setUint32(42, 0xffffffff, true);
    const extra = new DataView(new ArrayBuffer(28));
    extra.setUint16(0, 0x0001, true);
    extra.setUint16(2, 24, true);
    extra.setBigUint64(4, BigInt(e.size), true);
    extra.setBigUint64(12, BigInt(e.size), true);
    extra.setBigUint64(20, BigInt(e.offset), true);
    push(new Uint8Array(header.buffer));
    push(e.name);
    push(new Uint8Array(extra.buffer));
  }
  const directorySize = offset - directoryStart;
  const zip64End = offset;
  const record = new DataView(new ArrayBuffer(56));
  record.setUint32(0, 0x06064b50, true);
  record.setBigUint64(4, 44n, true);
  record.setUint16(12, 45, true);
  record.setUint16(14, 45, true);
  record.setBigUint64(24, BigInt(entries.length), true);
  record.setBigUint64(32, BigInt(entries.length), true);
  record.setBigUint64(40, BigInt(directorySize), true);
  record.setBigUint64(48, BigInt(directoryStart), true);
  push(new Uint8Array(record.buffer));
  const locator = new DataView(new ArrayBuffer(20));
  locator.setUint32(0, 0x07064b50, true);
  locator.setBigUint64(8, BigInt(zip64End), true);
  locator.setUint32(16, 1, true);
  push(new Uint8Array(locator.buffer));
  const end = new DataView(new ArrayBuffer(22));
  end.setUint32(0, 0x06054b50, true);
  end.setUint16(8, 0xffff, true);
  end.setUint16(10, 0xffff, true);
  end.setUint32(12, 0xffffffff, true);
  end.setUint32(16, 0xffffffff, true);
  push(new Uint8Array(end.buffer));
  const out = new Uint8Array(offset);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.length;
  }
  return out;
}
