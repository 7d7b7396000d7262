import { BoxGeometry, Group, Mesh } from 'three';
import { STLExporter, STLLoader } from 'three-stdlib';
import { describe, expect, it } from 'vitest';
import { stlExtent } from './stl-extent';

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

// Reference: three.js's STL exporter writes the files, and its STL loader with Box3 measures them
// independently (the binary layout of the STL format: 80-byte header, uint32 count, 50 bytes a facet).
describe('stlExtent', () => {
  it('reads the size of a binary STL as three.js measures it', () => {
    const view = new STLExporter().parse(shiftedBox(), { binary: true });
    const extent = stlExtent(bytesOf(view));
    const geometry = new STLLoader().parse(view.buffer as ArrayBuffer);
    geometry.computeBoundingBox();
    const box = geometry.boundingBox!;
    expect(extent.ok).toBe(true);
    if (!extent.ok) return;
    expect(extent.value.format).toBe('binary');
    expect(extent.value.triangles).toBe(12);
    expect(extent.value.min).toEqual([box.min.x, box.min.y, box.min.z]);
    expect(extent.value.max).toEqual([box.max.x, box.max.y, box.max.z]);
    expect(extent.value.size[0]).toBeCloseTo(15, 5);
    expect(extent.value.size[2]).toBeCloseTo(1.25, 5);
  });

  it('reads an ASCII STL of the same box to the same size', () => {
    const text = new STLExporter().parse(shiftedBox());
    const extent = stlExtent(new TextEncoder().encode(text));
    expect(extent.ok && extent.value.format).toBe('ascii');
    if (!extent.ok) return;
    expect(extent.value.triangles).toBe(12);
    expect(extent.value.min[1]).toBeCloseTo(-7, 9);
    expect(extent.value.max[0]).toBeCloseTo(9.5, 9);
  });

  it('takes a binary file for binary even when its header begins with "solid"', () => {
    const bytes = bytesOf(new STLExporter().parse(shiftedBox(), { binary: true }));
    bytes.set(new TextEncoder().encode('solid mould from a CAD export'), 0);
    const extent = stlExtent(bytes);
    expect(extent.ok && extent.value.format).toBe('binary');
  });

  it('says when a binary STL is cut short, counting from its own announced triangles', () => {
    const whole = bytesOf(new STLExporter().parse(shiftedBox(), { binary: true }));
    const extent = stlExtent(whole.subarray(0, 84 + 50 * 3));
    expect(extent.ok).toBe(false);
    if (extent.ok) return;
    expect(extent.error.code).toBe('stl_length_mismatch');
    // 80-byte header + 4-byte count + 12 facets of 50 bytes = 684 bytes.
    expect(extent.error.message).toContain('announces 12 triangles, which take 684 bytes, but the file has 234');
  });

  it('refuses a file that is no STL with a sentence that says what to do', () => {
    const extent = stlExtent(new TextEncoder().encode('PK\u0003\u0004 a zip'));
    expect(extent.ok).toBe(false);
    if (extent.ok) return;
    expect(extent.error.code).toBe('stl_unreadable');
    expect(extent.error.message).toMatch(/export the mould/);
  });

  it('refuses an ASCII STL without triangles', () => {
    const extent = stlExtent(new TextEncoder().encode('solid empty\nendsolid empty\n'));
    expect(!extent.ok && extent.error.code).toBe('stl_empty');
  });
});
