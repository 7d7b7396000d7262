interface CommandHelp {
  synopsis: string;
  about: string;
}

/** Each command's synopsis and explanation: `gelpoint CMD --help` prints them without loading the command. */
const help: Record<string, CommandHelp> = {
  mold: {
    synopsis: 'gelpoint mold FILE --level L [--units mm|cm|in] [--up x|y|z] [--dam outline|box] [--curve N] [--json]',
    about: `The cavity report of a mould file: fill volume to level L (in the file's units, a height in
the file's own frame as a CAD program shows it), wetted area, deepest resin, trapped air; it also
prints where the cavity floor stands and how high L is above it (the height the web app's fill
level means); --curve N adds N points of the volume-versus-level curve.`,
  },
  mix: {
    synopsis: 'gelpoint mix --volume-ml V --ratio A:B --by weight|volume --density-a DA --density-b DB [--pigment-pct P] [--pigment-density-g-ml DP] [--json]',
    about: `Grams and millilitres of part A, part B and pigment for one cup of V mL (pigment included).
--pigment-pct is a percentage of part A + part B by mass; without --pigment-density-g-ml the pigment
is taken to be as dense as the mixed resin.`,
  },
  cure: {
    synopsis: 'gelpoint cure --readings FILE.csv --ref-temp-c TR --activation-kj-mol E [--min-temp-c TMIN] [--carry-h H] [--json]',
    about: `Equivalent age at TR from a time,tempC log (ASTM C1074: each interval at the average of its two
readings). A reading speaks for H hours either side (2 by default); a longer gap counts at the
lower neighbouring reading and is listed. Below TMIN the cure is counted slowly and flagged.`,
  },
  exotherm: {
    synopsis:
      'gelpoint exotherm --depth-mm D --ambient-c T --reaction-heat-j-g H --activation-kj-mol E --ref-temp-c Tr --gel-min G [--density-g-ml 1.1] [--heat-capacity-j-gk 1.5] [--conductivity-w-mk 0.2] [--base wood|insulated] [--limit-c L] [--json]',
    about: `How hot one layer of resin gets, where and when: a layer D mm deep poured at T °C (the mix starting
at T) over bare wood or an insulated base. --gel-min is the isothermal gel time of a thin film at
--ref-temp-c. With --limit-c, also the deepest single layer whose forecast peak stays at or under
L °C. --json prints one JSON object: peakC, timeToPeakMin (from mixing), peakDepthMm (below the
resin surface), model, and maxLayerMm with --limit-c. An estimate only: follow the SDS and TDS.`,
  },
};

export const commandNames = Object.keys(help);

export function commandUsage(name: string): string | undefined {
  const entry = help[name];
  return entry ? `${entry.synopsis}\n\n${entry.about}\n` : undefined;
}

export const synopses = Object.values(help).map((h) => h.synopsis);
