/**
 * The contract in inches against the contract in millimetres, for every joint
 * kind: each length field of the inch JSON times 25.4 equals the mm JSON, and
 * angles and counts are the same in both (1 in = 25.4 mm exactly, NIST SP 811
 * Appendix B, recalled). Which field is which comes from the contract's naming
 * rule (angles end in `Deg`; counts are named), not from the builder.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isGirthError } from '@girth/pipes';
import {
  layoutBranch,
  layoutConcentricCone,
  layoutEccentricCone,
  layoutMiter,
  layoutPlaneCut,
  type LayoutKind,
  type LayoutResult,
} from '@girth/unroll';
import { toResultJson } from './result-json.js';

const MM_PER_IN = 25.4;
/** Keys holding counts or station numbers: never converted. */
const COUNT_KEYS = new Set(['n', 'count', 'welds', 'pieceCount', 'stationCount', 'segmentCount', 'subStationsPerStation']);
/**
 * Each JSON number is rounded to 1e-6 of its unit: at most 5e-7 in (1.27e-5 mm)
 * in the inch JSON and 5e-7 mm in the mm JSON, plus double rounding.
 */
const tolMm = (mm: number): number => MM_PER_IN * 5e-7 + 5e-7 + 1e-12 * Math.abs(mm);

interface Tally {
  lengths: number;
  unchanged: number;
}

/** Walks both JSON values side by side; `key` is the nearest object key (array items inherit it). */
function compare(inch: unknown, mm: unknown, key: string, path: string, tally: Tally): void {
  if (typeof inch === 'number') {
    expect(typeof mm, path).toBe('number');
    const m = mm as number;
    if (key.endsWith('Deg') || COUNT_KEYS.has(key)) {
      expect(inch, path).toBe(m);
      tally.unchanged++;
    } else {
      expect(Math.abs(inch * MM_PER_IN - m), `${path}: ${inch} in vs ${m} mm`).toBeLessThanOrEqual(tolMm(m));
      tally.lengths++;
    }
    return;
  }
  if (Array.isArray(inch)) {
    expect(Array.isArray(mm), path).toBe(true);
    expect((mm as unknown[]).length, path).toBe(inch.length);
    inch.forEach((v, i) => compare(v, (mm as unknown[])[i], key, `${path}[${i}]`, tally));
    return;
  }
  if (inch !== null && typeof inch === 'object') {
    const a = inch as Record<string, unknown>;
    const b = mm as Record<string, unknown>;
    expect(Object.keys(b), path).toEqual(Object.keys(a));
    for (const k of Object.keys(a)) compare(a[k], b[k], k, `${path}.${k}`, tally);
    return;
  }
  if (path === '$.units') return;
  expect(mm, path).toBe(inch);
}

const od = fc.double({ min: 20, max: 1200, noNaN: true });
const wallRatio = fc.double({ min: 0.02, max: 0.12, noNaN: true });
const pipeOf = (odMm: number, ratio: number, label: string) => ({ odMm, wallMm: odMm * ratio, label });

/** One random joint of each kind (ranges our own, inside each layout's limits). */
const jointArb: fc.Arbitrary<() => LayoutResult> = fc.oneof(
  fc
    .record({ hOd: od, ratio: wallRatio, f: fc.double({ min: 0.2, max: 0.95, noNaN: true }), angle: fc.double({ min: 50, max: 90, noNaN: true }), off: fc.double({ min: -0.8, max: 0.8, noNaN: true }), gap: fc.double({ min: 0, max: 4, noNaN: true }), setIn: fc.boolean() })
    .map((r) => () => {
      const header = pipeOf(r.hOd, r.ratio, 'header');
      const branch = pipeOf(r.hOd * r.f, r.ratio, 'branch');
      const room = (header.odMm - branch.odMm) / 2;
      return layoutBranch({ header, branch, angleDeg: r.angle, offsetMm: r.off * room, gapMm: r.gap, fit: r.setIn ? 'set-in' : 'set-on' });
    }),
  fc
    .record({ od, ratio: wallRatio, angle: fc.double({ min: 30, max: 90, noNaN: true }), gap: fc.double({ min: 0, max: 4, noNaN: true }), id: fc.boolean() })
    .map((r) => () => layoutPlaneCut({ pipe: pipeOf(r.od, r.ratio, 'pipe'), angleDeg: r.angle, gapMm: r.gap, fitSurface: r.id ? 'id' : 'od' })),
  fc
    .record({ od, ratio: wallRatio, bend: fc.double({ min: 15, max: 90, noNaN: true }), welds: fc.integer({ min: 1, max: 4 }), r: fc.double({ min: 1, max: 3, noNaN: true }), tangent: fc.double({ min: 0, max: 100, noNaN: true }) })
    .map((r) => () => layoutMiter({ pipe: pipeOf(r.od, r.ratio, 'pipe'), bendDeg: r.bend, welds: r.welds, radiusMm: r.r * r.od, tangentMm: r.tangent })),
  fc
    .record({ large: od, f: fc.double({ min: 0.2, max: 0.9, noNaN: true }), l: fc.double({ min: 0.6, max: 3, noNaN: true }), t: fc.double({ min: 0, max: 8, noNaN: true }), ecc: fc.boolean(), segments: fc.constantFrom(1, 2, 4) })
    .map((r) => () => {
      const spec = { largeDiameterMm: r.large, smallDiameterMm: r.large * r.f, lengthMm: r.l * r.large * (1 - r.f), thicknessMm: Math.min(r.t, r.large * r.f * 0.05) };
      return r.ecc ? layoutEccentricCone(spec, { segments: r.segments }) : layoutConcentricCone(spec, { segments: r.segments });
    }),
);

describe('toResultJson: inches against millimetres', () => {
  it('every length of every joint kind is the mm value / 25.4; angles and counts unchanged (fast-check)', () => {
    const seen = new Set<LayoutKind>();
    fc.assert(
      fc.property(jointArb, (make) => {
        let result: LayoutResult;
        try {
          result = make();
        } catch (e) {
          if (isGirthError(e)) return fc.pre(false); // a combination outside a layout's own limits
          throw e;
        }
        seen.add(result.kind);
        const tally: Tally = { lengths: 0, unchanged: 0 };
        compare(toResultJson(result, { units: 'in' }), toResultJson(result, { units: 'mm' }), '', '$', tally);
        expect(tally.lengths).toBeGreaterThan(0);
        expect(tally.unchanged).toBeGreaterThan(0);
      }),
      { numRuns: 120 },
    );
    expect([...seen].sort()).toEqual(['branch', 'miter', 'plane-cut', 'reducer']);
  });

  it('a miter\'s piece lengths and a cone\'s pattern come out in inches when inches are asked', () => {
    // NPS 12 STD: OD 12.750 in, wall 0.375 in (ASME B36.10M, recalled). A 90° two-weld
    // elbow on R 18 in: a middle piece's centre length is 2 R tan(22.5°) (REFERENCES.md, miter).
    const pipe = { odMm: 12.75 * MM_PER_IN, wallMm: 0.375 * MM_PER_IN, label: 'NPS 12 STD' };
    const json = toResultJson(layoutMiter({ pipe, bendDeg: 90, welds: 2, radiusMm: 18 * MM_PER_IN }), { units: 'in' });
    const middle = (json['pieces'] as { templateId: string; center: number }[]).find((p) => p.templateId === 'miter-middle')!;
    expect(Math.abs(middle.center - 2 * 18 * Math.tan(Math.PI / 8))).toBeLessThanOrEqual(1e-6);
    expect(json['radius']).toBe(18);
  });
});
