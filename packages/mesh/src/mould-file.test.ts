import { describe, expect, it } from 'vitest';
import { encode3mf, encodeObj, stlWithColourAttributes, stlWithCount, stlWithTrailingBytes } from '../test/mould-files';
import { revolvedPocketBlock } from '../test/moulds';
import { relative, unwrap } from '../test/pipeline';
import { analyzeMouldFile } from './analyze-stl';
import { fillAt } from './fill-queries';
import { mmPerUnit, type FileUnits } from './frame';
import { detectMouldFormat, readMouldFile } from './mould-file';
import { encodeStlAscii, encodeStlBinary } from './stl/encode-stl';

// A frustum pocket: 6 mm floor radius widening to 10 mm over 8 mm, in a 30 × 30 × 18 mm block.
// CRC Concise Encyclopedia of Mathematics, conical frustum: V = πh(R² + Rr + r²)/3 = 1642.006 mm³;
// the mesh's rings are regular 64-gons inscribed in the circles, whose area is the circle's times
// N sin(2π/N)/(2π) (CRC, regular polygon), so the mesh's pocket holds that factor times V.
const R = 10,
  r = 6,
  h = 8,
  floorZ = 10,
  segments = 64;
const mould = revolvedPocketBlock({
  halfSide: 15,
  bottomZ: 0,
  topZ: floorZ + h,
  profile: [
    [0, floorZ],
    [r, floorZ],
    [R, floorZ + h],
  ],
  segments,
});
const handbookFillMm3 = (((segments * Math.sin((2 * Math.PI) / segments)) / (2 * Math.PI)) * (Math.PI * h * (R * R + R * r + r * r))) / 3;
const text = (s: string): Uint8Array => new TextEncoder().encode(s);

function fillsOf(bytes: Uint8Array, units?: FileUnits) {
  const read = unwrap(analyzeMouldFile(bytes, units ? { units } : {}));
  const levels = [floorZ + 2, floorZ + 5, floorZ + h];
  return { read, fills: levels.map((level) => unwrap(fillAt(read.analysis, level, 'outline')).volumeMm3) };
}

const plain = fillsOf(encodeStlBinary(mould));

describe('readMouldFile: every format and quirk gives the fill of the plain binary STL', () => {
  it('the plain binary STL holds the handbook frustum', () => {
    expect(handbookFillMm3 / ((segments * Math.sin((2 * Math.PI) / segments)) / (2 * Math.PI))).toBeCloseTo(1642.006, 3); // CRC worked value
    expect(relative(plain.fills[2]!, handbookFillMm3)).toBeLessThan(1e-5);
    expect(plain.read.format).toBe('stl');
    expect(plain.read.analysis.watertight).toBe(true);
  });

  const cases: [string, Uint8Array, string[]][] = [
    ['ASCII STL with CRLF', text(encodeStlAscii(mould, { lineEnding: '\r\n' })), []],
    ['binary STL whose count is 0', stlWithCount(mould, 0), ['stl_count_mismatch']],
    ['binary STL whose count is 0 and whose header begins with "solid"', stlWithCount(mould, 0, 'solid mould'), ['stl_count_mismatch']],
    ['binary STL whose count is too high', stlWithCount(mould, mould.triangleCount + 1000), ['stl_count_mismatch']],
    ['binary STL whose count is too low', stlWithCount(mould, 7), ['stl_count_mismatch']],
    ['binary STL with a stray byte after its last record', stlWithTrailingBytes(mould, Uint8Array.of(0x0a)), ['stl_trailing_bytes']],
    [
      'binary STL with 49 stray bytes and count 0',
      (() => {
        const b = stlWithTrailingBytes(mould, new Uint8Array(49).fill(0x20));
        new DataView(b.buffer).setUint32(80, 0, true);
        return b;
      })(),
      ['stl_count_mismatch', 'stl_trailing_bytes'],
    ],
    ['binary STL with colour in its attribute bytes', stlWithColourAttributes(mould), []],
    ['3MF in millimetres', encode3mf(mould), []],
    ['OBJ of triangles', text(encodeObj(mould)), []],
    [
      'OBJ of quads with v/vt/vn corners counted from the end, CRLF and continued lines',
      text(encodeObj(mould, { quads: true, corner: 'v/vt/vn', negative: true, lineEnding: '\r\n', continuation: true })),
      [],
    ],
    ['OBJ with v//vn corners', text(encodeObj(mould, { quads: true, corner: 'v//vn' })), []],
    ['OBJ with v/vt corners', text(encodeObj(mould, { corner: 'v/vt', negative: true })), []],
  ];

  for (const [name, bytes, warnings] of cases) {
    it(name, () => {
      const got = fillsOf(bytes);
      for (let i = 0; i < 3; i++) expect(relative(got.fills[i]!, plain.fills[i]!)).toBeLessThan(1e-9);
      expect(got.read.analysis.watertight).toBe(true);
      const codes = got.read.analysis.warnings.map((w) => w.code);
      for (const w of warnings) expect(codes).toContain(w);
      expect(codes.filter((c) => c.startsWith('stl_'))).toEqual(warnings.filter((c) => c.startsWith('stl_')));
    });
  }

  it('says which format it found, and for a 3MF its unit', () => {
    expect(unwrap(readMouldFile(encode3mf(mould, 'inch', 25.4))).fileUnits).toBe('in');
    expect(unwrap(readMouldFile(encode3mf(mould))).format).toBe('3mf');
    expect(unwrap(readMouldFile(text(encodeObj(mould)))).format).toBe('obj');
    expect(unwrap(readMouldFile(text(encodeObj(mould)))).fileUnits).toBeNull();
    expect(unwrap(readMouldFile(stlWithCount(mould, 0))).format).toBe('stl');
  });
});

describe('3MF units: the same mould in millimetres, inches and microns', () => {
  // NIST SP 811, appendix B: 1 in = 25.4 mm exactly; 1 µm = 0.001 mm (SI prefix micro = 10⁻⁶ m).
  for (const [unit, units, mmPerFileUnit] of [
    ['millimeter', 'mm', 1],
    ['inch', 'in', 25.4],
    ['micron', 'um', 0.001],
    ['centimeter', 'cm', 10],
  ] as const) {
    it(`${unit}: the fill in mm³ is the same`, () => {
      const got = fillsOf(encode3mf(mould, unit, mmPerFileUnit));
      expect(got.read.units).toBe(units);
      expect(got.read.fileUnits).toBe(units);
      expect(mmPerUnit[units]).toBe(mmPerFileUnit);
      // The file's numbers are float32-rounded in its own unit: a few parts in 10⁷ of each corner.
      for (let i = 0; i < 3; i++) expect(relative(got.fills[i]!, plain.fills[i]!)).toBeLessThan(2e-6);
      expect(relative(got.read.analysis.enclosedVolumeMm3!, plain.read.analysis.enclosedVolumeMm3!)).toBeLessThan(2e-6);
    });
  }

  it('the caller’s units win over the file’s (a file whose unit is wrong)', () => {
    // The numbers are millimetres but the file says inch; read as mm they give the mould back.
    const mislabelled = encode3mf(mould, 'inch', 1);
    const asFile = fillsOf(mislabelled);
    expect(asFile.read.units).toBe('in');
    expect(relative(asFile.read.analysis.enclosedVolumeMm3!, plain.read.analysis.enclosedVolumeMm3! * 25.4 ** 3)).toBeLessThan(2e-6);
    const asMm = fillsOf(mislabelled, 'mm');
    expect(asMm.read.units).toBe('mm');
    expect(asMm.read.fileUnits).toBe('in');
    for (let i = 0; i < 3; i++) expect(relative(asMm.fills[i]!, plain.fills[i]!)).toBeLessThan(1e-9);
  });
});

describe('detectMouldFormat and refusals that name the format', () => {
  const codeOf = (bytes: Uint8Array) => {
    const r = readMouldFile(bytes);
    return r.ok ? null : r.error;
  };

  it('decides by content', () => {
    expect(detectMouldFormat(encode3mf(mould))).toBe('3mf');
    expect(detectMouldFormat(text('# exported\n\nv 0 0 0\nv 1 0 0\nv 0 1 0\nf 1 2 3\n'))).toBe('obj');
    expect(detectMouldFormat(text(encodeStlAscii(mould)))).toBe('stl');
    expect(detectMouldFormat(text('facet normal 0 0 1\n outer loop\n'))).toBe('stl');
    expect(detectMouldFormat(stlWithCount(mould, 0))).toBe('stl');
    expect(detectMouldFormat(text('hello, this is a note about the mould'))).toBeNull();
  });

  it('never calls a 3MF or an OBJ a broken STL', () => {
    const broken3mf = encode3mf(mould).subarray(0, 400);
    const e1 = codeOf(broken3mf)!;
    expect(e1.code).toMatch(/^threemf_/);
    expect(e1.message).toMatch(/3MF/);
    // What is wrong comes before the semicolon, what to do after it.
    expect(e1.message.split(';')[0]).not.toMatch(/STL/);
    const brokenObj = codeOf(text('v 0 0 0\nv 1 0 0\nv 0 1 0\nf 1 2 9\n'))!;
    expect(brokenObj.code).toBe('obj_invalid');
    expect(brokenObj.message).toMatch(/^Line 4 of the OBJ uses vertex 9, but the file has only 3 vertices/);
    expect(brokenObj.message.split(';')[0]).not.toMatch(/STL/);
  });

  it('names files that are no mould at all', () => {
    const png = new Uint8Array(200);
    png.set([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    expect(codeOf(png)).toMatchObject({ code: 'file_not_mould', message: expect.stringMatching(/^The file is a PNG image, not a mould/) as unknown as string });
    expect(codeOf(text('%PDF-1.7\n%\xe2\xe3\n1 0 obj\n'))?.message).toMatch(/PDF document/);
    expect(codeOf(text('ISO-10303-21;\nHEADER;\n'))?.message).toMatch(/STEP file/);
    expect(codeOf(text('hello, this is a note about the mould'))?.message).toMatch(/neither an ASCII STL .* nor an OBJ/);
    expect(codeOf(new Uint8Array(0))?.code).toBe('file_empty');
    expect(codeOf(text('  \r\n'))?.code).toBe('file_empty');
    expect(codeOf(Uint8Array.of(1, 2, 3))?.message).toMatch(/only 3 bytes/);
  });

  it('ends every refusal with a sentence that says what to do', () => {
    for (const bytes of [encode3mf(mould).subarray(0, 300), text('v 1 2\n'), text('solid x\nfacet\n'), Uint8Array.of(0x50, 0x4b, 3, 4, 0)]) {
      const e = codeOf(bytes)!;
      expect(e.message).toMatch(/; .*\.$/);
    }
  });
});
