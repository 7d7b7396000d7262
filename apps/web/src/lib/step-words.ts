/**
 * A plan step as the API names it ("seal_coat:1", "layer:2", "finish:3", counted from 1) in words.
 * Anything else is shown as it came.
 */
export function stepWords(step: string | null): string | null {
  if (step === null) return null;
  const match = /^(seal_coat|layer|finish):(\d+)$/.exec(step);
  if (!match) return step;
  const kind = { seal_coat: 'Seal coat', layer: 'Layer', finish: 'Finish coat' }[match[1] as 'seal_coat' | 'layer' | 'finish'];
  return `${kind} ${match[2]}`;
}
