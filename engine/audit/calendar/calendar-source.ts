// What the calendar review works on: a lane table (every row, class and validity window) and the
// planner that turns it into the network of one date and class. The files as loaded plan with
// planNetwork; a what-if plans the overlay's table with the overlay's own rules
// (engine/scenario/calendar-under-scenario.ts), so the review never computes an amount itself.

import { InvalidInputError } from '../../import/import-errors';
import { laneKeysOfTable, type LaneKey } from '../../import/lane-key';
import type { LaneTable } from '../../import/types';
import type { Network } from '../../network/types';
import { planNetwork } from '../../planning/import-network';
import type { ImportResult } from '../../planning/import-types';

export interface CalendarSource {
  /** The table reviewed; every row index in the review is a row of it. */
  lanes: LaneTable;
  depots: readonly { id: string }[];
  /** Classes of the file (the default review covers each; none = the default toll). */
  vehicleClasses: readonly string[];
  /** 1 for a row that is in the table but in no network (a what-if closed it): it names no date and belongs to no clause. */
  leaveOut?: Uint8Array;
  /** Key of every row of `lanes`, counted over the file's rows (what --negotiable and scenarios name). */
  keys(): readonly LaneKey[];
  /** The network of one date (ISO 8601) and class; `laneRecord[e]` is the `lanes` row of lane e. */
  plan(date: string | undefined, vehicleClass: string | null): { network: Network; laneRecord: Int32Array };
}

/** The files as loaded: the import's own table, planned with its settings. */
export function importCalendarSource(result: ImportResult, skipInvalid = false): CalendarSource {
  let keys: LaneKey[] | null = null;
  return {
    lanes: result.lanes,
    depots: result.depots,
    vehicleClasses: result.vehicleClasses,
    keys: () => (keys ??= laneKeysOfTable(result.lanes, result.depots)),
    plan(date, vehicleClass) {
      const planned = planNetwork(result, { date, vehicleClass: vehicleClass ?? undefined, settings: result.plan.settings }, { skipInvalid });
      if (planned.network === null) throw new InvalidInputError(planned.report);
      return { network: planned.network, laneRecord: planned.plan.laneRecord };
    },
  };
}
