import { parseArgs, type ParseArgsConfig } from 'node:util';

/** A command takes its own argv (after the command name) and returns what to print on stdout. */
export type Command = (argv: string[]) => Promise<string>;

/** An error the user caused: printed as one line on stderr, no stack trace. */
export class CliError extends Error {
  constructor(
    message: string,
    readonly exitCode = 2,
  ) {
    super(message);
  }
}

// node:util parseArgs reads "--flag -5" as a missing value; negative numbers are real input here
// (temperatures below zero, levels below the origin, and volumes the user should hear are wrong).
function attachNegativeValues(argv: string[]): string[] {
  const out: string[] = [];
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i]!;
    const next = argv[i + 1];
    if (arg.startsWith('--') && !arg.includes('=') && next !== undefined && /^-(\d|\.\d)/.test(next)) {
      out.push(`${arg}=${next}`);
      i++;
    } else out.push(arg);
  }
  return out;
}

type ParsedOptions<T extends ParseArgsConfig['options']> = ReturnType<
  typeof parseArgs<{ args: string[]; options: T; allowPositionals: boolean; strict: true }>
>;

/** node:util parseArgs, with its errors turned into one readable line. */
export function parseOptions<T extends ParseArgsConfig['options']>(argv: string[], options: T, allowPositionals = false): ParsedOptions<T> {
  try {
    return parseArgs({ args: attachNegativeValues(argv), options, allowPositionals, strict: true });
  } catch (err) {
    throw new CliError(err instanceof Error ? err.message.split('\n')[0]! : String(err));
  }
}

/** A finite number from a flag, or a CliError naming the flag. */
export function numberOption(value: string | undefined, flag: string, opts: { required?: boolean } = {}): number | undefined {
  if (value === undefined) {
    if (opts.required) throw new CliError(`--${flag} is required`);
    return undefined;
  }
  const n = Number(value);
  if (value.trim() === '' || !Number.isFinite(n)) throw new CliError(`--${flag} must be a number, got "${value}"`);
  return n;
}
