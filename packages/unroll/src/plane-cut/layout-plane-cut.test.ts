import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { expectGirthError } from '@girth/pipes/test-support';
import { layoutPlaneCut } from './layout-plane-cut.js';
import { expectClose } from '../internal/test-support/expect-close.js';
import { column, cutPolylines, expectAllFinite, maxChordDistance, stationPhis } from './test-support/template-checks.js';

const IN = 25.4;
// NPS 6 STD and NPS 16 STD, ASME B36.10M (recalled, REFERENCES.md).
const NPS6_STD = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD', npsIn: 6 };
const NPS16_STD = { odMm: 16 * IN, wallMm: 0.375 * IN, label: 'NPS 16 STD', npsIn: 16 };
const rad = (deg: number) => (deg * Math.PI) / 180;

describe('layoutPlaneCut', () => {
  it('tabulates the plane-cut ordinate at every station (REFERENCES.md: (D/2) tan(c) (1 − cos psi), psi from the long point)', () => {
    const layout = layoutPlaneCut({ pipe: NPS6_STD, angleDeg: 60 });
    const [t] = layout.templates;
    const D = NPS6_STD.odMm;
    const c = rad(30);
    // Our phi is 0 at the heel; psi = phi − 180°.
    const expected = stationPhis(16).map((phi) => (D / 2) * Math.tan(c) * (1 - Math.cos(phi - Math.PI)));
    expectClose(column(t, 'cutback'), expected, 1e-9 * D, 'cutback');
    expectClose(column(t, 'girth'), stationPhis(16).map((phi) => (phi * D) / 2), 1e-9 * D, 'girth');
    expect(t.stations.map((s) => s.angleDeg)).toEqual(stationPhis(16).map((_, i) => 22.5 * i)); // 16 stations of 22.5° (common practice)
    expectClose(layout.centerCutbackMm, (D / 2) * Math.tan(c), 1e-9 * D, 'axis cutback');
  });

  it('follows the result contract (DESIGN.md): kind, plane-cut template with girth and cutback, pipes, warnings', () => {
    const layout = layoutPlaneCut({ pipe: NPS16_STD, angleDeg: 45 }, { stations: 32 });
    expect(layout.kind).toBe('plane-cut');
    expect(layout.templates.map((t) => [t.id, t.kind])).toEqual([['plane-cut', 'wrap']]);
    const [t] = layout.templates;
    expect(t.stationColumns.map((c) => c.key)).toEqual(['girth', 'cutback']);
    expect(t.stations).toHaveLength(32);
    expect(t.stations[0]).toMatchObject({ n: 1, angleDeg: 0 });
    expect(layout.pipes).toEqual([{ role: 'pipe', label: 'NPS 16 STD', odMm: NPS16_STD.odMm, wallMm: NPS16_STD.wallMm, idMm: NPS16_STD.odMm - 2 * NPS16_STD.wallMm }]);
    expect(layout.warnings).toEqual([]);
    // No caution in the notes (the exporters print `CAUTION` once per sheet, file and table; a caution in the notes showed twice).
    expect(t.notes.filter((n) => /caution/i.test(n))).toEqual([]);
    expect(t.title).toBe('Plane cut: NPS 16 STD at 45° to the plane');
    expectAllFinite(JSON.parse(JSON.stringify(layout)));
  });

  it('keeps the invariants for any cut (property): stretch-out π·OD, cutback ≥ 0 and 0 at the long point, chords within tolerance', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 5, max: 90, noNaN: true }),
        fc.double({ min: 20, max: 1200, noNaN: true }),
        fc.constantFrom('od' as const, 'id' as const),
        fc.constantFrom(4, 16, 32, 90),
        fc.constantFrom(0.05, 0.01, 0.5),
        (angleDeg, odMm, fitSurface, stations, chordToleranceMm) => {
          const wallMm = odMm * 0.05;
          const layout = layoutPlaneCut({ pipe: { odMm, wallMm }, angleDeg, fitSurface }, { stations, chordToleranceMm });
          const [t] = layout.templates;
          if (t.kind !== 'wrap') throw new Error('a plane cut is a wrap');
          expectClose(t.stretchOutMm, Math.PI * odMm, 1e-9 * odMm, 'stretch-out = π × OD');
          const cb = column(t, 'cutback');
          expect(Math.min(...cb)).toBeGreaterThanOrEqual(-1e-9 * odMm);
          const [poly] = cutPolylines(t);
          if (!poly) throw new Error('no cut');
          // The contour spans the whole girth and closes on itself.
          expectClose([poly[0]?.[0] ?? NaN, poly[poly.length - 1]?.[0] ?? NaN], [0, Math.PI * odMm], 1e-9 * odMm, 'contour span');
          expectClose(poly[0]?.[1] ?? NaN, poly[poly.length - 1]?.[1] ?? NaN, 1e-9 * odMm, 'contour closes');
          expectClose(Math.min(...poly.map((p) => p[1])), 0, 1e-9 * odMm, 'long point at cutback 0');
          // Against the closed form of the ordinate (REFERENCES.md), with the fit radius r and the wrap on the OD.
          const r = fitSurface === 'od' ? odMm / 2 : odMm / 2 - wallMm;
          const k = r / Math.tan(rad(angleDeg));
          const f = (x: number) => k * (1 + Math.cos((2 * x) / odMm));
          for (const p of poly) expectClose(p[1], f(p[0]), 1e-9 * odMm * Math.max(1, k / odMm), 'cut point on the true curve');
          expect(maxChordDistance(poly, f)).toBeLessThanOrEqual(chordToleranceMm * 1.0001);
        },
      ),
      { numRuns: 120 },
    );
  });

  it('cuts the bore to the plane on request, still wrapped on the OD', () => {
    const layout = layoutPlaneCut({ pipe: NPS6_STD, angleDeg: 50, fitSurface: 'id' });
    const [t] = layout.templates;
    const d = NPS6_STD.odMm - 2 * NPS6_STD.wallMm;
    if (t.kind !== 'wrap') throw new Error('a plane cut is a wrap');
    expectClose(t.wrapOdMm, NPS6_STD.odMm, 0, 'wraps on the OD');
    expectClose(column(t, 'cutback'), stationPhis(16).map((phi) => (d / 2) * Math.tan(rad(40)) * (1 + Math.cos(phi))), 1e-9 * d, 'ID ordinates');
    expect(t.notes.some((n) => n.includes('crosses the bore'))).toBe(true);
  });

  it('sets the cut back by gap / sin(angle) for a root gap; the shape does not change (invariant)', () => {
    const plain = layoutPlaneCut({ pipe: NPS6_STD, angleDeg: 35 });
    const gapped = layoutPlaneCut({ pipe: NPS6_STD, angleDeg: 35, gapMm: 3 });
    expectClose(gapped.gapSetbackMm, 3 / Math.sin(rad(35)), 1e-12, 'setback');
    expectClose(column(gapped.templates[0], 'cutback'), column(plain.templates[0], 'cutback'), 1e-9, 'same ordinates');
    expect(gapped.gapMm).toBe(3);
    expect(gapped.templates[0].notes.some((n) => n.includes('root gap'))).toBe(true);
  });

  it('passes the shallow-cut warning into the notes', () => {
    const layout = layoutPlaneCut({ pipe: NPS6_STD, angleDeg: 10 });
    expect(layout.warnings.map((w) => w.code)).toEqual(['SHALLOW_PLANE_CUT']);
    expect(layout.templates[0].notes.some((n) => n.startsWith('Warning:'))).toBe(true);
  });

  it('rejects bad input with typed errors', () => {
    expectGirthError(() => layoutPlaneCut({ pipe: NPS6_STD, angleDeg: 0 }), 'OUT_OF_RANGE', 'angleDeg');
    expectGirthError(() => layoutPlaneCut({ pipe: NPS6_STD, angleDeg: 91 }), 'OUT_OF_RANGE', 'angleDeg');
    expectGirthError(() => layoutPlaneCut({ pipe: NPS6_STD, angleDeg: Number.NaN }), 'NOT_A_NUMBER', 'angleDeg');
    expectGirthError(() => layoutPlaneCut({ pipe: NPS6_STD, angleDeg: 45 }, { stations: 3 }), 'OUT_OF_RANGE', 'stations');
    expectGirthError(() => layoutPlaneCut({ pipe: NPS6_STD, angleDeg: 45 }, { stations: 16.5 }), 'OUT_OF_RANGE', 'stations');
    expectGirthError(() => layoutPlaneCut({ pipe: NPS6_STD, angleDeg: 45 }, { chordToleranceMm: 0 }), 'NEGATIVE', 'chordToleranceMm');
    expectGirthError(() => layoutPlaneCut({ pipe: NPS6_STD, angleDeg: 45, gapMm: Number.POSITIVE_INFINITY }), 'NOT_FINITE', 'gapMm');
    expectGirthError(() => layoutPlaneCut({ pipe: { odMm: -1, wallMm: 1 }, angleDeg: 45 }), 'NEGATIVE', 'pipe.odMm');
  });
});
