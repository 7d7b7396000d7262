import type { LotView, PigmentView, ResinSystemView } from '@gelpoint/contracts';

export type ResinUse = ResinSystemView['use'];
export type RatioBasis = ResinSystemView['mixRatio']['basis'];
export type PigmentKind = PigmentView['kind'];
export type LotPart = LotView['part'];

export const resinUseWords: Record<ResinUse, string> = {
  seal: 'Seal coat',
  deep_pour: 'Deep pour',
  casting: 'Casting',
  coating: 'Flood coat',
};

export const ratioBasisWords: Record<RatioBasis, string> = {
  weight: 'by weight',
  volume: 'by volume',
};

export const pigmentKindWords: Record<PigmentKind, string> = {
  powder: 'Powder',
  paste: 'Paste',
  liquid: 'Liquid',
};

export const lotPartWords: Record<LotPart, string> = {
  A: 'Part A (resin)',
  B: 'Part B (hardener)',
  pigment: 'Pigment',
};

/** "2 : 1 by volume", the way a data sheet writes it. */
export function mixRatioText(ratio: { a: number; b: number; basis: RatioBasis }): string {
  return `${ratio.a} : ${ratio.b} ${ratioBasisWords[ratio.basis]}`;
}
