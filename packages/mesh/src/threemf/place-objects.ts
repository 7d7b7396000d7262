import { mmPerUnit } from '../frame';
import { fail, ok, type MeshWarning, type Result } from '../result';
import { fileUnitsOf3mf, type Matrix3mf, type ModelObject, type ModelPart, type ObjectRef } from './model-part';

/**
 * Places every object the build names, as the 3MF core specification asks: each build item's
 * object with the item's transform (§3.4.3.1), each component's object with the component's
 * transform inside its parent (§4.2), recursively. Matrices are in the specification's row form
 * (§3.3): a point is the row [x y z 1] times the 4×3 matrix, so a component inside an item is
 * placed by C·I. A transform that mirrors (negative determinant) keeps the volume's sign (§3.3),
 * so the triangles it places are turned back over.
 */
export interface PlacedTriangles {
  positions: Float32Array;
  triangleCount: number;
  warnings: MeshWarning[];
}

/** Object types that are part of the body; supports are not, and `other` may not be built (§4, §4.1). */
const solidTypes = new Set(['model', 'solidsupport', 'surface']);
const maxNesting = 64;

const identity: Matrix3mf = Float64Array.of(1, 0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0);

/** A·B for 4×4 affine matrices stored as their first three columns, row by row. */
function product(a: Matrix3mf, b: Matrix3mf): Matrix3mf {
  const out = new Float64Array(12);
  for (let i = 0; i < 4; i++) {
    for (let j = 0; j < 3; j++) {
      out[3 * i + j] = a[3 * i]! * b[j]! + a[3 * i + 1]! * b[3 + j]! + a[3 * i + 2]! * b[6 + j]! + (i === 3 ? b[9 + j]! : 0);
    }
  }
  return out;
}

function determinant(m: Matrix3mf): number {
  return m[0]! * (m[4]! * m[8]! - m[5]! * m[7]!) - m[1]! * (m[3]! * m[8]! - m[5]! * m[6]!) + m[2]! * (m[3]! * m[7]! - m[4]! * m[6]!);
}

function scaling(s: number): Matrix3mf {
  return Float64Array.of(s, 0, 0, 0, s, 0, 0, 0, s, 0, 0, 0);
}

interface Resolved {
  object: ModelObject;
  partKey: string;
  part: ModelPart;
}

export function placeObjects(parts: Map<string, ModelPart>, keyOf: (path: string) => string, maxTriangles: number): Result<PlacedTriangles> {
  const root = parts.get('')!;
  const invalid = (what: string): Result<never> => fail('threemf_invalid', `The 3MF ${what}; export the mould again from your CAD program.`);

  const resolve = (ref: ObjectRef, fromKey: string): Resolved | string => {
    if (ref.path !== null && fromKey !== '') return `names another model part from inside "${fromKey}", which only the root model may do`;
    const partKey = ref.path === null ? fromKey : keyOf(ref.path);
    const part = parts.get(partKey);
    if (!part) return `refers to the model part "${ref.path ?? ''}", which the file does not hold`;
    const object = part.objects.get(ref.objectId);
    if (!object) return `refers to object ${ref.objectId}${partKey ? ` in "${partKey}"` : ''}, which is not defined`;
    return { object, partKey, part };
  };

  // Triangles each object puts out, counted once per object so a deep or cyclic tree is caught
  // before anything is allocated.
  const counted = new Map<string, number>();
  const visiting = new Set<string>();
  let skippedObjects = 0;
  const count = (r: Resolved, depth: number): number | string => {
    const key = `${r.partKey}#${r.object.id}`;
    const known = counted.get(key);
    if (known !== undefined) return known;
    if (visiting.has(key)) return `has object ${r.object.id} among its own components`;
    if (depth > maxNesting) return `nests components more than ${maxNesting} deep`;
    visiting.add(key);
    let total = 0;
    if (r.object.components) {
      for (const c of r.object.components) {
        const child = resolve(c, r.partKey);
        if (typeof child === 'string') return child;
        const n = count(child, depth + 1);
        if (typeof n === 'string') return n;
        total = Math.min(total + n, Number.MAX_SAFE_INTEGER);
      }
    } else if (solidTypes.has(r.object.type)) {
      total = r.object.triangleCount;
    }
    visiting.delete(key);
    counted.set(key, total);
    return total;
  };

  const items: Resolved[] = [];
  let total = 0;
  for (const item of root.build) {
    const r = resolve(item, '');
    if (typeof r === 'string') return invalid(`build ${r}`);
    const n = count(r, 0);
    if (typeof n === 'string') return invalid(n);
    items.push(r);
    total += n;
    if (total > maxTriangles) {
      return fail(
        'too_many_triangles',
        `The 3MF places more than ${maxTriangles} triangles, the most this service accepts; decimate the mesh in your CAD program and upload it again.`,
      );
    }
  }
  if (root.build.length === 0)
    return fail('threemf_no_model', 'The 3MF builds no object (its <build> is empty); export the mould again with the mould placed on the build plate.');
  if (total === 0) {
    return fail(
      'stl_no_triangles',
      'The objects the 3MF builds have no triangles (they may be supports or made by an extension Gelpoint does not read); export the mould again as a mesh.',
    );
  }

  const positions = new Float32Array(total * 9);
  let written = 0;
  let nonFinite = false;
  const scratch: { data: Float64Array } = { data: new Float64Array(0) };

  const emitMesh = (r: Resolved, m: Matrix3mf): void => {
    const { object, part } = r;
    if (!solidTypes.has(object.type)) {
      skippedObjects++;
      return;
    }
    const n = object.vertexCount;
    if (scratch.data.length < 3 * n) scratch.data = new Float64Array(3 * n);
    const placed = scratch.data;
    const v = part.vertices;
    for (let i = 0; i < n; i++) {
      const at = object.vertexStart + 3 * i;
      const x = v[at]!,
        y = v[at + 1]!,
        z = v[at + 2]!;
      placed[3 * i] = x * m[0]! + y * m[3]! + z * m[6]! + m[9]!;
      placed[3 * i + 1] = x * m[1]! + y * m[4]! + z * m[7]! + m[10]!;
      placed[3 * i + 2] = x * m[2]! + y * m[5]! + z * m[8]! + m[11]!;
    }
    const mirrored = determinant(m) < 0;
    const t = part.triangles;
    let check = 0;
    for (let k = 0; k < object.triangleCount; k++) {
      const at = object.triangleStart + 3 * k;
      const a = t[at]!;
      const b = mirrored ? t[at + 2]! : t[at + 1]!;
      const c = mirrored ? t[at + 1]! : t[at + 2]!;
      const out = 9 * written++;
      for (let j = 0; j < 3; j++) {
        positions[out + j] = placed[3 * a + j]!;
        positions[out + 3 + j] = placed[3 * b + j]!;
        positions[out + 6 + j] = placed[3 * c + j]!;
      }
      for (let j = 0; j < 9; j++) check += positions[out + j]! - positions[out + j]!;
    }
    if (check !== 0) nonFinite = true;
  };

  const emit = (r: Resolved, m: Matrix3mf): void => {
    if (counted.get(`${r.partKey}#${r.object.id}`) === 0 && r.object.components) return;
    if (!r.object.components) {
      emitMesh(r, m);
      return;
    }
    for (const c of r.object.components) {
      const child = resolve(c, r.partKey) as Resolved;
      let local = c.transform ?? identity;
      if (child.partKey !== r.partKey) local = product(scaling(mmPerUnit[fileUnitsOf3mf[child.part.unit]] / mmPerUnit[fileUnitsOf3mf[root.unit]]), local);
      emit(child, product(local, m));
    }
  };

  for (let i = 0; i < items.length; i++) {
    const r = items[i]!;
    let m = root.build[i]!.transform ?? identity;
    if (r.partKey !== '') m = product(scaling(mmPerUnit[fileUnitsOf3mf[r.part.unit]] / mmPerUnit[fileUnitsOf3mf[root.unit]]), m);
    emit(r, m);
  }
  if (nonFinite) {
    return fail(
      'stl_non_finite',
      'A transform in the 3MF places a corner beyond the ±3.4e38 a coordinate can hold; check the transforms and units and export the mould again.',
    );
  }
  const warnings: MeshWarning[] = [];
  if (skippedObjects > 0) {
    const one = skippedObjects === 1;
    warnings.push({
      code: 'threemf_objects_skipped',
      message: `${skippedObjects} object${one ? '' : 's'} the 3MF marks as support (or as not part of the body) ${one ? 'was' : 'were'} left out of the mould.`,
    });
  }
  return ok({ positions: written === total ? positions : positions.slice(0, 9 * written), triangleCount: written, warnings });
}
