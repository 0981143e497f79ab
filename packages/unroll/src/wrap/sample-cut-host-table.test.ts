import { describe, expect, it } from 'vitest';
import { findGrazingPhis, type GeneratorBundle } from '@girth/geometry';
import { SURFACES_WITH_TEST_SPHERE, type TestSphere } from '@girth/geometry/test-support';
import { distanceToSegment } from '../internal/test-support/segment-distance.js';
import { sampleCut } from './sample-cut.js';

describe('sampleCut against a host kind that only the tests know (the public surface table)', () => {
  // A pipe of radius r coming down −z with its axis at (e, 0), onto a sphere of radius R about the origin:
  // each generator (x, y) meets it at z = sqrt(R² − x² − y²) (Pythagoras). Side flush (e + r = R): a kink at phi = 0.
  const R = 150;
  const r = 60;
  const e = R - r;
  const bundle: GeneratorBundle = { radius: r, axisPoint: [e, 0, 500], axisDirection: [0, 0, -1], heelDirection: [1, 0, 0], sideDirection: [0, 1, 0] };
  const sphere: TestSphere = { kind: 'test-sphere', centre: [0, 0, 0], radiusMm: R };
  const zAt = (phi: number): number => {
    const x = e + r * Math.cos(phi);
    const y = r * Math.sin(phi);
    return Math.sqrt(Math.max(0, R * R - x * x - y * y));
  };

  it('samples the true curve within the chord tolerance, with the kink found from the operations on a sample point', () => {
    const kinks = findGrazingPhis(bundle, sphere, { surfaces: SURFACES_WITH_TEST_SPHERE });
    expect(kinks).toEqual([0]);
    const tol = 0.05;
    const cut = sampleCut(bundle, sphere, { stations: 12, wrapOdMm: 2 * r, chordToleranceMm: tol, kinkPhisRad: kinks, surfaces: SURFACES_WITH_TEST_SPHERE });
    // Every sample on the sphere's curve (1e-9 mm: rounding).
    for (const s of cut.samples) expect(Math.abs(s.point[2] - zAt(s.phiRad))).toBeLessThan(1e-9);
    expect(cut.samples[0]!.grazing).toBe(true);
    // Chords on the wrap [r phi, axial] stay within the tolerance of the true curve (checked at 32 points a chord).
    const flat = (phi: number): readonly [number, number] => [r * phi, 500 - zAt(phi)];
    let worst = 0;
    for (let i = 0; i + 1 < cut.samples.length; i++) {
      const a = cut.samples[i]!.phiRad;
      const b = cut.samples[i + 1]!.phiRad;
      for (let k = 1; k < 32; k++) worst = Math.max(worst, distanceToSegment(flat(a + ((b - a) * k) / 32), flat(a), flat(b)));
    }
    expect(worst).toBeLessThanOrEqual(tol);
  });

  it('without the extended table the host is refused by name (BAD_OPTION on host)', () => {
    expect(() => sampleCut(bundle, sphere as never, { stations: 12, wrapOdMm: 2 * r })).toThrow(/test-sphere/);
  });
});
