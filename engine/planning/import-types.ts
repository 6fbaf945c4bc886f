// What one import session takes and gives: the options for reading and planning, and the result
// (report, accepted rows, the plan). Here, not in engine/import/types.ts, because it names the
// planning types and the importer's areas come before planning (eslint.config.js ENGINE_ORDER).

import type { DepotRecord, LaneTable, ProgressEvent, ValidationReport } from '../import/types';
import type { Network } from '../network/types';
import type { PlannedNetwork, PlanRequest } from './types';

export interface ImportOptions {
  /** Names shown in the report; default "depots.csv" and "lanes.csv". */
  depotsFile?: string;
  lanesFile?: string;
  plan?: PlanRequest;
  /** ISO 4217 code of the network; default: the first currency the lanes file names, else EUR. */
  currency?: string;
  /** Code -> decimal rate: 1 unit of that currency is `rate` units of the network currency. */
  exchangeRates?: Record<string, string>;
  /** Build the network from the accepted rows even when the report has errors. */
  skipInvalid?: boolean;
  /**
   * False: read, check and plan (every problem reported) but build no network (`network` is null);
   * what `lanewright check` needs, at less time and memory. Default true.
   */
  network?: boolean;
  onProgress?: (progress: ProgressEvent) => void;
  /** Checked between chunks; when set, the import stops with ImportCancelledError. */
  signal?: { readonly aborted: boolean };
  /** Cap on stored errors and on stored warnings each; default 1000. */
  maxItems?: number;
  /**
   * For byte chunks (`feedDepotsBytes` / `feedLanesBytes`): the host's native UTF-8 decoder of whole
   * characters (Node: Buffer#toString), used where lines are read as text; default the engine's own
   * (engine/text/utf8.ts, the same text, slower).
   */
  utf8Text?: (bytes: Uint8Array, start: number, end: number) => string;
}

export interface ImportResult {
  /** Null when the report has errors and skipInvalid is not set. */
  network: Network | null;
  report: ValidationReport;
  depots: DepotRecord[];
  lanes: LaneTable;
  currency: string;
  exponent: number;
  /** Vehicle classes the lanes file names, in file order. */
  vehicleClasses: string[];
  plan: PlannedNetwork;
  /** The report of reading the files alone, before planning; `report` adds the plan's problems. */
  importReport: ValidationReport;
  /** Things worth knowing that are not problems (currency conversions, the class planned for). */
  notes: string[];
}
