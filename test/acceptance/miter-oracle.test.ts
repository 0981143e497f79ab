/**
 * The library's miter elbow (`layoutMiter`) checked against the independent
 * test oracle (test/oracle/miter-oracle.ts: the elbow assembled from its
 * definition, every piece's generators cut by their weld planes by bisection,
 * long points found by search, no closed form, written without reading the
 * library), and against the published miter statements (REFERENCES.md,
 * miter): cut angle B / (2 W) (ASME B31.3 para. 304.2.3), segment 2 R tan c on
 * the centreline, 2 (R + D/2) tan c on the back, 2 (R - D/2) tan c on the
 * throat, end pieces half (plus the tangent), ordinates (D/2) tan c (1 - cos psi).
 *
 * Tolerance: 1e-9 x OD on every length. The oracle closes each cut to adjacent
 * doubles. The sweep keeps the cut angle at or below 89° (only a single weld
 * can lean further, for bends over 178°): a generator then meets its weld
 * plane at 1° or more, so rounding of the signed distance is amplified at
 * most 1 / sin 1° = 57 times, on lengths of at most (R + D/2) tan 89° = 260 OD:
 * ~1e-12 OD. 1e-9 OD is far above that noise and far below anything a fitter
 * can mark: a failure is a disagreement of geometry or convention.
 *
 * Pipe ODs: ASME B36.10M NPS 1/2 to 48, recalled (REFERENCES.md; from NPS 14 up
 * the OD equals the NPS). Walls 2..40 mm (at most 30 % of the OD). Radii 0.6 to
 * 4 x OD (the library accepts down to OD/2).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isGirthError } from '@girth/pipes';
import { layoutMiter, type MiterLayout, type Template } from '@girth/unroll';
import {
  exactMiterPiece,
  exactPieceLengths,
  miterFitRadiusMm,
  miterReachMm,
  type ExactMiterPieceLayout,
  type OracleMiterSpec,
} from '../oracle/miter-oracle.js';
import { expectClose, findFirstMismatch } from '../support/expect-close.js';
import { stationColumn, templateById } from '../support/template-access.js';

const IN = 25.4;
/** ASME B36.10M outside diameters, inches, NPS 1/2 .. 48 (recalled; REFERENCES.md). */
const NPS_OD_IN = [0.84, 1.05, 1.315, 1.66, 1.9, 2.375, 2.875, 3.5, 4, 4.5, 5.563, 6.625, 8.625, 10.75, 12.75, 14, 16, 18, 20, 22, 24, 30, 36, 42, 48] as const;
const REL_TOL = 1e-9;
/** Largest cut angle the sweep asks for, degrees (see the tolerance note above). */
const MAX_SWEEP_CUT_DEG = 89;
const deg = (d: number): number => (d * Math.PI) / 180;

interface MiterCase {
  readonly spec: OracleMiterSpec & { readonly tangentMm: number; readonly fitSurface: 'od' | 'id' };
  readonly stations: number;
}

const wallMm = (odMm: number, frac: number): number => 2 + frac * (Math.min(40, 0.3 * odMm) - 2);

/** Elbows over NPS 1/2..48, bends 1..180°, 1..6 welds, radii 0.6..4 x OD, tangents 0..2 OD, both fit surfaces, 8/16/32 stations. */
const miterCase: fc.Arbitrary<MiterCase> = fc
  .record({
    odIndex: fc.integer({ min: 0, max: NPS_OD_IN.length - 1 }),
    wallFrac: fc.double({ min: 0, max: 1, noNaN: true }),
    bendDeg: fc.oneof(fc.constant(90), fc.constant(180), fc.constant(1), fc.double({ min: 1, max: 180, noNaN: true })),
    welds: fc.integer({ min: 1, max: 6 }),
    radiusOds: fc.oneof(fc.constant(0.6), fc.constant(4), fc.double({ min: 0.6, max: 4, noNaN: true })),
    tangentOds: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 2, noNaN: true })),
    fitSurface: fc.constantFrom('od' as const, 'id' as const),
    stations: fc.constantFrom(8, 16, 32),
  })
  .filter(({ bendDeg, welds }) => bendDeg / (2 * welds) <= MAX_SWEEP_CUT_DEG)
  .map(({ odIndex, wallFrac, bendDeg, welds, radiusOds, tangentOds, fitSurface, stations }) => {
    const odMm = NPS_OD_IN[odIndex]! * IN;
    const spec = { pipe: { odMm, wallMm: wallMm(odMm, wallFrac) }, bendDeg, welds, radiusMm: radiusOds * odMm, tangentMm: tangentOds * odMm, fitSurface };
    return { spec, stations };
  });

const describeCase = (c: MiterCase): string => JSON.stringify({ ...c.spec, stations: c.stations });
const layout = (c: MiterCase): MiterLayout => layoutMiter(c.spec, { stations: c.stations });

/** Template ids the elbow must have: the end piece always, the middle piece when there are two or more welds. */
const expectedIds = (welds: number): readonly string[] => (welds >= 2 ? ['miter-end', 'miter-middle'] : ['miter-end']);

/** Polyline parts of a template's cut, each as its own list of points. */
function cutPolylines(t: Template): readonly (readonly (readonly [number, number])[])[] {
  return t.cut.flatMap((p) => (p.kind === 'polyline' ? [p.points] : []));
}

/**
 * Each cut polyline must lie on one of the oracle's cut curves, and every curve must be drawn:
 * the template does not promise which part comes first, so each part is matched to the curve it lies on.
 */
function expectCutsOnCurves(t: Template, exact: ExactMiterPieceLayout, wrapRadiusMm: number, tol: number, label: string): void {
  const parts = cutPolylines(t);
  expect(parts.length, `${label}: one polyline per cut`).toBe(exact.cutCurves.length);
  const used = new Set<number>();
  parts.forEach((points, i) => {
    const ys = points.map(([, y]) => y);
    const misses = exact.cutCurves.map((curve) => findFirstMismatch(ys, points.map(([x]) => curve(x / wrapRadiusMm)), tol, `${label} polyline ${i}`));
    const k = misses.findIndex((m) => m === undefined);
    if (k < 0) throw new Error(misses.map((m) => m!.message).join('; or '));
    used.add(k);
    const xs = points.map(([x]) => x);
    expect(Math.min(...xs), `${label} polyline ${i} starts at girth 0`).toBeLessThanOrEqual(tol);
    expect(Math.max(...xs), `${label} polyline ${i} reaches the stretch-out`).toBeGreaterThanOrEqual(2 * Math.PI * wrapRadiusMm - tol);
  });
  expect(used.size, `${label}: every cut drawn`).toBe(exact.cutCurves.length);
}

/** y of the mark segments that run across the whole girth (square lines). */
function squareMarkYs(t: Template, stretchOutMm: number, tol: number): readonly number[] {
  return t.marks.flatMap((m) =>
    m.kind === 'segment' && Math.abs(m.from[1] - m.to[1]) <= tol && Math.abs(Math.abs(m.to[0] - m.from[0]) - stretchOutMm) <= tol ? [m.from[1]] : [],
  );
}

describe('layoutMiter against the oracle (fast-check sweep)', () => {
  it('cut angle B / (2 W) (ASME B31.3 para. 304.2.3; REFERENCES.md), templates miter-end and (W >= 2) miter-middle, wraps on the OD with stretch-out pi x OD and stations 360 (n-1)/N', () => {
    fc.assert(
      fc.property(miterCase, (c) => {
        const result = layout(c);
        const tol = REL_TOL * c.spec.pipe.odMm;
        expect(result.kind).toBe('miter');
        expectClose(result.cutAngleDeg, c.spec.bendDeg / (2 * c.spec.welds), 1e-9, `cut angle ${describeCase(c)}`);
        expect(result.welds).toBe(c.spec.welds);
        expect(result.pieceCount).toBe(c.spec.welds + 1);
        expect(result.templates.map((t) => t.id)).toEqual(expectedIds(c.spec.welds));
        for (const t of result.templates) {
          expect(t.kind).toBe('wrap');
          if (t.kind !== 'wrap') continue;
          expectClose(t.stretchOutMm ?? Number.NaN, Math.PI * c.spec.pipe.odMm, tol, `${t.id} stretch-out ${describeCase(c)}`);
          expectClose(t.wrapOdMm ?? Number.NaN, c.spec.pipe.odMm, tol, `${t.id} wrap OD ${describeCase(c)}`);
          expect(t.stations.map((s) => s.n)).toEqual(Array.from({ length: c.stations }, (_, i) => i + 1));
          expectClose(t.stations.map((s) => s.angleDeg), t.stations.map((s) => (360 * (s.n - 1)) / c.stations), 1e-9, `${t.id} station angles ${describeCase(c)}`);
          const sq = t.squareLine;
          expect(sq, `${t.id} square line`).toBeDefined();
          expectClose([sq!.from[1], sq!.to[1]], [0, 0], tol, `${t.id} square line y ${describeCase(c)}`);
        }
      }),
      { numRuns: 300 },
    );
  });

  it('miter-end: every station (girth, cutback, length) equals the oracle on BOTH end pieces of the assembled elbow, within 1e-9 x OD', () => {
    fc.assert(
      fc.property(miterCase, (c) => {
        const t = templateById(layout(c), 'miter-end');
        const tol = REL_TOL * c.spec.pipe.odMm;
        for (const index of [0, c.spec.welds]) {
          const exact = exactMiterPiece(c.spec, index, c.stations);
          const label = `end piece ${index} ${describeCase(c)}`;
          expectClose(stationColumn(t, 'girth'), exact.stations.map((s) => s.girthMm), tol, `girth, ${label}`);
          expectClose(stationColumn(t, 'cutback'), exact.stations.map((s) => s.cutbackMm), tol, `cutback, ${label}`);
          expectClose(stationColumn(t, 'length'), exact.stations.map((s) => s.lengthMm), tol, `length, ${label}`);
        }
      }),
      { numRuns: 300 },
    );
  });

  it('miter-middle: every station (girth, cutback, cutbackFar, length) equals the oracle on EVERY middle piece, within 1e-9 x OD', () => {
    fc.assert(
      fc.property(
        miterCase.filter((c) => c.spec.welds >= 2),
        (c) => {
          const t = templateById(layout(c), 'miter-middle');
          const tol = REL_TOL * c.spec.pipe.odMm;
          for (let index = 1; index < c.spec.welds; index++) {
            const exact = exactMiterPiece(c.spec, index, c.stations);
            const label = `middle piece ${index} ${describeCase(c)}`;
            expectClose(stationColumn(t, 'girth'), exact.stations.map((s) => s.girthMm), tol, `girth, ${label}`);
            expectClose(stationColumn(t, 'cutback'), exact.stations.map((s) => s.cutbackMm), tol, `cutback, ${label}`);
            expectClose(stationColumn(t, 'cutbackFar'), exact.stations.map((s) => s.cutbackFarMm ?? Number.NaN), tol, `cutbackFar, ${label}`);
            expectClose(stationColumn(t, 'length'), exact.stations.map((s) => s.lengthMm), tol, `length, ${label}`);
          }
        },
      ),
      { numRuns: 300 },
    );
  });

  it('every station of both templates: the published ordinate (D/2) tan(c) (1 - cos psi), psi from the long point (the back), D the fit surface (REFERENCES.md, miter), within 1e-9 x OD', () => {
    fc.assert(
      fc.property(miterCase, (c) => {
        const result = layout(c);
        const r = miterFitRadiusMm(c.spec);
        const tanC = Math.tan(deg(c.spec.bendDeg / (2 * c.spec.welds)));
        for (const t of result.templates) {
          // Station 1 on the throat (phi = 0), the back at 180°: psi = phi - 180°.
          const published = t.stations.map((s) => r * tanC * (1 - Math.cos(deg(s.angleDeg - 180))));
          const label = `${t.id} ${describeCase(c)}`;
          expectClose(stationColumn(t, 'cutback'), published, REL_TOL * c.spec.pipe.odMm, `published ordinate, ${label}`);
          if (t.id === 'miter-middle') expectClose(stationColumn(t, 'cutbackFar'), published, REL_TOL * c.spec.pipe.odMm, `published ordinate far end, ${label}`);
        }
      }),
      { numRuns: 300 },
    );
  });

  it('every cut-polyline point lies on an oracle cut (end: y = cutback; middle: y = cutback and y = S - cutbackFar), spanning the girth; the square end / far square line and the CENTRE line sit where the oracle puts them, within 1e-9 x OD', () => {
    fc.assert(
      fc.property(miterCase, (c) => {
        const result = layout(c);
        const tol = REL_TOL * c.spec.pipe.odMm;
        const wrapR = c.spec.pipe.odMm / 2;
        for (const t of result.templates) {
          const exact = exactMiterPiece(c.spec, t.id === 'miter-end' ? 0 : 1, c.stations);
          const label = `${t.id} ${describeCase(c)}`;
          expectCutsOnCurves(t, exact, wrapR, tol, label);
          const ys = squareMarkYs(t, Math.PI * c.spec.pipe.odMm, tol);
          // The far square line (end piece: its square end; middle piece: the far cut's square line) is drawn as a mark.
          expect(ys.some((y) => Math.abs(y - exact.farSquareLineYMm) <= tol), `${label}: far square line at ${exact.farSquareLineYMm}, marks at ${ys.join(', ')}`).toBe(true);
          // Middle piece: the square line through the piece's middle (CENTRE), from the near square line.
          if (t.id === 'miter-middle') expect(ys.some((y) => Math.abs(y - exact.tangentLineYMm) <= tol), `${label}: centre line at ${exact.tangentLineYMm}, marks at ${ys.join(', ')}`).toBe(true);
        }
      }),
      { numRuns: 150 },
    );
  });

  it('pieces: centre, back and throat equal the oracle on every piece of the assembled elbow and the published 2 R tan c, 2 (R ± D/2) tan c, end pieces half plus tangent (REFERENCES.md, miter); counts 2 and W - 1; stock = sum of centres, within 1e-9 x OD', () => {
    fc.assert(
      fc.property(miterCase, (c) => {
        const result = layout(c);
        const { welds, radiusMm: R, tangentMm: T } = c.spec;
        const tol = REL_TOL * c.spec.pipe.odMm;
        const tanC = Math.tan(deg(c.spec.bendDeg / (2 * welds)));
        // D/2 of the fit surface: the lengths are taken on the generators that meet the weld planes,
        // which is where the marked line stands on the OD at the same station (OD for 'od', ID for 'id').
        const r = miterFitRadiusMm(c.spec);
        const end = result.pieces.find((p) => p.templateId === 'miter-end');
        const middle = result.pieces.find((p) => p.templateId === 'miter-middle');
        expect(end?.count).toBe(2);
        expect(middle?.count).toBe(welds >= 2 ? welds - 1 : undefined);
        expect(result.pieces).toHaveLength(welds >= 2 ? 2 : 1);
        let stockCentres = 0;
        for (let index = 0; index <= welds; index++) {
          const entry = index === 0 || index === welds ? end! : middle!;
          const exact = exactPieceLengths(c.spec, index);
          stockCentres += exact.center;
          const got = [entry.center, entry.back, entry.throat];
          const label = `piece ${index} ${describeCase(c)}`;
          expectClose(got, [exact.center, exact.back, exact.throat], tol, `oracle lengths, ${label}`);
          const published = entry === end
            ? [R * tanC + T, (R + r) * tanC + T, (R - r) * tanC + T]
            : [2 * R * tanC, 2 * (R + r) * tanC, 2 * (R - r) * tanC];
          expectClose(got, published, tol, `published lengths, ${label}`);
        }
        expectClose(result.stockLengthMm, stockCentres, tol, `stock length, oracle ${describeCase(c)}`);
        expectClose(result.stock.lengthMm, 2 * welds * R * tanC + 2 * T, tol, `stock length, published ${describeCase(c)}`);
      }),
      { numRuns: 300 },
    );
  });
});

describe('layoutMiter: worked values and refusals', () => {
  it('NPS 12 STD, 90° in 4 pieces at R = 1.5 x NPS (ASME B16.9 long radius; B36.10M OD 12.750 in, STD .375 in; both recalled, REFERENCES.md): cut 15°, middle piece 2 R tan 15° on the centreline, default 16 stations', () => {
    const spec = { pipe: { odMm: 12.75 * IN, wallMm: 0.375 * IN }, bendDeg: 90, welds: 3, radiusMm: 18 * IN };
    const result = layoutMiter(spec);
    expectClose(result.cutAngleDeg, 15, 1e-12, 'cut angle');
    const middle = result.pieces.find((p) => p.templateId === 'miter-middle');
    expectClose(middle?.center ?? Number.NaN, 2 * 18 * IN * Math.tan(deg(15)), REL_TOL * spec.pipe.odMm, 'middle piece centre');
    const t = templateById(result, 'miter-middle');
    expectClose(t.stations.map((s) => s.angleDeg), Array.from({ length: 16 }, (_, i) => 22.5 * i), 1e-9, 'default stations (common practice, 16 of 22.5°)');
    expectClose(stationColumn(t, 'length'), exactMiterPiece(spec, 1, 16).stations.map((s) => s.lengthMm), REL_TOL * spec.pipe.odMm, 'middle lengths');
  });

  it('refuses a single weld turning 180° (cut angle 90°: the weld plane would hold the generators, which the oracle reports as parallel) with a typed OUT_OF_RANGE error', () => {
    const spec = { pipe: { odMm: 168.3, wallMm: 7.11 }, bendDeg: 180, welds: 1, radiusMm: 300 };
    let caught: unknown;
    try {
      layoutMiter(spec);
    } catch (e) {
      caught = e;
    }
    expect(isGirthError(caught, 'OUT_OF_RANGE')).toBe(true);
    expect(() => miterReachMm(spec, 0, 'far', 0)).toThrow(/parallel/);
  });
});
