import { ambientOf, checkAmbient } from './ambient';
import { buildColumnGrid, uniformCells } from './column-grid';
import { runColumn } from './column-run';
import { conversionAfterReducedTime, dgebaAmineKinetics, k2At, rateLawFromGelTime } from './kinetics';
import { kelvin } from './physics';
import { checkResinThermal, type ResinThermal } from './resin-thermal';
import { fail, ok, type Result } from './result';
import { radiationWPerM2K, sphereConvectionWPerM2K } from './surface';

export interface CupInput {
  /** Mixed A + B in the cup, g. */
  massG: number;
  ambientC: number;
  /** Temperature of the mix; the air's when absent. */
  mixTempC?: number;
  /** The data sheet's pot life, minutes. */
  sheetPotLifeMin: number;
  /** Temperature the data sheet's pot life holds at; the resin's refTempC when absent. */
  sheetPotLifeTempC?: number;
}

export interface CupPotLife {
  /** Working time of this cup, never longer than the data sheet's pot life at the same temperature. */
  potLifeMin: number;
  /** The data sheet's pot life moved to the shop's temperature by the Arrhenius law (a thin film, no self-heating). */
  sheetPotLifeAtAmbientMin: number;
  limitedBy: 'cup_heating' | 'data_sheet';
  /** Hottest point of the cup (its centre) by the end of the pot life. */
  peakC: number;
  /** The cup's centre when the pot life ends: its temperature and how far it has cured. */
  centreC: number;
  centreConversion: number;
  /** Conversion that ends the pot life: what a thin film reaches in the data sheet's pot life. */
  thresholdConversion: number;
  /** Radius of the sphere of the cup's volume. */
  radiusMm: number;
}

/**
 * How long a mixed cup stays workable. The cup is modelled as a sphere of the same volume (the
 * shape that keeps heat best for its mass, so it errs hot), cooled by free convection (Churchill's
 * sphere correlation) and radiation; its pot life ends when the cup as a whole (the mass-weighted mean
 * conversion) reaches the conversion a thin film reaches within the data sheet's pot life. The centre
 * alone would not do: past a few centimetres of radius every centre is adiabatic for the length of a
 * pot life, so a 100 g and a 1000 g cup would run out together, while the share of the mass near the
 * cooled wall, and with it the cup's mean heating, falls as the cup grows. The cup's own heat only speeds the cure, and the
 * answer is capped by the data sheet's pot life at the same temperature, so it is never longer.
 */
export function cupPotLife(resin: ResinThermal, cup: CupInput): Result<CupPotLife> {
  const checked = checkResinThermal(resin);
  if (!checked.ok) return checked;
  if (!(Number.isFinite(cup.massG) && cup.massG > 0 && cup.massG <= 100_000)) {
    return fail('cup_mass_invalid', `The mass in the cup must be above 0 and at most 100000 g, got ${String(cup.massG)}.`);
  }
  if (!(Number.isFinite(cup.sheetPotLifeMin) && cup.sheetPotLifeMin > 0)) {
    return fail('pot_life_invalid', `The data sheet's pot life must be a number of minutes above zero, got ${String(cup.sheetPotLifeMin)}.`);
  }
  const air = checkAmbient(cup.ambientC);
  if (!air.ok) return air;
  const mixTempC = cup.mixTempC ?? cup.ambientC;
  const mixCheck = checkAmbient(mixTempC);
  if (!mixCheck.ok) return fail('mix_temp_invalid', `The mix temperature must be a number of °C between −40 and 80, got ${String(mixTempC)}.`);
  const sheetTempC = cup.sheetPotLifeTempC ?? resin.refTempC;
  const sheetCheck = checkAmbient(sheetTempC);
  if (!sheetCheck.ok) return fail('pot_life_temp_invalid', `The pot life's temperature must be a number of °C between −40 and 80, got ${String(sheetTempC)}.`);

  const law = rateLawFromGelTime(resin.gelTimeMin, resin.refTempC, resin.activationEnergyKJPerMol, resin.kinetics ?? dgebaAmineKinetics);
  const threshold = conversionAfterReducedTime(k2At(law, kelvin(sheetTempC)) * cup.sheetPotLifeMin * 60, law.kinetics);
  const sheetAtAmbientS = (cup.sheetPotLifeMin * 60 * k2At(law, kelvin(sheetTempC))) / k2At(law, kelvin(cup.ambientC));

  const rho = resin.densityGPerMl * 1000;
  const radiusM = Math.cbrt((3 * (cup.massG / 1000 / rho)) / (4 * Math.PI));
  const material = { conductivityWPerMK: resin.conductivityWPerMK, volumetricHeatJPerM3K: rho * resin.heatCapacityJPerGK * 1000 };
  const grid = buildColumnGrid('sphere', [{ material, thicknessM: radiusM, reacting: true, cellsM: uniformCells(radiusM, 16) }]);
  const run = runColumn({
    grid,
    law,
    reactionHeatJPerM3: rho * resin.reactionHeatJPerG * 1000 * (resin.heatScale ?? 1),
    surfaceH: (surfaceC, airC) => sphereConvectionWPerM2K(surfaceC, airC, 2 * radiusM) + radiationWPerM2K(surfaceC, airC),
    ambient: ambientOf(cup.ambientC),
    initialTempC: () => mixTempC,
    initialConversion: 0,
    stepKelvin: 0.25,
    stepConversion: 0.005,
    maxStepS: 60,
    endS: sheetAtAmbientS,
    until: 'fixed',
    record: false,
    stopAtConversion: threshold,
    stopConversionOf: 'mean',
  });
  const cupS = run.conversionReachedS ?? sheetAtAmbientS;
  const limitedBy = run.conversionReachedS !== null && cupS < sheetAtAmbientS ? 'cup_heating' : 'data_sheet';
  return ok({
    potLifeMin: Math.min(cupS, sheetAtAmbientS) / 60,
    sheetPotLifeAtAmbientMin: sheetAtAmbientS / 60,
    limitedBy,
    peakC: Math.max(...run.finalTempC, run.peakC),
    // Depth is measured in from the surface, so the last node is the centre.
    centreC: run.finalTempC[run.finalTempC.length - 1]!,
    centreConversion: run.finalConversion[run.finalConversion.length - 1]!,
    thresholdConversion: threshold,
    radiusMm: radiusM * 1000,
  });
}
