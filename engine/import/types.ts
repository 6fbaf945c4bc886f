// The shapes the importer hands to every front end: the validation report, the accepted depots and
// the columnar lane table. Kept apart from the reading code so the desktop app can import the types
// alone (see DEVELOPERS.md, "Import, planning and exports").

import type { LaneLimits } from './lane-limits';

/** What kind of problem an item reports; stable, so front ends can group and tests can check. */
export type IssueCode =
  // errors
  | 'empty-file'
  | 'not-text'
  | 'unbalanced-quotes'
  | 'missing-column'
  | 'duplicate-column'
  | 'too-many-fields'
  | 'missing-value'
  | 'not-a-number'
  | 'not-finite'
  | 'ambiguous-number'
  | 'bad-amount'
  | 'negative-value'
  | 'latitude-range'
  | 'longitude-range'
  | 'bad-date'
  | 'bad-period'
  | 'bad-unit'
  | 'bad-duration'
  | 'unknown-depot'
  | 'duplicate-depot'
  | 'unknown-currency'
  | 'mixed-currency'
  | 'no-toll-for-class'
  | 'no-fuel-price'
  | 'not-positive'
  | 'bad-tunnel-category'
  | 'bad-tunnel-code'
  | 'bad-yes-no'
  | 'bad-carriage'
  | 'unknown-vehicle'
  | 'unknown-vehicle-class'
  | 'class-mismatch'
  | 'same-depot'
  | 'duplicate-load'
  | 'duplicate-vehicle'
  | 'out-of-range'
  | 'amount-overflow'
  // errors or warnings
  | 'no-data-rows' // an error for depots (nothing to plan), a warning for lanes
  // warnings
  | 'unknown-column'
  | 'duplicate-lane'
  | 'self-lane'
  | 'net-negative-lane'
  | 'negative-amount';

/** One problem, located as a spreadsheet shows it. `row` 1 is the header; null = the whole file. */
export interface ValidationItem {
  file: string;
  row: number | null;
  column: string | null;
  value: string | null;
  message: string;
  code: IssueCode;
}

export interface FileCounts {
  file: string;
  kind: 'depots' | 'lanes' | 'loads' | 'vehicles';
  total: number;
  accepted: number;
  rejected: number;
}

/** The report every front end shows. accepted + rejected = total (data rows of both files). */
export interface ValidationReport {
  total: number;
  accepted: number;
  rejected: number;
  errors: ValidationItem[];
  warnings: ValidationItem[];
  files: FileCounts[];
  /** Items left out past the cap (the counts above stay exact). */
  omitted: number;
}

/** An accepted depot row. */
export interface DepotRecord {
  id: string;
  name: string;
  lat: number;
  lon: number;
  type: string | null;
  notes: string | null;
  sourceRow: number;
  /** Values of columns the importer does not know, by header text. */
  extra: Record<string, string> | null;
}

/** Tolls of one vehicle class, one entry per lane row (NaN = no toll given for this class). */
export interface ClassTolls {
  /** As written in the header, e.g. "5axle". */
  name: string;
  /** Matching key: lower case without spaces, hyphens or underscores. */
  key: string;
  toll: Float64Array;
  /** The column's header as the file writes it ("Toll 5-Axle"), for messages. */
  header?: string;
}

/**
 * Every accepted lane row, all classes and validity periods, in columns so a million rows stay
 * affordable. Amounts are minor units of the network currency; NaN marks a blank cell.
 */
export interface LaneTable {
  count: number;
  from: Int32Array;
  to: Int32Array;
  sourceRow: Int32Array;
  /** Default toll (the `toll` column); NaN when blank. */
  toll: Float64Array;
  /** Wide layout: one toll column per vehicle class. */
  classTolls: ClassTolls[];
  /** Long layout (a vehicle_class column): index into `classNames` per row, -1 = every class. */
  vehicleClass: Int16Array | null;
  classNames: string[];
  /** NaN when blank: estimated at planning from distance, consumption and fuel price. */
  fuel: Float64Array;
  fees: Float64Array;
  rebate: Float64Array;
  /** NaN when blank: great-circle distance times the detour factor at planning. */
  distanceKm: Float64Array;
  /** NaN when blank: distance over the planning average speed. */
  driveMinutes: Float64Array;
  /** Inclusive validity as yyyymmdd numbers; 0 = open. */
  validFrom: Int32Array;
  validTo: Int32Array;
  ref: (string | undefined)[];
  /**
   * Contract clause of each row's rebate (the optional `clause` column); absent when the file has
   * none. A row without one is its own clause, named by its ref (see `clauseOf`).
   */
  clause?: (string | undefined)[];
  notes: (string | undefined)[];
  /** Columns the importer does not know, kept with their values. */
  extra: { column: string; values: (string | undefined)[] }[];
  /** Vehicle limit columns (lane-limits.ts), per row; absent or null when the file has none. */
  limits?: LaneLimits | null;
  /** Headers of the columns planning may report on, as the file writes them ("Fuel Cost"). */
  columnHeaders?: Partial<Record<'toll' | 'fuel' | 'rebate' | 'vehicle_class', string>>;
}

/** One lane row as an object, for a lane table on screen. */
export interface LaneRecord {
  index: number;
  sourceRow: number;
  from: string;
  to: string;
  ref: string | null;
  /** The `clause` cell; null when blank (the row is then its own clause, named by its ref). */
  clause: string | null;
  vehicleClass: string | null;
  /** Formatted amounts ("12.50"), null when blank. */
  toll: string | null;
  classTolls: Record<string, string | null>;
  fuel: string | null;
  fees: string | null;
  rebate: string | null;
  distanceKm: number | null;
  driveMinutes: number | null;
  validFrom: string | null;
  validTo: string | null;
  notes: string | null;
  extra: Record<string, string>;
}

export interface ProgressEvent {
  file: 'depots' | 'lanes';
  /** Data rows read so far in this file. */
  rows: number;
  /** Share of the file read (0..1) when the size is known. */
  fraction: number | null;
}

/** Text in one piece or in chunks, in order. */
export type TextSource = string | Iterable<string>;
