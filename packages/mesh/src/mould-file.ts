import { notAMouldMessage, otherFormatOf } from './file-signatures';
import type { FileUnits } from './frame';
import { parseObj } from './obj/parse-obj';
import { fail, ok, type MeshError, type Result } from './result';
import { binaryLayout, isExactBinary } from './stl/parse-binary-stl';
import { looksLikeAsciiStl, parseStl } from './stl/parse-stl';
import { defaultMaxTriangles, type TriangleSoup } from './stl/triangle-soup';
import { looksLikeText, onlyWhitespace } from './text-bytes';
import type { ArchiveLimits } from './threemf/archive-limits';
import { read3mf } from './threemf/read-3mf';

export type MouldFormat = 'stl' | '3mf' | 'obj';

export interface ReadMouldFileOptions {
  /** Refuse files with more triangles than this (memory guard for uploads). Default 5,000,000. */
  maxTriangles?: number;
  /** Zip-bomb limits for 3MF; defaults in `defaultArchiveLimits`. */
  archiveLimits?: Partial<ArchiveLimits>;
  /** The reader may overwrite the bytes (see ParseStlOptions.consumeBytes); only a binary STL uses it. */
  consumeBytes?: boolean;
}

export interface MouldFile {
  soup: TriangleSoup;
  format: MouldFormat;
  /** The unit the file states (3MF); null for STL and OBJ, which carry none. */
  fileUnits: FileUnits | null;
}

const objKeywords = new Set([
  'v',
  'vt',
  'vn',
  'vp',
  'f',
  'fo',
  'l',
  'p',
  'g',
  'o',
  's',
  'mg',
  'usemtl',
  'mtllib',
  'maplib',
  'usemap',
  'cstype',
  'deg',
  'curv',
  'curv2',
  'surf',
  'lod',
  'bevel',
  'c_interp',
  'd_interp',
  'shadow_obj',
  'trace_obj',
]);
/** How much of a text file is looked at to tell OBJ from other text. */
const sniffBytes = 256 * 1024;

/** Zip archives open with a local file header, "PK\x03\x04" (PKWARE APPNOTE.TXT §4.3.7); an empty one with its end record. */
function isZip(bytes: Uint8Array): boolean {
  return bytes[0] === 0x50 && bytes[1] === 0x4b && ((bytes[2] === 3 && bytes[3] === 4) || (bytes[2] === 5 && bytes[3] === 6));
}

/**
 * True for text whose first statement is an OBJ keyword and that has `v` lines near its start.
 * Comments (`#`) and blank lines may come first.
 */
function looksLikeObj(bytes: Uint8Array): boolean {
  const head = new TextDecoder('utf-8').decode(bytes.subarray(0, sniffBytes));
  let firstKeyword: string | null = null;
  let vertexLine = false;
  for (const raw of head.split('\n')) {
    const line = raw.trim();
    if (line === '' || line.startsWith('#')) continue;
    const keyword = line.split(/\s+/, 1)[0]!;
    firstKeyword ??= keyword;
    if (keyword === 'v') {
      vertexLine = true;
      break;
    }
  }
  return firstKeyword !== null && objKeywords.has(firstKeyword) && vertexLine;
}

/** Which mould format the bytes are, by content alone; null when they are none of STL, 3MF and OBJ. */
export function detectMouldFormat(bytes: Uint8Array): MouldFormat | null {
  if (bytes.length === 0) return null;
  if (isZip(bytes)) return '3mf';
  if (isExactBinary(binaryLayout(bytes))) return 'stl';
  if (looksLikeText(bytes)) {
    if (looksLikeAsciiStl(bytes)) return 'stl';
    return looksLikeObj(bytes) ? 'obj' : null;
  }
  if (otherFormatOf(bytes) !== null) return null;
  // Binary data that is no other known format is read as a binary STL with a quirky header.
  return bytes.length > 84 ? 'stl' : null;
}

/** The reader's refusal, or a sentence that says which format the file seemed to be. */
function unknownFormat(bytes: Uint8Array): MeshError {
  const other = otherFormatOf(bytes);
  if (other !== null) return { code: 'file_not_mould', message: notAMouldMessage(other) };
  if (looksLikeText(bytes)) {
    return {
      code: 'file_not_mould',
      message:
        'The file is text but neither an ASCII STL (which begins with "solid") nor an OBJ (which has "v" and "f" lines); export the mould as STL, 3MF or OBJ and upload that file.',
    };
  }
  return {
    code: 'file_not_mould',
    message: `The file is only ${bytes.length} bytes of binary data, too short for any mould file; export the mould as STL, 3MF or OBJ and upload the whole file.`,
  };
}

/**
 * Reads a mould file of any of the formats shops export, told apart by content, never by name:
 * a zip archive is a 3MF, text with OBJ statements is an OBJ, and STL is binary (by its size rule
 * or, failing that, record by record) or ASCII (`solid` … `facet`). Every format gives the same
 * TriangleSoup; a 3MF also gives the unit it states.
 */
export function readMouldFile(bytes: Uint8Array, options: ReadMouldFileOptions = {}): Result<MouldFile> {
  const maxTriangles = options.maxTriangles ?? defaultMaxTriangles;
  if (!Number.isInteger(maxTriangles) || maxTriangles < 1) {
    return fail('option_invalid', `maxTriangles must be a whole number of at least 1, got ${String(maxTriangles)}.`);
  }
  if (bytes.length === 0) return fail('file_empty', 'The file is empty (0 bytes); choose the exported mould file and upload it again.');
  if (onlyWhitespace(bytes)) return fail('file_empty', 'The file holds nothing but whitespace; choose the exported mould file and upload it again.');
  const format = detectMouldFormat(bytes);
  if (format === '3mf') {
    const read = read3mf(bytes, { maxTriangles, ...(options.archiveLimits ? { archiveLimits: options.archiveLimits } : {}) });
    return read.ok ? ok({ soup: read.value.soup, format, fileUnits: read.value.fileUnits }) : read;
  }
  if (format === 'obj') {
    const read = parseObj(bytes, { maxTriangles });
    return read.ok ? ok({ soup: read.value, format, fileUnits: null }) : read;
  }
  if (format === 'stl') {
    const read = parseStl(bytes, { maxTriangles, consumeBytes: options.consumeBytes === true });
    return read.ok ? ok({ soup: read.value, format, fileUnits: null }) : read;
  }
  const refusal = unknownFormat(bytes);
  return fail(refusal.code, refusal.message);
}
