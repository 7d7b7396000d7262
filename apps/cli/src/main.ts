import { CliError, type Command } from './command';

const commands: Record<string, () => Promise<{ command: Command }>> = {
  mold: () => import('./commands/mold'),
  mix: () => import('./commands/mix'),
  cure: () => import('./commands/cure'),
};

const usage = `gelpoint — cavity, mix and cure numbers from the terminal

  gelpoint mold FILE --level L [--units mm|cm|in] [--up x|y|z] [--dam outline|box] [--curve N] [--json]
      FILE is an STL, 3MF or OBJ; --units defaults to mm, or for a 3MF to the unit the file states
  gelpoint mix --volume-ml V --ratio A:B --by weight|volume --density-a DA --density-b DB [--pigment-pct P] [--json]
  gelpoint cure --readings FILE.csv --ref-temp-c TR --activation-kj-mol E [--min-temp-c TMIN] [--json]
`;

/** Returns the process exit code; never throws for bad input. */
export async function main(argv: string[]): Promise<number> {
  const [name, ...rest] = argv;
  if (!name || name === '--help' || name === '-h' || name === 'help') {
    process.stdout.write(usage);
    return name ? 0 : 2;
  }
  const load = commands[name];
  if (!load) {
    process.stderr.write(`gelpoint: unknown command "${name}" (try: ${Object.keys(commands).join(', ')})\n`);
    return 2;
  }
  try {
    const { command } = await load();
    const out = await command(rest);
    process.stdout.write(out.endsWith('\n') ? out : `${out}\n`);
    return 0;
  } catch (err) {
    if (err instanceof CliError) {
      process.stderr.write(`gelpoint ${name}: ${err.message}\n`);
      return err.exitCode;
    }
    const message = err instanceof Error ? err.message : String(err);
    process.stderr.write(`gelpoint ${name}: unexpected failure: ${message}\n`);
    return 70;
  }
}
