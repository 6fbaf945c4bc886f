// The one net-cost formula of a lane: toll + fuel + fees - rebate, in exact minor units. Every
// screen, export and solver that shows or uses a lane's net calls this, so no two can disagree.
// The net is what the lane costs, so only the net (or a component itself) must be exact; when a
// partial sum passes the exact range the net is recomputed with BigInt instead of being refused.

import { MoneyOverflowError } from '../errors';

const MAX = Number.MAX_SAFE_INTEGER;

/**
 * Net cost of one lane: toll + fuel + fees - rebate. Throws MoneyOverflowError when a component
 * is not an exact integer or the net itself leaves the exact range; `context` names the lane.
 */
export function netCost(toll: number, fuel: number, fees: number, rebate: number, context: string | (() => string) = 'net cost of a lane'): number {
  const a = toll + fuel;
  if (a <= MAX && a >= -MAX) {
    const b = a + fees;
    if (b <= MAX && b >= -MAX) {
      const net = b - rebate;
      // Each step stayed exact (safe integers), so the result is exact when it is itself safe.
      if (net <= MAX && net >= -MAX && Number.isSafeInteger(toll) && Number.isSafeInteger(fuel) && Number.isSafeInteger(fees) && Number.isSafeInteger(rebate)) {
        return net === 0 ? 0 : net;
      }
    }
  }
  // The context is made only here: hot loops pass a function so no text is built per lane.
  return netCostExact(toll, fuel, fees, rebate, typeof context === 'function' ? context() : context);
}

/** The slow path: components checked one by one, the sum taken in BigInt. */
function netCostExact(toll: number, fuel: number, fees: number, rebate: number, context: string): number {
  const parts: [string, number][] = [['toll', toll], ['fuel', fuel], ['fees', fees], ['rebate', rebate]];
  for (const [name, value] of parts) if (!Number.isSafeInteger(value)) throw new MoneyOverflowError(`${name} of the ${context}`);
  const net = BigInt(toll) + BigInt(fuel) + BigInt(fees) - BigInt(rebate);
  if (net > BigInt(MAX) || net < -BigInt(MAX)) throw new MoneyOverflowError(context);
  const value = Number(net);
  return value === 0 ? 0 : value;
}

/** netCost, or null where it throws: for checks that report a problem instead of stopping. */
export function netCostOrNull(toll: number, fuel: number, fees: number, rebate: number): number | null {
  try {
    return netCost(toll, fuel, fees, rebate);
  } catch (error) {
    if (error instanceof MoneyOverflowError) return null;
    throw error;
  }
}
