import { CliError, type Command } from './command';
import { commandUsage, synopses } from './usage';

const commands: Record<string, () => Promise<{ command: Command }>> = {
  mold: () => import('./commands/mold'),
  mix: () => import('./commands/mix'),
  cure: () => import('./commands/cure'),
  exotherm: () => import('./commands/exotherm'),
};

const usage = `gelpoint — cavity, mix, cure and exotherm numbers from the terminal

${synopses.map((s) => `  ${s}`).join('\n')}

  gelpoint COMMAND --help   explains one command
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
  if (rest.includes('--help') || rest.includes('-h')) {
    process.stdout.write(commandUsage(name) ?? '');
    return 0;
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
