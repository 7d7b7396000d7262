import { fail, ok, type Result } from '../result';
import type { TriangleSoup } from './triangle-soup';

const enum Byte {
  Tab = 9,
  LineFeed = 10,
  VerticalTab = 11,
  FormFeed = 12,
  Return = 13,
  Space = 32,
  Plus = 43,
  Minus = 45,
  Dot = 46,
  Zero = 48,
  Nine = 57,
  UpperE = 69,
  LowerE = 101,
}

function isSpace(b: number): boolean {
  return b === Byte.Space || (b >= Byte.Tab && b <= Byte.Return);
}

function keyword(text: string): Uint8Array {
  return Uint8Array.from(text, (c) => c.charCodeAt(0));
}

const words = {
  solid: keyword('solid'),
  endsolid: keyword('endsolid'),
  facet: keyword('facet'),
  normal: keyword('normal'),
  outer: keyword('outer'),
  loop: keyword('loop'),
  vertex: keyword('vertex'),
  endloop: keyword('endloop'),
  endfacet: keyword('endfacet'),
};

/**
 * Reads an ASCII STL: one or more `solid … endsolid` blocks (or bare facets to the end of the
 * file, as some writers leave them), any whitespace (CRLF included),
 * numbers with or without exponents. Keywords are matched case-insensitively because exporters
 * disagree on case; the grammar is otherwise strict so a damaged file is refused, not guessed at.
 */
export function parseAsciiStl(bytes: Uint8Array, maxTriangles: number): Result<TriangleSoup> {
  const n = bytes.length;
  let pos = 0;
  let tokenStart = 0;
  let tokenEnd = 0;
  let positions = new Float32Array(Math.max(9, Math.min(9 * maxTriangles, Math.ceil(n / 160) * 9)));
  let triangleCount = 0;

  const lineAt = (at: number): number => {
    let line = 1;
    for (let i = 0; i < at && i < n; i++) if (bytes[i] === Byte.LineFeed) line++;
    return line;
  };

  /** Moves to the next token; false at the end of the file. */
  const nextToken = (): boolean => {
    while (pos < n && isSpace(bytes[pos]!)) pos++;
    if (pos >= n) return false;
    tokenStart = pos;
    while (pos < n && !isSpace(bytes[pos]!)) pos++;
    tokenEnd = pos;
    return true;
  };

  const tokenIs = (word: Uint8Array): boolean => {
    if (tokenEnd - tokenStart !== word.length) return false;
    for (let i = 0; i < word.length; i++) {
      const b = bytes[tokenStart + i]!;
      // ASCII lower-casing: letters differ from their capitals by bit 0x20.
      if ((b | 0x20) !== word[i]) return false;
    }
    return true;
  };

  const tokenText = (): string => {
    let s = '';
    for (let i = tokenStart; i < tokenEnd && i < tokenStart + 40; i++) s += String.fromCharCode(bytes[i]!);
    return s;
  };

  const skipRestOfLine = (): void => {
    while (pos < n && bytes[pos] !== Byte.LineFeed && bytes[pos] !== Byte.Return) pos++;
  };

  const truncated = (what: string): Result<TriangleSoup> =>
    fail(
      'stl_truncated',
      `The ASCII STL ends before ${what} (after ${triangleCount} complete facets); the upload or export was cut short, so send the whole file.`,
    );

  const unexpected = (what: string): Result<TriangleSoup> =>
    fail(
      'stl_not_stl',
      `Line ${lineAt(tokenStart)} of the ASCII STL has "${tokenText()}" where ${what} was expected; this is not a valid STL file, so export the mould as STL again.`,
    );

  const expectWord = (word: Uint8Array, label: string): Result<TriangleSoup> | null => {
    if (!nextToken()) return truncated(`"${label}"`);
    if (!tokenIs(word)) return unexpected(`"${label}"`);
    return null;
  };

  /** A decimal number by the STL grammar; NaN for nan/inf spellings, undefined for anything else. */
  const readNumber = (): number | undefined => {
    let i = tokenStart;
    if (i < tokenEnd && (bytes[i] === Byte.Plus || bytes[i] === Byte.Minus)) i++;
    let digits = 0;
    while (i < tokenEnd && bytes[i]! >= Byte.Zero && bytes[i]! <= Byte.Nine) {
      i++;
      digits++;
    }
    if (i < tokenEnd && bytes[i] === Byte.Dot) {
      i++;
      while (i < tokenEnd && bytes[i]! >= Byte.Zero && bytes[i]! <= Byte.Nine) {
        i++;
        digits++;
      }
    }
    if (digits === 0) {
      const word = tokenText().replace(/^[+-]/, '').toLowerCase();
      return word === 'nan' || word === 'inf' || word === 'infinity' ? Number.NaN : undefined;
    }
    if (i < tokenEnd && (bytes[i] === Byte.UpperE || bytes[i] === Byte.LowerE)) {
      i++;
      if (i < tokenEnd && (bytes[i] === Byte.Plus || bytes[i] === Byte.Minus)) i++;
      let expDigits = 0;
      while (i < tokenEnd && bytes[i]! >= Byte.Zero && bytes[i]! <= Byte.Nine) {
        i++;
        expDigits++;
      }
      if (expDigits === 0) return undefined;
    }
    if (i !== tokenEnd) return undefined;
    // Number() rounds correctly, so a value written with enough digits reads back bit for bit.
    let text = '';
    for (let k = tokenStart; k < tokenEnd; k++) text += String.fromCharCode(bytes[k]!);
    return Number(text);
  };

  const readCoordinate = (label: string, ignoreNonFinite: boolean): Result<TriangleSoup> | number => {
    if (!nextToken()) return truncated(`the ${label}`);
    const v = readNumber();
    if (v === undefined) return unexpected(`a number (${label})`);
    if (ignoreNonFinite) return v;
    if (!Number.isFinite(v)) {
      return fail(
        'stl_non_finite',
        `Line ${lineAt(tokenStart)} of the ASCII STL has the coordinate "${tokenText()}", which is not a finite number; repair or re-export the mesh.`,
      );
    }
    // Corners are kept as float32 like a binary STL's, and 1e39 is finite only in float64.
    if (!Number.isFinite(Math.fround(v))) {
      return fail(
        'stl_non_finite',
        `Line ${lineAt(tokenStart)} of the ASCII STL has the coordinate "${tokenText()}", beyond the ±3.4e38 an STL coordinate can hold; check the units and re-export the mesh.`,
      );
    }
    return v;
  };

  if (!nextToken()) return unexpected('"solid"');
  // Some writers leave out the `solid` line: the facets then run to the end of the file.
  const implicitSolid = tokenIs(words.facet);
  if (implicitSolid) pos = tokenStart;
  else if (!tokenIs(words.solid)) return unexpected('"solid"');
  solids: for (;;) {
    if (!implicitSolid) skipRestOfLine();
    for (;;) {
      if (!nextToken()) {
        if (implicitSolid) break solids;
        return truncated('"endsolid"');
      }
      if (tokenIs(words.endsolid)) break;
      if (!tokenIs(words.facet)) return unexpected('"facet" or "endsolid"');
      const bad = expectWord(words.normal, 'normal');
      if (bad) return bad;
      for (let k = 0; k < 3; k++) {
        // The stored normal is recomputed from the corners, so a degenerate facet's NaN normal is harmless.
        const v = readCoordinate('facet normal', true);
        if (typeof v !== 'number') return v;
      }
      const badLoop = expectWord(words.outer, 'outer') ?? expectWord(words.loop, 'loop');
      if (badLoop) return badLoop;
      if (triangleCount >= maxTriangles) {
        return fail(
          'stl_too_many_triangles',
          `The STL holds more than ${maxTriangles} triangles, the most this service accepts; decimate the mesh in your CAD program and upload it again.`,
        );
      }
      if ((triangleCount + 1) * 9 > positions.length) {
        const grown = new Float32Array(positions.length * 2);
        grown.set(positions);
        positions = grown;
      }
      const out = triangleCount * 9;
      for (let corner = 0; corner < 3; corner++) {
        if (!nextToken()) return truncated('the third "vertex" of a facet');
        if (!tokenIs(words.vertex)) return unexpected('"vertex" (a facet has exactly three)');
        for (let k = 0; k < 3; k++) {
          const v = readCoordinate('vertex coordinate', false);
          if (typeof v !== 'number') return v;
          positions[out + corner * 3 + k] = v;
        }
      }
      const badEnd = expectWord(words.endloop, 'endloop') ?? expectWord(words.endfacet, 'endfacet');
      if (badEnd) return badEnd;
      triangleCount++;
    }
    skipRestOfLine();
    if (!nextToken()) break;
    if (!tokenIs(words.solid)) return unexpected('"solid" or the end of the file');
  }
  if (triangleCount === 0) {
    return fail('stl_no_triangles', 'The ASCII STL has no facets; export the mould again with its surface included.');
  }
  return ok({ positions: positions.slice(0, triangleCount * 9), triangleCount, format: 'ascii', warnings: [] });
}
