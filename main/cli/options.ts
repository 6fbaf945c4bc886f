// The option tables of the command line. Each command declares one table (its own options plus the
// shared groups below); the parser (args.ts), the usage line and the `--help` text (usage.ts) all read
// the same table, so an option cannot be accepted without being documented or documented without
// being accepted. Adding an option is one entry in a table.

import type { ParsedArgs } from './args';
import type { CommandOutput } from './run';

/**
 * One option. Without `value` it is a flag (`--json`); with it, it takes a value and `value` is the
 * placeholder shown in the usage text (`--from DEPOT_ID`).
 */
export interface OptionSpec {
  readonly name: string;
  readonly value?: string;
  readonly help: string;
  /** The command refuses to run without it (checked before the command starts). */
  readonly required?: boolean;
  /** Heading the option is listed under in `--help`; own options have none. */
  readonly group?: string;
}

export interface CommandSpec {
  readonly name: string;
  /** One line: what the command does (the overview list and the first line of its help). */
  readonly summary: string;
  /** A few more lines for `COMMAND --help`: what it reads, what it prints, its exit status. */
  readonly details: string;
  /** A complete command line that works on the sample data. */
  readonly example: string;
  readonly options: readonly OptionSpec[];
  /**
   * The command's work, imported when it runs (a dynamic import: a chunk of its own in the bundle),
   * so the option tables and `--help` load no engine code.
   */
  load(): Promise<CommandRun>;
}

/** Runs a command on its parsed arguments; returns the exit status. */
export type CommandRun = (args: ParsedArgs, out: CommandOutput) => number;

/** The two input files every command reads. */
export const NETWORK_FILES: readonly OptionSpec[] = [
  { name: 'depots', value: 'FILE', help: 'depots CSV (id, name, lat, lon, ...)', required: true },
  { name: 'lanes', value: 'FILE', help: 'lanes CSV (from, to, toll, fuel, fees, rebate, ...)', required: true },
];

/** What main/cli/load-network.ts reads: the date, vehicle class and planning settings. */
export const PLANNING_OPTIONS: readonly OptionSpec[] = [
  { name: 'date', value: 'YYYY-MM-DD', help: 'plan for this day (lanes valid on it); default today, local time' },
  { name: 'vehicle-class', value: 'CLASS', help: 'vehicle class whose tolls apply (default: the default toll column, else the first class in the file)' },
  { name: 'skip-invalid', help: 'plan with the accepted rows when some rows have errors (they are listed)' },
  { name: 'drive-limit', value: 'eu|us|HOURS', help: 'daily driving limit the routes are checked against' },
  { name: 'detour-factor', value: 'F', help: 'road distance / great-circle distance for lanes without a distance' },
  { name: 'fuel-consumption', value: 'L_PER_100KM', help: 'fuel use for lanes without a fuel figure' },
  { name: 'fuel-price', value: 'PRICE', help: 'fuel price per litre for lanes without a fuel figure' },
  { name: 'average-speed', value: 'KMH', help: 'speed for lanes without a drive time' },
  { name: 'default-toll', value: 'AMOUNT', help: 'toll for lanes without one for the vehicle class' },
  { name: 'currency', value: 'CODE', help: 'ISO 4217 currency of the network (amounts in others are converted)' },
  { name: 'rates', value: 'CODE=RATE,...', help: 'exchange rates into the network currency, e.g. USD=0.92' },
].map((o) => ({ ...o, group: 'planning options' }));

/** The output options most commands share. */
export const JSON_OPTION: OptionSpec = { name: 'json', help: 'print one JSON object instead of CSV' };
export const OUT_OPTION: OptionSpec = { name: 'out', value: 'FILE', help: 'write the output to FILE (atomically) instead of standard output' };
/** How CSV output is written (engine/export/csv-dialect.ts); read by csv-dialect-option.ts. */
export const CSV_DIALECT_OPTION: OptionSpec = {
  name: 'csv-dialect',
  value: 'comma|semicolon|SEP,DECIMAL,BOM',
  help: 'CSV output: comma (RFC 4180, default), semicolon (decimal comma and byte-order mark, for decimal-comma spreadsheets), or e.g. semicolon,comma,no-bom',
};
export const TIMINGS_OPTION: OptionSpec = { name: 'timings', help: 'print read and solve times as one JSON line on stderr' };

/** Accepted by every command and never listed among its options. */
export const HELP_OPTION: OptionSpec = { name: 'help', help: 'print this help' };

/** How many distinct rebate loops to search for (audit, compare). */
export const LOOP_CAP_OPTION: OptionSpec = { name: 'loop-cap', value: 'N', help: 'report at most N distinct rebate loops (the search also stops at a work budget and a memory bound, and says which)' };
