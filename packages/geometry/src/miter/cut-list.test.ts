import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { hitGenerator } from '../generators.js';
import { addScaled, dot, norm, sub, type Vec3 } from '../vec3.js';
import { expectGirthError } from '@girth/pipes/test-support';
import { miterGeometry } from './elbow-geometry.js';
import { miterCutList } from './cut-list.js';
import type { MiterCutList, MiterGeometry, MiterSpec } from './types.js';
import { expectClose, expectPointClose } from '../plane-cut/test-support/expect-close.js';
import { NPS12_STD, NPS24_XS, NPS4_S80, arbMiterSpec } from './test-support/specs.js';

const rad = (deg: number) => (deg * Math.PI) / 180;

/** Rotation of v by angle a about the unit axis k (Rodrigues' formula). */
function rotate(v: Vec3, k: Vec3, a: number): Vec3 {
  const c = Math.cos(a);
  const s = Math.sin(a);
  const kxv: Vec3 = [k[1] * v[2] - k[2] * v[1], k[2] * v[0] - k[0] * v[2], k[0] * v[1] - k[1] * v[0]];
  const kdv = dot(k, v);
  return [0, 1, 2].map((i) => v[i]! * c + kxv[i]! * s + k[i]! * kdv * (1 - c)) as unknown as Vec3;
}

/** Centre lengths of the pieces in elbow order, from the cut list's pieces. */
function centresInOrder(list: MiterCutList, welds: number): number[] {
  const end = list.pieces.find((p) => p.templateId === 'miter-end');
  const middle = list.pieces.find((p) => p.templateId === 'miter-middle');
  if (!end) throw new Error('no end piece');
  return [end.center, ...Array.from({ length: welds - 1 }, () => middle?.center ?? NaN), end.center];
}

/** Centre lengths in elbow order, from the stock plan's cut positions. */
function centresFromStock(list: MiterCutList): number[] {
  const at = [0, ...list.stock.cuts.map((c) => c.centerAtMm), list.stock.lengthMm];
  return at.slice(1).map((x, i) => x - (at[i] as number));
}

/**
 * Rebuilds the elbow from a list of centre lengths: start square to +x at the
 * origin, walk each piece's centreline, turn 2c about the bend axis at each weld.
 * Checks the final direction, the tangent points R from the bend centre, and
 * every weld point R / cos(c) from it.
 */
function checkRebuild(spec: MiterSpec, geometry: MiterGeometry, centres: readonly number[]): void {
  const { radiusMm: r, tangentMm: t, cutAngleDeg, bendDeg, pipe } = geometry.spec;
  const tol = 1e-9 * Math.max(r, pipe.odMm, t);
  const axis: Vec3 = [0, 0, 1];
  const start: Vec3 = [0, 0, 0];
  const d0: Vec3 = [1, 0, 0];
  // The bend starts at the first tangent point, t along the stock; its centre is R square to it.
  const firstTangent = addScaled(start, d0, t);
  const centre = addScaled(firstTangent, rotate(d0, axis, Math.PI / 2), r);
  let p = start;
  let d = d0;
  centres.forEach((len, i) => {
    p = addScaled(p, d, len);
    if (i < centres.length - 1) {
      // A weld: R / cos(c) from the bend centre (weld planes contain the bend axis).
      expectClose(norm(sub(p, centre)), r / Math.cos(rad(cutAngleDeg)), tol, `weld ${i + 1} from the centre`);
      d = rotate(d, axis, 2 * rad(cutAngleDeg));
    }
  });
  // Final axis: turned by exactly the bend.
  expectPointClose(d, rotate(d0, axis, rad(bendDeg)), 1e-9, `final direction (${JSON.stringify(spec)})`);
  // Final tangent point: R from the centre, square to the final direction.
  const lastTangent = addScaled(p, d, -t);
  expectClose(norm(sub(lastTangent, centre)), r, tol, 'last tangent point R from the centre');
  expectClose(dot(sub(lastTangent, centre), d), 0, tol, 'last tangent point square to the final axis');
  expectPointClose(lastTangent, addScaled(centre, rotate(rotate(d0, axis, -Math.PI / 2), axis, rad(bendDeg)), r), tol, 'last tangent point');
}

describe('miterCutList', () => {
  it('gives the segment lengths of REFERENCES.md for a 90° four-piece elbow, NPS 12 STD on 1.5 × NPS', () => {
    // REFERENCES.md, "Geometry with published statements", miter: centre 2 R tan(c), back 2 (R + D/2) tan(c),
    // throat 2 (R − D/2) tan(c), end pieces half. c = 90 / (2 × 3) = 15° (ASME B31.3 para. 304.2.3).
    const spec: MiterSpec = { pipe: NPS12_STD, bendDeg: 90, pieces: 4, radiusNps: 1.5, tangentMm: 50 };
    const list = miterCutList(miterGeometry(spec));
    const R = 457.2;
    const D = NPS12_STD.odMm;
    const tc = Math.tan(rad(15));
    const [end, middle] = list.pieces;
    expect(list.pieces).toHaveLength(2);
    expect([end?.label, end?.count, middle?.label, middle?.count]).toEqual(['End piece', 2, 'Middle piece', 2]);
    const tol = 1e-9 * D;
    expectClose(middle?.center ?? NaN, 2 * R * tc, tol, 'middle centre');
    expectClose(middle?.back ?? NaN, 2 * (R + D / 2) * tc, tol, 'middle back');
    expectClose(middle?.throat ?? NaN, 2 * (R - D / 2) * tc, tol, 'middle throat');
    expectClose(end?.center ?? NaN, R * tc + 50, tol, 'end centre');
    expectClose(end?.back ?? NaN, (R + D / 2) * tc + 50, tol, 'end back');
    expectClose(end?.throat ?? NaN, (R - D / 2) * tc + 50, tol, 'end throat');
    // Stock = sum of centre lengths = 2 W R tan(c) + 2 tangents.
    expectClose(list.stock.lengthMm, 6 * R * tc + 100, tol, 'stock length');
  });

  it('gives REFERENCES.md lengths for any elbow, on the fit surface chosen (property)', () => {
    fc.assert(
      fc.property(arbMiterSpec, (spec) => {
        const g = miterGeometry(spec);
        const list = miterCutList(g);
        const { radiusMm: R, tangentMm: T, welds: W, fitRadiusMm: rf } = g.spec;
        const tc = Math.tan(rad(g.spec.cutAngleDeg));
        const tol = 1e-9 * Math.max(R, g.spec.pipe.odMm) * Math.max(1, tc);
        const end = list.pieces[0];
        expectClose(end?.center ?? NaN, R * tc + T, tol, 'end centre');
        expectClose(end?.back ?? NaN, (R + rf) * tc + T, tol, 'end back');
        expectClose(end?.throat ?? NaN, (R - rf) * tc + T, tol, 'end throat');
        if (W >= 2) {
          const mid = list.pieces[1];
          expect(mid?.count).toBe(W - 1);
          expectClose(mid?.center ?? NaN, 2 * R * tc, tol, 'middle centre');
          expectClose(mid?.back ?? NaN, 2 * (R + rf) * tc, tol, 'middle back');
          expectClose(mid?.throat ?? NaN, 2 * (R - rf) * tc, tol, 'middle throat');
        } else {
          expect(list.pieces).toHaveLength(1);
        }
        // Invariant: stock length = sum of the pieces' centre lengths.
        const sum = list.pieces.reduce((s, p) => s + p.count * p.center, 0);
        expectClose(list.stock.lengthMm, sum, tol, 'stock = sum of centres');
        expect(list.stock.cuts).toHaveLength(W);
      }),
      { numRuns: 200 },
    );
  });

  it('rebuilds a 90° elbow that turns exactly 90° and ends at its tangent point (invariant, 1e-9)', () => {
    for (const spec of [
      { pipe: NPS12_STD, bendDeg: 90, welds: 3, radiusNps: 1.5 },
      { pipe: NPS24_XS, bendDeg: 90, welds: 4, radiusNps: 1.0, tangentMm: 152.4 },
      { pipe: NPS4_S80, bendDeg: 90, welds: 1, radiusMm: NPS4_S80.odMm / 2 },
      { pipe: NPS4_S80, bendDeg: 90, welds: 2, radiusNps: 1.5, tangentMm: 25 },
    ] satisfies MiterSpec[]) {
      const g = miterGeometry(spec);
      const list = miterCutList(g);
      checkRebuild(spec, g, centresInOrder(list, g.spec.welds));
      checkRebuild(spec, g, centresFromStock(list));
    }
  });

  it('rebuilds any elbow from its cut list (property)', () => {
    fc.assert(
      fc.property(arbMiterSpec, (spec) => {
        const g = miterGeometry(spec);
        const list = miterCutList(g);
        checkRebuild(spec, g, centresInOrder(list, g.spec.welds));
        checkRebuild(spec, g, centresFromStock(list));
      }),
      { numRuns: 200 },
    );
  });

  it('cuts the stock with nothing between pieces: each cut is where the next piece, turned 180°, starts (invariant)', () => {
    fc.assert(
      fc.property(arbMiterSpec, (spec) => {
        const g = miterGeometry(spec);
        const list = miterCutList(g);
        const tol = 1e-9 * Math.max(g.spec.radiusMm, g.spec.pipe.odMm) * Math.max(1, Math.tan(rad(g.spec.cutAngleDeg)));
        const centres = centresInOrder(list, g.spec.welds);
        let pieceStart = 0;
        list.stock.cuts.forEach((cut, i) => {
          const j = i + 1; // the piece after cut j is piece j
          pieceStart += centres[i] as number;
          expectClose(cut.centerAtMm, pieceStart, tol, `cut ${j} centre`);
          const after = g.pieces[j];
          if (!after?.nearCut) throw new Error('no near cut');
          const nearAxis = hitGenerator({ ...after.nearCut.bundle, radius: 0 }, after.nearCut.host, 0)?.axialMm ?? NaN;
          const centreOfAfter = pieceStart + nearAxis;
          // Piece j lies in the stock turned j × 180°: the reference line is its phi = j × 180°.
          const ref = hitGenerator(after.nearCut.bundle, after.nearCut.host, j * Math.PI)?.axialMm ?? NaN;
          const opp = hitGenerator(after.nearCut.bundle, after.nearCut.host, (j + 1) * Math.PI)?.axialMm ?? NaN;
          expectClose(cut.referenceLineAtMm, centreOfAfter - ref, tol, `cut ${j} on the reference line`);
          expectClose(cut.oppositeLineAtMm, centreOfAfter - opp, tol, `cut ${j} on the opposite line`);
          // The cuts lean alternately: the piece before cut 1 is long opposite the reference line, and so on.
          expect(cut.longSideDeg).toBe(j % 2 === 1 ? 180 : 0);
          const longer = cut.longSideDeg === 180 ? cut.oppositeLineAtMm : cut.referenceLineAtMm;
          const shorter = cut.longSideDeg === 180 ? cut.referenceLineAtMm : cut.oppositeLineAtMm;
          expect(longer).toBeGreaterThan(shorter);
        });
        expect(list.stock.turnEachNextDeg).toBe(180);
      }),
      { numRuns: 150 },
    );
  });
});

describe('miter root gap', () => {
  // ASME B36.10M (recalled): NPS 12 STD 12.750 x 0.375 in. R = 1.5 × NPS 12 = 18 in, 3 welds: c = 15°.
  const pipe = { odMm: 323.85, wallMm: 9.525 };
  const base = { pipe, bendDeg: 90, welds: 3, radiusMm: 457.2 };
  const c = (15 * Math.PI) / 180;

  it('sets each piece end back g/2 square to its weld plane: g/(2 cos c) along the pipe, every length shorter by that per cut end, the stock by welds × g / cos c (right-triangle geometry)', () => {
    const g = 3.2;
    const plain = miterCutList(miterGeometry(base));
    const gapped = miterCutList(miterGeometry({ ...base, gapMm: g }));
    const along = g / (2 * Math.cos(c));
    const [endP, midP] = plain.pieces;
    const [endG, midG] = gapped.pieces;
    for (const key of ['center', 'back', 'throat'] as const) {
      expect(endG![key]).toBeCloseTo(endP![key] - along, 9);
      expect(midG![key]).toBeCloseTo(midP![key] - 2 * along, 9);
    }
    expect(gapped.stock.lengthMm).toBeCloseTo(plain.stock.lengthMm - (3 * g) / Math.cos(c), 9);
    // One cut still serves the pieces on both sides: the last cut sits one end piece's centre length before the stock's end.
    expect(gapped.stock.lengthMm - gapped.stock.cuts.at(-1)!.centerAtMm).toBeCloseTo(endG!.center, 9);
  });

  it('refuses a negative gap and one that leaves a piece no throat (g < 2 (R − r) sin c)', () => {
    expectGirthError(() => miterGeometry({ ...base, gapMm: -1 }), 'NEGATIVE', 'gapMm');
    const most = 2 * (457.2 - 323.85 / 2) * Math.sin(c);
    expect(() => miterGeometry({ ...base, gapMm: most * 0.999 })).not.toThrow();
    expectGirthError(() => miterGeometry({ ...base, gapMm: most * 1.001 }), 'OUT_OF_RANGE', 'gapMm');
  });
});
