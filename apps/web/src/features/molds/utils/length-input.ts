import { convertLength, fail, formatLength, ok, readDecimal, unitSystemUnits, type LengthUnit, type Result, type UnitSystem } from '@gelpoint/core';

export function shopLengthUnit(unitSystem: UnitSystem): LengthUnit {
  return unitSystemUnits[unitSystem].length.unit;
}

export function mmToShopLength(lengthMm: number, unitSystem: UnitSystem): number {
  return convertLength(lengthMm, 'mm', shopLengthUnit(unitSystem));
}

export function shopLengthToMm(length: number, unitSystem: UnitSystem): number {
  return convertLength(length, shopLengthUnit(unitSystem), 'mm');
}

// The same decimals core's formatLength shows, so a typed value and the printed one agree.
const decimals: Record<UnitSystem, number> = { metric: 1, us: 3 };

/** Slider steps: a tenth of a millimetre, or five thousandths of an inch. */
export function lengthInputStep(unitSystem: UnitSystem): number {
  return unitSystem === 'metric' ? 0.1 : 0.005;
}

/** A length as a form control shows it: in the shop's unit, rounded as it is printed, without the unit. */
export function lengthInputValue(lengthMm: number, unitSystem: UnitSystem): string {
  return mmToShopLength(lengthMm, unitSystem).toFixed(decimals[unitSystem]);
}

export interface LengthBoundsMm {
  minMm: number;
  maxMm: number;
}

/**
 * Reads a typed length in the shop's unit back to millimetres, inside the bounds. A value that is
 * off a bound by less than the printed rounding is the bound itself (typing the shown "1.181 in"
 * for a 30 mm rim must not be refused as above it).
 */
export function readLengthInput(text: string, unitSystem: UnitSystem, bounds: LengthBoundsMm, label: string): Result<number> {
  const unit = shopLengthUnit(unitSystem);
  const range = `between ${formatLength(bounds.minMm, unitSystem).text} and ${formatLength(bounds.maxMm, unitSystem).text}`;
  const value = readDecimal(text);
  if (value === null) {
    return fail(
      'length_unreadable',
      `${label} must be a number in ${unit}, ${range}; type digits only, such as ${lengthInputValue(bounds.maxMm, unitSystem)}.`,
    );
  }
  const lengthMm = shopLengthToMm(value, unitSystem);
  const slackMm = shopLengthToMm(0.5 * 10 ** -decimals[unitSystem], unitSystem);
  if (lengthMm < bounds.minMm - slackMm || lengthMm > bounds.maxMm + slackMm) {
    return fail('length_out_of_range', `${label} must be ${range}; ${formatLength(lengthMm, unitSystem).text} is outside the mould.`);
  }
  return ok(Math.min(bounds.maxMm, Math.max(bounds.minMm, lengthMm)));
}

/** An optional length such as a layer limit: empty is "not given", anything else must be above zero. */
export function readOptionalLength(text: string, unitSystem: UnitSystem, label: string): Result<number | null> {
  const trimmed = text.trim();
  if (trimmed === '') return ok(null);
  const value = readDecimal(trimmed);
  if (value === null || value <= 0) {
    return fail('length_not_positive', `${label} must be a number above zero in ${shopLengthUnit(unitSystem)}, or left empty; "${trimmed}" is not.`);
  }
  return ok(shopLengthToMm(value, unitSystem));
}
