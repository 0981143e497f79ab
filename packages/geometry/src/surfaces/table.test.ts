import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { expectGirthError } from '@girth/pipes/test-support';
import { hitGenerator } from '../generators.js';
import { findGrazingPhis } from './grazing.js';
import { developPoint, intersectLine, lineRoots, offsetSurface, surfaceNormal } from './line-intersection.js';
import { SURFACES, surfaceOpsFor, type HostSurface } from './table.js';
import { SURFACES_WITH_TEST_SPHERE, type TestSphere } from './test-support/test-sphere.js';
import type { GeneratorBundle } from '../types.js';

/** A pipe of radius r along −z toward the host, its axis at (e, 0), heel toward +x, side +y. */
const pipeDown = (r: number, e: number): GeneratorBundle => ({
  radius: r,
  axisPoint: [e, 0, 1000],
  axisDirection: [0, 0, -1],
  heelDirection: [1, 0, 0],
  sideDirection: [0, 1, 0],
});

const sphere = (R: number): TestSphere => ({ kind: 'test-sphere', centre: [0, 0, 0], radiusMm: R });

describe('a host kind added only in the tests, through the public table', () => {
  it('hitGenerator cuts a pipe to a sphere where z = sqrt(R² − ρ²) (Pythagoras: textbook sphere)', () => {
    const R = 200;
    const r = 50;
    const e = 60;
    const b = pipeDown(r, e);
    for (let i = 0; i < 24; i++) {
      const phi = (2 * Math.PI * i) / 24;
      const x = e + r * Math.cos(phi);
      const y = r * Math.sin(phi);
      const hit = hitGenerator(b, sphere(R), phi, { surfaces: SURFACES_WITH_TEST_SPHERE });
      expect(hit).toBeDefined();
      // Tolerance 1e-9 mm: double rounding on metre-scale numbers.
      expect(Math.abs(hit!.point[2] - Math.sqrt(R * R - x * x - y * y))).toBeLessThan(1e-9);
      expect(Math.abs(hit!.axialMm - (1000 - hit!.point[2]))).toBeLessThan(1e-9);
      expect(hit!.grazing).toBe(false);
    }
  });

  it('finds the kink of a pipe whose side is flush with the sphere (e + r = R) by the numeric search, at phi = 0 (invariant: the only generator at distance R from the centre)', () => {
    const R = 200;
    const b = pipeDown(80, 120);
    const kinks = findGrazingPhis(b, sphere(R), { surfaces: SURFACES_WITH_TEST_SPHERE });
    expect(kinks).toEqual([0]);
    expect(hitGenerator(b, sphere(R), 0, { surfaces: SURFACES_WITH_TEST_SPHERE })?.grazing).toBe(true);
    // Not flush: no kink.
    expect(findGrazingPhis(pipeDown(80, 110), sphere(R), { surfaces: SURFACES_WITH_TEST_SPHERE })).toEqual([]);
  });

  it('finds both kinks of a flush pipe off the centre line anywhere around (property: grazes where |(e cos β + r cos φ, e sin β + r sin φ)| = R)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 0.9, noNaN: true }), fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }), (k, beta) => {
        const R = 100;
        const r = k * R;
        const e = R - r;
        // Axis moved to (e cos β, e sin β): the graze is at the generator pointing along β.
        const b: GeneratorBundle = { ...pipeDown(r, 0), axisPoint: [e * Math.cos(beta), e * Math.sin(beta), 1000] };
        const kinks = findGrazingPhis(b, sphere(R), { surfaces: SURFACES_WITH_TEST_SPHERE });
        expect(kinks.length).toBe(1);
        const d = Math.abs(kinks[0]! - beta);
        // A graze is ill-conditioned: rounding of ~1e-10 in the discriminant (terms of 1e6 mm²) fixes
        // its angle only to about sqrt(1e-10 / (e r)) ≈ 1e-6 rad here; allow 1e-6 rad.
        expect(Math.min(d, 2 * Math.PI - d)).toBeLessThan(1e-6);
      }),
      { numRuns: 40 },
    );
  });

  it('offsets and normals go through the same table', () => {
    const s = offsetSurface<TestSphere>(sphere(100), 3, { surfaces: SURFACES_WITH_TEST_SPHERE });
    expect(s.radiusMm).toBe(103);
    expect(surfaceNormal(sphere(100), [0, 100, 0], { surfaces: SURFACES_WITH_TEST_SPHERE })).toEqual([0, 1, 0]);
    expect(intersectLine(sphere(10), { origin: [0, 10, 50], direction: [0, 0, -1] }, { surfaces: SURFACES_WITH_TEST_SPHERE })).toEqual([50, 50]);
  });

  it('a kind missing from the table, or one that does not roll out flat, is a BAD_OPTION on host', () => {
    expectGirthError(() => hitGenerator(pipeDown(1, 0), sphere(10) as unknown as HostSurface, 0), 'BAD_OPTION', 'host');
    expectGirthError(() => surfaceOpsFor({ kind: 'toString' }), 'BAD_OPTION', 'host');
    expectGirthError(() => developPoint(sphere(10), [0, 0, 10], { surfaces: SURFACES_WITH_TEST_SPHERE }), 'BAD_OPTION', 'host');
    expectGirthError(() => developPoint({ kind: 'plane', point: [0, 0, 0], normal: [0, 0, 1] }, [0, 0, 0]), 'BAD_OPTION', 'host');
  });

  it('SURFACES has one entry for each host kind, and the entry is what surfaceOpsFor returns', () => {
    expect(Object.keys(SURFACES).sort()).toEqual(['cone', 'cylinder', 'ellipsoidal-head', 'hemispherical-head', 'plane', 'torispherical-head', 'torus']);
    const header: HostSurface = { kind: 'cylinder', radius: 1, axisPoint: [0, 0, 0], axisDirection: [1, 0, 0] };
    expect(surfaceOpsFor(header)).toBe(SURFACES.cylinder);
    expect(lineRoots(header, { origin: [0, 1, 5], direction: [0, 0, -1] })).toEqual([{ tMm: 5, tangent: true }]);
  });
});
