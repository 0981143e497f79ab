import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { expectGirthError } from '@girth/pipes/test-support';
import { dot, miterGeometry, norm, sub, type MiterSpec, type Vec3 } from '@girth/geometry';
import { layoutMiter } from './layout-miter.js';
import type { MiterLayout } from './types.js';
import type { Template } from '../types.js';
import { expectClose } from '../internal/test-support/expect-close.js';
import { column, cutPolylines, expectAllFinite, maxChordDistance, stationPhis } from '../plane-cut/test-support/template-checks.js';
import { templatePointTo3d } from './test-support/template-to-3d.js';

const IN = 25.4;
// ASME B36.10M (recalled, REFERENCES.md).
const NPS12_STD = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD', npsIn: 12 };
const NPS8_XS = { odMm: 8.625 * IN, wallMm: 0.5 * IN, label: 'NPS 8 XS', npsIn: 8 };
const rad = (deg: number) => (deg * Math.PI) / 180;

function template(layout: MiterLayout, id: string): Template {
  const t = layout.templates.find((x) => x.id === id);
  if (!t) throw new Error(`no ${id}`);
  return t;
}

function backs(layout: MiterLayout): { endBack: number; middleBack?: number } {
  const end = layout.pieces.find((p) => p.templateId === 'miter-end');
  const middle = layout.pieces.find((p) => p.templateId === 'miter-middle');
  return { endBack: end?.back ?? NaN, ...(middle ? { middleBack: middle.back } : {}) };
}

/**
 * The cut line of `piece`'s near or far end, from its template, in 3D: the
 * station rows (girth, and y from the cutback columns) and every point of the
 * drawn polyline.
 */
function cutIn3d(layout: MiterLayout, spec: MiterSpec, piece: number, end: 'near' | 'far'): { stations: Vec3[]; polyline: Vec3[] } {
  const g = miterGeometry(spec);
  const role = g.pieces[piece]?.role;
  const t = template(layout, role === 'end' ? 'miter-end' : 'miter-middle');
  const b = backs(layout);
  const girth = column(t, 'girth');
  let ys: number[];
  let poly;
  if (role === 'end') {
    ys = column(t, 'cutback');
    poly = cutPolylines(t)[0];
  } else {
    const span = b.middleBack ?? NaN;
    ys = end === 'near' ? column(t, 'cutback') : column(t, 'cutbackFar').map((cb) => span - cb);
    poly = cutPolylines(t)[end === 'near' ? 0 : 1];
  }
  if (!poly) throw new Error('no polyline');
  return {
    stations: girth.map((x, i) => templatePointTo3d(g, piece, [x, ys[i] as number], b)),
    polyline: poly.map((p) => templatePointTo3d(g, piece, p, b)),
  };
}

/** Distance of p from the line through a along unit u. */
function distFromAxis(p: Vec3, a: Vec3, u: Vec3): number {
  const rel = sub(p, a);
  const along = dot(rel, u);
  return norm([rel[0] - u[0] * along, rel[1] - u[1] * along, rel[2] - u[2] * along]);
}

/** Checks that pieces k and k+1 meet on one contour at every weld, from their templates. */
function checkWeldsFromTemplates(spec: MiterSpec, options: { stations: number }): void {
  const layout = layoutMiter(spec, options);
  const g = miterGeometry(spec);
  const od = g.spec.pipe.odMm;
  const tol = 1e-9 * od * Math.max(1, Math.tan(rad(g.spec.cutAngleDeg))) * Math.max(1, g.spec.radiusMm / od);
  for (let j = 1; j <= g.spec.welds; j++) {
    const before = cutIn3d(layout, spec, j - 1, 'far');
    const after = cutIn3d(layout, spec, j, 'near');
    // Station by station: the same points (invariant: the pieces fit at the weld).
    before.stations.forEach((p, i) => {
      const q = after.stations[i] as Vec3;
      expectClose(norm(sub(p, q)), 0, tol, `weld ${j}, station ${i + 1}: piece ${j - 1} and piece ${j} apart`);
    });
    // As sets: every drawn point of one cut lies on the other piece's fit surface and on the weld plane.
    const plane = g.weldPlanes[j - 1];
    const pa = g.pieces[j - 1];
    const pb = g.pieces[j];
    if (!plane || !pa || !pb) throw new Error('missing');
    for (const p of before.polyline) {
      expectClose(distFromAxis(p, pb.tangentPoint, pb.direction), g.spec.fitRadiusMm, tol, `weld ${j}: drawn point of piece ${j - 1} on piece ${j}`);
      expectClose(dot(sub(p, plane.point), plane.normal), 0, tol, `weld ${j}: drawn point on the plane`);
    }
    for (const q of after.polyline) {
      expectClose(distFromAxis(q, pa.tangentPoint, pa.direction), g.spec.fitRadiusMm, tol, `weld ${j}: drawn point of piece ${j} on piece ${j - 1}`);
    }
  }
}

describe('layoutMiter', () => {
  const ELBOW: MiterSpec = { pipe: NPS12_STD, bendDeg: 90, pieces: 4, radiusNps: 1.5, tangentMm: 50 };

  it('tabulates the ordinates of REFERENCES.md on both templates: (D/2) tan(c) (1 − cos psi), c = B / 2W', () => {
    const layout = layoutMiter(ELBOW);
    const D = NPS12_STD.odMm;
    const c = rad(15); // ASME B31.3 para. 304.2.3: 90° / (2 × 3 welds)
    expect(layout.cutAngleDeg).toBe(15);
    // psi from the long point (the back); our phi is 0 on the throat: psi = phi − 180°.
    const ordinate = stationPhis(16).map((phi) => (D / 2) * Math.tan(c) * (1 - Math.cos(phi - Math.PI)));
    const end = template(layout, 'miter-end');
    const middle = template(layout, 'miter-middle');
    expectClose(column(end, 'cutback'), ordinate, 1e-9 * D, 'end cutback');
    expectClose(column(middle, 'cutback'), ordinate, 1e-9 * D, 'middle cutback, near end');
    expectClose(column(middle, 'cutbackFar'), ordinate, 1e-9 * D, 'middle cutback, far end');
    // Lengths at the throat (station 1) and back (station 9) are the REFERENCES.md segment lengths.
    const R = 1.5 * 12 * IN;
    const endLen = column(end, 'length');
    expectClose([endLen[0] as number, endLen[8] as number], [(R - D / 2) * Math.tan(c) + 50, (R + D / 2) * Math.tan(c) + 50], 1e-9 * D, 'end length throat/back');
    const midLen = column(middle, 'length');
    expectClose([midLen[0] as number, midLen[8] as number], [2 * (R - D / 2) * Math.tan(c), 2 * (R + D / 2) * Math.tan(c)], 1e-9 * D, 'middle length throat/back');
    expectClose(layout.stockLengthMm, 6 * R * Math.tan(c) + 100, 1e-9 * D, 'stock length');
  });

  it('follows the result contract (DESIGN.md) and adds pieces and the stock plan', () => {
    const layout = layoutMiter(ELBOW, { stations: 32 });
    expect(layout.kind).toBe('miter');
    expect(layout.templates.map((t) => [t.id, t.kind])).toEqual([
      ['miter-end', 'wrap'],
      ['miter-middle', 'wrap'],
    ]);
    for (const t of layout.templates) {
      expect(t.stationColumns.map((c) => c.key).slice(0, 2)).toEqual(['girth', 'cutback']);
      expect(t.stations).toHaveLength(32);
      // No caution in the notes (the exporters print `CAUTION` once per sheet, file and table; a caution in the notes showed twice).
      expect(t.notes.filter((n) => /caution/i.test(n))).toEqual([]);
    }
    expect(layout.pieces.map((p) => [p.label, p.count])).toEqual([
      ['End piece', 2],
      ['Middle piece', 2],
    ]);
    expect(layout.stock.cuts.map((c) => c.longSideDeg)).toEqual([180, 0, 180]);
    expect(layout.pipes[0]?.role).toBe('pipe');
    expect(layout.templates[0]?.title).toBe('Miter end piece: NPS 12 STD, 90° in 4 pieces (3 welds), R 457.2 mm (18.000 in)');
    expectAllFinite(JSON.parse(JSON.stringify(layout)));
  });

  it('puts station 1 of every piece on the throat, as its THROAT label says', () => {
    // Station 1 is at phi = 0, the generator toward the bend centre: the throat (common practice).
    const layout = layoutMiter({ pipe: NPS12_STD, bendDeg: 90, welds: 3, radiusMm: 457.2 });
    for (const t of layout.templates) {
      if (t.kind !== 'wrap') throw new Error(`${t.id} is a wrap`);
      expect(t.startLine).toBe('throat');
      const throat = t.labels.find((l) => l.text === 'THROAT');
      expect(throat?.at[0]).toBe(0);
    }
  });

  it('makes one end template for a single miter', () => {
    const layout = layoutMiter({ pipe: NPS8_XS, bendDeg: 90, welds: 1, radiusMm: 300 });
    expect(layout.templates.map((t) => t.id)).toEqual(['miter-end']);
    expect(layout.pieces).toHaveLength(1);
    expect(layout.cutAngleDeg).toBe(45);
  });

  it('lays the cut lines of neighbouring pieces on one contour at every weld, from the templates (invariant, 1e-9 × OD)', () => {
    checkWeldsFromTemplates(ELBOW, { stations: 64 });
    checkWeldsFromTemplates({ pipe: NPS8_XS, bendDeg: 60, welds: 4, radiusMm: 400, fitSurface: 'id' }, { stations: 16 });
    checkWeldsFromTemplates({ pipe: NPS8_XS, bendDeg: 90, welds: 1, radiusMm: NPS8_XS.odMm / 2, tangentMm: 100 }, { stations: 16 });
  });

  it('keeps the invariants for any elbow (property): stretch-out π·OD, cutback ≥ 0 and 0 at the long point, contours span the girth, chords within tolerance, stock = sum of centres', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 180, noNaN: true }),
        fc.integer({ min: 1, max: 8 }),
        fc.double({ min: 20, max: 1200, noNaN: true }),
        fc.double({ min: 1, max: 5, noNaN: true }),
        fc.constantFrom('od' as const, 'id' as const),
        (bendDeg, welds, odMm, radiusOverHalfOd, fitSurface) => {
          fc.pre(bendDeg / (2 * welds) < 75);
          const spec: MiterSpec = { pipe: { odMm, wallMm: 0.06 * odMm }, bendDeg, welds, radiusMm: (radiusOverHalfOd * odMm) / 2, fitSurface };
          const layout = layoutMiter(spec);
          const tanC = Math.tan(rad(layout.cutAngleDeg));
          const tol = 1e-9 * odMm * Math.max(1, tanC);
          const r = fitSurface === 'od' ? odMm / 2 : odMm / 2 - 0.06 * odMm;
          for (const t of layout.templates) {
            if (t.kind !== 'wrap') throw new Error(`${t.id} is a wrap`);
            expectClose(t.stretchOutMm, Math.PI * odMm, 1e-9 * odMm, `${t.id} stretch-out`);
            const polys = cutPolylines(t);
            polys.forEach((poly, k) => {
              expectClose([poly[0]?.[0] ?? NaN, poly[poly.length - 1]?.[0] ?? NaN], [0, Math.PI * odMm], 1e-9 * odMm, `${t.id} contour ${k} span`);
              // Against the closed-form ordinate of REFERENCES.md (near cut y = cutback; far cut y = span − cutback).
              const span = t.id === 'miter-middle' ? (layout.pieces[1]?.back ?? NaN) : 0;
              const f = (x: number) => {
                const cb = r * tanC * (1 + Math.cos((2 * x) / odMm));
                return k === 0 ? cb : span - cb;
              };
              expect(maxChordDistance(poly, f)).toBeLessThanOrEqual(0.05 * 1.0001 + tol);
            });
            const cb = column(t, 'cutback');
            expect(Math.min(...cb)).toBeGreaterThanOrEqual(-tol);
            expectClose(Math.min(...(polys[0] ?? []).map((p) => p[1])), 0, tol, `${t.id} long point`);
          }
          const sum = layout.pieces.reduce((s, p) => s + p.count * p.center, 0);
          expectClose(layout.stockLengthMm, sum, tol * Math.max(1, (radiusOverHalfOd * welds) / 2), 'stock = sum of centres');
          expectAllFinite(layout);
        },
      ),
      { numRuns: 80 },
    );
  });

  it('passes the ASME B31.3 para. 304.2.3 warnings into the result and the notes', () => {
    const layout = layoutMiter({ pipe: NPS12_STD, bendDeg: 120, welds: 2, radiusMm: 1000 });
    expect(layout.warnings.map((w) => w.code)).toEqual(['MITER_CUT_ANGLE_OVER_LIMIT']);
    expect(layout.templates.every((t) => t.notes.some((n) => n.startsWith('Warning:')))).toBe(true);
  });

  it('rejects bad input with typed errors', () => {
    expectGirthError(() => layoutMiter({ ...ELBOW, pieces: 0 }), 'OUT_OF_RANGE', 'pieces');
    expectGirthError(() => layoutMiter({ ...ELBOW, pieces: undefined, welds: 0 }), 'OUT_OF_RANGE', 'welds');
    expectGirthError(() => layoutMiter({ ...ELBOW, welds: 3 }), 'BAD_OPTION', 'pieces');
    expectGirthError(() => layoutMiter({ ...ELBOW, bendDeg: 0 }), 'OUT_OF_RANGE', 'bendDeg');
    expectGirthError(() => layoutMiter({ ...ELBOW, bendDeg: 200 }), 'OUT_OF_RANGE', 'bendDeg');
    expectGirthError(() => layoutMiter({ ...ELBOW, radiusNps: undefined, radiusMm: 100 }), 'OUT_OF_RANGE', 'radiusMm');
    expectGirthError(() => layoutMiter({ ...ELBOW, pipe: { odMm: 323.85, wallMm: 9.525 } }), 'BAD_OPTION', 'radiusNps');
    expectGirthError(() => layoutMiter({ ...ELBOW, tangentMm: Number.NaN }), 'NOT_A_NUMBER', 'tangentMm');
    expectGirthError(() => layoutMiter(ELBOW, { stations: 361 }), 'OUT_OF_RANGE', 'stations');
    expectGirthError(() => layoutMiter(ELBOW, { chordToleranceMm: 0.0001 }), 'OUT_OF_RANGE', 'chordToleranceMm');
  });
});
