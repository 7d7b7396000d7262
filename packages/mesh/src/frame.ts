import { fail, ok, type Result } from './result';

/**
 * The length a file's numbers stand for. A maker picks mm, cm or in for files that carry no unit
 * (STL, OBJ); a 3MF states its own, which may also be micron (um), metre (m) or foot (ft).
 */
export type FileUnits = 'um' | 'mm' | 'cm' | 'm' | 'in' | 'ft';
/** The units a maker chooses for a file that carries none. */
export type ChosenUnits = 'mm' | 'cm' | 'in';
export type UpAxis = 'x' | 'y' | 'z';

/** Millimetres per file unit; 1 in = 25.4 mm and 1 ft = 0.3048 m exactly (NIST SP 811). */
export const mmPerUnit: Record<FileUnits, number> = { um: 0.001, mm: 1, cm: 10, m: 1000, in: 25.4, ft: 304.8 };

export const fileUnitsList: readonly FileUnits[] = ['um', 'mm', 'cm', 'm', 'in', 'ft'];

export function checkUnits(units: unknown): Result<FileUnits> {
  if (typeof units === 'string' && (fileUnitsList as readonly string[]).includes(units)) return ok(units as FileUnits);
  return fail('option_invalid', `Units must be mm, cm or in (or um, m or ft), got "${String(units)}"; say which units the file was exported in.`);
}

export function checkUpAxis(up: unknown): Result<UpAxis> {
  if (up === 'x' || up === 'y' || up === 'z') return ok(up);
  return fail('option_invalid', `The up axis must be x, y or z, got "${String(up)}"; say which axis of the file points up out of the mould's opening.`);
}

/**
 * Writes the file point (x, y, z) into the engine's Z-up millimetre frame. Each turn is a proper
 * rotation (determinant +1), so the winding of every triangle — and the sign of every volume —
 * survives it:
 *   up = z: (x, y, z) → (x, y, z)
 *   up = y: (x, y, z) → (x, −z, y)   a quarter turn about x
 *   up = x: (x, y, z) → (y, z, x)    the cyclic turn about (1, 1, 1)
 * The file's up coordinate becomes z unchanged (only scaled), so a level measured along the file's
 * up axis is the same level in the engine's frame.
 */
export function toZUpMm(x: number, y: number, z: number, up: UpAxis, scale: number, out: Float64Array, at: number): void {
  if (up === 'z') {
    out[at] = x * scale;
    out[at + 1] = y * scale;
    out[at + 2] = z * scale;
  } else if (up === 'y') {
    out[at] = x * scale;
    out[at + 1] = -z * scale;
    out[at + 2] = y * scale;
  } else {
    out[at] = y * scale;
    out[at + 1] = z * scale;
    out[at + 2] = x * scale;
  }
}
