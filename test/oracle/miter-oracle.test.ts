import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectClose } from '../support/expect-close.js';
import {
  exactMiterPiece,
  exactPieceLengths,
  miterCutAngleRad,
  miterFitRadiusMm,
  miterPiece,
  miterWeldPlane,
  type OracleMiterSpec,
} from './miter-oracle.js';
import { dot, sub } from './vec3.js';

const IN = 25.4;
// ASME B36.10M, recalled (REFERENCES.md): NPS 12 OD 12.750 in, STD wall .375 in.
const NPS12_STD = { odMm: 12.75 * IN, wallMm: 0.375 * IN };

describe('miter oracle against the published segment lengths (REFERENCES.md, miter)', () => {
  it('NPS 12 STD, 90° in 3 welds, R = 1.5 x NPS (ASME B16.9 long radius, recalled): centre 2 R tan 15°, back 2 (R + D/2) tan 15°, throat 2 (R - D/2) tan 15°; ends half plus tangent', () => {
    const spec: OracleMiterSpec = { pipe: NPS12_STD, bendDeg: 90, welds: 3, radiusMm: 18 * IN, tangentMm: 50 };
    const R = spec.radiusMm;
    const d2 = NPS12_STD.odMm / 2;
    const t = Math.tan(Math.PI / 12);
    // 1e-11 OD: the lengths are about 1.5 OD, both sides good to a few ulp of them.
    const tol = 1e-12 * NPS12_STD.odMm * 10;
    for (const k of [1, 2]) {
      const l = exactPieceLengths(spec, k);
      expectClose([l.center, l.back, l.throat], [2 * R * t, 2 * (R + d2) * t, 2 * (R - d2) * t], tol, `middle piece ${k}`);
    }
    for (const k of [0, 3]) {
      const l = exactPieceLengths(spec, k);
      expectClose([l.center, l.back, l.throat], [R * t + 50, (R + d2) * t + 50, (R - d2) * t + 50], tol, `end piece ${k}`);
    }
  });

  it('over a sweep: every piece, both fit surfaces; ordinates (D/2) tan c (1 - cos psi) at each end', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 21.3, max: 1219.2, noNaN: true }),
        fc.double({ min: 1, max: 180, noNaN: true }),
        fc.integer({ min: 2, max: 6 }),
        fc.double({ min: 0.6, max: 4, noNaN: true }),
        fc.constantFrom('od' as const, 'id' as const),
        (odMm, bendDeg, welds, radiusOds, fitSurface) => {
          const spec: OracleMiterSpec = { pipe: { odMm, wallMm: 0.08 * odMm }, bendDeg, welds, radiusMm: radiusOds * odMm, tangentMm: 0.3 * odMm, fitSurface };
          const c = miterCutAngleRad(spec);
          const r = miterFitRadiusMm(spec);
          const R = spec.radiusMm;
          // 1e-10 OD: with 2 or more welds c <= 45°, lengths stay below 2 (4 + 0.5) OD tan 45° + 0.3 OD ≈ 9.3 OD and
          // each plane meets its generators at 45° or more: both sides are good to ~10 ulp of 10 OD.
          const tol = 1e-12 * odMm * 100;
          for (let k = 0; k <= welds; k++) {
            const l = exactPieceLengths(spec, k);
            const f = k === 0 || k === welds ? 1 : 2;
            const extra = f === 1 ? 0.3 * odMm : 0;
            expectClose([l.center, l.back, l.throat], [f * R * Math.tan(c) + extra, f * (R + r) * Math.tan(c) + extra, f * (R - r) * Math.tan(c) + extra], tol, `piece ${k}`);
            const p = exactMiterPiece(spec, k, 8);
            const ord = p.stations.map((s) => r * Math.tan(c) * (1 + Math.cos(s.phiRad)));
            expectClose(p.stations.map((s) => s.cutbackMm), ord, tol, `piece ${k} cutback`);
            if (f === 2) expectClose(p.stations.map((s) => s.cutbackFarMm ?? Number.NaN), ord, tol, `piece ${k} far cutback`);
          }
        },
      ),
      { numRuns: 60 },
    );
  });

  it('assembles the elbow: each weld plane holds the bend axis and mirrors piece j-1 into piece j', () => {
    const spec: OracleMiterSpec = { pipe: NPS12_STD, bendDeg: 75, welds: 4, radiusMm: 500 };
    for (let j = 1; j <= 4; j++) {
      const w = miterWeldPlane(spec, j);
      expect(dot(w.normal, [0, 0, 1])).toBe(0);
      const a = miterPiece(spec, j - 1);
      const b = miterPiece(spec, j);
      // Mirror of a's direction in the weld plane, and a's tangent point mirrored, give b's (same R on both sides).
      const m = (v: readonly [number, number, number]): [number, number, number] => {
        const k = 2 * dot(v, w.normal);
        return [v[0] - k * w.normal[0], v[1] - k * w.normal[1], v[2] - k * w.normal[2]];
      };
      expectClose([...m(a.direction)].map((x) => -x), [...b.direction], 1e-15, `direction across weld ${j}`);
      expectClose([...sub(m(a.tangentPointMm), b.tangentPointMm)], [0, 0, 0], 1e-12, `tangent points across weld ${j}`);
    }
  });
});
