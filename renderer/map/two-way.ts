// The geometry of two-way lanes, apart from Leaflet so it is unit-tested under Node: which lanes
// have a reverse, and how a projected segment is shifted to the right of its direction of travel.

import type { NetworkView } from '../worker/protocol';

/** Answers whether the network also has the lane b->a for a lane a->b (a != b). */
export type HasReverse = (a: number, b: number) => boolean;

export function reverseLookup(network: NetworkView): HasReverse {
  const n = network.depotIds.length;
  const pairs = new Set<number>();
  for (let e = 0; e < network.laneFrom.length; e++) pairs.add(network.laneFrom[e] * n + network.laneTo[e]);
  return (a, b) => a !== b && pairs.has(b * n + a);
}

/** Sideways shift in pixels for a line of this weight: half its width plus a small gap. */
export function offsetFor(weight: number): number {
  return weight / 2 + 1;
}

/**
 * Shifts each ring sideways by its own offset (px, positive = right of the direction of travel).
 * Points are changed in place.
 */
export function shiftRings(rings: { x: number; y: number }[][], offsets: ArrayLike<number>): void {
  for (let i = 0; i < rings.length && i < offsets.length; i++) {
    const ring = rings[i];
    const off = offsets[i];
    if (!off || ring.length < 2) continue;
    const a = ring[0];
    const b = ring[ring.length - 1];
    const dx = b.x - a.x;
    const dy = b.y - a.y;
    const length = Math.hypot(dx, dy);
    if (length === 0) continue;
    // Screen y grows downwards, so the right-hand normal of (dx, dy) is (-dy, dx).
    const sx = (-dy / length) * off;
    const sy = (dx / length) * off;
    for (const p of ring) {
      p.x += sx;
      p.y += sy;
    }
  }
}

