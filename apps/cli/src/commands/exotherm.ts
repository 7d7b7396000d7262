import { exothermCaution as caution, forecastSingleLayer, type LayerForecast, type MaxLayer } from '@gelpoint/thermal';
import { CliError, numberOption, parseOptions, type Command } from '../command';

const options = {
  'depth-mm': { type: 'string' },
  'ambient-c': { type: 'string' },
  'reaction-heat-j-g': { type: 'string' },
  'activation-kj-mol': { type: 'string' },
  'ref-temp-c': { type: 'string' },
  'gel-min': { type: 'string' },
  'density-g-ml': { type: 'string' },
  'heat-capacity-j-gk': { type: 'string' },
  'conductivity-w-mk': { type: 'string' },
  base: { type: 'string' },
  'limit-c': { type: 'string' },
  json: { type: 'boolean' },
} as const;

function hoursMinutes(min: number): string {
  const total = Math.round(min);
  return `${Math.floor(total / 60)} h ${String(total % 60).padStart(2, '0')} min`;
}

function report(f: LayerForecast, ambientC: number, base: string, max: MaxLayer | null): string {
  const line = (label: string, value: string) => `${label.padEnd(22)}${value}`;
  const lines = [
    line('layer', `${f.depthMm} mm poured at ${ambientC} °C on ${base === 'wood' ? 'bare wood' : 'an insulated base'}`),
    line('peak', `${f.peakC.toFixed(1)} °C${f.runaway ? ' (runaway: the layer reaches its adiabatic ceiling)' : ''}`),
    line('time to peak', `${hoursMinutes(f.timeToPeakMin)} after mixing`),
    line('hottest depth', `${f.peakDepthMm.toFixed(1)} mm below the surface`),
    line('adiabatic ceiling', `${(ambientC + f.adiabaticRiseK).toFixed(1)} °C (no heat lost at all)`),
  ];
  if (max) {
    const deepest = max.reachedCap ? `over ${max.maxLayerMm} mm (the search stops there)` : `${max.maxLayerMm.toFixed(1)} mm`;
    lines.push(line(`deepest under ${max.limitC} °C`, deepest));
  }
  if (f.reachedTimeLimit) lines.push('the cure was still going when the forecast stopped: the peak may come later');
  lines.push(`model: ${f.model}`, caution);
  return lines.join('\n');
}

/** gelpoint exotherm: the forecast of one layer's exotherm. */
export const command: Command = async (argv) => {
  const { values } = parseOptions(argv, options);
  const depthMm = numberOption(values['depth-mm'], 'depth-mm', { required: true })!;
  const ambientC = numberOption(values['ambient-c'], 'ambient-c', { required: true })!;
  const base = values.base ?? 'wood';
  if (base !== 'wood' && base !== 'insulated') throw new CliError(`--base must be "wood" or "insulated", got "${base}"`);
  const limitC = numberOption(values['limit-c'], 'limit-c');
  const answer = forecastSingleLayer({
    depthMm,
    ambientC,
    reactionHeatJPerG: numberOption(values['reaction-heat-j-g'], 'reaction-heat-j-g', { required: true })!,
    activationEnergyKJPerMol: numberOption(values['activation-kj-mol'], 'activation-kj-mol', { required: true })!,
    refTempC: numberOption(values['ref-temp-c'], 'ref-temp-c', { required: true })!,
    gelTimeMin: numberOption(values['gel-min'], 'gel-min', { required: true })!,
    densityGPerMl: numberOption(values['density-g-ml'], 'density-g-ml'),
    heatCapacityJPerGK: numberOption(values['heat-capacity-j-gk'], 'heat-capacity-j-gk'),
    conductivityWPerMK: numberOption(values['conductivity-w-mk'], 'conductivity-w-mk'),
    base,
    limitC,
  });
  if (!answer.ok) throw new CliError(answer.error.message);
  const { forecast: f, max } = answer.value;
  if (!values.json) return report(f, ambientC, base, max);
  return JSON.stringify(
    {
      peakC: f.peakC,
      timeToPeakMin: f.timeToPeakMin,
      peakDepthMm: f.peakDepthMm,
      model: f.model,
      ...(max ? { maxLayerMm: max.maxLayerMm, maxLayerPeakC: max.peakC, limitC: max.limitC } : {}),
      depthMm: f.depthMm,
      ambientC,
      base,
      adiabaticRiseK: f.adiabaticRiseK,
      runaway: f.runaway,
      reachedTimeLimit: f.reachedTimeLimit,
      caution,
    },
    null,
    2,
  );
};
