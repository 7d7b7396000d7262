import type { GeneratedMesh } from './moulds';
/** Shared corners: the vertex list and three vertex numbers per triangle, as 3MF and OBJ store them. */
export interface IndexedMesh {
  vertices: number[][];
  triangles: [number, number, number][];
}
export declare function indexed(mesh: GeneratedMesh): IndexedMesh;
/** A number written so it reads back as the float32 the STL of the same mould holds (9 significant digits). */
export declare const float32Text: (v: number) => string;
/** The binary STL with the header's triangle count set to `count` (0 or wrong, as some writers leave it). */
export declare function stlWithCount(mesh: GeneratedMesh, count: number, header?: string): Uint8Array;
/** The binary STL with `extra` bytes after its last record. */
export declare function stlWithTrailingBytes(mesh: GeneratedMesh, extra: Uint8Array): Uint8Array;
/** The binary STL with every record's 2-byte attribute word holding a 15-bit colour and its valid bit. */
export declare function stlWithColourAttributes(mesh: GeneratedMesh): Uint8Array;
export interface ThreeMfObjectSpec {
  id: number;
  type?: string;
  mesh?: IndexedMesh;
  /** Coordinates are written as x · scale (e.g. 1/25.4 for an inch file of a mm mould). */
  scale?: number;
  components?: {
    objectId: number;
    transform?: number[];
    path?: string;
  }[];
}
export interface ThreeMfModelSpec {
  unit?: string;
  objects: ThreeMfObjectSpec[];
  items: {
    objectId: number;
    transform?: number[];
    path?: string;
  }[];
  /** Extra attributes on <model>, e.g. namespaces and requiredextensions. */
  modelAttributes?: string;
}
/** The XML of a 3D Model part (3MF core specification §3.4, chapter 4). */
export declare function modelXml(spec: ThreeMfModelSpec): string;
export declare function relsXml(target: string): string;
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
export declare function package3mf(model: string, options?: PackageOptions): Uint8Array;
/** The mould as a one-object 3MF in the given unit; coordinates are converted from mm. */
export declare function encode3mf(mesh: GeneratedMesh, unit?: string, mmPerFileUnit?: number): Uint8Array;
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
export declare function encodeObj(mesh: GeneratedMesh, options?: ObjOptions): string;
/** OBJ text for the given vertices and polygon faces (0-based corners). */
export declare function objText(vertices: number[][], faces: number[][], options?: ObjOptions): string;
