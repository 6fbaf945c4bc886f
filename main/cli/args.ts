// Reads a command's options with node:util's parseArgs in strict mode, from the command's option
// table (options.ts). A first, non-strict pass over parseArgs' tokens finds what is wrong, so each
// mistake gets its own message (unknown option with the nearest name, a flag given a value, an
// option given none); the strict pass then reads the values, so nothing it would refuse gets through.

import { parseArgs as parseWithNode, type ParseArgsConfig } from 'node:util';
import { LanewrightError } from '../../engine/index';
import { closestName } from './closest-name';
import { HELP_OPTION, type OptionSpec } from './options';

/** A mistake on the command line; the command exits with status 2. */
export class UsageError extends LanewrightError {}

export interface ParsedArgs {
  command: string | undefined;
  values: Map<string, string>;
  flags: Set<string>;
  /** When the command line was read: "today" for every part of one run, even across midnight. */
  now: Date;
}

type NodeOptions = NonNullable<ParseArgsConfig['options']>;

function nodeOptions(options: readonly OptionSpec[]): NodeOptions {
  const config: NodeOptions = Object.create(null) as NodeOptions;
  for (const o of options) config[o.name] = { type: o.value === undefined ? 'boolean' : 'string' };
  config[HELP_OPTION.name] = { type: 'boolean', short: 'h' };
  return config;
}

/** A negative number (`--default-toll -1.50`): a value, not an option. */
const NEGATIVE_NUMBER = /^-\d/;

/** `unknown option --X` with the nearest name, or the commands that take it when this one does not. */
function unknownOption(rawName: string, name: string, command: string, own: readonly OptionSpec[], elsewhere: ReadonlyMap<string, readonly string[]>): UsageError {
  const near = closestName(name, own.map((o) => o.name));
  if (near !== null) return new UsageError(`unknown option ${rawName}; did you mean --${near}? (lanewright ${command} --help lists its options)`);
  const owners = elsewhere.get(name);
  if (owners && owners.length > 0) return new UsageError(`unknown option ${rawName} for ${command}; it belongs to ${owners.join(', ')} (lanewright ${command} --help lists its options)`);
  return new UsageError(`unknown option ${rawName} (lanewright ${command} --help lists its options)`);
}

function valueText(o: OptionSpec): string {
  return `--${o.name} ${o.value ?? ''}`.trim();
}

/**
 * Reads `argv` (the words after the command) against `options`. `elsewhere` maps option names of
 * other commands to those commands, to say where a misplaced option belongs. Throws UsageError.
 * With --help nothing else is checked: `values` and `flags` hold only `help`.
 */
export function parseCommandLine(
  command: string,
  argv: readonly string[],
  options: readonly OptionSpec[],
  elsewhere: ReadonlyMap<string, readonly string[]> = new Map(),
): ParsedArgs {
  const config = nodeOptions(options);
  const byName = new Map(options.map((o) => [o.name, o]));
  const { tokens } = parseWithNode({ args: [...argv], options: config, strict: false, allowPositionals: true, tokens: true });
  if (tokens.some((t) => t.kind === 'option' && t.name === HELP_OPTION.name)) {
    return { command, values: new Map(), flags: new Set([HELP_OPTION.name]), now: new Date() };
  }

  // Index of an option followed by a negative number -> the two words joined as `--name=-1.50`.
  const joined = new Map<number, string>();
  const seen = new Set<string>();
  let previous: OptionSpec | undefined;
  for (const token of tokens) {
    if (token.kind === 'option-terminator') throw new UsageError(`unexpected "--": ${command} takes no file names or words without an option`);
    if (token.kind === 'positional') {
      if (previous !== undefined && previous.value === undefined) throw new UsageError(`--${previous.name} is a flag and takes no value, got "${token.value}"`);
      throw new UsageError(`unexpected argument "${token.value}" (every input of ${command} is given with an option, e.g. --lanes FILE)`);
    }
    const spec = byName.get(token.name);
    if (spec === undefined) throw unknownOption(token.rawName, token.name, command, options, elsewhere);
    if (seen.has(spec.name)) throw new UsageError(`--${spec.name} is given more than once; give it once`);
    seen.add(spec.name);
    previous = spec;
    if (spec.value === undefined) {
      if (token.value !== undefined) throw new UsageError(`--${spec.name} is a flag and takes no value, got "${token.rawName}=${token.value}"`);
      continue;
    }
    if (token.value === undefined || token.value === '') throw new UsageError(`--${spec.name} needs a value: ${valueText(spec)}`);
    if (!token.inlineValue && token.value.startsWith('-')) {
      if (!NEGATIVE_NUMBER.test(token.value)) throw new UsageError(`--${spec.name} needs a value: ${valueText(spec)}, got the option ${token.value}`);
      // parseArgs' strict mode reads "-1.50" after an option as a mistake; joined, it is plainly a value.
      joined.set(token.index, `--${spec.name}=${token.value}`);
    }
  }

  let parsed;
  try {
    const args = argv.flatMap((word, i) => (joined.has(i) ? [joined.get(i)!] : joined.has(i - 1) ? [] : [word]));
    parsed = parseWithNode({ args, options: config, strict: true, allowPositionals: false });
  } catch (error) {
    // The token pass above refuses everything the strict pass does; this keeps a missed case one line.
    throw new UsageError(error instanceof Error ? error.message : String(error));
  }
  const values = new Map<string, string>();
  const flags = new Set<string>();
  for (const [name, value] of Object.entries(parsed.values)) {
    if (typeof value === 'string') values.set(name, value);
    else if (value === true) flags.add(name);
  }
  for (const o of options) {
    if (o.required && !values.has(o.name)) throw new UsageError(`missing required option ${valueText(o)} (lanewright ${command} --help)`);
  }
  return { command, values, flags, now: new Date() };
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
