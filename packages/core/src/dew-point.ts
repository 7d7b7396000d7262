import { caution, type Caution } from './cautions';
import { fail, ok, type Result } from './result';

// Magnus form constants of Alduchov & Eskridge (1996), as recommended by Lawrence (2005).
const magnusA = 17.625;
const magnusBC = 243.04;

/** Surfaces closer than this to the dew point risk condensation and amine blush (ISO 8502-4 practice). */
export const minSurfaceMarginC = 3;

function checkHumidity(rhPct: number): Result<number> {
  if (!Number.isFinite(rhPct) || rhPct <= 0 || rhPct > 100) {
    return fail('humidity_out_of_range', `Relative humidity must be above 0 and at most 100 %, got ${String(rhPct)}; read it off the hygrometer.`);
  }
  return ok(rhPct);
}

export function dewPointC(airTempC: number, rhPct: number): Result<number> {
  const rh = checkHumidity(rhPct);
  if (!rh.ok) return rh;
  if (!Number.isFinite(airTempC)) return fail('temperature_invalid', `The air temperature must be a number in °C, got ${String(airTempC)}.`);
  const gamma = Math.log(rh.value / 100) + (magnusA * airTempC) / (magnusBC + airTempC);
  return ok((magnusBC * gamma) / (magnusA - gamma));
}

export interface SurfaceDewPointCheck {
  dewPointC: number;
  /** Surface temperature minus dew point. */
  marginC: number;
  /** True when the surface is at least minSurfaceMarginC above the dew point. */
  clear: boolean;
  caution: Caution | null;
}

export function surfaceDewPointCheck(surfaceTempC: number, airTempC: number, rhPct: number): Result<SurfaceDewPointCheck> {
  const dew = dewPointC(airTempC, rhPct);
  if (!dew.ok) return dew;
  if (!Number.isFinite(surfaceTempC)) return fail('temperature_invalid', `The surface temperature must be a number in °C, got ${String(surfaceTempC)}.`);
  const marginC = surfaceTempC - dew.value;
  const clear = marginC >= minSurfaceMarginC;
  return ok({
    dewPointC: dew.value,
    marginC,
    clear,
    caution: clear
      ? null
      : caution(
          'surface_near_dew_point',
          'warning',
          `The surface (${surfaceTempC.toFixed(1)} °C) is only ${marginC.toFixed(1)} °C above the dew point (${dew.value.toFixed(1)} °C); below a ${minSurfaceMarginC} °C margin moisture can condense and cause amine blush. Warm the piece or dry the air before pouring.`,
          'plan',
        ),
  });
}
