import { Matrix3, Matrix4, Vector3 } from 'three';
import { describe, expect, it } from 'vitest';
import { upAxisTurn } from './up-axis-turn';

function asMatrix3(up: 'x' | 'y' | 'z'): Matrix3 {
  // Matrix3.set takes its arguments row by row, the same order as the turn.
  return new Matrix3().set(...upAxisTurn(up));
}

function expectSameMatrix(actual: Matrix3, expected: Matrix3) {
  actual.elements.forEach((value, i) => expect(value).toBeCloseTo(expected.elements[i]!, 12));
}

// Reference: three.js's own rotation builders (Rodrigues' formula), and its determinant.
describe('upAxisTurn', () => {
  it('leaves a Z-up file as it is', () => {
    expectSameMatrix(asMatrix3('z'), new Matrix3().identity());
  });

  it('turns a Y-up file a quarter turn about x', () => {
    expectSameMatrix(asMatrix3('y'), new Matrix3().setFromMatrix4(new Matrix4().makeRotationX(Math.PI / 2)));
  });

  it('turns an X-up file by a third of a turn about the (1, 1, 1) diagonal', () => {
    const diagonal = new Vector3(1, 1, 1).normalize();
    expectSameMatrix(asMatrix3('x'), new Matrix3().setFromMatrix4(new Matrix4().makeRotationAxis(diagonal, (-2 * Math.PI) / 3)));
  });

  it.each(['x', 'y', 'z'] as const)('keeps the winding of every triangle for up = %s (a proper rotation, determinant +1)', (up) => {
    expect(asMatrix3(up).determinant()).toBeCloseTo(1, 12);
  });

  it.each(['x', 'y', 'z'] as const)('brings the file axis %s to the report’s z', (up) => {
    const along = new Vector3(up === 'x' ? 1 : 0, up === 'y' ? 1 : 0, up === 'z' ? 1 : 0).applyMatrix3(asMatrix3(up));
    expect(along.z).toBeCloseTo(1, 12);
    expect(Math.hypot(along.x, along.y)).toBeCloseTo(0, 12);
  });
});
