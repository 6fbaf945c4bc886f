// Web Mercator as the map projects it, against the figures of EPSG:3857 (the "WGS 84 / Pseudo-Mercator"
// definition: sphere radius 6,378,137 m; the world spans ±20,037,508.342789244 m in x, and the
// latitude limit 85.0511287798° maps to the same value in y, making the world square). From memory
// of the EPSG registry entry.

import { describe, expect, it } from 'vitest';
import { MERCATOR_MAX_LATITUDE, mercatorX, mercatorY, projectPoints } from '../../../renderer/map/mercator';

const HALF_WORLD = 20037508.342789244;

describe('mercator', () => {
  it('maps the date line and the latitude limit to the edges of the square world', () => {
    expect(mercatorX(180)).toBeCloseTo(HALF_WORLD, 3);
    expect(mercatorX(-180)).toBeCloseTo(-HALF_WORLD, 3);
    expect(mercatorY(MERCATOR_MAX_LATITUDE)).toBeCloseTo(HALF_WORLD, -1);
    expect(mercatorY(-MERCATOR_MAX_LATITUDE)).toBeCloseTo(-HALF_WORLD, -1);
  });

  it('is zero at the origin, odd in latitude, and clamps past the limit', () => {
    expect(mercatorX(0)).toBe(0);
    expect(mercatorY(0)).toBe(0);
    expect(mercatorY(-48.8566)).toBeCloseTo(-mercatorY(48.8566), 6);
    expect(mercatorY(90)).toBe(mercatorY(MERCATOR_MAX_LATITUDE));
  });

  it('projects every point of a list', () => {
    const { x, y } = projectPoints([0, 45, -30], [0, 10, -170]);
    expect(Array.from(x)).toEqual([mercatorX(0), mercatorX(10), mercatorX(-170)]);
    expect(Array.from(y)).toEqual([mercatorY(0), mercatorY(45), mercatorY(-30)]);
  });
});
