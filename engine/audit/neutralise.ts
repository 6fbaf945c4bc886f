// What neutralises one rebate loop, lane by lane: a loop whose lap nets -X stops paying once any of
// its lanes costs X more, by a rebate cut of X (when the lane's rebate is at least X) or by a cost
// rise of X. The contract analyst picks the clause to renegotiate from this list.

import type { Minor } from '../money/minor';
import type { Network } from '../network/types';
import type { RebateLoop } from '../routes/rebate-loop';

export interface LaneNeutraliser {
  /** Lane index. */
  lane: number;
  /** The amount (X) by which this lane must get dearer for the loop to stop paying. */
  amount: Minor;
  /** True when cutting this lane's rebate by X (not below 0) suffices. */
  rebateCutSuffices: boolean;
}

/** One entry per lane of the loop, in travel order. */
export function neutralisers(network: Network, loop: RebateLoop): LaneNeutraliser[] {
  const amount = (loop.netPerLap === 0 ? 0 : -loop.netPerLap) as Minor;
  return loop.lanes.map((lane) => ({ lane, amount, rebateCutSuffices: network.laneRebate[lane] >= amount }));
}
