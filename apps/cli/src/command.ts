import { parseArgs, type ParseArgsConfig } from 'node:util';

/** A command takes its own argv (after the command name) and returns what to print on stdout. */
export type Command = (argv: string[]) => Promise<string>;

/** An error the user caused: printed as one line on stderr, no stack trace. */
export class CliError extends Error {
  constructor(message: string, readonly exitCode = 2) {
    super(message);
  }
}

/** node:util parseArgs, with its errors turned into one readable line. */
export function parseOptions<T extends ParseArgsConfig['options']>(argv: string[], options: T, allowPositionals = false) {
  try {
    return parseArgs({ args: argv, options, allowPositionals, strict: true });
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
