// The five amount cells every per-lane table carries (toll, fuel, fees, rebate, net), formatted
// exactly in the network's currency, so the loops export and the audit tables read the same.

import { formatMinor, type Minor } from '../money/minor';
import type { Network } from '../network/types';

/** Column names of laneAmountCells, in order. */
export const LANE_AMOUNT_COLUMNS = ['toll', 'fuel', 'fees', 'rebate', 'net'] as const;

/** Toll, fuel, fees, rebate and net of lane `e` as plain decimals. */
export function laneAmountCells(network: Network, e: number): string[] {
  const money = (v: number) => formatMinor(v as Minor, network.exponent);
  return [money(network.laneToll[e]), money(network.laneFuel[e]), money(network.laneFees[e]), money(network.laneRebate[e]), money(network.laneNet[e])];
}
