/**
 * Writers of the same generated mould in the formats and with the quirks found in the wild, so
 * each reader can be checked against the plain binary STL of the very same mould.
 */
import { zipSync, type Zippable } from 'fflate';
import { encodeStlBinary } from '../src/stl/encode-stl';
import type { GeneratedMesh } from './moulds';

/** Shared corners: the vertex list and three vertex numbers per triangle, as 3MF and OBJ store them. */
export interface IndexedMesh {
  vertices: number[][];
  triangles: [number, number, number][];
}

export function indexed(mesh: GeneratedMesh): IndexedMesh {
  const ids = new Map<string, number>();
  const vertices: number[][] = [];
  const triangles: [number, number, number][] = [];
  const p = mesh.positions;
  for (let t = 0; t < mesh.triangleCount; t++) {
    const corner = (c: number): number => {
      const xyz = [p[9 * t + 3 * c]!, p[9 * t + 3 * c + 1]!, p[9 * t + 3 * c + 2]!];
      const key = xyz.join(',');
      let id = ids.get(key);
      if (id === undefined) {
        id = vertices.length;
        ids.set(key, id);
        vertices.push(xyz);
      }
      return id;
    };
    triangles.push([corner(0), corner(1), corner(2)]);
  }
  return { vertices, triangles };
}

/** A number written so it reads back as the float32 the STL of the same mould holds (9 significant digits). */
export const float32Text = (v: number): string => String(Number(Math.fround(v).toPrecision(9)));

// ---------------------------------------------------------------- STL quirks

/** The binary STL with the header's triangle count set to `count` (0 or wrong, as some writers leave it). */
export function stlWithCount(mesh: GeneratedMesh, count: number, header = 'gelpoint mesh'): Uint8Array {
  const bytes = encodeStlBinary(mesh, header);
  new DataView(bytes.buffer).setUint32(80, count, true);
  return bytes;
}

/** The binary STL with `extra` bytes after its last record. */
export function stlWithTrailingBytes(mesh: GeneratedMesh, extra: Uint8Array): Uint8Array {
  const bytes = encodeStlBinary(mesh);
  const out = new Uint8Array(bytes.length + extra.length);
  out.set(bytes);
  out.set(extra, bytes.length);
  return out;
}

/** The binary STL with every record's 2-byte attribute word holding a 15-bit colour and its valid bit. */
export function stlWithColourAttributes(mesh: GeneratedMesh): Uint8Array {
  const bytes = encodeStlBinary(mesh);
  const view = new DataView(bytes.buffer);
  for (let t = 0; t < mesh.triangleCount; t++) view.setUint16(84 + 50 * t + 48, 0x8000 | ((t * 2654435761) & 0x7fff), true);
  return bytes;
}

// ---------------------------------------------------------------- 3MF

export interface ThreeMfObjectSpec {
  id: number;
  type?: string;
  mesh?: IndexedMesh;
  /** Coordinates are written as x · scale (e.g. 1/25.4 for an inch file of a mm mould). */
  scale?: number;
  components?: { objectId: number; transform?: number[]; path?: string }[];
}

export interface ThreeMfModelSpec {
  unit?: string;
  objects: ThreeMfObjectSpec[];
  items: { objectId: number; transform?: number[]; path?: string }[];
  /** Extra attributes on <model>, e.g. namespaces and requiredextensions. */
  modelAttributes?: string;
}

const coreNs = 'http://schemas.microsoft.com/3dmanufacturing/core/2015/02';
const productionNs = 'http://schemas.microsoft.com/3dmanufacturing/production/2015/06';

function attributes(ref: { objectId: number; transform?: number[]; path?: string }): string {
  return `objectid="${ref.objectId}"${ref.transform ? ` transform="${ref.transform.join(' ')}"` : ''}${ref.path ? ` p:path="${ref.path}"` : ''}`;
}

/** The XML of a 3D Model part (3MF core specification §3.4, chapter 4). */
export function modelXml(spec: ThreeMfModelSpec): string {
  const lines = [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<model ${spec.unit === undefined ? '' : `unit="${spec.unit}" `}xml:lang="en-US" xmlns="${coreNs}" xmlns:p="${productionNs}"${spec.modelAttributes ? ` ${spec.modelAttributes}` : ''}>`,
    '  <metadata name="Application">gelpoint test writer</metadata>',
    '  <resources>',
  ];
  for (const o of spec.objects) {
    lines.push(`    <object id="${o.id}" type="${o.type ?? 'model'}">`);
    if (o.mesh) {
      const s = o.scale ?? 1;
      lines.push('      <mesh>', '        <vertices>');
      for (const v of o.mesh.vertices)
        lines.push(`          <vertex x="${float32Text(v[0]! * s)}" y="${float32Text(v[1]! * s)}" z="${float32Text(v[2]! * s)}" />`);
      lines.push('        </vertices>', '        <triangles>');
      for (const [a, b, c] of o.mesh.triangles) lines.push(`          <triangle v1="${a}" v2="${b}" v3="${c}" />`);
      lines.push('        </triangles>', '      </mesh>');
    } else {
      lines.push('      <components>');
      for (const c of o.components ?? []) lines.push(`        <component ${attributes(c)} />`);
      lines.push('      </components>');
    }
    lines.push('    </object>');
  }
  lines.push('  </resources>', '  <build>');
  for (const item of spec.items) lines.push(`    <item ${attributes(item)} />`);
  lines.push('  </build>', '</model>', '');
  return lines.join('\n');
}

const contentTypes =
  '<?xml version="1.0" encoding="UTF-8"?>\n<Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types">' +
  '<Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/>' +
  '<Default Extension="model" ContentType="application/vnd.ms-package.3dmanufacturing-3dmodel+xml"/></Types>';

export function relsXml(target: string): string {
  return (
    '<?xml version="1.0" encoding="UTF-8"?>\n<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships">' +
    `<Relationship Target="${target}" Id="rel0" Type="http://schemas.microsoft.com/3dmanufacturing/2013/01/3dmodel"/></Relationships>`
  );
}

export interface PackageOptions {
  /** Where the root model lives; default 3D/3dmodel.model. */
  modelPath?: string;
  /** Write `_rels/.rels` (default true); without it a reader must fall back to the conventional name. */
  rels?: boolean;
  /** Other parts, by name. */
  extraParts?: Record<string, string | Uint8Array>;
  /** Store the parts instead of deflating them. */
  stored?: boolean;
}

/** An OPC zip package holding the model part (3MF core specification §1.1, §2.1). */
export function package3mf(model: string, options: PackageOptions = {}): Uint8Array {
  const modelPath = options.modelPath ?? '3D/3dmodel.model';
  const text = (s: string | Uint8Array): Uint8Array => (typeof s === 'string' ? new TextEncoder().encode(s) : s);
  const files: Zippable = { '[Content_Types].xml': text(contentTypes) };
  if (options.rels ?? true) files['_rels/.rels'] = text(relsXml(`/${modelPath}`));
  files[modelPath] = text(model);
  for (const [name, data] of Object.entries(options.extraParts ?? {})) files[name] = text(data);
  return zipSync(files, { level: options.stored ? 0 : 6 });
}

/** The mould as a one-object 3MF in the given unit; coordinates are converted from mm. */
export function encode3mf(mesh: GeneratedMesh, unit = 'millimeter', mmPerFileUnit = 1): Uint8Array {
  return package3mf(
    modelXml({
      unit,
      objects: [{ id: 1, mesh: indexed(mesh), scale: 1 / mmPerFileUnit }],
      items: [{ objectId: 1 }],
    }),
  );
}

// ---------------------------------------------------------------- OBJ

export interface ObjOptions {
  /** Corner form: `v`, `v/vt`, `v//vn` or `v/vt/vn`. */
  corner?: 'v' | 'v/vt' | 'v//vn' | 'v/vt/vn';
  /** Corners counted back from the latest vertex. */
  negative?: boolean;
  /** Join each pair of triangles the generator wrote for one quad back into that quad. */
  quads?: boolean;
  lineEnding?: '\n' | '\r\n';
  /** Split every face line in two with a trailing backslash. */
  continuation?: boolean;
}

/** The mould as OBJ text: comments, an object and a group, texture and normal vectors, then faces. */
export function encodeObj(mesh: GeneratedMesh, options: ObjOptions = {}): string {
  const { vertices, triangles } = indexed(mesh);
  const faces: number[][] = [];
  for (let t = 0; t < triangles.length; t++) {
    const [a, b, c] = triangles[t]!;
    const next = triangles[t + 1];
    // MeshWriter.quad(a, b, c, d) writes (a, b, c) then (a, c, d).
    if (options.quads && next && next[0] === a && next[1] === c) {
      faces.push([a, b, c, next[2]]);
      t++;
    } else faces.push([a, b, c]);
  }
  return objText(vertices, faces, options);
}

/** OBJ text for the given vertices and polygon faces (0-based corners). */
export function objText(vertices: number[][], faces: number[][], options: ObjOptions = {}): string {
  const eol = options.lineEnding ?? '\n';
  const lines = ['# gelpoint test writer', 'mtllib mould.mtl', 'o mould', 'g body', 's off'];
  const n = vertices.length;
  for (const v of vertices) lines.push(`v ${v.map(float32Text).join(' ')}`);
  lines.push('vt 0 0', 'vn 0 0 1', 'usemtl wood');
  const corner = options.corner ?? 'v';
  for (const face of faces) {
    const words = face.map((v) => {
      const i = options.negative ? String(v - n) : String(v + 1);
      return corner === 'v' ? i : corner === 'v/vt' ? `${i}/1` : corner === 'v//vn' ? `${i}//1` : `${i}/1/1`;
    });
    if (options.continuation && words.length > 2) lines.push(`f ${words.slice(0, 2).join(' ')} \\`, `  ${words.slice(2).join(' ')}`);
    else lines.push(`f ${words.join(' ')}`);
  }
  lines.push('# end', '');
  return lines.join(eol);
}
