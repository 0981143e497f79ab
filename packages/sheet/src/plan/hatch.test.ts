import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { hatchLines } from './hatch.js';

describe('hatchLines', () => {
  test('every hatch line is a 45° segment with both ends on the rectangle (clipped exactly)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -500, max: 500, noNaN: true }),
        fc.double({ min: -500, max: 500, noNaN: true }),
        fc.double({ min: 0.5, max: 300, noNaN: true }),
        fc.double({ min: 0.5, max: 300, noNaN: true }),
        (x0, y0, w, h) => {
          const lines = hatchLines(x0, y0, x0 + w, y0 + h, 4);
          // Lines (x - x0) + (y - y0) = t for t = 4, 8, ... below w + h.
          expect(lines.length).toBe(Math.max(0, Math.ceil((w + h) / 4) - 1));
          const eps = 1e-9 * (1 + Math.abs(x0) + Math.abs(y0) + w + h);
          for (const [a, b] of lines) {
            for (const [x, y] of [a, b]) {
              expect(x).toBeGreaterThanOrEqual(x0 - eps);
              expect(x).toBeLessThanOrEqual(x0 + w + eps);
              expect(y).toBeGreaterThanOrEqual(y0 - eps);
              expect(y).toBeLessThanOrEqual(y0 + h + eps);
              const onEdge = Math.min(Math.abs(x - x0), Math.abs(x - x0 - w), Math.abs(y - y0), Math.abs(y - y0 - h));
              expect(onEdge).toBeLessThanOrEqual(eps);
            }
            // Slope -1 in paper coordinates (45°).
            expect(Math.abs(b[0] - a[0] + (b[1] - a[1]))).toBeLessThanOrEqual(eps * 4);
          }
        },
      ),
    );
  });
});
