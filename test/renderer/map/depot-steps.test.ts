// Keyboard steps between depots on the map, on hand-placed points (screen y grows downwards).

import { describe, expect, it } from 'vitest';
import { directionOfKey, stepToward } from '../../../renderer/map/depot-steps';

//        1 (0,-10)
//  3 (-10,0)   0 (0,0)   2 (10,1)   4 (30,0)
//        5 (2,20)               6 (12,-30)
const x = [0, 0, 10, -10, 30, 2, 12];
const y = [0, -10, 1, 0, 0, 20, -30];

describe('stepToward', () => {
  it('goes to the nearest depot in each direction', () => {
    expect(stepToward(x, y, 0, 'right')).toBe(2);
    expect(stepToward(x, y, 0, 'left')).toBe(3);
    expect(stepToward(x, y, 0, 'up')).toBe(1);
    expect(stepToward(x, y, 0, 'down')).toBe(5);
    expect(stepToward(x, y, 2, 'right')).toBe(4);
  });

  it('ignores depots more than 60 degrees off the key and says null when none lies that way', () => {
    // From 4 nothing lies to the right; 6 is up-left of 4 at about 56 degrees from "up".
    expect(stepToward(x, y, 4, 'right')).toBeNull();
    expect(stepToward(x, y, 4, 'up')).toBe(6);
    expect(stepToward(x, y, 3, 'left')).toBeNull();
  });

  it('skips depots drawn at the same point', () => {
    expect(stepToward([0, 0, 5], [0, 0, 0], 0, 'right')).toBe(2);
  });

  it('maps only the arrow keys to directions', () => {
    expect(directionOfKey('ArrowUp')).toBe('up');
    expect(directionOfKey('Enter')).toBeNull();
  });
});
