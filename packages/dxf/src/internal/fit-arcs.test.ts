/**
 * The arc fitter on curves whose exact arcs are known (a circle is its own
 * best arc; a corner must stay a vertex) and on a sine (no arcs at all), each
 * checked against the closed-form curve, not against the fitter.
 */
import { describe, expect, it } from 'vitest';
import { arcOfBulge } from './arc-math.js';
import { fitArcs, kinkIndices } from './fit-arcs.js';

const circle = (r: number, fromDeg: number, toDeg: number, n: number): Array<[number, number]> =>
  Array.from({ length: n + 1 }, (_, k) => {
    const t = ((fromDeg + ((toDeg - fromDeg) * k) / n) * Math.PI) / 180;
    return [r * Math.cos(t), r * Math.sin(t)];
  });

describe('fitArcs', () => {
  it('a sampled quarter circle of radius 100 becomes one arc of radius 100 (bulge tan(22.5°))', () => {
    const fit = fitArcs(circle(100, 0, 90, 64), 0.01);
    expect(fit.vertices).toHaveLength(2);
    expect(fit.vertices[0]![2]).toBeCloseTo(Math.tan(Math.PI / 8), 9);
    const arc = arcOfBulge([fit.vertices[0]![0], fit.vertices[0]![1]], [fit.vertices[1]![0], fit.vertices[1]![1]], fit.vertices[0]![2]);
    expect(arc.radius).toBeCloseTo(100, 6);
    expect(fit.maxDeviation).toBeLessThan(1e-9);
  });

  it('walked clockwise, the same quarter gives the negative bulge', () => {
    const fit = fitArcs(circle(100, 90, 0, 64), 0.01);
    expect(fit.vertices[0]![2]).toBeCloseTo(-Math.tan(Math.PI / 8), 9);
  });

  it('a corner between an arc and a straight run stays a vertex (no arc runs across it)', () => {
    const a = circle(50, 180, 90, 32); // clockwise, ends at (0, 50)

    // The arc arrives at (0, 50) heading +x; the straight run leaves it along +y: a right angle.
    const straight = Array.from({ length: 20 }, (_, k): [number, number] => [0, 50 + (k + 1) * 2]);
    const pts = [...a, ...straight];

    expect(kinkIndices(pts)).toContain(a.length - 1);
    const fit = fitArcs(pts, 0.01);
    expect(fit.vertices.some(([x, y]) => Math.abs(x) < 1e-9 && Math.abs(y - 50) < 1e-9)).toBe(true);
    // The straight run is one segment: bulge 0 from the corner on.
    const corner = fit.vertices.findIndex(([x, y]) => Math.abs(x) < 1e-9 && Math.abs(y - 50) < 1e-9);
    expect(fit.vertices[corner]![2]).toBe(0);
    expect(fit.vertices.length).toBeLessThanOrEqual(4);
  });

  it('a sine wave, 0.02 mm tolerance: every sample within the tolerance of the fitted run, far fewer vertices', () => {
    const pts = Array.from({ length: 801 }, (_, k): [number, number] => [k * 0.5, 30 * Math.sin((k * 0.5 * Math.PI) / 100)]);
    const fit = fitArcs(pts, 0.02);
    expect(fit.maxDeviation).toBeLessThanOrEqual(0.02);
    expect(fit.vertices.length * 5).toBeLessThan(pts.length);
    // Independent check of every sample against the arcs rebuilt from the bulges.
    let worst = 0;
    for (const [x, y] of pts) {
      let best = Infinity;
      for (let i = 0; i + 1 < fit.vertices.length; i++) {
        const [ax, ay, b] = fit.vertices[i]!;
        const [bx, by] = fit.vertices[i + 1]!;
        if (x < Math.min(ax, bx) - 1e-9 || x > Math.max(ax, bx) + 1e-9) continue;
        if (b === 0) {
          best = Math.min(best, Math.abs(y - (ay + ((by - ay) * (x - ax)) / (bx - ax))));
        } else {
          const arc = arcOfBulge([ax, ay], [bx, by], b);
          best = Math.min(best, Math.abs(Math.hypot(x - arc.center[0], y - arc.center[1]) - arc.radius));
        }
      }
      worst = Math.max(worst, best);
    }
    expect(worst).toBeLessThanOrEqual(0.02 + 1e-9);
  });

  it('two points stay one straight segment', () => {
    expect(fitArcs([[0, 0], [1, 1]], 0.1).vertices).toEqual([[0, 0, 0], [1, 1, 0]]);
  });
});
