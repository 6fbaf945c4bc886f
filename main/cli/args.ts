// Minimal flag parser for the command line: `--name value`, `--flag`, and the command word.

import { LanewrightError } from '../../engine/index';

export class UsageError extends LanewrightError {}

export interface ParsedArgs {
  command: string | undefined;
  values: Map<string, string>;
  flags: Set<string>;
}

/** Parses argv; `booleanFlags` lists the flags that take no value. */
export function parseArgs(argv: readonly string[], booleanFlags: ReadonlySet<string>): ParsedArgs {
  const values = new Map<string, string>();
  const flags = new Set<string>();
  let command: string | undefined;
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i];
    if (!arg.startsWith('--')) {
      if (command !== undefined) throw new UsageError(`unexpected argument "${arg}"`);
      command = arg;
      continue;
    }
    const eq = arg.indexOf('=');
    const name = eq === -1 ? arg.slice(2) : arg.slice(2, eq);
    if (booleanFlags.has(name)) {
      flags.add(name);
    } else if (eq !== -1) {
      values.set(name, arg.slice(eq + 1));
    } else {
      const value = argv[i + 1];
      if (value === undefined || value.startsWith('--')) throw new UsageError(`option --${name} needs a value`);
      values.set(name, value);
      i++;
    }
  }
  return { command, values, flags };
}

/** The value of a required option, or a UsageError naming it. */
export function required(args: ParsedArgs, name: string): string {
  const value = args.values.get(name);
  if (value === undefined || value === '') throw new UsageError(`missing required option --${name}`);
  return value;
}

/** The value of a whole-number option (at least `min`), undefined when absent, or a UsageError naming it. */
export function wholeNumberOption(args: ParsedArgs, name: string, min: number): number | undefined {
  const text = args.values.get(name);
  if (text === undefined) return undefined;
  const value = Number(text);
  if (!/^\d+$/.test(text) || !Number.isSafeInteger(value) || value < min) throw new UsageError(`--${name} must be a whole number >= ${min}, got "${text}"`);
  return value;
}
