import { roundTree, stepsToAmount, type ExactNode, type SteppedNode } from './rounding';

/** Exact amounts of one pour: groups (layers or coats) → batches → parts. */
export type GroupedAmounts = number[][][];

export interface RoundedGroups {
  total: number;
  groups: { total: number; batches: { total: number; parts: number[] }[] }[];
}

function sum(values: number[]): number {
  return values.reduce((acc, v) => acc + v, 0);
}

export function groupedTree(amounts: GroupedAmounts): ExactNode {
  const groups = amounts.map((batches) => {
    const batchNodes = batches.map((parts) => ({ exact: sum(parts), children: parts.map((exact) => ({ exact })) }));
    return { exact: sum(batchNodes.map((b) => b.exact)), children: batchNodes };
  });
  return { exact: sum(groups.map((g) => g.exact)), children: groups };
}

export function readGroupedTree(node: SteppedNode, stepSize: number): RoundedGroups {
  const amount = (n: SteppedNode) => stepsToAmount(n.steps, stepSize);
  return {
    total: amount(node),
    groups: node.children.map((group) => ({
      total: amount(group),
      batches: group.children.map((batch) => ({ total: amount(batch), parts: batch.children.map(amount) })),
    })),
  };
}

/** Rounds a pour's amounts to a step so that every shown total is the sum of its shown parts. */
export function roundGrouped(amounts: GroupedAmounts, stepSize: number): RoundedGroups {
  return readGroupedTree(roundTree(groupedTree(amounts), stepSize), stepSize);
}
