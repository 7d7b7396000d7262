import { formatTemperature, minSurfaceMarginC, surfaceDewPointCheck, type UnitSystem } from '@gelpoint/core';
import { inputUnitsOf, temperatureFromC } from './shop-units';

export interface DewPointReadout {
  dewPointC: number;
  marginC: number;
  clear: boolean;
  /** The warning in the shop's units, or null when the surface is clear of the dew point. */
  warning: string | null;
}

/**
 * The live dew-point check of the mixing form, once air, surface and humidity are all typed (all in °C and %).
 * Core does the physics; this only words it in the shop's units.
 */
export function dewPointReadout(airTempC: number | null, surfaceTempC: number | null, rhPct: number | null, unitSystem: UnitSystem): DewPointReadout | null {
  if (airTempC === null || surfaceTempC === null || rhPct === null) return null;
  const check = surfaceDewPointCheck(surfaceTempC, airTempC, rhPct);
  if (!check.ok) return null;
  const { dewPointC, marginC, clear } = check.value;
  const shown = (tempC: number) => formatTemperature(tempC, unitSystem).text;
  // A difference of temperatures: the gap between two converted readings, not a converted reading.
  const gap = (fromC: number, toC: number) =>
    `${(temperatureFromC(toC, unitSystem) - temperatureFromC(fromC, unitSystem)).toFixed(1)} ${inputUnitsOf(unitSystem).temperature}`;
  const marginShown = gap(dewPointC, surfaceTempC);
  const neededShown = gap(0, minSurfaceMarginC);
  const warning = clear
    ? null
    : marginC <= 0
      ? `The surface (${shown(surfaceTempC)}) is at or below the dew point (${shown(dewPointC)}): water will condense on it and the resin can blush or cloud. Warm the piece or dry the air before pouring.`
      : `The surface (${shown(surfaceTempC)}) is only ${marginShown} above the dew point (${shown(dewPointC)}); it needs at least ${neededShown} so moisture cannot condense and cause amine blush. Warm the piece or dry the air before pouring.`;
  return { dewPointC, marginC, clear, warning };
}
