import { describe, expect, it } from 'vitest';
import { distanceToSegment } from './segment-distance.js';

describe('distanceToSegment', () => {
  it('measures square to the segment inside it, and to the nearer end outside it', () => {
    expect(distanceToSegment([1, 1], [0, 0], [2, 0])).toBe(1);
    expect(distanceToSegment([5, 4], [0, 0], [2, 0])).toBe(5);
    expect(distanceToSegment([3, 4], [0, 0], [0, 0])).toBe(5);
  });
});
