import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { girthErrorOf } from '@girth/pipes/test-support';
import { lineRoots, offsetSurface, surfaceNormal } from './line-intersection.js';
import { headTapePosition, parallelTapeShortfallMm, type HeadSurface } from './heads.js';
import { torisphericalHeadProfile, torisphericalShape, type TorisphericalHeadSurface } from './torispherical-head.js';
import type { EllipsoidalHeadSurface } from './ellipsoidal-head.js';
import type { HemisphericalHeadSurface } from './hemispherical-head.js';
import type { Line3 } from '../types.js';
import type { Vec3 } from '../vec3.js';

const frame = { axisPoint: [0, 0, 0] as Vec3, axisDirection: [0, 0, 1] as Vec3, straightFlangeMm: 50 };
const ell = (offsetMm: number): EllipsoidalHeadSurface => ({ kind: 'ellipsoidal-head', ...frame, offsetMm, radiusMm: 600, depthMm: 300 });
const hemi = (offsetMm: number): HemisphericalHeadSurface => ({ kind: 'hemispherical-head', ...frame, offsetMm, radiusMm: 600 });
const tori = (offsetMm: number): TorisphericalHeadSurface => ({ kind: 'torispherical-head', ...frame, offsetMm, radiusMm: 600, crownRadiusMm: 1219.2, knuckleRadiusMm: 73.152 });

const at = (line: Line3, t: number): Vec3 => [line.origin[0] + t * line.direction[0], line.origin[1] + t * line.direction[1], line.origin[2] + t * line.direction[2]];
const unit = (v: Vec3): Vec3 => {
  const n = Math.hypot(...v);
  return [v[0] / n, v[1] / n, v[2] / n];
};

describe('head surfaces', () => {
  it('a hemispherical head is a sphere of radius ID/2 inside, ID/2 + wall outside (hemispherical radius = D/2)', () => {
    for (const off of [0, 12.7]) {
      const line: Line3 = { origin: [123, -45, 2000], direction: unit([-0.1, 0.05, -1]) };
      const roots = lineRoots(hemi(off), line);
      expect(roots.length).toBe(2);
      const p = at(line, roots[0]!.tMm);
      expect(Math.hypot(...p)).toBeCloseTo(600 + off, 9);
    }
  });

  it('the inside of an ellipsoidal head satisfies the ellipse equation; its outside lies the wall away along the normal', () => {
    fc.assert(
      fc.property(fc.double({ min: -500, max: 500, noNaN: true }), fc.double({ min: -500, max: 500, noNaN: true }), fc.double({ min: -0.6, max: 0.6, noNaN: true }), (x, y, tilt) => {
        fc.pre(Math.hypot(x, y) < 550);
        const line: Line3 = { origin: [x, y, 1000], direction: unit([tilt, 0, -1]) };
        const inside = lineRoots(ell(0), line)[0];
        if (inside !== undefined) {
          const p = at(line, inside.tMm);
          if (p[2] >= 0) expect((Math.hypot(p[0], p[1]) / 600) ** 2 + (p[2] / 300) ** 2).toBeCloseTo(1, 12);
        }
        const outsideHost = ell(12.7);
        const outside = lineRoots(outsideHost, line)[0];
        if (outside !== undefined) {
          const p = at(line, outside.tMm);
          if (p[2] < 0) return;
          const n = surfaceNormal(outsideHost, p);
          const foot: Vec3 = [p[0] - 12.7 * n[0], p[1] - 12.7 * n[1], p[2] - 12.7 * n[2]];
          const rho = Math.hypot(foot[0], foot[1]);
          // The foot is on the ellipse, and n is the ellipse's normal there (gradient of the implicit equation).
          expect((rho / 600) ** 2 + (foot[2] / 300) ** 2).toBeCloseTo(1, 11);
          const g = unit([foot[0] / 600 ** 2, foot[1] / 600 ** 2, foot[2] / 300 ** 2]);
          for (let i = 0; i < 3; i++) expect(n[i]).toBeCloseTo(g[i]!, 10);
        }
      }),
      { numRuns: 300 },
    );
  });

  it('the torispherical profile is continuous in position and slope at the crown-knuckle tangent point', () => {
    const s = tori(0);
    const shape = torisphericalShape(s);
    const [rj, zj] = shape.junction;
    // On both circles: |J − crown centre| = crown radius, |J − knuckle centre| = knuckle radius.
    expect(Math.hypot(rj, zj - shape.crownCentreZMm)).toBeCloseTo(1219.2, 9);
    expect(Math.hypot(rj - (600 - 73.152), zj)).toBeCloseTo(73.152, 9);
    // Just either side of J the distance is ~0 and the normals agree (one tangent).
    const before = torisphericalHeadProfile.distance(s, rj - 1e-7, zj + 1e-7 * Math.tan(shape.junctionAngleRad));
    const after = torisphericalHeadProfile.distance(s, rj + 1e-7, zj - 1e-7 * Math.tan(shape.junctionAngleRad));
    expect(Math.abs(before.distanceMm)).toBeLessThan(1e-9);
    expect(Math.abs(after.distanceMm)).toBeLessThan(1e-9);
    expect(before.normalRho).toBeCloseTo(after.normalRho, 6);
    expect(before.normalZ).toBeCloseTo(after.normalZ, 6);
    // Depth of the dish: crown − sqrt((crown − knuckle)² − (R − knuckle)²) (the standard construction).
    expect(shape.depthMm).toBeCloseTo(1219.2 - Math.sqrt((1219.2 - 73.152) ** 2 - (600 - 73.152) ** 2), 9);
  });

  it('a line across the flange meets the shell cylinder of radius + offset', () => {
    for (const host of [ell(10), hemi(10), tori(10)] as HeadSurface[]) {
      const roots = lineRoots(host, { origin: [-2000, 30, -20], direction: [1, 0, 0] });
      expect(roots.map((r) => r.tMm - 2000)).toEqual([expect.closeTo(-Math.sqrt(610 ** 2 - 30 ** 2), 9), expect.closeTo(Math.sqrt(610 ** 2 - 30 ** 2), 9)]);
    }
  });

  it('a line square to the axis touching the crown is one tangent root; just above it, none', () => {
    for (const [host, top] of [[ell(5), 305], [hemi(5), 605]] as const) {
      const touch = lineRoots(host, { origin: [-1000, 0, top], direction: [1, 0, 0] });
      expect(touch).toEqual([{ tMm: expect.closeTo(1000, 3), tangent: true }]);
      expect(lineRoots(host, { origin: [-1000, 0, top + 0.01], direction: [1, 0, 0] })).toEqual([]);
    }
  });

  it('refuses an inward offset past the smallest radius of curvature (the knuckle)', () => {
    const e = girthErrorOf(() => offsetSurface(tori(0), -80));
    expect([e.code, e.field]).toEqual(['OUT_OF_RANGE', 'gap']);
  });

  it('tape positions: the meridian from the crown centre and the arc around the parallel', () => {
    // A sphere of radius r: meridian = r × polar angle; around = rho × azimuth.
    const host = hemi(0);
    const p: Vec3 = [600 * Math.sin(0.5) * Math.cos(0.3), 600 * Math.sin(0.5) * Math.sin(0.3), 600 * Math.cos(0.5)];
    const tape = headTapePosition(host, p);
    expect(tape.meridianMm).toBeCloseTo(300, 9);
    expect(tape.aroundMm).toBeCloseTo(600 * Math.sin(0.5) * 0.3, 9);
    // A 2:1 ellipse's quarter perimeter (Ramanujan's approximation, exact to ~1e-9 relative at this eccentricity).
    const a = 600;
    const b = 300;
    const h = ((a - b) / (a + b)) ** 2;
    const quarter = (Math.PI * (a + b) * (1 + (3 * h) / (10 + Math.sqrt(4 - 3 * h)))) / 4;
    expect(headTapePosition(ell(0), [600, 0, 0]).meridianMm).toBeCloseTo(quarter, 4);
    expect(parallelTapeShortfallMm(500, 100)).toBeCloseTo(100 - 1000 * Math.sin(0.1), 12);
  });
});
