import { fail, ok, type MeshError, type Result } from '../result';
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

const enum Char {
  Tab = 9,
  LineFeed = 10,
  Return = 13,
  Space = 32,
  Hash = 35,
  Plus = 43,
  Minus = 45,
  Dot = 46,
  Slash = 47,
  Zero = 48,
  Nine = 57,
  Backslash = 92,
}

function isBlank(c: number): boolean {
  return c === Char.Space || (c >= Char.Tab && c <= Char.Return && c !== Char.LineFeed);
}

class GrowingArray<T extends Float64Array | Int32Array> {
  length = 0;
  constructor(
    public data: T,
    private readonly make: (n: number) => T,
  ) {}
  push(v: number): void {
    if (this.length === this.data.length) {
      const grown = this.make(2 * this.data.length);
      grown.set(this.data);
      this.data = grown as T;
    }
    this.data[this.length++] = v;
  }
}

/** A refusal raised while reading a statement; caught in parseObj. */
class Refusal {
  constructor(readonly error: MeshError) {}
}

class ObjReader {
  readonly vertices = new GrowingArray(new Float64Array(3 * 1024), (n) => new Float64Array(n));
  /** Each face: its corner count, then its corners (0-based; forward references are checked at the end). */
  readonly faces = new GrowingArray(new Int32Array(4 * 1024), (n) => new Int32Array(n));
  faceCount = 0;
  triangleCount = 0;
  freeForm = false;
  lineNumber = 0;
  /** Faces may name vertices written after them; the largest number is checked once all are read. */
  largestIndex = -1;
  largestIndexLine = 0;
  private s = '';
  private i = 0;
  private end = 0;

  constructor(
    private readonly maxTriangles: number,
    private readonly maxVertices: number,
  ) {}

  refuse(what: string): never {
    throw new Refusal({
      code: 'obj_invalid',
      message: `Line ${this.lineNumber} of the OBJ ${what}; export the mould again as OBJ (or STL) and upload that file.`,
    });
  }

  /** The next word of the statement as [start, end) in the string, or false at its end. */
  private nextWord(): boolean {
    const s = this.s;
    let i = this.i;
    while (i < this.end && isBlank(s.charCodeAt(i))) i++;
    this.i = i;
    return i < this.end;
  }

  private wordEnd(): number {
    const s = this.s;
    let j = this.i;
    while (j < this.end && !isBlank(s.charCodeAt(j))) j++;
    return j;
  }

  /** One statement: s[start, end), comments already cut off. */
  statement(s: string, start: number, end: number): void {
    this.s = s;
    this.i = start;
    this.end = end;
    if (!this.nextWord()) return;
    const keyEnd = this.wordEnd();
    const k0 = s.charCodeAt(this.i);
    const length = keyEnd - this.i;
    this.i = keyEnd;
    if (length === 1 && k0 === 118 /* v */) this.vertex();
    // f, or fo (an old spelling of a face)
    else if (k0 === 102 && (length === 1 || (length === 2 && s.charCodeAt(keyEnd - 1) === 111))) this.face();
    else if (freeFormKeywords.has(s.slice(keyEnd - length, keyEnd))) this.freeForm = true;
  }

  private vertex(): void {
    if (this.vertices.length / 3 >= this.maxVertices) {
      throw new Refusal({
        code: 'too_many_triangles',
        message: `The OBJ holds more than ${this.maxVertices} vertices, more than this service reads; decimate the mesh in your CAD program and upload it again.`,
      });
    }
    const s = this.s;
    for (let k = 0; k < 3; k++) {
      if (!this.nextWord()) this.refuse('has a vertex with fewer than three coordinates');
      const start = this.i;
      const stop = this.wordEnd();
      this.i = stop;
      const c = s.charCodeAt(start);
      const word = s.slice(start, stop);
      const value = (c >= Char.Zero && c <= Char.Nine) || c === Char.Plus || c === Char.Minus || c === Char.Dot ? Number(word) : Number.NaN;
      if (Number.isNaN(value)) this.refuse(`has the coordinate "${word.slice(0, 40)}", which is not a number`);
      if (!Number.isFinite(Math.fround(value))) this.refuse(`has the coordinate "${word.slice(0, 40)}", beyond the ±3.4e38 a coordinate can hold`);
      this.vertices.push(value);
    }
  }

  private face(): void {
    const s = this.s;
    const countAt = this.faces.length;
    this.faces.push(0);
    let corners = 0;
    const known = this.vertices.length / 3;
    while (this.nextWord()) {
      const start = this.i;
      const stop = this.wordEnd();
      this.i = stop;
      // The vertex number is the part before the first slash: digits with an optional sign.
      let j = start;
      const negative = s.charCodeAt(j) === Char.Minus;
      if (negative || s.charCodeAt(j) === Char.Plus) j++;
      let v = 0;
      const digitsFrom = j;
      for (; j < stop; j++) {
        const c = s.charCodeAt(j);
        if (c < Char.Zero || c > Char.Nine) break;
        v = 10 * v + (c - Char.Zero);
      }
      if (j === digitsFrom || (j < stop && s.charCodeAt(j) !== Char.Slash) || v === 0 || !Number.isSafeInteger(v)) {
        this.refuse(
          `has the face corner "${s.slice(start, stop).slice(0, 40)}"; corners are vertex numbers from 1 (or negative, counting back from the latest vertex)`,
        );
      }
      let index: number;
      if (negative) {
        index = known - v;
        if (index < 0) this.refuse(`has the face corner -${v}, but only ${known} vertices come before it`);
      } else {
        index = v - 1;
        if (index > 0x7fffffff) this.refuse(`has the face corner ${v}, beyond any vertex this service reads`);
        if (index > this.largestIndex) {
          this.largestIndex = index;
          this.largestIndexLine = this.lineNumber;
        }
      }
      this.faces.push(index);
      corners++;
    }
    if (corners < 3) this.refuse(`has a face with ${corners} corner${corners === 1 ? '' : 's'}; a face needs at least three`);
    this.faces.data[countAt] = corners;
    this.faceCount++;
    this.triangleCount += corners - 2;
    if (this.triangleCount > this.maxTriangles) {
      throw new Refusal({
        code: 'too_many_triangles',
        message: `The OBJ holds more than ${this.maxTriangles} triangles, the most this service accepts; decimate the mesh in your CAD program and upload it again.`,
      });
    }
  }
}

/** End of the statement that starts a line: before a # comment and trailing blanks. */
function statementEnd(text: string, start: number, end: number): number {
  let stop = start;
  while (stop < end && text.charCodeAt(stop) !== Char.Hash) stop++;
  while (stop > start && isBlank(text.charCodeAt(stop - 1))) stop--;
  return stop;
}

export function parseObj(bytes: Uint8Array, options: ParseObjOptions = {}): Result<TriangleSoup> {
  const maxTriangles = options.maxTriangles ?? defaultMaxTriangles;
  const reader = new ObjReader(maxTriangles, Math.max(1024, 3 * maxTriangles));
  const text = new TextDecoder('utf-8').decode(bytes);
  try {
    let pos = 0;
    while (pos < text.length) {
      let end = text.indexOf('\n', pos);
      if (end < 0) end = text.length;
      reader.lineNumber++;
      let stop = end;
      while (stop > pos && isBlank(text.charCodeAt(stop - 1))) stop--;
      if (stop > pos && text.charCodeAt(stop - 1) === Char.Backslash) {
        // A continued statement: join its lines (rare, so a string of its own is fine).
        const firstLine = reader.lineNumber;
        let joined = text.slice(pos, stop - 1);
        pos = end + 1;
        while (pos < text.length) {
          let next = text.indexOf('\n', pos);
          if (next < 0) next = text.length;
          reader.lineNumber++;
          let tail = next;
          while (tail > pos && isBlank(text.charCodeAt(tail - 1))) tail--;
          const continued = tail > pos && text.charCodeAt(tail - 1) === Char.Backslash;
          joined += ` ${text.slice(pos, continued ? tail - 1 : tail)}`;
          pos = next + 1;
          if (!continued) break;
        }
        const last = reader.lineNumber;
        reader.lineNumber = firstLine;
        reader.statement(joined, 0, statementEnd(joined, 0, joined.length));
        reader.lineNumber = last;
        continue;
      }
      reader.statement(text, pos, statementEnd(text, pos, stop));
      pos = end + 1;
    }
  } catch (err) {
    if (err instanceof Refusal) return fail(err.error.code, err.error.message);
    throw err;
  }

  const vertexCount = reader.vertices.length / 3;
  if (reader.faceCount === 0) {
    if (reader.freeForm)
      return fail(
        'obj_no_faces',
        'The OBJ describes its shape with free-form curves and surfaces, which Gelpoint does not read; export the mould as a polygon mesh (OBJ with faces, or STL).',
      );
    return fail(
      'obj_no_faces',
      vertexCount > 0
        ? `The OBJ has ${vertexCount} vertices but no faces (a point cloud); export the mould as a closed surface with its faces.`
        : 'The OBJ has no vertices and no faces; export the mould again with its surface included.',
    );
  }
  if (reader.largestIndex >= vertexCount) {
    return fail(
      'obj_invalid',
      `Line ${reader.largestIndexLine} of the OBJ uses vertex ${reader.largestIndex + 1}, but the file has only ${vertexCount} vertices; export the mould again as OBJ (or STL) and upload that file.`,
    );
  }

  const v = reader.vertices.data;
  const positions = new Float32Array(9 * reader.triangleCount);
  const triangles: number[] = [];
  let written = 0;
  const f = reader.faces.data;
  for (let at = 0; at < reader.faces.length;) {
    const corners = f[at]!;
    triangles.length = 0;
    triangulatePolygon(v, f.subarray(at + 1, at + 1 + corners), triangles);
    for (let k = 0; k < triangles.length; k++) {
      const p = 3 * triangles[k]!;
      const out = 3 * written++;
      positions[out] = v[p]!;
      positions[out + 1] = v[p + 1]!;
      positions[out + 2] = v[p + 2]!;
    }
    at += 1 + corners;
  }
  return ok({ positions, triangleCount: reader.triangleCount, format: 'obj', warnings: [] });
}
