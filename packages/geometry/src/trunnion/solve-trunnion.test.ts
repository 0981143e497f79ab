import { describe, expect, it } from 'vitest';
import { girthErrorOf } from '@girth/pipes/test-support';
import { hitGenerator } from '../generators.js';
import { torusLocal } from '../surfaces/torus.js';
import { resolveElbowSpec } from './elbow-spec.js';
import { solveTrunnion } from './solve-trunnion.js';
import type { TrunnionSpec } from './types.js';

const IN = 25.4;
// NPS 12 STD 12.75 x 0.375 in, NPS 8 STD 8.625 x 0.322 in (ASME B36.10M, recalled).
const nps12 = { odMm: 12.75 * IN, wallMm: 0.375 * IN, npsIn: 12, label: 'NPS 12 STD' };
const nps8 = { odMm: 8.625 * IN, wallMm: 0.322 * IN, npsIn: 8, label: 'NPS 8 STD' };
const spec: TrunnionSpec = { elbow: { pipe: nps12 }, branch: nps8, alongDeg: 45 };

describe('elbow radii (ASME B16.9, recalled)', () => {
  it('long radius 1.5 x NPS, short radius 1.0 x NPS, NPS 1/2 long radius 1-1/2 in', () => {
    expect(resolveElbowSpec({ pipe: nps12 }).bendRadiusMm).toBeCloseTo(18 * IN, 12);
    expect(resolveElbowSpec({ pipe: nps12, radius: 'short' }).bendRadiusMm).toBeCloseTo(12 * IN, 12);
    expect(resolveElbowSpec({ pipe: nps8 }).bendRadiusMm).toBeCloseTo(12 * IN, 12);
    expect(resolveElbowSpec({ pipe: { odMm: 0.84 * IN, wallMm: 0.109 * IN, npsIn: 0.5 } }).bendRadiusMm).toBeCloseTo(1.5 * IN, 12);
    expect(resolveElbowSpec({ pipe: { odMm: 1.05 * IN, wallMm: 0.113 * IN, npsIn: 0.75 } }).bendRadiusMm).toBeCloseTo(1.125 * IN, 12);
    expect(resolveElbowSpec({ pipe: nps12, radius: 600, bendDeg: 45 }).label).toContain('45°');
  });

  it('refuses a named radius without NPS, a short radius below NPS 1, a radius within the pipe', () => {
    expect(girthErrorOf(() => resolveElbowSpec({ pipe: { odMm: 300, wallMm: 10 } }))).toMatchObject({ code: 'MISSING_INPUT', field: 'elbow.radius' });
    expect(girthErrorOf(() => resolveElbowSpec({ pipe: { odMm: 0.84 * IN, wallMm: 0.109 * IN, npsIn: 0.5 }, radius: 'short' }))).toMatchObject({ code: 'OUT_OF_RANGE', field: 'elbow.radius' });
    expect(girthErrorOf(() => resolveElbowSpec({ pipe: nps12, radius: 150 }))).toMatchObject({ code: 'OUT_OF_RANGE', field: 'elbow.radius' });
    expect(girthErrorOf(() => resolveElbowSpec({ pipe: nps12, bendDeg: 200 }))).toMatchObject({ code: 'OUT_OF_RANGE', field: 'elbow.bendDeg' });
  });
});

describe('solveTrunnion', () => {
  it('places the axis on the extrados at 45° along the bend, along the normal; every generator meets the elbow within the bend', () => {
    const g = solveTrunnion(spec);
    const R = 18 * IN;
    const ro = nps12.odMm / 2;
    const c = Math.SQRT1_2;
    expect(g.axisPointMm.map((v) => Number(v.toFixed(9)))).toEqual([(R + ro) * c, (R + ro) * c, 0].map((v) => Number(v.toFixed(9))));
    expect(g.branchAxisDirection[0]).toBeCloseTo(c, 12);
    expect(g.tiltFromNormalDeg).toBeCloseTo(0, 9);
    expect(g.cutRadiusMm).toBeCloseTo((nps8.odMm - 2 * nps8.wallMm) / 2, 12);
    for (let i = 0; i < 32; i++) {
      const hit = hitGenerator(g.cutBundle, g.cutHost, (2 * Math.PI * i) / 32)!;
      const l = torusLocal(g.cutHost, hit.point);
      expect(l.fromCentrelineMm).toBeCloseTo(ro, 9);
      expect(l.bendRad).toBeGreaterThan(0);
      expect(l.bendRad).toBeLessThan(Math.PI / 2);
    }
  });

  it('a trunnion parallel to the outlet end runs along the outlet axis; set-in meets the inside', () => {
    const g = solveTrunnion({ ...spec, direction: 'outlet', alongDeg: 60, fit: 'set-in', branch: { odMm: 4.5 * IN, wallMm: 0.237 * IN } });
    expect(g.branchAxisDirection).toEqual([1, -0, 0].map((v) => expect.closeTo(v, 12)));
    expect(g.tiltFromNormalDeg).toBeCloseTo(60, 9);
    expect(g.cutHost.tubeRadiusMm).toBeCloseTo((nps12.odMm - 2 * nps12.wallMm) / 2, 12);
  });

  it('refuses a trunnion larger than the elbow, one running off the bend, bad words', () => {
    expect(girthErrorOf(() => solveTrunnion({ ...spec, branch: { odMm: 14 * IN, wallMm: 0.375 * IN } }))).toMatchObject({ code: 'BRANCH_TOO_LARGE', field: 'branch' });
    expect(girthErrorOf(() => solveTrunnion({ ...spec, alongDeg: 5 }))).toMatchObject({ code: 'TRUNNION_OFF_ELBOW', field: 'alongDeg' });
    expect(girthErrorOf(() => solveTrunnion({ ...spec, alongDeg: 95 }))).toMatchObject({ code: 'OUT_OF_RANGE', field: 'alongDeg' });
    expect(girthErrorOf(() => solveTrunnion({ ...spec, direction: 'up' as never }))).toMatchObject({ code: 'BAD_CHOICE', field: 'direction' });
    expect(girthErrorOf(() => solveTrunnion({ ...spec, gapMm: -1 }))).toMatchObject({ field: 'gapMm' });
  });
});
