import { mixBatch, type MixResult } from '@gelpoint/core';
import { CliError, numberOption, parseOptions, type Command } from '../command';

const options = {
  'volume-ml': { type: 'string' },
  ratio: { type: 'string' },
  by: { type: 'string' },
  'density-a': { type: 'string' },
  'density-b': { type: 'string' },
  'pigment-pct': { type: 'string' },
  'pigment-density-g-ml': { type: 'string' },
  json: { type: 'boolean' },
} as const;

function required(value: string | undefined, flag: string, example: string): string {
  if (value === undefined || value.trim() === '') throw new CliError(`--${flag} is required (for example --${flag} ${example})`);
  return value;
}

function table(mix: MixResult): string {
  const row = (label: string, grams: number, ml: number | null) =>
    `${label.padEnd(10)}${grams.toFixed(1).padStart(10)} g${ml === null ? '' : `${ml.toFixed(1).padStart(10)} mL`}`;
  return [
    row('part A', mix.partA.grams, mix.partA.ml),
    row('part B', mix.partB.grams, mix.partB.ml),
    row('pigment', mix.pigment.grams, mix.pigmentMl),
    row('total', mix.totalGrams, mix.partA.ml + mix.partB.ml + mix.pigmentMl),
    `mixed density ${mix.mixedDensityGPerMl.toFixed(4)} g/mL (part A + part B); pigment as % of part A + part B by mass`,
  ].join('\n');
}

/** gelpoint mix: grams and mL of part A, part B and pigment for one cup. */
export const command: Command = async (argv) => {
  const { values } = parseOptions(argv, options);
  const volumeMl = numberOption(values['volume-ml'], 'volume-ml', { required: true })!;
  const ratio = required(values.ratio, 'ratio', '2:1');
  const by = required(values.by, 'by', 'weight');
  if (by !== 'weight' && by !== 'volume') throw new CliError(`--by must be "weight" or "volume", got "${by}"`);
  const densityA = numberOption(values['density-a'], 'density-a', { required: true })!;
  const densityB = numberOption(values['density-b'], 'density-b', { required: true })!;
  const pigmentPct = numberOption(values['pigment-pct'], 'pigment-pct') ?? 0;
  const pigmentDensity = numberOption(values['pigment-density-g-ml'], 'pigment-density-g-ml');
  const result = mixBatch({
    target: { volumeMl },
    ratio,
    basis: by,
    densityAGPerMl: densityA,
    densityBGPerMl: densityB,
    pigmentPct,
    ...(pigmentDensity === undefined ? {} : { pigmentDensityGPerMl: pigmentDensity }),
  });
  if (!result.ok) throw new CliError(result.error.message);
  const mix = result.value;
  return values.json ? JSON.stringify(mix, null, 2) : table(mix);
};
