import { describe, expect, it } from 'vitest';
import { indexed, modelXml, package3mf, relsXml, type ThreeMfModelSpec } from '../../test/mould-files';
import { revolvedPocketBlock } from '../../test/moulds';
import { meshOf, relative, unwrap } from '../../test/pipeline';
import { withFlagsAndMethod, zip64Stored } from '../../test/zip-bytes';
import { prepareMesh } from '../prepare-mesh';
import { encodeStlBinary } from '../stl/encode-stl';
import { readMouldFile } from '../mould-file';
import { read3mf } from './read-3mf';

const mould = revolvedPocketBlock({
  halfSide: 15,
  bottomZ: 0,
  topZ: 18,
  profile: [
    [0, 10],
    [6, 10],
    [10, 18],
  ],
  segments: 32,
});
const mouldMesh = indexed(mould);
const plainVolume = meshOf(mould).enclosedVolumeMm3!;
const text = (s: string): Uint8Array => new TextEncoder().encode(s);

function read(spec: ThreeMfModelSpec | string, options: Parameters<typeof package3mf>[1] = {}) {
  return read3mf(package3mf(typeof spec === 'string' ? spec : modelXml(spec), options));
}

function meshOfSpec(spec: ThreeMfModelSpec) {
  const r = unwrap(read(spec));
  return { mesh: unwrap(prepareMesh(r.soup, { units: r.fileUnits })), soup: r.soup };
}

const one = (transform?: number[]): ThreeMfModelSpec => ({
  objects: [{ id: 1, mesh: mouldMesh }],
  items: [{ objectId: 1, ...(transform ? { transform } : {}) }],
});

describe('read3mf: build items and their transforms (3MF core specification §3.3, §3.4.3)', () => {
  it('reads the mesh as the STL of the same mould, corner for corner', () => {
    const soup = unwrap(read(one())).soup;
    expect(soup.format).toBe('3mf');
    expect(soup.triangleCount).toBe(mould.triangleCount);
    expect(Array.from(soup.positions)).toEqual(Array.from(mould.positions, Math.fround));
  });

  it('translates: the last row of the matrix is the offset', () => {
    const { mesh } = meshOfSpec(one([1, 0, 0, 0, 1, 0, 0, 0, 1, 100, -20, 5]));
    const plain = meshOf(mould);
    expect(mesh.bboxMm.min).toEqual([plain.bboxMm.min[0] + 100, plain.bboxMm.min[1] - 20, plain.bboxMm.min[2] + 5]);
    expect(relative(mesh.enclosedVolumeMm3!, plainVolume)).toBeLessThan(1e-6);
  });

  it('rotates with the row form: a point is the row [x y z 1] times the matrix', () => {
    const a = Math.PI / 6,
      c = Math.cos(a),
      s = Math.sin(a);
    // Rotation by a about z (linear algebra): x' = x cos a − y sin a, y' = x sin a + y cos a.
    const soup = unwrap(read(one([c, s, 0, -s, c, 0, 0, 0, 1, 0, 0, 0]))).soup;
    for (const k of [0, 7, 100]) {
      const x = Math.fround(mould.positions[3 * k]!),
        y = Math.fround(mould.positions[3 * k + 1]!);
      expect(soup.positions[3 * k]).toBeCloseTo(x * c - y * s, 4);
      expect(soup.positions[3 * k + 1]).toBeCloseTo(x * s + y * c, 4);
    }
    const mesh = unwrap(prepareMesh(soup));
    expect(relative(mesh.enclosedVolumeMm3!, plainVolume)).toBeLessThan(1e-6);
  });

  it('scales: the volume grows by the determinant (2 × 3 × 0.5 = 3)', () => {
    const { mesh } = meshOfSpec(one([2, 0, 0, 0, 3, 0, 0, 0, 0.5, 0, 0, 0]));
    expect(relative(mesh.enclosedVolumeMm3!, 3 * plainVolume)).toBeLessThan(1e-6);
    expect(mesh.bboxMm.max[2]).toBeCloseTo(9, 5);
  });

  it('keeps the volume positive through a mirror (§3.3: a negative determinant must not change its sign)', () => {
    const { mesh } = meshOfSpec(one([-1, 0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0]));
    expect(mesh.topology.watertight).toBe(true);
    expect(mesh.topology.invertedFixed).toBe(false);
    expect(relative(mesh.enclosedVolumeMm3!, plainVolume)).toBeLessThan(1e-6);
  });
});

describe('read3mf: components (§4.2), nested and from other parts (Production extension)', () => {
  it('places an object twice through components', () => {
    const { mesh } = meshOfSpec({
      objects: [
        { id: 1, mesh: mouldMesh },
        { id: 2, components: [{ objectId: 1 }, { objectId: 1, transform: [1, 0, 0, 0, 1, 0, 0, 0, 1, 40, 0, 0] }] },
      ],
      items: [{ objectId: 2 }],
    });
    expect(relative(mesh.enclosedVolumeMm3!, 2 * plainVolume)).toBeLessThan(1e-6);
    expect(mesh.bboxMm.max[0] - mesh.bboxMm.min[0]).toBeCloseTo(70, 5);
  });

  it('composes a component inside an item: C then I', () => {
    // The component moves the mould 40 mm along x; the item then turns it a quarter about z, so
    // the mould ends up 40 mm along y (x' = −y, y' = x). In the other order it would stay on x.
    const { mesh } = meshOfSpec({
      objects: [
        { id: 1, mesh: mouldMesh },
        { id: 2, components: [{ objectId: 1, transform: [1, 0, 0, 0, 1, 0, 0, 0, 1, 40, 0, 0] }] },
      ],
      items: [{ objectId: 2, transform: [0, 1, 0, -1, 0, 0, 0, 0, 1, 0, 0, 0] }],
    });
    expect(mesh.bboxMm.min[1]).toBeCloseTo(25, 5);
    expect(mesh.bboxMm.max[1]).toBeCloseTo(55, 5);
    expect(mesh.bboxMm.min[0]).toBeCloseTo(-15, 5);
    expect(relative(mesh.enclosedVolumeMm3!, plainVolume)).toBeLessThan(1e-6);
  });

  it('reads objects from another model part named by p:path, in that part’s unit', () => {
    const part = modelXml({ unit: 'centimeter', objects: [{ id: 7, mesh: mouldMesh, scale: 0.1 }], items: [] });
    const root = modelXml({
      unit: 'millimeter',
      modelAttributes: 'requiredextensions="p"',
      objects: [{ id: 1, components: [{ objectId: 7, path: '/3D/Objects/mould.model' }] }],
      items: [{ objectId: 1 }],
    });
    const r = unwrap(read3mf(package3mf(root, { extraParts: { '3D/Objects/mould.model': part } })));
    expect(r.fileUnits).toBe('mm');
    const mesh = unwrap(prepareMesh(r.soup, { units: r.fileUnits }));
    expect(relative(mesh.enclosedVolumeMm3!, plainVolume)).toBeLessThan(1e-6);
  });

  it('leaves supports out, and says so', () => {
    const r = unwrap(
      read({
        objects: [
          { id: 1, mesh: mouldMesh },
          { id: 2, type: 'support', mesh: mouldMesh },
        ],
        items: [{ objectId: 1 }, { objectId: 2 }],
      }),
    );
    expect(r.soup.triangleCount).toBe(mould.triangleCount);
    expect(r.soup.warnings.map((w) => w.code)).toEqual(['threemf_objects_skipped']);
  });
});

describe('read3mf: finding the model part', () => {
  it('follows the StartPart relationship to any part name', () => {
    const r = read3mf(package3mf(modelXml(one()), { modelPath: '3D/mould body.model' }));
    expect(unwrap(r).soup.triangleCount).toBe(mould.triangleCount);
  });

  it('falls back to 3D/3dmodel.model when the relationships part is missing', () => {
    expect(unwrap(read(one(), { rels: false })).soup.triangleCount).toBe(mould.triangleCount);
  });

  it('reads stored (uncompressed) parts and ZIP64 archives, both of which a 3MF consumer must accept (§1.1)', () => {
    expect(unwrap(read(one(), { stored: true })).soup.triangleCount).toBe(mould.triangleCount);
    const zip64 = zip64Stored({ '_rels/.rels': text(relsXml('/3D/3dmodel.model')), '3D/3dmodel.model': text(modelXml(one())) });
    const r = unwrap(readMouldFile(zip64));
    expect(r.format).toBe('3mf');
    expect(r.soup.triangleCount).toBe(mould.triangleCount);
  });

  it('takes the default unit, millimetre, when the model states none', () => {
    expect(unwrap(read({ ...one(), unit: undefined })).fileUnits).toBe('mm');
    expect(unwrap(read({ ...one(), unit: 'foot' })).fileUnits).toBe('ft');
    expect(unwrap(read({ ...one(), unit: 'meter' })).fileUnits).toBe('m');
  });
});

describe('read3mf: refusals, each a sentence about the 3MF', () => {
  const refusal = (r: ReturnType<typeof read3mf>) => (r.ok ? null : r.error);

  const cases: [string, () => ReturnType<typeof read3mf>, string, RegExp][] = [
    [
      'a relationship to a part that is not there',
      () => read3mf(package3mf(modelXml(one()), { rels: false, extraParts: { '_rels/.rels': relsXml('/3D/missing.model') } })),
      'threemf_no_model',
      /names "\/3D\/missing.model" as its model/,
    ],
    [
      'a zip with an STL inside',
      () => readMouldFile(package3mf('x', { modelPath: 'mould.stl', rels: false })) as never,
      'file_not_mould',
      /zip archive holding "mould.stl", not a 3MF; unzip it/,
    ],
    ['a DOCTYPE', () => read(modelXml(one()).replace('<model', '<!DOCTYPE model [<!ENTITY a "aaaa">]>\n<model')), 'threemf_invalid', /DOCTYPE/],
    [
      'an extension it cannot read',
      () => read({ ...one(), modelAttributes: 'xmlns:b="http://schemas.microsoft.com/3dmanufacturing/beamlattice/2017/02" requiredextensions="b"' }),
      'threemf_unsupported',
      /beamlattice/,
    ],
    [
      'a triangle that uses a vertex the object lacks',
      () =>
        read({
          objects: [
            {
              id: 1,
              mesh: {
                vertices: [
                  [0, 0, 0],
                  [1, 0, 0],
                  [0, 1, 0],
                ],
                triangles: [[0, 1, 3]],
              },
            },
          ],
          items: [{ objectId: 1 }],
        }),
      'threemf_invalid',
      /uses vertex 3, but the object has only 3 vertices/,
    ],
    [
      'an item for an object not defined',
      () => read({ objects: [{ id: 1, mesh: mouldMesh }], items: [{ objectId: 9 }] }),
      'threemf_invalid',
      /object 9, which is not defined/,
    ],
    [
      'components that contain themselves',
      () =>
        read({
          objects: [
            { id: 1, mesh: mouldMesh },
            { id: 2, components: [{ objectId: 3 }] },
            { id: 3, components: [{ objectId: 2 }] },
          ],
          items: [{ objectId: 2 }],
        }),
      'threemf_invalid',
      /among its own components/,
    ],
    ['an empty build', () => read({ objects: [{ id: 1, mesh: mouldMesh }], items: [] }), 'threemf_no_model', /builds no object/],
    ['an unknown unit', () => read({ ...one(), unit: 'furlong' }), 'threemf_invalid', /unit "furlong"/],
    ['a coordinate that is not a number', () => read(modelXml(one()).replace(/x="[^"]*"/, 'x="1,5"')), 'threemf_invalid', /whose x is "1,5", not a number/],
    ['a transform of 11 numbers', () => read(one([1, 0, 0, 0, 1, 0, 0, 0, 1, 0, 0])), 'threemf_invalid', /not 12 numbers/],
    ['another XML document', () => read('<?xml version="1.0"?><svg xmlns="http://www.w3.org/2000/svg"/>'), 'threemf_invalid', /opens with <svg>/],
    ['XML cut short', () => read(modelXml(one()).slice(0, 2000)), 'threemf_invalid', /not well-formed XML/],
    ['an encrypted part', () => read3mf(withFlagsAndMethod(package3mf(modelXml(one())), '3D/3dmodel.model', 1, 8)), 'threemf_unsupported', /encrypted/],
    [
      'a part packed with another method',
      () => read3mf(withFlagsAndMethod(package3mf(modelXml(one())), '3D/3dmodel.model', 0, 12)),
      'threemf_unsupported',
      /zip method 12/,
    ],
    ['more triangles than allowed', () => read3mf(package3mf(modelXml(one())), { maxTriangles: 100 }), 'too_many_triangles', /more than 100 triangles/],
    ['a zip cut short', () => read3mf(package3mf(modelXml(one())).subarray(0, 1000)), 'threemf_invalid', /zip structure is damaged/],
  ];
  for (const [name, run, code, message] of cases) {
    it(name, () => {
      const e = refusal(run());
      expect(e?.code).toBe(code);
      expect(e?.message).toMatch(message);
      expect(e?.message).toMatch(/; .+\.$/);
    });
  }

  it('reads an item placed twice as twice the triangles, and counts them against the cap', () => {
    const twice = { objects: [{ id: 1, mesh: mouldMesh }], items: [{ objectId: 1 }, { objectId: 1, transform: [1, 0, 0, 0, 1, 0, 0, 0, 1, 50, 0, 0] }] };
    expect(unwrap(read(twice)).soup.triangleCount).toBe(2 * mould.triangleCount);
    const capped = read3mf(package3mf(modelXml(twice)), { maxTriangles: mould.triangleCount + 1 });
    expect(refusal(capped)?.code).toBe('too_many_triangles');
  });

  it('agrees with the STL of the same mould through the whole reader', () => {
    const viaStl = unwrap(readMouldFile(encodeStlBinary(mould))).soup;
    const via3mf = unwrap(readMouldFile(package3mf(modelXml(one())))).soup;
    expect(Array.from(via3mf.positions)).toEqual(Array.from(viaStl.positions));
  });
});
