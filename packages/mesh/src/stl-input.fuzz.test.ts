import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cellSolid } from '../test/moulds';
import { analyzeStl } from './analyze-stl';
import type { FileUnits, UpAxis } from './frame';
import type { MeshErrorCode, Result } from './result';
import { encodeStlAscii, encodeStlBinary } from './stl/encode-stl';
import { parseStl } from './stl/parse-stl';
import { defaultMaxTriangles, type TriangleSoup } from './stl/triangle-soup';

// Layout of binary STL (StereoLithography Interface Specification, 3D Systems 1988, from memory):
// 80-byte header, little-endian uint32 triangle count at byte 80, then 50 bytes per triangle
// (normal, three corners as 12 little-endian float32, a 2-byte attribute word).
const headerBytes = 84;
const recordBytes = 50;

const errorCodes: readonly MeshErrorCode[] = [
  'file_empty',
  'file_not_mould',
  'too_many_triangles',
  'stl_empty',
  'stl_truncated',
  'stl_not_stl',
  'stl_non_finite',
  'stl_too_many_triangles',
  'stl_no_triangles',
  'mesh_degenerate',
  'option_invalid',
  'level_invalid',
  'levels_not_ascending',
  'dam_invalid',
  'analysis_invalid',
];

// Generous for a loaded 2-core machine; a quadratic scan or a runaway loop blows well past them.
const parseBudgetMs = 200;
const analyzeBudgetMs = 3000;

const text = (s: string): Uint8Array => new TextEncoder().encode(s);

/** Runs f and reports how long it took; a throw is left to escape so fast-check shows the case. */
function timed<T>(f: () => T): { value: T; ms: number } {
  const start = performance.now();
  const value = f();
  return { value, ms: performance.now() - start };
}

/** Either a result or a typed refusal whose message is a sentence for people. */
function expectValue<T>(result: Result<T>): void {
  expect(typeof result.ok).toBe('boolean');
  if (result.ok) return;
  expect(errorCodes).toContain(result.error.code);
  expect(result.error.message.length).toBeGreaterThan(20);
  expect(result.error.message).toMatch(/[.]$/);
}

function expectSoup(result: Result<TriangleSoup>, byteLength: number): void {
  expectValue(result);
  if (!result.ok) return;
  const { positions, triangleCount } = result.value;
  expect(triangleCount).toBeGreaterThan(0);
  expect(positions.length).toBe(9 * triangleCount);
  expect(positions.every(Number.isFinite)).toBe(true);
  // Neither format packs a triangle into fewer bytes than binary's 50-byte record (an ASCII facet
  // is at least 24 tokens), so the count a file yields is bounded by the bytes it really has.
  expect(recordBytes * triangleCount).toBeLessThanOrEqual(byteLength);
}

/**
 * Bytes of every Float32Array made while f runs (the parser's only buffers). The global is
 * swapped for a counting subclass, so `slice` and growth copies are counted too.
 */
function float32BytesDuring<T>(f: () => T): { value: T; bytes: number } {
  const original = globalThis.Float32Array;
  let bytes = 0;
  class Counting extends original {
    constructor(...args: unknown[]) {
      super(...(args as [ArrayBuffer]));
      bytes += this.byteLength;
    }
  }
  globalThis.Float32Array = Counting as typeof Float32Array;
  try {
    return { value: f(), bytes };
  } finally {
    globalThis.Float32Array = original;
  }
}

/** The checks every input gets: a value, in time, with buffers bounded by the bytes it really has. */
function checkParse(bytes: Uint8Array): Result<TriangleSoup> {
  const run = float32BytesDuring(() => timed(() => parseStl(bytes)));
  expectSoup(run.value.value, bytes.length);
  expect(run.value.ms).toBeLessThan(parseBudgetMs);
  // ASCII starts from an estimate and doubles, so it may hold twice what it needs, and what it
  // needs (36 bytes a triangle) is less than the ~80 bytes of text a facet takes at the least.
  expect(run.bytes).toBeLessThanOrEqual(2 * bytes.length + 1024);
  return run.value.value;
}

function checkAnalyze(bytes: Uint8Array, frame: { up: UpAxis; units: FileUnits } = { up: 'z', units: 'mm' }): void {
  const run = timed(() => analyzeStl(bytes, { ...frame, maxColumns: 4096 }));
  expectValue(run.value);
  expect(run.ms).toBeLessThan(analyzeBudgetMs);
  if (run.value.ok) {
    const a = run.value.value;
    expect([...a.bboxMm.min, ...a.bboxMm.max].every(Number.isFinite)).toBe(true);
    expect(a.enclosedVolumeMm3 === null || Number.isFinite(a.enclosedVolumeMm3)).toBe(true);
    expect(Number.isFinite(a.surfaceAreaMm2)).toBe(true);
  }
}

/** A 20 × 10 × 5 block with a 3-cell step: closed, 30-odd triangles, a valid file both ways. */
const block = cellSolid([0, 8, 14, 20], [0, 10], [0, 3, 5], (i, _j, k) => k === 0 || i !== 1);
const validBinary = encodeStlBinary(block);
const validBinarySolidHeader = encodeStlBinary(block, 'solid block exported by a CAD program');
const validAscii = encodeStlAscii(block);
const validAsciiCrlf = encodeStlAscii(block, { lineEnding: '\r\n', solidName: 'blöck' });

type Mutation =
  | { kind: 'truncate'; at: number }
  | { kind: 'flip'; at: number; mask: number }
  | { kind: 'count'; count: number }
  | { kind: 'float'; record: number; slot: number; value: number }
  | { kind: 'append'; extra: Uint8Array }
  | { kind: 'solidHeader' };

const specialFloats = fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, 3.4e38, -3.4e38, 1e-45, 0, -0);

const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  fc.record({ kind: fc.constant('truncate' as const), at: fc.nat() }),
  fc.record({ kind: fc.constant('flip' as const), at: fc.nat(), mask: fc.integer({ min: 1, max: 255 }) }),
  fc.record({
    kind: fc.constant('count' as const),
    count: fc.oneof(
      fc.constantFrom(0, 1, 2 ** 31, 2 ** 32 - 1, defaultMaxTriangles, defaultMaxTriangles + 1),
      fc.nat(),
      fc.integer({ min: 0, max: 2 ** 32 - 1 }),
    ),
  }),
  fc.record({ kind: fc.constant('float' as const), record: fc.nat(), slot: fc.integer({ min: 0, max: 11 }), value: fc.oneof(specialFloats, fc.float()) }),
  fc.record({ kind: fc.constant('append' as const), extra: fc.uint8Array({ minLength: 1, maxLength: 120 }) }),
  fc.constant({ kind: 'solidHeader' as const }),
);

function applied(source: Uint8Array, mutations: Mutation[]): Uint8Array {
  let bytes = source.slice();
  for (const m of mutations) {
    const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
    if (m.kind === 'truncate') bytes = bytes.slice(0, m.at % (bytes.length + 1));
    else if (m.kind === 'flip' && bytes.length > 0) bytes[m.at % bytes.length]! ^= m.mask;
    else if (m.kind === 'count' && bytes.length >= headerBytes) view.setUint32(80, m.count, true);
    else if (m.kind === 'float') {
      const records = Math.floor((bytes.length - headerBytes) / recordBytes);
      if (records > 0) view.setFloat32(headerBytes + (m.record % records) * recordBytes + 4 * m.slot, m.value, true);
    } else if (m.kind === 'append') {
      const grown = new Uint8Array(bytes.length + m.extra.length);
      grown.set(bytes);
      grown.set(m.extra, bytes.length);
      bytes = grown;
    } else if (m.kind === 'solidHeader') bytes.set(text('solid x\n').subarray(0, Math.min(8, bytes.length)));
  }
  return bytes;
}

/** Words a damaged ASCII STL might carry where a keyword or number belongs. */
const asciiToken = fc.oneof(
  fc.constantFrom(
    'solid',
    'endsolid',
    'facet',
    'normal',
    'outer',
    'loop',
    'vertex',
    'endloop',
    'endfacet',
    'FACET',
    'Vertex',
    'nan',
    '-NaN',
    'inf',
    '-inf',
    'Infinity',
    '1e39',
    '-1e39',
    '3.4028236e38',
    '1e-46',
    '1e',
    '1e+',
    '.',
    '-',
    '+.e1',
    '0x1p3',
    '1,5',
    '1.5.5',
    '٣',
    '１',
    '\u00a0',
    '\u2028',
    '\t',
    '\r\n',
    '\r',
    '\n',
    '\uFEFF',
    '\0',
  ),
  fc.double().map(String),
  fc.string({ maxLength: 12 }),
  fc.string({ unit: 'binary', maxLength: 12 }),
);

type AsciiEdit = { at: number; op: 'insert' | 'replace' | 'delete'; token: string };
const asciiEdit: fc.Arbitrary<AsciiEdit> = fc.record({ at: fc.nat(), op: fc.constantFrom('insert', 'replace', 'delete'), token: asciiToken });

/** Edits the whitespace-separated tokens of an ASCII STL, keeping its line structure otherwise. */
function edited(source: string, edits: AsciiEdit[]): string {
  const parts = source.split(/(\s+)/);
  for (const e of edits) {
    const i = parts.length === 0 ? 0 : e.at % parts.length;
    if (e.op === 'insert') parts.splice(i, 0, ' ', e.token, ' ');
    else if (e.op === 'replace') parts[i] = e.token;
    else parts.splice(i, 1);
  }
  return parts.join('');
}

describe('parseStl and analyzeStl on hostile input: a value, never a throw, in bounded time and memory', () => {
  it('answers arbitrary bytes', () => {
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 2048 }), (bytes) => {
        checkParse(bytes);
      }),
      { numRuns: 400 },
    );
  });

  it('answers arbitrary text, with or without a "solid" opening, a byte-order mark or CRLF', () => {
    const prefix = fc.constantFrom('', 'solid ', 'solid x\n', '\uFEFFsolid x\r\n', '  SOLID\t', 'solid\n facet normal 0 0 1\n outer loop\n');
    fc.assert(
      fc.property(prefix, fc.string({ unit: 'grapheme', maxLength: 400 }), (head, body) => {
        checkParse(text(head + body));
      }),
      { numRuns: 300 },
    );
  });

  it('answers byte-level mutations of valid binary files: cut short, flipped, recounted, NaN/infinite corners, padded, "solid" headers', () => {
    const sources = fc.constantFrom(validBinary, validBinarySolidHeader);
    fc.assert(
      fc.property(sources, fc.array(mutation, { minLength: 1, maxLength: 4 }), (source, mutations) => {
        const bytes = applied(source, mutations);
        const soup = checkParse(bytes);
        // A binary reading takes every whole record and leaves fewer than 50 stray bytes, saying so.
        if (soup.ok && soup.value.format === 'binary') {
          const stray = bytes.length - headerBytes - recordBytes * soup.value.triangleCount;
          expect(stray).toBeGreaterThanOrEqual(0);
          expect(stray).toBeLessThan(recordBytes);
          expect(soup.value.warnings.some((w) => w.code === 'stl_trailing_bytes')).toBe(stray > 0);
        }
      }),
      { numRuns: 400 },
    );
  });

  it('answers valid ASCII files with garbage tokens inserted, replaced or removed, and cut short', () => {
    const sources = fc.constantFrom(validAscii, validAsciiCrlf);
    fc.assert(
      fc.property(sources, fc.array(asciiEdit, { minLength: 1, maxLength: 5 }), fc.option(fc.nat()), (source, edits, cut) => {
        let body = edited(source, edits);
        if (cut !== null) body = body.slice(0, cut % (body.length + 1));
        const bytes = text(body);
        const soup = checkParse(bytes);
        // An edit that moves "solid" off the start makes the file binary by its opening, read record by record.
        if (soup.ok && soup.value.format === 'ascii') expect(soup.value.triangleCount).toBeLessThanOrEqual(block.triangleCount + edits.length);
        if (soup.ok && soup.value.format === 'binary') expect(soup.value.triangleCount).toBe(Math.floor((bytes.length - headerBytes) / recordBytes));
      }),
      {
        numRuns: 400,
        // "1,5" and a line break put before "solid": read as binary.
        examples: [
          [
            validAsciiCrlf,
            [
              { at: 0, op: 'insert', token: '\n' },
              { at: 0, op: 'insert', token: '1,5' },
              { at: 814673836, op: 'replace', token: '\u0000' },
            ],
            1904453911,
          ],
        ],
      },
    );
  });

  it('reads any spelling of a corner coordinate as a finite float32 or refuses it', () => {
    const spelling = fc.oneof(
      fc.double().map(String),
      fc.double().map((v) => v.toExponential()),
      fc.constantFrom(
        '1e39',
        '-1e39',
        '3.4028235e38',
        '3.4028236e38',
        '3.40282357e38',
        '1e-46',
        '-0',
        '00',
        '+.5',
        '5.',
        '1E+0',
        'nan',
        'inf',
        '-Infinity',
        '1e999',
      ),
    );
    const vertexLines = validAscii.split('\n').flatMap((line, i) => (line.trim().startsWith('vertex') ? [i] : []));
    fc.assert(
      fc.property(fc.nat(), fc.integer({ min: 1, max: 3 }), spelling, (pick, slot, number) => {
        const lines = validAscii.split('\n');
        const at = vertexLines[pick % vertexLines.length]!;
        const words = lines[at]!.trim().split(/\s+/);
        words[slot] = number;
        lines[at] = `      ${words.join(' ')}`;
        const soup = checkParse(text(lines.join('\n')));
        const value = Number(number);
        if (Number.isFinite(Math.fround(value))) expect(soup.ok).toBe(true);
        else expect(!soup.ok && soup.error.code).toBe('stl_non_finite');
      }),
      { numRuns: 300 },
    );
  });

  it('refuses a header that announces more triangles than the bytes hold when the last one is cut short, at once and without allocating for them', () => {
    const count = fc.integer({ min: 1, max: 2 ** 32 - 1 });
    const padding = fc.integer({ min: 0, max: 200 });
    fc.assert(
      fc.property(count, padding, (announced, extra) => {
        // Whole records are read whatever the count says; a record cut in two cannot be.
        fc.pre(announced > Math.floor(extra / recordBytes) && (extra % recordBytes !== 0 || extra === 0));
        const bytes = new Uint8Array(headerBytes + extra);
        new DataView(bytes.buffer).setUint32(80, announced, true);
        const run = float32BytesDuring(() => timed(() => parseStl(bytes)));
        expect(run.value.value.ok).toBe(false);
        expect(run.bytes).toBe(0);
        expect(run.value.ms).toBeLessThan(parseBudgetMs);
      }),
      { numRuns: 300 },
    );
  });

  it('refuses an 84-byte file that claims 2^31 triangles as cut short, naming both sizes', () => {
    const bytes = new Uint8Array(headerBytes);
    new DataView(bytes.buffer).setUint32(80, 2 ** 31, true);
    const run = float32BytesDuring(() => parseStl(bytes));
    expect(run.bytes).toBe(0);
    expect(run.value.ok).toBe(false);
    if (run.value.ok) return;
    expect(run.value.error.code).toBe('stl_truncated');
    expect(run.value.error.message).toContain('2147483648 triangles');
    expect(run.value.error.message).toContain('only 84 bytes');
  });

  it('runs the whole analysis on whatever parses: random triangle soups, extreme and tiny coordinates, any up axis and units', () => {
    const coordinate = fc.oneof(
      fc.integer({ min: -3, max: 3 }),
      fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e6, max: 1e6 }),
      fc.constantFrom(3e38, -3e38, 1e-30, 1e-45, 1e20),
    );
    const soup = fc.array(fc.array(coordinate, { minLength: 9, maxLength: 9 }), { minLength: 1, maxLength: 30 });
    const frame = fc.record({ up: fc.constantFrom<UpAxis>('x', 'y', 'z'), units: fc.constantFrom<FileUnits>('mm', 'cm', 'in') });
    fc.assert(
      fc.property(soup, fc.boolean(), frame, (triangles, ascii, f) => {
        const source = { positions: Float64Array.from(triangles.flat()), triangleCount: triangles.length };
        checkAnalyze(ascii ? text(encodeStlAscii(source)) : encodeStlBinary(source), f);
      }),
      { numRuns: 120 },
    );
  });

  it('runs the whole analysis on mutated valid files', () => {
    fc.assert(
      fc.property(fc.array(mutation, { minLength: 1, maxLength: 3 }), (mutations) => {
        checkAnalyze(applied(validBinary, mutations));
      }),
      { numRuns: 60 },
    );
  });
});
