import { fail, ok, type Result } from './result';

export type RatioBasis = 'weight' | 'volume';

/** Parts of A to parts of B, as the data sheet states them (e.g. 100:45 by weight). */
export interface MixRatio {
  a: number;
  b: number;
  basis: RatioBasis;
}

const ratioPattern = /^\s*(\d+(?:\.\d+)?|\.\d+)\s*:\s*(\d+(?:\.\d+)?|\.\d+)\s*$/;

/** Reads "2:1", "100:45", "2.5:1"; both parts must be above zero. */
export function parseRatioParts(text: string): Result<{ a: number; b: number }> {
  const match = ratioPattern.exec(text);
  if (!match) {
    return fail(
      'ratio_unreadable',
      `The mix ratio "${text}" is not two positive numbers separated by a colon; write it as on the data sheet, for example 2:1 or 100:45.`,
    );
  }
  const a = Number(match[1]);
  const b = Number(match[2]);
  if (a <= 0 || b <= 0) {
    return fail('ratio_zero_part', `The mix ratio "${text}" has a part of zero; both part A and part B must be above zero, for example 2:1.`);
  }
  return ok({ a, b });
}

export function checkRatio(ratio: { a: number; b: number }): Result<{ a: number; b: number }> {
  if (!Number.isFinite(ratio.a) || !Number.isFinite(ratio.b) || ratio.a <= 0 || ratio.b <= 0) {
    return fail('ratio_zero_part', `The mix ratio ${ratio.a}:${ratio.b} must have both parts above zero, for example 2:1.`);
  }
  return ok(ratio);
}
