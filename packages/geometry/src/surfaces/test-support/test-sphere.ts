/**
 * A host kind that exists only in the tests: a sphere, added through the
 * public surface table to show that a new host needs nothing outside its own
 * file and the table. Its line intersection is the textbook one
 * (|o + t d − c|² = R²); it does not develop and has no closed-form grazes,
 * so grazes are found by the numeric search.
 */
import { GirthError } from '@girth/pipes';
import { SURFACES, type HostSurface } from '../table.js';
import type { LineRoot, SurfaceOps, SurfaceTable } from '../types.js';
import type { Vec3 } from '../../vec3.js';

/** A sphere of radius `radiusMm` about `centre`; outside is away from the centre. */
export interface TestSphere {
  readonly kind: 'test-sphere';
  readonly centre: Vec3;
  readonly radiusMm: number;
}

const dot = (a: Vec3, b: Vec3): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];

/** The sphere's operations, written from the textbook formulas only. */
export const testSphereOps: SurfaceOps<TestSphere> = {
  intersectLine(sphere, line, eps): readonly LineRoot[] {
    const w: Vec3 = [line.origin[0] - sphere.centre[0], line.origin[1] - sphere.centre[1], line.origin[2] - sphere.centre[2]];
    const b = dot(w, line.direction);
    const c = dot(w, w) - sphere.radiusMm ** 2;
    const disc = b * b - c;
    const scale = sphere.radiusMm ** 2;
    if (disc < -eps * scale) return [];
    if (disc <= eps * scale) return [{ tMm: -b, tangent: true }];
    const s = Math.sqrt(disc);
    return [{ tMm: -b - s, tangent: false }, { tMm: -b + s, tangent: false }];
  },
  offset(sphere, distanceMm) {
    const radiusMm = sphere.radiusMm + distanceMm;
    if (!(radiusMm > 0)) throw new GirthError('OUT_OF_RANGE', 'gap', 'gap: no sphere left', distanceMm);
    return { ...sphere, radiusMm };
  },
  normal(sphere, p) {
    const v: Vec3 = [p[0] - sphere.centre[0], p[1] - sphere.centre[1], p[2] - sphere.centre[2]];
    const n = Math.hypot(v[0], v[1], v[2]);
    return [v[0] / n, v[1] / n, v[2] / n];
  },
};

/** Girth's table with the test sphere added: the only place the new kind is registered. */
export const SURFACES_WITH_TEST_SPHERE: SurfaceTable<HostSurface | TestSphere> = { ...SURFACES, 'test-sphere': testSphereOps };
