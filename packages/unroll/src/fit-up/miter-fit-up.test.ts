import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { expectClose } from '../internal/test-support/expect-close.js';
import { miterFitUp } from './miter-fit-up.js';
import { miterArb } from './test-support/joints.js';
import { codeOf } from './test-support/code-of.js';

const DEG = Math.PI / 180;

describe('miterFitUp', () => {
  it('puts the weld lines at the piece lengths of the bend, and the pieces between them sum to the stock length', () => {
    // REFERENCES.md (miter): a piece is 2 R tan(c) along the centreline, end pieces half (plus their tangent T),
    // c = bend / (2 × welds) (ASME B31.3 para. 304.2.3).
    fc.assert(
      fc.property(miterArb, (spec) => {
        const fit = miterFitUp(spec);
        const W = spec.welds!;
        const c = (spec.bendDeg / (2 * W)) * DEG;
        const R = spec.radiusMm!;
        const T = spec.tangentMm!;
        const expected = Array.from({ length: W }, (_, i) => T + R * Math.tan(c) + 2 * i * R * Math.tan(c));
        const tol = 1e-9 * (R + T);
        expectClose(fit.weldLines.map((w) => w.fromStartMm), expected, tol, 'weld lines from the start, mm');
        expectClose(fit.stockLengthMm, 2 * T + 2 * W * R * Math.tan(c), tol, 'stock length, mm');
        const stops = [0, ...fit.weldLines.map((w) => w.fromStartMm), fit.stockLengthMm];
        const pieces = stops.slice(1).map((v, i) => v - stops[i]!);
        expectClose(pieces.reduce((a, b) => a + b, 0), fit.stockLengthMm, tol, 'pieces sum to the stock, mm');
        for (const w of fit.weldLines) expectClose(w.fromStartMm + w.fromEndMm, fit.stockLengthMm, tol, 'from start + from end = stock, mm');
        expect(fit.weldLines.map((w) => w.weld)).toEqual(Array.from({ length: W }, (_, i) => i + 1));
      }),
      { numRuns: 100 },
    );
  });

  it('gives the elbow a centre to face of R tan(B/2) plus the tangent, and checks each joint at bend / welds', () => {
    // Bend geometry (common practice): the end tangents of a bend of radius R through B meet R tan(B/2) from each tangent point.
    fc.assert(
      fc.property(miterArb, (spec) => {
        const fit = miterFitUp(spec, { runMm: 300, chordRadiusMm: 300 });
        const B = spec.bendDeg;
        const R = spec.radiusMm!;
        expectClose(fit.centreToFaceMm!, R * Math.tan((B / 2) * DEG) + spec.tangentMm!, 1e-9 * (R * (1 + Math.tan((B / 2) * DEG)) + spec.tangentMm!), 'centre to face, mm');
        expect(fit.endAxesApartMm).toBeUndefined();
        const D = B / spec.welds!;
        expect(fit.joints).toHaveLength(spec.welds!);
        for (const j of fit.joints) {
          expectClose(j.deflectionDeg, D, 1e-12, 'change of direction at a joint, degrees');
          expectClose(j.angleCheck.chordMm, 2 * 300 * Math.sin((D / 2) * DEG), 1e-9, 'chord at 300 mm, mm');
        }
      }),
      { numRuns: 100 },
    );
  });

  it('gives a 90° long-radius elbow (1.5 × NPS) a centre to face equal to its radius; a 180° return bend has its ends 2R apart', () => {
    // ASME B16.9 (REFERENCES.md): long-radius elbow centre to end 1.5 × NPS; tan 45° = 1. NPS 12 STD, ASME B36.10M (recalled).
    const pipe = { odMm: 323.85, wallMm: 9.525, npsIn: 12 };
    expectClose(miterFitUp({ pipe, bendDeg: 90, welds: 3, radiusNps: 1.5 }).centreToFaceMm!, 1.5 * 12 * 25.4, 1e-9, 'centre to face, mm');
    const u = miterFitUp({ pipe, bendDeg: 180, welds: 4, radiusMm: 600 });
    expect(u.centreToFaceMm).toBeUndefined();
    expectClose(u.endAxesApartMm!, 1200, 1e-9, 'return bend: ends 2R apart, mm');
    expect(u.joints[0]!.angleCheck.riseMm).toBeCloseTo(304.8 * Math.tan(45 * DEG), 9);
  });

  it('rejects bad check lengths naming the option, and passes on the elbow errors', () => {
    const ok = { pipe: { odMm: 323.85, wallMm: 9.525 }, bendDeg: 90, welds: 3, radiusMm: 457.2 };
    expect(codeOf(() => miterFitUp(ok, { runMm: -1 }))).toBe('NEGATIVE:runMm');
    expect(codeOf(() => miterFitUp(ok, { chordRadiusMm: 0 }))).toBe('NEGATIVE:chordRadiusMm');
    expect(codeOf(() => miterFitUp({ ...ok, bendDeg: 0 }))).toBe('OUT_OF_RANGE:bendDeg');
    expect(codeOf(() => miterFitUp(ok))).toBeUndefined();
  });
});
