import fc from 'fast-check';
import { zipSync } from 'fflate';
import { describe, expect, it } from 'vitest';
import { encode3mf, encodeObj, modelXml, package3mf } from '../test/mould-files';
import { cellSolid } from '../test/moulds';
import { analyzeMouldFile } from './analyze-stl';
import { readMouldFile, type MouldFile } from './mould-file';
import type { MeshErrorCode, Result } from './result';

// Every refusal is one of the engine's codes and a sentence; nothing throws, nothing hangs.
const errorCodes: readonly MeshErrorCode[] = [
  'file_empty',
  'file_not_mould',
  'stl_empty',
  'stl_truncated',
  'stl_not_stl',
  'stl_non_finite',
  'stl_too_many_triangles',
  'stl_no_triangles',
  'threemf_invalid',
  'threemf_no_model',
  'threemf_unsupported',
  'threemf_too_large',
  'threemf_compression_ratio',
  'obj_invalid',
  'obj_no_faces',
  'too_many_triangles',
  'mesh_degenerate',
  'option_invalid',
  'level_invalid',
  'levels_not_ascending',
  'dam_invalid',
  'analysis_invalid',
];
// Generous for a loaded 2-core machine; a runaway loop or a quadratic scan blows well past them.
const readBudgetMs = 500;
const analyzeBudgetMs = 3000;

const text = (s: string): Uint8Array => new TextEncoder().encode(s);

function expectValue<T>(result: Result<T>): void {
  expect(typeof result.ok).toBe('boolean');
  if (result.ok) return;
  expect(errorCodes).toContain(result.error.code);
  expect(result.error.message.length).toBeGreaterThan(20);
  expect(result.error.message).toMatch(/[.]$/);
}

function checkRead(bytes: Uint8Array): Result<MouldFile> {
  const start = performance.now();
  const result = readMouldFile(bytes, { maxTriangles: 100_000 });
  expect(performance.now() - start).toBeLessThan(readBudgetMs);
  expectValue(result);
  if (result.ok) {
    const { positions, triangleCount } = result.value.soup;
    expect(triangleCount).toBeGreaterThan(0);
    expect(positions.length).toBe(9 * triangleCount);
    expect(positions.every(Number.isFinite)).toBe(true);
  }
  return result;
}

const block = cellSolid([0, 8, 14, 20], [0, 10], [0, 3, 5], (i, _j, k) => k === 0 || i !== 1);
const valid3mf = encode3mf(block);
const validObj = encodeObj(block, { quads: true, corner: 'v/vt/vn', negative: true });

type ByteEdit = { at: number; kind: 'flip' | 'cut' | 'insert'; value: number };
const byteEdit: fc.Arbitrary<ByteEdit> = fc.record({ at: fc.nat(), kind: fc.constantFrom('flip', 'cut', 'insert'), value: fc.integer({ min: 1, max: 255 }) });

function edited(source: Uint8Array, edits: ByteEdit[]): Uint8Array {
  let bytes = source.slice();
  for (const e of edits) {
    const at = e.at % (bytes.length + 1);
    if (e.kind === 'flip' && bytes.length > 0) bytes[at % bytes.length]! ^= e.value;
    else if (e.kind === 'cut') bytes = bytes.slice(0, at);
    else {
      const grown = new Uint8Array(bytes.length + 1);
      grown.set(bytes.subarray(0, at));
      grown[at] = e.value;
      grown.set(bytes.subarray(at), at + 1);
      bytes = grown;
    }
  }
  return bytes;
}

/** Words a damaged 3MF model or OBJ might hold. */
const xmlWord = fc.oneof(
  fc.constantFrom(
    '<model>',
    '</model>',
    '<resources>',
    '</resources>',
    '<object id="1">',
    '<object id="0">',
    '<object id="1" type="support">',
    '</object>',
    '<mesh>',
    '</mesh>',
    '<vertices>',
    '</vertices>',
    '<triangles>',
    '</triangles>',
    '<vertex x="0" y="0" z="0"/>',
    '<vertex x="1e39" y="0" z="0"/>',
    '<vertex x="nan" y="0" z="0"/>',
    '<vertex x="" y="0" z="0"/>',
    '<triangle v1="0" v2="1" v3="2"/>',
    '<triangle v1="-1" v2="1" v3="2"/>',
    '<triangle v1="99999999999" v2="1" v3="2"/>',
    '<components>',
    '</components>',
    '<component objectid="1"/>',
    '<component objectid="1" p:path="/3D/x.model"/>',
    '<build>',
    '</build>',
    '<item objectid="1"/>',
    '<item objectid="1" transform="1 0 0 0 1 0 0 0 1 0 0 0"/>',
    '<item objectid="1" transform="1e308 0 0 0 1e308 0 0 0 1e308 0 0 0"/>',
    '<!DOCTYPE x>',
    '<![CDATA[x]]>',
    '&amp;',
    '&bogus;',
    '<?pi x?>',
    '<!-- c -->',
    '\uFEFF',
    '\0',
  ),
  fc.string({ maxLength: 12 }),
);
const objWord = fc.oneof(
  fc.constantFrom(
    'v',
    'vt',
    'vn',
    'f',
    'g',
    'o',
    's',
    'l',
    'p',
    'usemtl',
    'curv',
    '#',
    '\\',
    '\n',
    '\r\n',
    '/',
    '//',
    '-1',
    '0',
    '1',
    '2',
    '3',
    '-999999',
    '1e39',
    'nan',
    '1/2/3',
    '1//3',
    '4294967297',
  ),
  fc.double().map(String),
  fc.integer({ min: -50, max: 50 }).map(String),
);

describe('readMouldFile on hostile input: a value with a sentence, never a throw, in bounded time', () => {
  it('answers arbitrary bytes, with and without a zip opening', () => {
    const head = fc.constantFrom(new Uint8Array(0), Uint8Array.of(0x50, 0x4b, 3, 4), Uint8Array.of(0x50, 0x4b, 5, 6), text('v '), text('solid '));
    fc.assert(
      fc.property(head, fc.uint8Array({ maxLength: 2048 }), (h, body) => {
        const bytes = new Uint8Array(h.length + body.length);
        bytes.set(h);
        bytes.set(body, h.length);
        checkRead(bytes);
      }),
      { numRuns: 400 },
    );
  });

  it('answers byte edits of a valid 3MF: flipped, cut short, padded', () => {
    fc.assert(
      fc.property(fc.array(byteEdit, { minLength: 1, maxLength: 4 }), (edits) => {
        checkRead(edited(valid3mf, edits));
      }),
      { numRuns: 300 },
    );
  });

  it('answers 3MF packages whose model XML is shuffled, broken or hostile', () => {
    fc.assert(
      fc.property(fc.array(xmlWord, { maxLength: 40 }), fc.boolean(), (words, prefixed) => {
        const body = words.join('');
        const xml = prefixed
          ? `<model xmlns="http://schemas.microsoft.com/3dmanufacturing/core/2015/02" xmlns:p="http://schemas.microsoft.com/3dmanufacturing/production/2015/06">${body}`
          : body;
        checkRead(package3mf(xml));
      }),
      { numRuns: 300 },
    );
  });

  it('answers mutations of the valid model XML, token by token', () => {
    const xml = modelXml({
      objects: [
        {
          id: 1,
          mesh: {
            vertices: [
              [0, 0, 0],
              [1, 0, 0],
              [0, 1, 0],
              [0, 0, 1],
            ],
            triangles: [
              [0, 2, 1],
              [0, 1, 3],
              [0, 3, 2],
              [1, 2, 3],
            ],
          },
        },
      ],
      items: [{ objectId: 1 }],
    });
    const parts = xml.split(/(?=<)/);
    fc.assert(
      fc.property(fc.array(fc.record({ at: fc.nat(), op: fc.constantFrom('insert', 'replace', 'delete'), word: xmlWord })), (edits) => {
        const p = parts.slice();
        for (const e of edits) {
          const i = e.at % (p.length + 1);
          if (e.op === 'insert') p.splice(i, 0, e.word);
          else if (e.op === 'replace') p[i] = e.word;
          else p.splice(i, 1);
        }
        checkRead(zipSync({ '3D/3dmodel.model': text(p.join('')) }));
      }),
      { numRuns: 300 },
    );
  });

  it('answers OBJ text made of OBJ words, and mutations of a valid OBJ', () => {
    fc.assert(
      fc.property(fc.array(objWord, { maxLength: 80 }), (words) => {
        checkRead(text(`v 0 0 0\n${words.join(' ')}`));
      }),
      { numRuns: 300 },
    );
    const lines = validObj.split('\n');
    fc.assert(
      fc.property(fc.array(fc.record({ at: fc.nat(), word: objWord })), (edits) => {
        const l = lines.slice();
        for (const e of edits) l[e.at % l.length] = `${l[e.at % l.length]} ${e.word}`;
        checkRead(text(l.join('\n')));
      }),
      { numRuns: 300 },
    );
  });

  it('runs the whole analysis on whatever reads: mutated 3MF and OBJ files', () => {
    const sources = fc.constantFrom(valid3mf, text(validObj));
    fc.assert(
      fc.property(sources, fc.array(byteEdit, { maxLength: 2 }), (source, edits) => {
        const start = performance.now();
        const result = analyzeMouldFile(edited(source, edits), { maxColumns: 4096 });
        expect(performance.now() - start).toBeLessThan(analyzeBudgetMs);
        expectValue(result);
      }),
      { numRuns: 60 },
    );
  });
});
