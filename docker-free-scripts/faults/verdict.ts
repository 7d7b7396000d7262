/** A check's failure: a sentence saying what should have happened and what did. */
export class CheckFailed extends Error {}

export function must(condition: unknown, sentence: string): asserts condition {
  if (!condition) throw new CheckFailed(sentence);
}
