import type { SaxesTagPlain } from 'saxes';
import type { FileUnits } from '../frame';
import { fail, ok, type Result } from '../result';
import { XmlStream } from './xml-stream';

/**
 * One 3D Model part of a 3MF (3MF core specification §3.4 and chapter 4), read as a stream: the
 * unit, the objects (a mesh, or components that place other objects) and the build items. With
 * the Production extension, an item or component may name the part that holds its object (path).
 */
export type ThreeMfUnit = 'micron' | 'millimeter' | 'centimeter' | 'inch' | 'foot' | 'meter';

/** The core specification's ST_Unit values, as the engine's file units. */
export const fileUnitsOf3mf: Record<ThreeMfUnit, FileUnits> = {
  micron: 'um',
  millimeter: 'mm',
  centimeter: 'cm',
  inch: 'in',
  foot: 'ft',
  meter: 'm',
};

export const coreNamespace = 'http://schemas.microsoft.com/3dmanufacturing/core/2015/02';
export const productionNamespace = 'http://schemas.microsoft.com/3dmanufacturing/production/2015/06';
/** Extensions that may be required without changing the geometry this reader takes in. */
const harmlessExtensions = new Set([productionNamespace, 'http://schemas.microsoft.com/3dmanufacturing/material/2015/02']);

/** An affine map in the specification's row form: x' = m00·x + m10·y + m20·z + m30, and so on. */
export type Matrix3mf = Float64Array;

export interface ObjectRef {
  objectId: number;
  /** The model part holding the object (Production extension), or null for this part. */
  path: string | null;
  transform: Matrix3mf | null;
}

export interface ModelObject {
  id: number;
  type: string;
  /** Into the part's vertex store (3 numbers per vertex) and triangle store (3 indices per triangle, local to the object). */
  vertexStart: number;
  vertexCount: number;
  triangleStart: number;
  triangleCount: number;
  components: ObjectRef[] | null;
}

export interface ModelPart {
  unit: ThreeMfUnit;
  objects: Map<number, ModelObject>;
  build: ObjectRef[];
  vertices: Float64Array;
  triangles: Uint32Array;
}

export interface ModelLimits {
  maxTriangles: number;
  maxVertices: number;
}

const numberPattern = /^\s*[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?\s*$/;
const units = new Set<string>(Object.keys(fileUnitsOf3mf));

class Growing<T extends Float64Array | Uint32Array> {
  length = 0;
  constructor(
    public data: T,
    private readonly make: (n: number) => T,
  ) {}
  reserve(extra: number): T {
    if (this.length + extra > this.data.length) {
      const grown = this.make(Math.max(2 * this.data.length, this.length + extra));
      grown.set(this.data.subarray(0, this.length));
      this.data = grown as T;
    }
    return this.data;
  }
}

/** Reads one model part from its unpacked bytes, fed piece by piece. */
export class ModelPartReader {
  private readonly xml: XmlStream;
  private readonly vertices = new Growing(new Float64Array(3 * 1024), (n) => new Float64Array(n));
  private readonly triangles = new Growing(new Uint32Array(3 * 1024), (n) => new Uint32Array(n));
  private readonly objects = new Map<number, ModelObject>();
  private readonly build: ObjectRef[] = [];
  private unit: ThreeMfUnit = 'millimeter';
  private sawModel = false;
  private corePrefix = '';
  private productionPath = 'p:path';
  /** Depth inside elements of other namespaces, whose content is not this reader's. */
  private foreignDepth = 0;
  private path: string[] = [];
  private object: ModelObject | null = null;
  private totalTriangles = 0;

  constructor(
    private readonly part: string,
    private readonly limits: ModelLimits,
  ) {
    this.xml = new XmlStream(part, { open: (tag) => this.open(tag), close: (name) => this.close(name) });
  }

  write(chunk: Uint8Array): Result<void> {
    return this.xml.write(chunk);
  }

  finish(): Result<ModelPart> {
    const ended = this.xml.end();
    if (!ended.ok) return ended;
    if (!this.sawModel) return fail('threemf_no_model', `The 3MF's part "${this.part}" holds no <model>; export the mould again from your CAD program.`);
    return ok({
      unit: this.unit,
      objects: this.objects,
      build: this.build,
      vertices: this.vertices.data.subarray(0, this.vertices.length),
      triangles: this.triangles.data.subarray(0, this.triangles.length),
    });
  }

  private invalid(what: string): never {
    return XmlStream.stop('threemf_invalid', `The 3MF's part "${this.part}" ${what}; export the mould again from your CAD program.`);
  }

  /** The core-namespace local name of an element, or null for another namespace's element. */
  private local(name: string): string | null {
    const colon = name.indexOf(':');
    if (colon < 0) return this.corePrefix === '' ? name : null;
    return name.slice(0, colon) === this.corePrefix ? name.slice(colon + 1) : null;
  }

  private open(tag: SaxesTagPlain): void {
    if (this.foreignDepth > 0) {
      this.foreignDepth++;
      return;
    }
    if (!this.sawModel) {
      this.openModel(tag);
      return;
    }
    const name = this.local(tag.name);
    if (name === null) {
      this.foreignDepth = 1;
      return;
    }
    const parent = this.path[this.path.length - 1];
    const a = tag.attributes;
    if (name === 'vertex' && parent === 'vertices') this.vertex(a);
    else if (name === 'triangle' && parent === 'triangles') this.triangle(a);
    else if (name === 'object' && parent === 'resources') this.startObject(a);
    else if (name === 'component' && parent === 'components' && this.object) this.object.components!.push(this.reference(a, 'component'));
    else if (name === 'components' && parent === 'object' && this.object) this.object.components = [];
    else if (name === 'item' && parent === 'build') this.build.push(this.reference(a, 'build item'));
    this.path.push(name);
  }

  private close(name: string): void {
    if (this.foreignDepth > 0) {
      this.foreignDepth--;
      return;
    }
    const local = this.local(name);
    this.path.pop();
    if (local === 'object' && this.object) {
      this.objects.set(this.object.id, this.object);
      this.object = null;
    }
  }

  private openModel(tag: SaxesTagPlain): void {
    const colon = tag.name.indexOf(':');
    const prefix = colon < 0 ? '' : tag.name.slice(0, colon);
    if (tag.name.slice(colon + 1) !== 'model') this.invalid(`opens with <${tag.name.slice(0, 40)}> where a 3MF model opens with <model>`);
    const bindings = new Map<string, string>();
    for (const [key, value] of Object.entries(tag.attributes)) {
      if (key === 'xmlns') bindings.set('', value.trim());
      else if (key.startsWith('xmlns:')) bindings.set(key.slice(6), value.trim());
    }
    const ns = bindings.get(prefix);
    // Writers that leave the namespace out are read as core; another namespace is another format.
    if (ns !== undefined && ns !== coreNamespace) this.invalid(`is in the namespace "${ns.slice(0, 80)}", not the 3MF core namespace`);
    this.corePrefix = prefix;
    for (const [p, uri] of bindings) if (uri === productionNamespace && p !== '') this.productionPath = `${p}:path`;
    const unit = tag.attributes.unit?.trim() ?? 'millimeter';
    if (!units.has(unit)) this.invalid(`states the unit "${unit.slice(0, 40)}", which is none of micron, millimeter, centimeter, inch, foot and meter`);
    this.unit = unit as ThreeMfUnit;
    for (const required of (tag.attributes.requiredextensions ?? '').split(/\s+/).filter(Boolean)) {
      const uri = bindings.get(required) ?? required;
      if (!harmlessExtensions.has(uri)) {
        XmlStream.stop(
          'threemf_unsupported',
          `The 3MF requires the extension "${uri.slice(0, 100)}", which changes the geometry in a way Gelpoint does not read; export the mould as a plain 3MF mesh or as STL.`,
        );
      }
    }
    this.sawModel = true;
    this.path.push('model');
  }

  private startObject(a: Record<string, string>): void {
    const id = this.resourceId(a.id, 'object id');
    if (this.objects.has(id)) this.invalid(`defines object ${id} twice`);
    this.object = {
      id,
      type: (a.type ?? 'model').trim(),
      vertexStart: this.vertices.length,
      vertexCount: 0,
      triangleStart: this.triangles.length,
      triangleCount: 0,
      components: null,
    };
  }

  private vertex(a: Record<string, string>): void {
    const object = this.object;
    if (!object) return;
    if (this.vertices.length / 3 >= this.limits.maxVertices) {
      XmlStream.stop(
        'too_many_triangles',
        `The 3MF holds more than ${this.limits.maxVertices} vertices, more than this service reads; decimate the mesh in your CAD program and upload it again.`,
      );
    }
    const data = this.vertices.reserve(3);
    const at = this.vertices.length;
    data[at] = this.coordinate(a.x, 'x');
    data[at + 1] = this.coordinate(a.y, 'y');
    data[at + 2] = this.coordinate(a.z, 'z');
    this.vertices.length += 3;
    object.vertexCount++;
  }

  private coordinate(text: string | undefined, axis: string): number {
    if (text === undefined || !numberPattern.test(text)) this.invalid(`has a vertex whose ${axis} is "${String(text).slice(0, 40)}", not a number`);
    const v = Number(text);
    if (!Number.isFinite(v)) this.invalid(`has a vertex whose ${axis} (${text.trim().slice(0, 40)}) is beyond any finite number`);
    return v;
  }

  private triangle(a: Record<string, string>): void {
    const object = this.object;
    if (!object) return;
    if (this.totalTriangles >= this.limits.maxTriangles) {
      XmlStream.stop(
        'too_many_triangles',
        `The 3MF holds more than ${this.limits.maxTriangles} triangles, the most this service accepts; decimate the mesh in your CAD program and upload it again.`,
      );
    }
    const data = this.triangles.reserve(3);
    const at = this.triangles.length;
    data[at] = this.index(a.v1, object);
    data[at + 1] = this.index(a.v2, object);
    data[at + 2] = this.index(a.v3, object);
    this.triangles.length += 3;
    object.triangleCount++;
    this.totalTriangles++;
  }

  private index(text: string | undefined, object: ModelObject): number {
    const v = Number(text);
    if (text === undefined || !Number.isInteger(v) || v < 0 || (v === 0 && !/\d/.test(text))) {
      this.invalid(`has a triangle of object ${object.id} whose corner is "${String(text).slice(0, 40)}", not a vertex number`);
    }
    if (v >= object.vertexCount)
      this.invalid(`has a triangle of object ${object.id} that uses vertex ${v}, but the object has only ${object.vertexCount} vertices`);
    return v;
  }

  private resourceId(text: string | undefined, what: string): number {
    const v = Number(text);
    if (text === undefined || !Number.isInteger(v) || v < 1 || v >= 2 ** 31)
      this.invalid(`has an ${what} "${String(text).slice(0, 40)}", not a whole number from 1 up`);
    return v;
  }

  private reference(a: Record<string, string>, what: string): ObjectRef {
    const objectId = this.resourceId(a.objectid, `${what} objectid`);
    const path = a[this.productionPath]?.trim() || null;
    return { objectId, path, transform: a.transform === undefined ? null : this.matrix(a.transform, what) };
  }

  private matrix(text: string, what: string): Matrix3mf {
    const parts = text.trim().split(/\s+/);
    if (parts.length !== 12 || parts.some((p) => !numberPattern.test(p))) this.invalid(`has a ${what} transform "${text.slice(0, 80)}" that is not 12 numbers`);
    const m = Float64Array.from(parts, Number);
    if (!m.every(Number.isFinite)) this.invalid(`has a ${what} transform with a number beyond any finite value`);
    return m;
  }
}
