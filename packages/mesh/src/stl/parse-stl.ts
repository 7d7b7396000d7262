import { fail, type Result } from '../result';
import { parseAsciiStl } from './parse-ascii-stl';
import { announcedTriangleCount, binaryHeaderBytes, binaryRecordBytes, parseBinaryStl } from './parse-binary-stl';
import { defaultMaxTriangles, type ParseStlOptions, type TriangleSoup } from './triangle-soup';

function isTextByte(b: number): boolean {
  // Tab, line breaks and printable ASCII; bytes from 128 up may be UTF-8 in a solid's name.
  return (b >= 9 && b <= 13) || (b >= 32 && b <= 126) || b >= 128;
}

function looksLikeText(bytes: Uint8Array): boolean {
  for (let i = 0; i < bytes.length; i++) if (!isTextByte(bytes[i]!)) return false;
  return true;
}

function onlyWhitespace(bytes: Uint8Array): boolean {
  for (let i = 0; i < bytes.length; i++) {
    const b = bytes[i]!;
    if (!(b === 32 || (b >= 9 && b <= 13))) return false;
  }
  return true;
}

/** True when the bytes open with the word `solid` (after an optional UTF-8 byte-order mark and spaces). */
function opensWithSolid(bytes: Uint8Array): boolean {
  let i = bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf ? 3 : 0;
  while (i < bytes.length && (bytes[i] === 32 || (bytes[i]! >= 9 && bytes[i]! <= 13))) i++;
  const word = 'solid';
  for (let k = 0; k < word.length; k++) if ((bytes[i + k]! | 0x20) !== word.charCodeAt(k)) return false;
  const after = bytes[i + word.length];
  return after === undefined || after === 32 || (after >= 9 && after <= 13);
}

function withoutByteOrderMark(bytes: Uint8Array): Uint8Array {
  return bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf ? bytes.subarray(3) : bytes;
}

/**
 * Parses a binary or ASCII STL. The format is decided by the size rule of binary STL
 * (84 + 50 × count bytes) and by the content, never by the first word alone: many binary
 * exporters start their 80-byte header with "solid".
 */
export function parseStl(bytes: Uint8Array, options: ParseStlOptions = {}): Result<TriangleSoup> {
  const maxTriangles = options.maxTriangles ?? defaultMaxTriangles;
  if (!Number.isInteger(maxTriangles) || maxTriangles < 1) {
    return fail('option_invalid', `maxTriangles must be a whole number of at least 1, got ${String(maxTriangles)}.`);
  }
  if (bytes.length === 0) return fail('stl_empty', 'The STL file is empty (0 bytes); choose the exported mould file and upload it again.');
  if (onlyWhitespace(bytes)) return fail('stl_empty', 'The STL file holds nothing but whitespace; choose the exported mould file and upload it again.');

  const count = announcedTriangleCount(bytes);
  const binarySized = count !== null && binaryHeaderBytes + binaryRecordBytes * count === bytes.length;
  const text = opensWithSolid(bytes) && looksLikeText(bytes);
  if (binarySized) {
    if (text) {
      const ascii = parseAsciiStl(withoutByteOrderMark(bytes), maxTriangles);
      if (ascii.ok) return ascii;
    }
    return parseBinaryStl(bytes, maxTriangles);
  }
  if (text) return parseAsciiStl(withoutByteOrderMark(bytes), maxTriangles);
  if (looksLikeText(bytes)) {
    return fail('stl_not_stl', 'The file is text but does not begin with "solid", so it is not an ASCII STL; export the mould as STL and upload that file.');
  }
  if (count === null) {
    return fail('stl_truncated', `The file is only ${bytes.length} bytes, shorter than the 84-byte header of a binary STL; the upload or export was cut short.`);
  }
  const expected = binaryHeaderBytes + binaryRecordBytes * count;
  if (expected > bytes.length) {
    return fail('stl_truncated', `The binary STL announces ${count} triangles (${expected} bytes) but the file has only ${bytes.length} bytes; the upload or export was cut short, so send the whole file.`);
  }
  return fail('stl_not_stl', `The file has ${bytes.length - expected} bytes more than the ${count} triangles its header announces, so it is not a binary STL; export the mould as STL and upload that file.`);
}
