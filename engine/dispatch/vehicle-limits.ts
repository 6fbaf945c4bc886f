// Which lanes a vehicle and its load may not use: each lane limit column (height, width, length,
// gross weight, axle load, ADR tunnel category, no dangerous goods) against the vehicle's size and
// the load's tunnel restriction code. Gives a per-lane mask, the solver weights, and the reasons.

import type { LaneLimits } from '../import/lane-limits';
import type { LoadRecord } from '../import/loads-reader';
import type { VehicleRecord } from '../import/vehicles-reader';
import type { Network } from '../network/types';
import { categoryBits, categoryOfBit, forbiddenCategories, TUNNEL_CATEGORIES, type TunnelCode, type TunnelCategory } from '../import/adr-tunnels';

/** What a lane is checked against for one load. */
export interface RestrictionProfile {
  /** Sizes of the vehicle; null when no vehicle is named (size limits cannot be checked). */
  sizes: { max_height: number; max_width: number; max_length: number; max_weight: number; max_axle_load: number } | null;
  /** Bit per tunnel category the load may not pass (categoryBits). */
  forbiddenTunnels: number;
  /** The code that decided the tunnels, for messages (the load's, else the vehicle's). */
  tunnelCodes: TunnelCode[];
  /** The load counts as dangerous goods (a tunnel code is given, even "-"). */
  dangerousGoods: boolean;
  /** The carriage was unknown and the stricter ADR row was applied. */
  assumedStricter: boolean;
}

/** The profile of a load on its vehicle: sizes from the vehicle, tunnel codes of both (the stricter wins). */
export function restrictionProfile(load: Pick<LoadRecord, 'tunnelCode'>, vehicle: VehicleRecord | null): RestrictionProfile {
  const codes = [load.tunnelCode, vehicle?.tunnelCode ?? null].filter((c): c is TunnelCode => c !== null);
  const carriage = { tank: vehicle?.carriage ? vehicle.carriage === 'tank' : null, bulk: vehicle?.carriage ? vehicle.carriage === 'bulk' : null, explosiveMassKg: null };
  let bits = 0;
  let assumed = false;
  for (const code of codes) {
    const v = forbiddenCategories(code, carriage);
    bits |= categoryBits(v.forbidden);
    assumed ||= v.assumedStricter;
  }
  return {
    sizes: vehicle ? { max_height: vehicle.heightM, max_width: vehicle.widthM, max_length: vehicle.lengthM, max_weight: vehicle.weightT, max_axle_load: vehicle.axleLoadT } : null,
    forbiddenTunnels: bits,
    tunnelCodes: [...new Set(codes)],
    dangerousGoods: codes.length > 0,
    assumedStricter: assumed,
  };
}

/** Key of a profile: loads with equal keys see the same lanes closed. */
export function profileKey(p: RestrictionProfile): string {
  const s = p.sizes;
  return `${s ? `${s.max_height}|${s.max_width}|${s.max_length}|${s.max_weight}|${s.max_axle_load}` : '-'}|${p.forbiddenTunnels}|${p.dangerousGoods ? 1 : 0}`;
}

const fixed = (v: number) => v.toFixed(2);

/**
 * Why table row `r` is closed to the profile: one text per limit it breaks, e.g.
 * "max_height_m 4.00 < 4.20 on lane row 57". Empty when the lane is open.
 */
export function closureReasons(limits: LaneLimits | null | undefined, r: number, sourceRow: number, p: RestrictionProfile): string[] {
  if (!limits) return [];
  const reasons: string[] = [];
  if (p.sizes) {
    for (const m of limits.measures) {
      const limit = m.values[r];
      const size = p.sizes[m.column.field as keyof NonNullable<RestrictionProfile['sizes']>];
      if (!Number.isNaN(limit) && size > limit) reasons.push(`${m.column.name} ${fixed(limit)} < ${fixed(size)} on lane row ${sourceRow}`);
    }
  }
  const cat = limits.tunnelCategory ? limits.tunnelCategory[r] : 0;
  if (cat > 0 && (p.forbiddenTunnels & (1 << (cat - 1))) !== 0) {
    reasons.push(`tunnel_category ${categoryOfBit(cat - 1)} forbidden to tunnel code ${p.tunnelCodes.join(' + ')} (ADR 8.6.4) on lane row ${sourceRow}`);
  }
  if (p.dangerousGoods && limits.noDangerousGoods && limits.noDangerousGoods[r] === 1) {
    reasons.push(`no_dangerous_goods on lane row ${sourceRow}, load has tunnel code ${p.tunnelCodes.join(' + ')}`);
  }
  return reasons;
}

/** Closed network lanes (1 = closed) for the profile; null when none is closed. */
export function closedLanes(network: Network, laneRecord: Int32Array, limits: LaneLimits | null | undefined, p: RestrictionProfile): Uint8Array | null {
  if (!limits) return null;
  const closed = new Uint8Array(network.laneCount);
  let any = false;
  const checks: { values: Float64Array; size: number }[] = [];
  if (p.sizes) for (const m of limits.measures) checks.push({ values: m.values, size: p.sizes[m.column.field as keyof NonNullable<RestrictionProfile['sizes']>] });
  const tunnels = p.forbiddenTunnels !== 0 ? limits.tunnelCategory : null;
  const noDg = p.dangerousGoods ? limits.noDangerousGoods : null;
  for (let e = 0; e < network.laneCount; e++) {
    const r = laneRecord[e];
    let shut = false;
    for (let k = 0; k < checks.length && !shut; k++) if (checks[k].size > checks[k].values[r]) shut = true; // NaN limit: false
    if (!shut && tunnels && tunnels[r] > 0 && (p.forbiddenTunnels & (1 << (tunnels[r] - 1))) !== 0) shut = true;
    if (!shut && noDg && noDg[r] === 1) shut = true;
    if (shut) {
      closed[e] = 1;
      any = true;
    }
  }
  return any ? closed : null;
}

/** Solver weights (CSR layout) with closed lanes at +Infinity. */
export function restrictedWeights(network: Network, closed: Uint8Array, base: Float64Array = network.outNet): Float64Array {
  const w = base.slice();
  for (let p = 0; p < w.length; p++) if (closed[network.outLane[p]] === 1) w[p] = Infinity;
  return w;
}

/** Tunnel categories a profile may not pass, as letters. */
export function forbiddenLetters(p: RestrictionProfile): TunnelCategory[] {
  return TUNNEL_CATEGORIES.filter((_c, i) => (p.forbiddenTunnels & (1 << i)) !== 0);
}
