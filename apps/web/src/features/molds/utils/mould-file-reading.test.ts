import { BoxGeometry, Group, Mesh, Vector3, Box3 } from 'three';
import { OBJExporter, OBJLoader, STLExporter, STLLoader } from 'three-stdlib';
import { describe, expect, it } from 'vitest';
import { encode3mf } from '../../../../../../packages/mesh/test/mould-files';
import { readMouldFileInBrowser } from './mould-file-reading';

function shiftedBox(): Group {
  const group = new Group();
  const box = new Mesh(new BoxGeometry(15, 8, 1.25));
  box.position.set(2, -3, 0.625);
  group.add(box);
  group.updateMatrixWorld(true);
  return group;
}

function bytesOf(view: DataView): Uint8Array {
  return new Uint8Array(view.buffer, view.byteOffset, view.byteLength);
}

function expectBox(read: ReturnType<typeof readMouldFileInBrowser>, box: Box3): void {
  expect(read.ok).toBe(true);
  if (!read.ok) return;
  expect(read.value.min[0]).toBeCloseTo(box.min.x, 5);
  expect(read.value.min[1]).toBeCloseTo(box.min.y, 5);
  expect(read.value.min[2]).toBeCloseTo(box.min.z, 5);
  expect(read.value.max[0]).toBeCloseTo(box.max.x, 5);
  expect(read.value.max[2]).toBeCloseTo(box.max.z, 5);
}

// Reference: three.js's exporters write the files and its own loaders with Box3 measure them,
// independently of the mesh package's readers.
describe('readMouldFileInBrowser', () => {
  it('reads the size of a binary STL as three.js measures it', () => {
    const view = new STLExporter().parse(shiftedBox(), { binary: true });
    const geometry = new STLLoader().parse(view.buffer as ArrayBuffer);
    geometry.computeBoundingBox();
    const read = readMouldFileInBrowser(bytesOf(view));
    expectBox(read, geometry.boundingBox!);
    expect(read.ok && read.value).toMatchObject({ format: 'stl', fileUnits: null, triangles: 12 });
  });

  it('reads the size of an OBJ as three.js measures it', () => {
    const text = new OBJExporter().parse(shiftedBox());
    const box = new Box3().setFromObject(new OBJLoader().parse(text));
    const read = readMouldFileInBrowser(new TextEncoder().encode(text));
    expectBox(read, box);
    expect(read.ok && read.value).toMatchObject({ format: 'obj', fileUnits: null, triangles: 12 });
  });

  it('says which unit a 3MF states, and gives its size in the file’s own numbers', () => {
    const geometry = new BoxGeometry(40, 20, 10).toNonIndexed();
    const positions = Float64Array.from(geometry.getAttribute('position').array);
    // The box written in inches: its numbers are the millimetres divided by 25.4 (NIST SP 811).
    const read = readMouldFileInBrowser(encode3mf({ positions, triangleCount: positions.length / 9 }, 'inch', 25.4));
    const box = new Box3().setFromPoints([new Vector3(-20, -10, -5).divideScalar(25.4), new Vector3(20, 10, 5).divideScalar(25.4)]);
    expectBox(read, box);
    expect(read.ok && read.value).toMatchObject({ format: '3mf', fileUnits: 'in', triangles: 12 });
  });

  it('passes on the reader’s sentence for a file it cannot read', () => {
    const read = readMouldFileInBrowser(new TextEncoder().encode('a shopping list, not a mould'));
    expect(read.ok ? '' : read.error.message).toMatch(/neither an ASCII STL .* nor an OBJ/);
  });
});
