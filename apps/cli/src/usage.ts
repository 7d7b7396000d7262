/** One usage block per command: printed by `gelpoint CMD --help` without loading the command. */
export const commandUsage: Record<string, string> = {
  mold: `gelpoint mold FILE --level L [--units mm|cm|in] [--up x|y|z] [--dam outline|box] [--curve N] [--json]
  The cavity report of a mould file: fill volume to level L (in the file's units), wetted area,
  deepest resin, trapped air; --curve N adds N points of the volume-versus-level curve.`,
  mix: `gelpoint mix --volume-ml V --ratio A:B --by weight|volume --density-a DA --density-b DB [--pigment-pct P] [--pigment-density-g-ml DP] [--json]
  Grams and millilitres of part A, part B and pigment for one cup of V mL (pigment included).
  --pigment-pct is a percentage of part A + part B by mass; without --pigment-density-g-ml the pigment
  is taken to be as dense as the mixed resin.`,
  cure: `gelpoint cure --readings FILE.csv --ref-temp-c TR --activation-kj-mol E [--min-temp-c TMIN] [--carry-h H] [--json]
  Equivalent age at TR from a time,tempC log (ASTM C1074: each interval at the average of its two
  readings). A reading speaks for H hours either side (2 by default); a longer gap counts at the
  lower neighbouring reading and is listed. Below TMIN the cure is counted slowly and flagged.`,
};
