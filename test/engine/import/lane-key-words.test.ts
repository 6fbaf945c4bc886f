// Lanes named in words for people (never the key text "FROM>TO|ref|n"), with English ordinals
// (1st, 2nd, 3rd, 4th; 11th-13th; 21st, 22nd, 23rd; common usage, no source).

import { describe, expect, it } from 'vitest';
import { laneKeyWords, ordinal } from '../../../engine/import/lane-key';

describe('laneKeyWords', () => {
  it('names origin, destination and ref, and the row only when it is not the first', () => {
    expect(laneKeyWords({ from: 'FRA', to: 'SXB', ref: 'BFH-L-019', occurrence: 1 })).toBe('FRA → SXB, ref BFH-L-019');
    expect(laneKeyWords({ from: 'FRA', to: 'SXB', ref: 'BFH-L-019', occurrence: 2 })).toBe('FRA → SXB, ref BFH-L-019, 2nd row');
    expect(laneKeyWords({ from: 'A', to: 'B', ref: null, occurrence: 3 })).toBe('A → B, no ref, 3rd row');
    expect(laneKeyWords({ from: 'A', to: 'B', ref: null, occurrence: 1 })).not.toMatch(/[>|]/);
  });

  it('writes ordinals', () => {
    expect([1, 2, 3, 4, 11, 12, 13, 21, 22, 23, 101, 111, 112].map(ordinal)).toEqual(['1st', '2nd', '3rd', '4th', '11th', '12th', '13th', '21st', '22nd', '23rd', '101st', '111th', '112th']);
  });
});
