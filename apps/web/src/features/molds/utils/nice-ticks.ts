function niceNumber(value: number, round: boolean): number {
  const exponent = Math.floor(Math.log10(value));
  const fraction = value / 10 ** exponent;
  let nice: number;
  if (round) nice = fraction < 1.5 ? 1 : fraction < 3 ? 2 : fraction < 7 ? 5 : 10;
  else nice = fraction <= 1 ? 1 : fraction <= 2 ? 2 : fraction <= 5 ? 5 : 10;
  return nice * 10 ** exponent;
}

export interface NiceTicks {
  step: number;
  ticks: number[];
}

/**
 * Round axis labels: steps of 1, 2 or 5 times a power of ten, the first and last tick enclosing the
 * data, so a reader can interpolate between ticks in their head.
 */
export function niceTicks(min: number, max: number, count = 5): NiceTicks {
  if (!(max > min)) {
    const step = min === 0 ? 1 : niceNumber(Math.abs(min), true);
    return { step, ticks: [min - step, min, min + step].filter((t) => t >= 0 || min < 0) };
  }
  const range = niceNumber(max - min, false);
  const step = niceNumber(range / Math.max(1, count - 1), true);
  const first = Math.floor(min / step) * step;
  const last = Math.ceil(max / step) * step;
  const ticks: number[] = [];
  // Rounding the product keeps 0.1-sized steps from printing as 0.30000000000000004.
  const digits = Math.max(0, -Math.floor(Math.log10(step)) + 1);
  for (let i = 0; first + i * step <= last + step / 2; i++) ticks.push(Number((first + i * step).toFixed(digits)));
  return { step, ticks };
}
