declare module 'alea' {
  /** Johannes Baagøe's Alea generator: the same seeds always give the same numbers in [0, 1). */
  export default function alea(...seeds: (string | number)[]): () => number;
}
