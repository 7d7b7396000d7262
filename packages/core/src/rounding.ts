/**
 * Rounding for run sheets, so that what is shown always adds up.
 *
 * The rule: amounts form a tree (plan → layers → batches → part A, part B, pigment). The top is
 * rounded to the nearest step of the scale. Each node's rounded amount is then shared among its
 * children by largest remainder: every child first gets its exact amount rounded down to a step,
 * and the steps still missing go, one each, to the children with the largest cut-off fractions
 * (ties to the earlier child). Hence, at every level:
 *   - a displayed total is exactly the sum of its displayed parts, and
 *   - every displayed amount is within one step of its exact amount (rounded down or up, never
 *     further), so rounding never loses more than the display can show; the top is within half a step.
 */
export interface ExactNode {
  exact: number;
  children?: ExactNode[];
}

export interface SteppedNode {
  /** Whole steps of the resolution. */
  steps: number;
  children: SteppedNode[];
}

// Exact amounts divided by a decimal step pick up float noise (0.3 / 0.1 = 2.9999999999999996).
function snap(x: number): number {
  const nearest = Math.round(x);
  return Math.abs(x - nearest) <= 1e-9 * Math.max(1, Math.abs(x)) ? nearest : x;
}

/** Shares targetSteps among parts whose exact sizes (in steps) are given, by largest remainder. */
export function apportionSteps(exactSteps: number[], targetSteps: number): number[] {
  const snapped = exactSteps.map(snap);
  const shares = snapped.map((x) => Math.floor(x));
  const order = snapped.map((x, i) => ({ i, fraction: x - Math.floor(x) })).sort((p, q) => q.fraction - p.fraction || p.i - q.i);
  let missing = targetSteps - shares.reduce((sum, s) => sum + s, 0);
  // With a parent rounded from these very parts, missing lies between 0 and the count of parts;
  // the loops also keep the sum right for any other target, cycling when they must.
  for (let k = 0; missing > 0 && order.length > 0; k = (k + 1) % order.length, missing--) shares[order[k]!.i]! += 1;
  for (let k = order.length - 1; missing < 0 && shares.some((s) => s > 0); k = (k - 1 + order.length) % order.length) {
    const i = order[k]!.i;
    if (shares[i]! > 0) {
      shares[i]! -= 1;
      missing++;
    }
  }
  return shares;
}

function shareAmong(node: ExactNode, steps: number, stepSize: number): SteppedNode {
  const children = node.children ?? [];
  if (children.length === 0) return { steps, children: [] };
  const childSteps = apportionSteps(
    children.map((c) => c.exact / stepSize),
    steps,
  );
  return { steps, children: children.map((child, i) => shareAmong(child, childSteps[i]!, stepSize)) };
}

export function roundTree(node: ExactNode, stepSize: number): SteppedNode {
  return shareAmong(node, Math.round(snap(node.exact / stepSize)), stepSize);
}

/** Steps back to a number, without the float tails that steps × 0.1 would leave. */
export function stepsToAmount(steps: number, stepSize: number): number {
  if (stepSize >= 1) return steps * stepSize;
  const perUnit = Math.round(1 / stepSize);
  return steps / perUnit;
}
