// Keyboard moves between depots on the map: an arrow key goes to the nearest depot that lies in
// that direction on screen (within 60 degrees either side of it), nearer ones and ones closer to
// the key's axis first. Pure geometry on screen points, so it is unit-tested without a browser.

export type Direction = 'left' | 'right' | 'up' | 'down';

const AXES: Record<Direction, [number, number]> = { left: [-1, 0], right: [1, 0], up: [0, -1], down: [0, 1] };

/** The arrow key's direction, or null for any other key. */
export function directionOfKey(key: string): Direction | null {
  return key === 'ArrowLeft' ? 'left' : key === 'ArrowRight' ? 'right' : key === 'ArrowUp' ? 'up' : key === 'ArrowDown' ? 'down' : null;
}

/**
 * Index of the depot to move to from `from` in `direction`, or null when none lies that way.
 * `x`/`y` are screen positions (y grows downwards); depots at the same point as `from` are skipped.
 */
export function stepToward(x: ArrayLike<number>, y: ArrayLike<number>, from: number, direction: Direction): number | null {
  const [ax, ay] = AXES[direction];
  let best: number | null = null;
  let bestScore = Infinity;
  for (let d = 0; d < x.length; d++) {
    if (d === from) continue;
    const dx = x[d] - x[from];
    const dy = y[d] - y[from];
    const along = dx * ax + dy * ay;
    const across = Math.abs(dx * ay - dy * ax);
    // Within 60 degrees of the axis: across <= along * tan(60°).
    if (along <= 0 || across > along * Math.sqrt(3)) continue;
    // Sideways distance counts double, so a depot straight ahead beats a nearer one off to the side.
    const score = along + 2 * across;
    if (score < bestScore) {
      bestScore = score;
      best = d;
    }
  }
  return best;
}
