import type { ScaleResolutionG } from './unit-format';

export interface ShownCup {
  aG: number;
  bG: number;
  pigmentG: number;
  /** How far the shown A:B is from the product's own ratio, in percent (signed: + means A-rich). */
  ratioErrorPct: number;
}

function toSteps(massG: number, step: ScaleResolutionG): number {
  // 0.3 / 0.1 is 2.9999999999999996: nudge before rounding, as a scale display would show 3.
  return Math.round(massG / step + 1e-9);
}

function fromSteps(steps: number, step: ScaleResolutionG): number {
  return step === 1 ? steps : steps / 10;
}

/**
 * One cup's grams as the scale can show them, kept on ratio: the part with the smaller mass is
 * rounded to the scale's step (down or up, whichever keeps the cup nearer the ratio; never to
 * nothing), the other is derived from the product's ratio and rounded in turn. Rounding both on their
 * own can leave a small cup far off ratio (100:45 with 16.6 g A and 7.47 g B shows 17 g / 7 g on a
 * 1 g scale, 9.3 % A-rich); deriving the larger part from the rounded smaller one keeps the error
 * within half a step of the larger part.
 */
export function roundCupOnRatio(exactAG: number, exactBG: number, pigmentPct: number, step: ScaleResolutionG): ShownCup {
  const ratio = exactAG / exactBG;
  const aIsSmaller = exactAG < exactBG;
  const smaller = aIsSmaller ? exactAG : exactBG;
  const largerPerSmaller = aIsSmaller ? 1 / ratio : ratio;
  const exactSteps = smaller / step;
  const candidates = [...new Set([Math.max(1, Math.floor(exactSteps + 1e-9)), Math.max(1, Math.ceil(exactSteps - 1e-9))])];
  let best: { small: number; large: number; error: number; distance: number } | null = null;
  for (const small of candidates) {
    const large = Math.max(1, toSteps(fromSteps(small, step) * largerPerSmaller, step));
    const error = Math.abs(large / small / largerPerSmaller - 1);
    const distance = Math.abs(small - exactSteps);
    if (!best || error < best.error - 1e-12 || (Math.abs(error - best.error) <= 1e-12 && distance < best.distance)) best = { small, large, error, distance };
  }
  const aG = fromSteps(aIsSmaller ? best!.small : best!.large, step);
  const bG = fromSteps(aIsSmaller ? best!.large : best!.small, step);
  const pigmentG = pigmentPct > 0 ? fromSteps(toSteps(((aG + bG) * pigmentPct) / 100, step), step) : 0;
  return { aG, bG, pigmentG, ratioErrorPct: (aG / bG / ratio - 1) * 100 };
}
