/** "2 : 1 by volume", as a data sheet writes it. */
export function mixRatioWords(ratio: { a: number; b: number; basis: 'weight' | 'volume' }): string {
  return `${ratio.a} : ${ratio.b} by ${ratio.basis}`;
}
