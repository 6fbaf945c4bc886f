// The one place the command line turns --depots/--lanes files into a Network. Every command goes
// through here, so --date, --vehicle-class, --skip-invalid and the planning options work the same
// for all of them. Files stream in 1 MB chunks of bytes into the engine's importer.

import { startImport } from '../../engine/index';
import { InvalidInputError } from '../../engine/index';
import { formatItem } from '../../engine/index';
import type { ImportOptions, ImportResult } from '../../engine/index';
import type { Network } from '../../engine/index';
import { drivingLimitOf } from '../../engine/index';
import type { ExportSettings, PlanningSettings } from '../../engine/index';
import { required, UsageError, type ParsedArgs } from './args';
import { nodeUtf8Text, readByteChunks } from './read-chunks';
import { printError } from './terminal-text';
import { counted } from '../../engine/index';

/** Today's calendar date in the local time zone, as ISO 8601 (YYYY-MM-DD). */
export function todayIso(now: Date = new Date()): string {
  return `${now.getFullYear()}-${String(now.getMonth() + 1).padStart(2, '0')}-${String(now.getDate()).padStart(2, '0')}`;
}

/**
 * The day every command plans for: --date, or today in the local time zone. Without a date the
 * planner would mix lanes of every validity window (an expired rebate beside its standard-rate twin),
 * so there is always one, and `note` says so when the user did not choose it.
 */
export function planDateOf(args: ParsedArgs): { date: string; note: string | null } {
  const given = args.values.get('date');
  if (given !== undefined) return { date: given, note: null };
  const date = todayIso(args.now);
  return { date, note: `note: planning for ${date} (today); --date to choose` };
}

/**
 * What a JSON or GeoJSON output was made from, as the app's exports carry it: the date planned for
 * (null = the whole calendar), the vehicle class whose tolls applied (null = the file's default), the
 * input files as given (depots and lanes first, then `more`), and the what-if scenario's name.
 */
export function exportSettingsOf(args: ParsedArgs, plan: { date: string | null; vehicleClass: string | null }, scenario: string | null, more: (string | undefined)[] = []): ExportSettings {
  const files = [args.values.get('depots'), args.values.get('lanes'), ...more].filter((f): f is string => f !== undefined);
  return { date: plan.date, vehicle_class: plan.vehicleClass, files, scenario };
}

function positive(args: ParsedArgs, name: string): number | undefined {
  const text = args.values.get(name);
  if (text === undefined) return undefined;
  if (!/^\d+(\.\d+)?$/.test(text) || !(Number(text) > 0) || !Number.isFinite(Number(text))) throw new UsageError(`--${name} must be a positive number, got "${text}"`);
  return Number(text);
}

// The importer options the command line asks for. `dated` false plans with no date (every validity
// window at once): only for reviews that split the calendar themselves (audit without --date).
export function importOptionsFromArgs(args: ParsedArgs, dated = true): ImportOptions {
  const settings: Partial<PlanningSettings> = {};
  settings.detourFactor = positive(args, 'detour-factor');
  settings.fuelLitresPer100Km = positive(args, 'fuel-consumption');
  settings.averageSpeedKmh = positive(args, 'average-speed');
  const price = args.values.get('fuel-price');
  if (price !== undefined) {
    if (!/^\d+(\.\d+)?$/.test(price)) throw new UsageError(`--fuel-price must be a decimal price per litre such as 1.659, got "${price}"`);
    settings.fuelPricePerLitre = price;
  }
  const toll = args.values.get('default-toll');
  if (toll !== undefined) {
    if (!/^-?\d+(\.\d+)?$/.test(toll)) throw new UsageError(`--default-toll must be a decimal amount, got "${toll}"`);
    settings.defaultToll = toll;
  }
  const limit = args.values.get('drive-limit');
  if (limit !== undefined) {
    const parsed = drivingLimitOf(limit);
    if (!parsed) throw new UsageError(`--drive-limit must be eu, us or a number of hours up to 24, got "${limit}"`);
    settings.drivingLimit = parsed;
  }
  let exchangeRates: Record<string, string> | undefined;
  const rates = args.values.get('rates');
  if (rates !== undefined) {
    exchangeRates = {};
    for (const part of rates.split(',')) {
      const m = /^\s*([A-Za-z]{3})\s*=\s*(\d+(?:\.\d+)?)\s*$/.exec(part);
      if (!m) throw new UsageError(`--rates takes CODE=RATE pairs such as USD=0.92, got "${part}"`);
      exchangeRates[m[1].toUpperCase()] = m[2];
    }
  }
  const date = dated ? planDateOf(args).date : undefined;
  const vehicleClass = args.values.get('vehicle-class');
  return {
    depotsFile: args.values.get('depots'),
    lanesFile: args.values.get('lanes'),
    currency: args.values.get('currency'),
    exchangeRates,
    skipInvalid: args.flags.has('skip-invalid'),
    plan: { date, vehicleClass, settings },
  };
}

/**
 * Reads --depots and --lanes and plans the network. The report is always returned; nothing is
 * printed and nothing is thrown for problems in the files (the `check` command wants them all).
 */
export function readImport(args: ParsedArgs, extra: Partial<ImportOptions> = {}, dated = true): ImportResult {
  const depotsPath = required(args, 'depots');
  const lanesPath = required(args, 'lanes');
  // Bytes, not text: plain lane rows are read from them without a string per line.
  const session = startImport({ ...importOptionsFromArgs(args, dated), utf8Text: nodeUtf8Text, ...extra });
  for (const chunk of readByteChunks(depotsPath)) session.feedDepotsBytes(chunk.bytes, chunk.fraction);
  session.finishDepots();
  for (const chunk of readByteChunks(lanesPath)) session.feedLanesBytes(chunk.bytes, chunk.fraction);
  session.finishLanes();
  return session.result();
}

/**
 * Reads and plans (for --date or today, unless `dated` is false); prints warnings and notes to stderr (and the errors, with --skip-invalid);
 * throws InvalidInputError, one line per problem, when there are errors and no --skip-invalid.
 */
export function loadImport(args: ParsedArgs, extra: Partial<ImportOptions> = {}, dated = true): ImportResult & { network: Network } {
  const result = readImport(args, extra, dated);
  const note = dated ? planDateOf(args).note : null;
  if (note !== null) printError(note);
  if (result.network === null) throw new InvalidInputError(result.report);
  const lines = [
    ...result.report.errors.map((e) => formatItem(e, 'error')),
    ...result.report.warnings.map((w) => formatItem(w, 'warning')),
    ...(result.report.omitted > 0 ? [`... ${counted(result.report.omitted, 'more problem')} not listed (see lanewright check)`] : []),
    ...result.notes.map((n) => `note: ${n}`),
  ];
  if (result.report.errors.length > 0) {
    for (const f of result.report.files) lines.push(`${f.file}: ${counted(f.total, 'row')}, ${f.accepted} accepted, ${f.rejected} rejected`);
    lines.push(`note: --skip-invalid: planning with the ${counted(result.report.accepted, 'accepted row')}; ${result.report.rejected} rejected`);
  }
  for (const line of lines) printError(line);
  return result as ImportResult & { network: Network };
}

/** Reads --depots and --lanes and builds the network for --date and --vehicle-class. */
export function loadNetwork(args: ParsedArgs): Network {
  return loadImport(args).network;
}
