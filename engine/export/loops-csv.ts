// The loops export: one row per lane of each rebate loop, in travel order, with its contract
// reference and amounts and the loop's net per lap, for the contract analyst's review.

import { formatCsvRows } from '../io/csv-papaparse';
import type { RebateLoop } from '../routes/rebate-loop';
import { formatMinor, type Minor } from '../money/minor';
import type { Network } from '../network/types';
import { LANE_AMOUNT_COLUMNS, laneAmountCells } from '../report/lane-amount-cells';

export function loopsCsvRows(network: Network, loops: readonly RebateLoop[]): (string | number)[][] {
  const money = (v: number) => formatMinor(v as Minor, network.exponent);
  const rows: (string | number)[][] = [['loop', 'step', 'from', 'to', 'lane_row', 'ref', ...LANE_AMOUNT_COLUMNS, 'net_per_lap', 'currency']];
  loops.forEach((loop, k) => {
    loop.lanes.forEach((e, step) => {
      rows.push([
        k + 1,
        step + 1,
        network.depotIds[network.laneFrom[e]],
        network.depotIds[network.laneTo[e]],
        network.laneRow[e],
        network.laneRef[e] ?? '',
        ...laneAmountCells(network, e),
        money(loop.netPerLap),
        network.currency,
      ]);
    });
  });
  return rows;
}

/** The loops export as RFC 4180 CSV text. */
export function loopsCsv(network: Network, loops: readonly RebateLoop[]): string {
  return formatCsvRows(loopsCsvRows(network, loops));
}
