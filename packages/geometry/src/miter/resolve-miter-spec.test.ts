import { describe, expect, it } from 'vitest';
import { expectGirthError } from '@girth/pipes/test-support';
import { resolveMiterSpec } from './resolve-miter-spec.js';
import { miterWarnings } from './miter-warnings.js';
import type { MiterSpec } from './types.js';
import { expectClose } from '../plane-cut/test-support/expect-close.js';

// NPS 12 STD, ASME B36.10M (recalled, REFERENCES.md): OD 12.750 in, wall 0.375 in.
const NPS12_STD = { odMm: 12.75 * 25.4, wallMm: 0.375 * 25.4, label: 'NPS 12 STD', npsIn: 12 };
const BASE: MiterSpec = { pipe: NPS12_STD, bendDeg: 90, welds: 3, radiusMm: 457.2 };

describe('resolveMiterSpec', () => {
  it('resolves pieces to welds + 1 and the cut angle (ASME B31.3 para. 304.2.3 via REFERENCES.md)', () => {
    const fromPieces = resolveMiterSpec({ pipe: NPS12_STD, bendDeg: 90, pieces: 4, radiusMm: 457.2 });
    expect(fromPieces.welds).toBe(3);
    expect(fromPieces.pieceCount).toBe(4);
    expect(fromPieces.cutAngleDeg).toBe(15);
    expect(fromPieces.fitSurface).toBe('od');
    expect(fromPieces.fitRadiusMm).toBe(NPS12_STD.odMm / 2);
  });

  it('reads radiusNps as a multiple of the nominal size: 1.5 × NPS 12 = 18 in (ASME B16.9 long radius, REFERENCES.md)', () => {
    const r = resolveMiterSpec({ pipe: NPS12_STD, bendDeg: 90, welds: 3, radiusNps: 1.5 });
    expectClose(r.radiusMm, 18 * 25.4, 1e-9, 'radius of 1.5 × NPS 12');
  });

  it('rejects bad input with the field and a stable code', () => {
    expectGirthError(() => resolveMiterSpec({ ...BASE, welds: 0 }), 'OUT_OF_RANGE', 'welds');
    expectGirthError(() => resolveMiterSpec({ ...BASE, welds: undefined, pieces: 0 }), 'OUT_OF_RANGE', 'pieces');
    expectGirthError(() => resolveMiterSpec({ ...BASE, welds: undefined, pieces: 1 }), 'OUT_OF_RANGE', 'pieces');
    expectGirthError(() => resolveMiterSpec({ ...BASE, welds: 2.5 }), 'OUT_OF_RANGE', 'welds');
    expectGirthError(() => resolveMiterSpec({ ...BASE, welds: 3, pieces: 4 }), 'BAD_OPTION', 'pieces');
    expectGirthError(() => resolveMiterSpec({ ...BASE, welds: undefined }), 'MISSING_INPUT', 'welds');
    expectGirthError(() => resolveMiterSpec({ ...BASE, bendDeg: 0 }), 'OUT_OF_RANGE', 'bendDeg');
    expectGirthError(() => resolveMiterSpec({ ...BASE, bendDeg: 180.5 }), 'OUT_OF_RANGE', 'bendDeg');
    expectGirthError(() => resolveMiterSpec({ ...BASE, bendDeg: Number.NaN }), 'NOT_A_NUMBER', 'bendDeg');
    expectGirthError(() => resolveMiterSpec({ ...BASE, bendDeg: Number.NEGATIVE_INFINITY }), 'NOT_FINITE', 'bendDeg');
    expectGirthError(() => resolveMiterSpec({ ...BASE, bendDeg: 180, welds: 1 }), 'OUT_OF_RANGE', 'welds');
    expectGirthError(() => resolveMiterSpec({ ...BASE, welds: undefined, bendDeg: 180, pieces: 2 }), 'OUT_OF_RANGE', 'pieces');
    expectGirthError(() => resolveMiterSpec({ ...BASE, radiusMm: NPS12_STD.odMm / 2 - 0.01 }), 'OUT_OF_RANGE', 'radiusMm');
    expectGirthError(() => resolveMiterSpec({ ...BASE, radiusMm: Number.POSITIVE_INFINITY }), 'NOT_FINITE', 'radiusMm');
    expectGirthError(() => resolveMiterSpec({ ...BASE, radiusMm: undefined }), 'MISSING_INPUT', 'radiusMm');
    expectGirthError(() => resolveMiterSpec({ ...BASE, radiusNps: 1.5 }), 'BAD_OPTION', 'radiusNps');
    expectGirthError(() => resolveMiterSpec({ ...BASE, radiusMm: undefined, radiusNps: 1.5, pipe: { odMm: 323.85, wallMm: 9.525 } }), 'BAD_OPTION', 'radiusNps');
    expectGirthError(() => resolveMiterSpec({ ...BASE, radiusMm: undefined, radiusNps: 0.5 }), 'OUT_OF_RANGE', 'radiusNps');
    expectGirthError(() => resolveMiterSpec({ ...BASE, radiusMm: undefined, radiusNps: Number.NaN }), 'NOT_A_NUMBER', 'radiusNps');
    expectGirthError(() => resolveMiterSpec({ ...BASE, tangentMm: -1 }), 'NEGATIVE', 'tangentMm');
    expectGirthError(() => resolveMiterSpec({ ...BASE, fitSurface: 'mid' as never }), 'BAD_CHOICE', 'fitSurface');
    expectGirthError(() => resolveMiterSpec({ ...BASE, pipe: { odMm: 0, wallMm: 1 } }), 'NEGATIVE', 'pipe.odMm');
    expectGirthError(() => resolveMiterSpec(undefined as never), 'EMPTY_INPUT', 'miter');
  });

  it('accepts a radius of exactly half the OD (throat length zero)', () => {
    expect(resolveMiterSpec({ ...BASE, radiusMm: NPS12_STD.odMm / 2 }).radiusMm).toBe(NPS12_STD.odMm / 2);
  });
});

describe('miterWarnings (ASME B31.3 para. 304.2.3)', () => {
  const codes = (spec: MiterSpec) => miterWarnings(resolveMiterSpec(spec)).map((w) => w.code);

  it('allows a 22.5° cut for multiple miters and warns above it (REFERENCES.md)', () => {
    expect(codes({ ...BASE, bendDeg: 90, welds: 2, radiusMm: 1000 })).toEqual([]);
    expect(codes({ ...BASE, bendDeg: 120, welds: 2, radiusMm: 1000 })).toEqual(['MITER_CUT_ANGLE_OVER_LIMIT']);
  });

  it('warns for a radius below eq. (5) (recalled): 1 × NPS 12 passes at 15° and fails at 7.5°', () => {
    // R = 304.8 mm; R1 = 255.23 mm at 15° (3 welds for 90°), 351.82 mm at 7.5° (6 welds), see code-min-radius.test.ts.
    expect(codes({ ...BASE, welds: 3, radiusMm: 304.8 })).toEqual([]);
    expect(codes({ ...BASE, welds: 6, radiusMm: 304.8 })).toEqual(['MITER_RADIUS_BELOW_MIN']);
  });

  it('checks only multiple miters (R1 needs two or more joints)', () => {
    expect(codes({ ...BASE, bendDeg: 90, welds: 1, radiusMm: NPS12_STD.odMm / 2 })).toEqual([]);
  });
});
