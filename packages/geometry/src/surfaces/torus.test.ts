import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { TANGENCY_REL_EPS } from '../tolerances.js';
import { lineRoots, offsetSurface, surfaceNormal } from './line-intersection.js';
import { torusLocal, torusOps, torusPoint, torusTapePosition, type TorusSurface } from './torus.js';

// An invented NPS 8 long-radius elbow: OD 8.625 in, centreline radius 1.5 x 8 in = 12 in (ASME B16.9, recalled).
const IN = 25.4;
const R = 12 * IN;
const r = (8.625 * IN) / 2;
const elbow: TorusSurface = { kind: 'torus', centre: [0, 0, 0], axisDirection: [0, 0, 1], zeroDirection: [1, 0, 0], bendRadiusMm: R, tubeRadiusMm: r };
const eps = TANGENCY_REL_EPS;

/** Distance of a point from the torus (implicit form, written out here). */
const distance = (p: readonly number[]): number => Math.hypot(Math.hypot(p[0]!, p[1]!) - R, p[2]!) - r;

describe('torus host', () => {
  it('meets a line in the bend plane through the centre four times: ±(R − r), ±(R + r)', () => {
    const roots = lineRoots(elbow, { origin: [-1000, 0, 0], direction: [1, 0, 0] });
    expect(roots.map((x) => x.tMm - 1000)).toEqual([-(R + r), -(R - r), R - r, R + r].map((v) => expect.closeTo(v, 9)));
    expect(roots.every((x) => !x.tangent)).toBe(true);
  });

  it('meets a line parallel to the axis on the centreline at z = ±r', () => {
    const roots = lineRoots(elbow, { origin: [0, R, 500], direction: [0, 0, -1] });
    expect(roots.map((x) => 500 - x.tMm)).toEqual([r, -r].map((v) => expect.closeTo(v, 9)));
  });

  it('flags a touch: a line along the outer equator touches once; a line on the top plane touches twice', () => {
    const outer = lineRoots(elbow, { origin: [R + r, -400, 0], direction: [0, 1, 0] });
    expect(outer).toHaveLength(1);
    expect(outer[0]!.tangent).toBe(true);
    expect(outer[0]!.tMm).toBeCloseTo(400, 3);
    const top = lineRoots(elbow, { origin: [-1000, 0, r], direction: [1, 0, 0] });
    expect(top.map((x) => x.tangent)).toEqual([true, true]);
    expect(top.map((x) => x.tMm - 1000)).toEqual([-R, R].map((v) => expect.closeTo(v, 3)));
    expect(lineRoots(elbow, { origin: [-1000, 0, r + 1e-3], direction: [1, 0, 0] })).toHaveLength(0);
  });

  it('every root of random lines lies on the surface, and crossings alternate in and out (fast-check)', () => {
    const coord = fc.double({ min: -600, max: 600, noNaN: true });
    fc.assert(
      fc.property(coord, coord, coord, coord, coord, coord, (x, y, z, u, v, w) => {
        const n = Math.hypot(u, v, w);
        if (n < 1e-3) return;
        const d = [u / n, v / n, w / n] as const;
        const roots = torusOps.intersectLine(elbow, { origin: [x, y, z], direction: d }, eps);
        expect(roots.length).toBeLessThanOrEqual(4);
        for (const root of roots) {
          const p = [x + root.tMm * d[0], y + root.tMm * d[1], z + root.tMm * d[2]];
          expect(Math.abs(distance(p))).toBeLessThan(1e-9 * 2 * r * 10);
        }
        for (let i = 1; i < roots.length; i++) expect(roots[i]!.tMm).toBeGreaterThanOrEqual(roots[i - 1]!.tMm);
      }),
      { numRuns: 2000 },
    );
  });

  it('normal points away from the centreline; offset moves the tube radius; frame round-trips', () => {
    const p = torusPoint(elbow, 0.7, 2.1);
    const l = torusLocal(elbow, p);
    expect(l.bendRad).toBeCloseTo(0.7, 12);
    expect(l.aroundRad).toBeCloseTo(2.1, 12);
    expect(l.fromCentrelineMm).toBeCloseTo(r, 9);
    const n = surfaceNormal(elbow, p);
    const q = p.map((c, i) => c + 5 * n[i]!);
    expect(distance(q)).toBeCloseTo(5, 9);
    expect(offsetSurface(elbow, -3).tubeRadiusMm).toBeCloseTo(r - 3, 12);
    expect(() => offsetSurface(elbow, -r)).toThrow(expect.objectContaining({ code: 'OUT_OF_RANGE', field: 'gap' }));
  });

  it('tape position: along the extrados is (R + r) × bend angle, around is r × angle from the extrados', () => {
    const t = torusTapePosition(elbow, torusPoint(elbow, Math.PI / 4, 0));
    expect(t.alongMm).toBeCloseTo(((R + r) * Math.PI) / 4, 9);
    expect(t.aroundMm).toBeCloseTo(0, 9);
    const side = torusTapePosition(elbow, torusPoint(elbow, Math.PI / 3, Math.PI / 2));
    expect(side.aroundMm).toBeCloseTo((r * Math.PI) / 2, 9);
    expect(side.alongMm).toBeCloseTo((R * Math.PI) / 3, 9);
  });
});
