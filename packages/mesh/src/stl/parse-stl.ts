import { otherFormatOf } from '../file-signatures';
import { fail, type Result } from '../result';
import { looksLikeText, onlyWhitespace, opensWith, withoutByteOrderMark } from '../text-bytes';
import { parseAsciiStl } from './parse-ascii-stl';
import { binaryLayout, isExactBinary, parseBinaryStl } from './parse-binary-stl';
import { defaultMaxTriangles, type ParseStlOptions, type TriangleSoup } from './triangle-soup';

/**
 * True when the bytes read as an ASCII STL: text that opens with `solid`, or with `facet` as some
 * writers do who leave the `solid` line out.
 */
export function looksLikeAsciiStl(bytes: Uint8Array): boolean {
  return (opensWith(bytes, 'solid') || opensWith(bytes, 'facet')) && looksLikeText(bytes);
}

/**
 * Parses a binary or ASCII STL. The format is decided by the content, never by the first word
 * alone: many binary exporters start their 80-byte header with "solid". A file whose size follows
 * the binary rule (84 + 50 × count bytes) exactly is binary unless it reads as ASCII; text that
 * reads as ASCII STL is ASCII; any other binary file is read record by record from its size,
 * with a warning, since writers leave the count at 0 or wrong and add stray bytes at the end.
 */
export function parseStl(bytes: Uint8Array, options: ParseStlOptions = {}): Result<TriangleSoup> {
  const maxTriangles = options.maxTriangles ?? defaultMaxTriangles;
  if (!Number.isInteger(maxTriangles) || maxTriangles < 1) {
    return fail('option_invalid', `maxTriangles must be a whole number of at least 1, got ${String(maxTriangles)}.`);
  }
  if (bytes.length === 0) return fail('stl_empty', 'The STL file is empty (0 bytes); choose the exported mould file and upload it again.');
  if (onlyWhitespace(bytes)) return fail('stl_empty', 'The STL file holds nothing but whitespace; choose the exported mould file and upload it again.');

  const layout = binaryLayout(bytes);
  const ascii = looksLikeAsciiStl(bytes);
  if (isExactBinary(layout)) {
    if (ascii) {
      const read = parseAsciiStl(withoutByteOrderMark(bytes), maxTriangles);
      if (read.ok) return read;
    }
    return parseBinaryStl(bytes, maxTriangles, options.consumeBytes === true);
  }
  if (ascii) return parseAsciiStl(withoutByteOrderMark(bytes), maxTriangles);
  if (looksLikeText(bytes)) {
    return fail(
      'stl_not_stl',
      'The file is text but does not begin with "solid" or "facet", so it is not an ASCII STL; export the mould as STL and upload that file.',
    );
  }
  const other = otherFormatOf(bytes) ?? (bytes[0] === 0x50 && bytes[1] === 0x4b ? 'a zip archive (a 3MF, perhaps)' : null);
  if (other !== null) return fail('stl_not_stl', `The file is ${other}, not an STL; export the mould as STL and upload that file.`);
  return parseBinaryStl(bytes, maxTriangles, options.consumeBytes === true);
}
