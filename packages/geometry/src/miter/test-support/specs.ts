/**
 * Miter specs for tests: pipes from ASME B36.10M (recalled, REFERENCES.md) and
 * a fast-check generator of valid specs.
 */
import fc from 'fast-check';
import type { MiterSpec } from '../types.js';

const IN = 25.4;
/** NPS 12 STD, ASME B36.10M (recalled): OD 12.750 in, wall 0.375 in. */
export const NPS12_STD = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD', npsIn: 12 } as const;
/** NPS 24 XS, ASME B36.10M (recalled): OD 24.000 in, wall 0.500 in. */
export const NPS24_XS = { odMm: 24 * IN, wallMm: 0.5 * IN, label: 'NPS 24 XS', npsIn: 24 } as const;
/** NPS 4 Sch 80, ASME B36.10M (recalled): OD 4.500 in, wall 0.337 in. */
export const NPS4_S80 = { odMm: 4.5 * IN, wallMm: 0.337 * IN, label: 'NPS 4 Sch 80', npsIn: 4 } as const;

/** Valid miter specs of all shapes: any bend, 1..12 welds (cut < 90°), radius from half the OD up. */
export const arbMiterSpec: fc.Arbitrary<MiterSpec> = fc
  .record({
    odMm: fc.double({ min: 20, max: 1500, noNaN: true }),
    wallFrac: fc.double({ min: 0.01, max: 0.2, noNaN: true }),
    bendDeg: fc.double({ min: 1, max: 180, noNaN: true }),
    welds: fc.integer({ min: 1, max: 12 }),
    radiusOverHalfOd: fc.double({ min: 1, max: 6, noNaN: true }),
    tangentMm: fc.constantFrom(0, 50, 152.4),
    fitSurface: fc.constantFrom('od' as const, 'id' as const),
  })
  .filter((r) => r.bendDeg / (2 * r.welds) < 80)
  .map((r) => ({
    pipe: { odMm: r.odMm, wallMm: r.wallFrac * r.odMm },
    bendDeg: r.bendDeg,
    welds: r.welds,
    radiusMm: (r.radiusOverHalfOd * r.odMm) / 2,
    tangentMm: r.tangentMm,
    fitSurface: r.fitSurface,
  }));
