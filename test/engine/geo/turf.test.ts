// Great-circle distance against a published worked example: Ed Williams, "Aviation Formulary"
// (v1.47), worked example LAX (33deg57'N 118deg24'W) to JFK (40deg38'N 73deg47'W):
// d = 0.623585 rad = 2144 nm (values quoted from memory). On turf's sphere of 6371.0088 km that is
// 0.623585 x 6371.0088 = 3972.9 km.

import { describe, expect, it } from 'vitest';
import { greatCircleKm } from '../../../engine/geo/turf';

describe('greatCircleKm', () => {
  it('matches the LAX-JFK worked example of the Aviation Formulary', () => {
    const lax = [33 + 57 / 60, -(118 + 24 / 60)];
    const jfk = [40 + 38 / 60, -(73 + 47 / 60)];
    const km = greatCircleKm(lax[0], lax[1], jfk[0], jfk[1]);
    expect(km / 6371.0088).toBeCloseTo(0.623585, 5);
    expect(km).toBeCloseTo(3972.9, 0);
  });

  it('is symmetric and zero at one point; a quarter meridian is pi/2 x R', () => {
    expect(greatCircleKm(51.9, 4.1, 50.6, 3.0)).toBeCloseTo(greatCircleKm(50.6, 3.0, 51.9, 4.1), 9);
    expect(greatCircleKm(10, 20, 10, 20)).toBe(0);
    expect(greatCircleKm(0, 0, 90, 0)).toBeCloseTo((Math.PI / 2) * 6371.0088, 3);
  });
});
