import type { Caution, CautionSeverity, CautionTarget } from '@gelpoint/core';

export const severityWords: Record<CautionSeverity, { label: string; rank: number }> = {
  danger: { label: 'Danger', rank: 0 },
  warning: { label: 'Caution', rank: 1 },
  info: { label: 'Note', rank: 2 },
};

/** The cautions about one thing (a layer, a batch, a product), most serious first, so they sit beside it. */
export function cautionsFor(cautions: readonly Caution[], kind: CautionTarget, index?: number): Caution[] {
  return cautions
    .filter((c) => c.appliesTo.kind === kind && (index === undefined || c.appliesTo.index === undefined || c.appliesTo.index === index))
    .sort((p, q) => severityWords[p.severity].rank - severityWords[q.severity].rank);
}
