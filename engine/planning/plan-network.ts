// Turns the imported lane table into the network for one day and one vehicle class: lanes outside
// their validity or of another class are left out, the class's toll applies, blanks are filled from
// the planning settings (great-circle distance x detour, fuel from consumption and price, drive time).

import { greatCircleAt, greatCircleColumn } from './great-circle-cache';
import { classKey } from '../import/headers';
import { isoDateText, readIsoDate } from '../import/cells';
import { PlanRequestError } from '../import/import-errors';
import type { DepotRecord, IssueCode, LaneTable, ValidationItem } from '../import/types';
import { formatMinor, parseMinor, type Minor } from '../money/minor';
import { netCostOrNull } from '../money/net-cost';
import { buildPlannedNetwork, plannedLanes, type PlannedColumns } from './planned-columns';
import { planningSettings } from './settings';
import type { PlannedLane, PlannedNetwork, PlanRequest } from './types';
import { counted } from '../text/plural';

// Items past this are dropped before the report's own cap; counting them is not worth the strings.
const MAX_PLAN_ITEMS = 100_000;

export interface PlanInput {
  depots: readonly DepotRecord[];
  lanes: LaneTable;
  currency: string;
  exponent: number;
  lanesFile: string;
  /**
   * Rows planned like any other (they still decide which row of a lane applies) but left out of the
   * network: the rows a what-if scenario closes. Absent = none.
   */
  leaveOut?: Uint8Array;
  /**
   * Warnings past this many are counted (`dropped`), not made: the import's report keeps only its
   * first `maxItems` anyway, so making the rest (a message each for a million net-negative lanes)
   * is wasted. Absent = 100,000.
   */
  maxWarnings?: number;
}

export interface PlanOutcome {
  plan: PlannedNetwork;
  errors: ValidationItem[];
  warnings: ValidationItem[];
  /** Lane rows accepted by the import but rejected by this plan (e.g. no toll for the class). */
  rejected: number;
  /** Warnings counted but not made into items (past a cap). */
  dropped: number;
  /** The planned lanes in columns (lane e of the network is entry e). */
  columns: PlannedColumns;
}

function money(text: string | null, digits: number, option: string): number {
  if (text === null) return NaN;
  try {
    return parseMinor(text, digits);
  } catch {
    throw new PlanRequestError(option, text, 'not a decimal amount');
  }
}

/**
 * Which class's tolls a request plans with (`chosen`: index into the toll columns in the wide
 * layout, into classNames in the long one; -1 = the toll column) and the default toll (NaN = none).
 * No class asked: the first class, unless the wide layout has a toll column with values.
 */
export function tollChoice(t: LaneTable, request: PlanRequest, exponent: number): { chosen: number; defaultToll: number } {
  const settings = planningSettings(request.settings);
  const wide = t.classTolls.length > 0;
  const classes = wide ? t.classTolls.map((c) => c.name) : t.classNames;
  let hasDefaultToll = false;
  for (let i = 0; i < t.count && !hasDefaultToll; i++) if (!Number.isNaN(t.toll[i])) hasDefaultToll = true;
  let chosen = -1;
  if (request.vehicleClass !== undefined && request.vehicleClass.trim() !== '') {
    const key = classKey(request.vehicleClass);
    chosen = wide ? t.classTolls.findIndex((c) => c.key === key) : t.classNames.findIndex((n) => classKey(n) === key);
    if (chosen === -1) {
      throw new PlanRequestError('vehicle class', request.vehicleClass, classes.length === 0 ? 'the lanes file has no tolls per vehicle class' : `not in the lanes file (classes: ${classes.join(', ')})`);
    }
  } else if (classes.length > 0 && !(wide && hasDefaultToll)) {
    chosen = 0;
  }
  return { chosen, defaultToll: money(settings.defaultToll, exponent, 'default toll') };
}

/**
 * The toll row `i` is planned with, for a row the plan keeps: wide layout, the chosen class's
 * column, else the toll column, else the default toll; long layout, the row's own toll, or the
 * default toll for a row standing in for a class it has no row for; no classes, the toll column
 * (blank = 0). NaN = no toll (an error of the plan). The one rule, for the planner and the overlay.
 */
export function plannedRowToll(t: LaneTable, i: number, chosen: number, defaultToll: number): number {
  const long = t.vehicleClass;
  const wide = t.classTolls.length > 0;
  if (long) {
    const c = long[i];
    if (chosen !== -1 && c !== -1 && c !== chosen) return defaultToll;
    const toll = t.toll[i];
    return Number.isNaN(toll) ? (t.classNames.length > 0 ? defaultToll : 0) : toll;
  }
  if (wide && chosen !== -1) {
    const toll = t.classTolls[chosen].toll[i];
    if (!Number.isNaN(toll)) return toll;
    return Number.isNaN(t.toll[i]) ? defaultToll : t.toll[i];
  }
  const toll = t.toll[i];
  return Number.isNaN(toll) ? (wide ? defaultToll : 0) : toll;
}

/** Plans the lanes; builds the network only when `build` says so, given this plan's error count. */
export function planLanes(input: PlanInput, request: PlanRequest, build: (planErrors: number) => boolean): PlanOutcome {
  const { lanes: t, depots, exponent, currency, lanesFile } = input;
  const maxWarnings = Math.min(input.maxWarnings ?? MAX_PLAN_ITEMS, MAX_PLAN_ITEMS);
  const settings = planningSettings(request.settings);
  const errors: ValidationItem[] = [];
  const warnings: ValidationItem[] = [];
  const notes: string[] = [];
  const item = (row: number, column: string, value: string | null, code: IssueCode, message: string): ValidationItem => ({ file: lanesFile, row, column, value, message, code });
  // Items name a column as the file writes it; a column the file lacks goes by its field name.
  const header = (field: 'toll' | 'fuel' | 'rebate' | 'vehicle_class') => t.columnHeaders?.[field] ?? field;

  const date = request.date === undefined ? 0 : readIsoDate(request.date.trim());
  if (date === null) throw new PlanRequestError('date', request.date!, 'not an ISO 8601 calendar date (YYYY-MM-DD)');
  if (!(settings.detourFactor >= 1 && settings.detourFactor <= 5)) throw new PlanRequestError('detour factor', String(settings.detourFactor), 'must be between 1 and 5');
  if (!(settings.fuelLitresPer100Km > 0 && settings.fuelLitresPer100Km < 200)) throw new PlanRequestError('fuel consumption', String(settings.fuelLitresPer100Km), 'must be between 0 and 200 l/100 km');
  if (!(settings.averageSpeedKmh > 0 && settings.averageSpeedKmh <= 130)) throw new PlanRequestError('average speed', String(settings.averageSpeedKmh), 'must be between 0 and 130 km/h');

  // Which class's tolls apply.
  const wide = t.classTolls.length > 0;
  const classes = wide ? t.classTolls.map((c) => c.name) : t.classNames;
  const { chosen, defaultToll } = tollChoice(t, request, exponent);
  const asked = request.vehicleClass !== undefined && request.vehicleClass.trim() !== '';
  if (!asked && chosen !== -1) notes.push(`No vehicle class chosen: planning for "${classes[0]}", the first class in the lanes file (classes: ${classes.join(', ')}).`);
  else if (!asked && classes.length > 0) notes.push(`No vehicle class chosen: the default toll column applies (classes in the file: ${classes.join(', ')}).`);
  const className = chosen === -1 ? null : classes[chosen];

  // Fuel price in minor units x 1000, so prices such as 1.659 per litre stay exact.
  const priceCurrency = request.settings?.fuelPricePerLitre !== undefined && request.settings?.fuelPriceCurrency === undefined ? currency : settings.fuelPriceCurrency;
  const priceMilli = priceCurrency.toUpperCase() === currency ? money(settings.fuelPricePerLitre, exponent + 3, 'fuel price') : NaN;

  // Long layout: which lanes (from, to, reference) have a row for the chosen class, among rows valid on the date.
  const validOn = (i: number) => date === 0 || ((t.validFrom[i] === 0 || t.validFrom[i] <= date) && (t.validTo[i] === 0 || t.validTo[i] >= date));
  const long = t.vehicleClass;
  const groupKey = (i: number) => `${t.from[i]}|${t.to[i]}|${t.ref[i] ?? ''}`;
  const withClass = new Set<string>();
  const withDefault = new Set<string>();
  if (long && chosen !== -1) {
    for (let i = 0; i < t.count; i++) {
      if (!validOn(i)) continue;
      if (long[i] === chosen) withClass.add(groupKey(i));
      else if (long[i] === -1) withDefault.add(groupKey(i));
    }
  }

  // Planned lanes in columns; a million PlannedLane objects would cost more than the network itself.
  const cap = t.count;
  const record = new Int32Array(cap);
  const tolls = new Float64Array(cap);
  const fuels = new Float64Array(cap);
  const distances = new Float64Array(cap);
  const drives = new Float64Array(cap);
  const estimated = new Uint8Array(cap);
  let n = 0;
  let excluded = 0;
  let rejected = 0;
  let dropped = 0;
  let closedRows = 0;
  const missingReported = new Set<string>();
  let greatCircle: Float64Array | null = null;
  for (let i = 0; i < t.count; i++) {
    if (!validOn(i)) {
      excluded++;
      continue;
    }
    if (long) {
      const c = long[i];
      if (chosen !== -1 && c !== -1 && c !== chosen) {
        const key = groupKey(i);
        // The first row of a lane with no row for the chosen class stands in for it at the default
        // toll, as a blank class toll does in the wide layout; without a default toll it is an error.
        const firstWithout = !withClass.has(key) && !withDefault.has(key) && !missingReported.has(key);
        if (firstWithout) missingReported.add(key);
        if (!firstWithout || Number.isNaN(defaultToll)) {
          excluded++;
          if (firstWithout) {
            errors.push(item(t.sourceRow[i], header('vehicle_class'), t.classNames[c], 'no-toll-for-class', `this lane has no row for vehicle class "${className}" and no default toll is set`));
          }
          continue;
        }
      } else if (c === -1 && chosen !== -1 && withClass.has(groupKey(i))) {
        excluded++; // the class's own row overrides the all-classes row
        continue;
      }
    }
    const toll = plannedRowToll(t, i, chosen, defaultToll);
    if (Number.isNaN(toll)) {
      errors.push(item(t.sourceRow[i], wide && chosen !== -1 ? (t.classTolls[chosen].header ?? `toll_${className}`) : header('toll'), '', 'no-toll-for-class', `no toll for vehicle class "${className ?? '(default)'}" and no default toll is set`));
      rejected++;
      continue;
    }

    const from = t.from[i];
    const to = t.to[i];
    let distanceKm = t.distanceKm[i];
    const distanceEstimated = Number.isNaN(distanceKm);
    if (distanceEstimated) {
      greatCircle ??= greatCircleColumn(t);
      distanceKm = Math.round(greatCircleAt(greatCircle, t, depots, i) * settings.detourFactor * 10) / 10;
    }
    let driveMinutes = t.driveMinutes[i];
    const driveEstimated = Number.isNaN(driveMinutes);
    if (driveEstimated) driveMinutes = Math.round((distanceKm / settings.averageSpeedKmh) * 60);
    let fuel = t.fuel[i];
    const fuelEstimated = Number.isNaN(fuel);
    if (fuelEstimated) {
      if (Number.isNaN(priceMilli)) {
        errors.push(item(t.sourceRow[i], header('fuel'), '', 'no-fuel-price', `fuel is blank and there is no fuel price in ${currency} to estimate it; give a fuel price`));
        rejected++;
        continue;
      }
      fuel = Math.round((distanceKm * settings.fuelLitresPer100Km * priceMilli) / 100_000);
    }
    const fees = t.fees[i];
    const rebate = t.rebate[i];
    // The reader refused rows whose own amounts leave the exact range; a planned toll or an estimated
    // fuel cost (a default toll, a fuel price) can still push the net past it: a row error here, so a
    // check that builds no network reports it too, and the network build never meets it.
    const planned = netCostOrNull(toll, fuel, fees, rebate);
    if (planned === null) {
      errors.push(
        item(t.sourceRow[i], fuelEstimated ? header('fuel') : header('toll'), null, 'amount-overflow', `the lane's planned net cost (toll + fuel + fees - rebate, with the ${fuelEstimated ? 'estimated fuel' : 'planned toll'}) is outside the exact range (±${Number.MAX_SAFE_INTEGER} minor units)`),
      );
      rejected++;
      continue;
    }
    const net = planned;
    if (net < 0 && warnings.length >= maxWarnings) dropped++;
    else if (net < 0) {
      const f = (v: number) => formatMinor(v as Minor, exponent);
      warnings.push(
        item(t.sourceRow[i], header('rebate'), f(rebate), 'net-negative-lane', `rebate is larger than the lane's costs (${f(net + rebate)}): net ${f(net)} per trip; a contract item to look at`),
      );
    }
    if (input.leaveOut && input.leaveOut[i]) {
      closedRows++;
      continue;
    }
    record[n] = i;
    tolls[n] = toll;
    fuels[n] = fuel;
    distances[n] = distanceKm;
    drives[n] = driveMinutes;
    estimated[n] = (distanceEstimated ? 1 : 0) | (fuelEstimated ? 2 : 0) | (driveEstimated ? 4 : 0);
    n++;
  }
  if (closedRows > 0) notes.push(`${counted(closedRows, 'lane row')} closed by the scenario.`);
  if (excluded > 0) notes.push(`${counted(excluded, 'lane row')} left out: not valid on ${request.date ?? 'the date'} or for another vehicle class.`);

  // Trimmed to the planned lanes; a view when nearly every row is planned, so the columns are not held twice.
  const rows = <T extends Int32Array | Float64Array | Uint8Array>(a: T): T => (n >= cap * 0.9 ? a.subarray(0, n) : a.slice(0, n)) as T;
  const columns: PlannedColumns = {
    record: rows(record),
    toll: rows(tolls),
    fuel: rows(fuels),
    distanceKm: rows(distances),
    driveMinutes: rows(drives),
    estimated: rows(estimated),
  };
  const network = build(errors.length) ? buildPlannedNetwork(depots, t, columns, currency, exponent) : null;
  let lanes: PlannedLane[] | null = null;
  const plan: PlannedNetwork = {
    network,
    // Made on first use: the CLI never needs them, the desktop app and scenarios do.
    get lanes() {
      return (lanes ??= plannedLanes(depots, t, columns, className));
    },
    laneRecord: columns.record,
    date: date === 0 ? null : isoDateText(date),
    vehicleClass: className,
    settings,
    excluded,
    notes,
  };
  return {
    plan,
    errors,
    warnings,
    rejected,
    dropped,
    columns,
  };
}
