import { fail, ok, type Result } from '../result';
import { defaultMaxTriangles, type TriangleSoup } from '../stl/triangle-soup';
import { triangulatePolygon } from './triangulate-polygon';

/**
 * Reads the polygon geometry of a Wavefront OBJ: `v x y z` vertices (a w or a colour after them is
 * ignored) and `f` faces whose corners are written `v`, `v/vt`, `v//vn` or `v/vt/vn`, numbered
 * from 1, or from the end when negative (-1 is the latest vertex). Faces with more than three
 * corners are triangulated. Everything else (texture and normal vectors, groups, objects,
 * smoothing, materials, comments) is skipped. A line ending in a backslash continues on the next.
 * OBJ carries no unit: the caller says which one the numbers are in.
 */
export interface ParseObjOptions {
  maxTriangles?: number;
}

const freeFormKeywords = new Set(['cstype', 'curv', 'curv2', 'surf', 'deg', 'bmat', 'step', 'parm', 'trim', 'hole', 'scrv', 'sp', 'con']);

class GrowingArray<T extends Float64Array | Int32Array> {
  length = 0;
  constructor(public data: T, private readonly make: (n: number) => T) {}
  push(v: number): void {
    if (this.length === this.data.length) {
      const grown = this.make(2 * this.data.length);
      grown.set(this.data);
      this.data = grown as T;
    }
    this.data[this.length++] = v;
  }
}

const isBlank = (c: number): boolean => c === 32 || c === 9 || c === 13 || c === 11 || c === 12;

export function parseObj(bytes: Uint8Array, options: ParseObjOptions = {}): Result<TriangleSoup> {
  const maxTriangles = options.maxTriangles ?? defaultMaxTriangles;
  const maxVertices = Math.max(1024, 3 * maxTriangles);
  const text = new TextDecoder('utf-8').decode(bytes);
  const vertices = new GrowingArray(new Float64Array(3 * 1024), (n) => new Float64Array(n));
  // Each face: its corner count, then its corners (0-based, or ≥ vertex count for a forward reference checked at the end).
  const faces = new GrowingArray(new Int32Array(4 * 1024), (n) => new Int32Array(n));
  let faceCount = 0;
  let triangleCount = 0;
  let freeForm = false;
  let lineNumber = 0;
  // Faces may name vertices written after them; the largest number is checked once all are read.
  let largestIndex = -1;
  let largestIndexLine = 0;

  const invalid = (what: string): Result<never> => fail('obj_invalid', `Line ${lineNumber} of the OBJ ${what}; export the mould again as OBJ (or STL) and upload that file.`);

  let pos = 0;
  while (pos < text.length) {
    // One logical line: physical lines joined where one ends in a backslash.
    let line = '';
    for (;;) {
      let end = text.indexOf('\n', pos);
      if (end < 0) end = text.length;
      lineNumber++;
      let stop = end;
      while (stop > pos && isBlank(text.charCodeAt(stop - 1))) stop--;
      const continued = stop > pos && text.charCodeAt(stop - 1) === 92;
      line += text.slice(pos, continued ? stop - 1 : stop);
      pos = end + 1;
      if (!continued || pos >= text.length) break;
      line += ' ';
    }

    // A comment runs from # to the end of the line, after a statement too.
    const hash = line.indexOf('#');
    if (hash >= 0) line = line.slice(0, hash);
    let i = 0;
    const n = line.length;
    while (i < n && isBlank(line.charCodeAt(i))) i++;
    if (i >= n || line.charCodeAt(i) === 35) continue;
    let keyEnd = i;
    while (keyEnd < n && !isBlank(line.charCodeAt(keyEnd))) keyEnd++;
    const keyword = line.slice(i, keyEnd);
    i = keyEnd;
    const nextToken = (): string | null => {
      while (i < n && isBlank(line.charCodeAt(i))) i++;
      if (i >= n) return null;
      const start = i;
      while (i < n && !isBlank(line.charCodeAt(i))) i++;
      return line.slice(start, i);
    };

    if (keyword === 'v') {
      if (vertices.length / 3 >= maxVertices) {
        return fail('too_many_triangles', `The OBJ holds more than ${maxVertices} vertices, more than this service reads; decimate the mesh in your CAD program and upload it again.`);
      }
      for (let k = 0; k < 3; k++) {
        const token = nextToken();
        if (token === null) return invalid('has a vertex with fewer than three coordinates');
        const c = token.charCodeAt(0);
        const value = (c >= 48 && c <= 57) || c === 43 || c === 45 || c === 46 ? Number(token) : Number.NaN;
        if (Number.isNaN(value)) return invalid(`has the coordinate "${token.slice(0, 40)}", which is not a number`);
        if (!Number.isFinite(Math.fround(value))) return invalid(`has the coordinate "${token.slice(0, 40)}", beyond the ±3.4e38 a coordinate can hold`);
        vertices.push(value);
      }
    } else if (keyword === 'f' || keyword === 'fo') {
      const countAt = faces.length;
      faces.push(0);
      let corners = 0;
      const known = vertices.length / 3;
      for (let token = nextToken(); token !== null; token = nextToken()) {
        const slash = token.indexOf('/');
        const number = slash < 0 ? token : token.slice(0, slash);
        const v = /^[+-]?\d+$/.test(number) ? Number(number) : Number.NaN;
        if (!Number.isSafeInteger(v) || v === 0) {
          return invalid(`has the face corner "${token.slice(0, 40)}"; corners are vertex numbers from 1 (or negative, counting back from the latest vertex)`);
        }
        let index: number;
        if (v < 0) {
          index = known + v;
          if (index < 0) return invalid(`has the face corner ${v}, but only ${known} vertices come before it`);
        } else {
          index = v - 1;
          if (index > largestIndex) { largestIndex = index; largestIndexLine = lineNumber; }
        }
        if (index > 0x7fffffff) return invalid(`has the face corner ${v}, beyond any vertex this service reads`);
        faces.push(index);
        corners++;
      }
      if (corners < 3) return invalid(`has a face with ${corners} corner${corners === 1 ? '' : 's'}; a face needs at least three`);
      faces.data[countAt] = corners;
      faceCount++;
      triangleCount += corners - 2;
      if (triangleCount > maxTriangles) {
        return fail('too_many_triangles', `The OBJ holds more than ${maxTriangles} triangles, the most this service accepts; decimate the mesh in your CAD program and upload it again.`);
      }
    } else if (freeFormKeywords.has(keyword)) {
      freeForm = true;
    }
  }

  const vertexCount = vertices.length / 3;
  if (faceCount === 0) {
    if (freeForm) return fail('obj_no_faces', 'The OBJ describes its shape with free-form curves and surfaces, which Gelpoint does not read; export the mould as a polygon mesh (OBJ with faces, or STL).');
    return fail('obj_no_faces', vertexCount > 0
      ? `The OBJ has ${vertexCount} vertices but no faces (a point cloud); export the mould as a closed surface with its faces.`
      : 'The OBJ has no vertices and no faces; export the mould again with its surface included.');
  }
  if (largestIndex >= vertexCount) {
    lineNumber = largestIndexLine;
    return invalid(`uses vertex ${largestIndex + 1}, but the file has only ${vertexCount} vertices`);
  }

  const v = vertices.data;
  const positions = new Float32Array(9 * triangleCount);
  const triangles: number[] = [];
  let written = 0;
  const f = faces.data;
  for (let at = 0; at < faces.length;) {
    const corners = f[at]!;
    triangles.length = 0;
    triangulatePolygon(v, f.subarray(at + 1, at + 1 + corners), triangles);
    for (let k = 0; k < triangles.length; k++) {
      const p = 3 * triangles[k]!;
      const out = 3 * written++;
      positions[out] = v[p]!; positions[out + 1] = v[p + 1]!; positions[out + 2] = v[p + 2]!;
    }
    at += 1 + corners;
  }
  return ok({ positions, triangleCount, format: 'obj', warnings: [] });
}
