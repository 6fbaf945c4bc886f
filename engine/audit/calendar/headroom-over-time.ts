// Rebate headroom over the calendar: a row's floor is the highest of its one-period floors (the
// lowest net that is safe in every period it is valid in), and the period with that floor sets it.
// A covered network's back paths all exist, no dearer, in its cover, so its floors are never higher:
// only the maximal networks are solved, each by the one-network headroom (engine/audit/headroom.ts).

import { laneFloors } from '../headroom';
import type { PeriodNetwork } from './period-networks';
import { weightsWithCuts } from './period-weights';

export interface RowHeadroom {
  /** LaneTable row. */
  row: number;
  vehicleClass: string | null;
  /** The row's net in this class (after the fix plan when one was applied). */
  net: number;
  /** Lowest safe net over the periods it is valid in; NaN = no limit in any of them. */
  floor: number;
  /** Period index that sets the floor (-1 when there is no limit). */
  setBy: number;
}

/** Headroom of every row in every class it is planned in, rows in table order within each class. */
export function headroomOverTime(nets: readonly PeriodNetwork[], rows: number, cut: Float64Array | null, onProgress?: (done: number, total: number) => void): RowHeadroom[] {
  const out: RowHeadroom[] = [];
  const classes = [...new Set(nets.map((n) => n.vehicleClass))];
  const maximal = nets.filter((n) => n.maximal);
  let done = 0;
  for (const vehicleClass of classes) {
    const floor = new Float64Array(rows).fill(NaN);
    const net = new Float64Array(rows).fill(NaN);
    const setBy = new Int32Array(rows).fill(-1);
    for (const pn of maximal) {
      if (pn.vehicleClass !== vehicleClass) continue;
      const weights = weightsWithCuts(pn, cut);
      const floors = laneFloors(pn.network, { weights });
      for (let e = 0; e < pn.record.length; e++) {
        const r = pn.record[e];
        if (Number.isNaN(net[r])) net[r] = floors.net[e];
        const f = floors.floor[e];
        if (Number.isNaN(f)) continue;
        if (Number.isNaN(floor[r]) || f > floor[r] || (f === floor[r] && pn.periods[0] < setBy[r])) {
          floor[r] = f;
          net[r] = floors.net[e];
          setBy[r] = pn.periods[0];
        }
      }
      onProgress?.(++done, maximal.length);
    }
    for (let r = 0; r < rows; r++) if (!Number.isNaN(net[r])) out.push({ row: r, vehicleClass, net: net[r], floor: floor[r], setBy: setBy[r] });
  }
  return out;
}
