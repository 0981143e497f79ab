import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { hitGenerator } from '../generators.js';
import { addScaled, dot, norm, sub, type Vec3 } from '../vec3.js';
import { miterGeometry } from './elbow-geometry.js';
import type { MiterCutEnd, MiterGeometry } from './types.js';
import { expectClose, expectPointClose, stationPhis } from '../plane-cut/test-support/expect-close.js';
import { NPS12_STD, arbMiterSpec } from './test-support/specs.js';

function cutPoint(cut: MiterCutEnd | undefined, phi: number): Vec3 {
  if (!cut) throw new Error('missing cut end');
  const hit = hitGenerator(cut.bundle, cut.host, phi);
  if (!hit) throw new Error(`generator ${phi} misses weld ${cut.weld}`);
  return hit.point;
}

/** Distance of p from the line through `a` along unit `u`. */
function distFromLine(p: Vec3, a: Vec3, u: Vec3): number {
  const rel = sub(p, a);
  return norm(addScaled(rel, u, -dot(rel, u)));
}

function checkWeldsCoincide(g: MiterGeometry, phis: readonly number[]): void {
  const od = g.spec.pipe.odMm;
  const r = g.spec.fitRadiusMm;
  for (let j = 1; j <= g.spec.welds; j++) {
    const before = g.pieces[j - 1];
    const after = g.pieces[j];
    if (!before || !after) throw new Error('missing piece');
    for (const phi of phis) {
      const p = cutPoint(before.farCut, phi);
      const q = cutPoint(after.nearCut, phi);
      // The same point of the weld, reached from both pieces (invariant: the pieces fit).
      expectPointClose(p, q, 1e-9 * od, `weld ${j} phi ${phi}`);
      // As sets: each piece's cut point lies on the other piece's fit surface and on the weld plane.
      expectClose(distFromLine(p, after.tangentPoint, after.direction), r, 1e-9 * od, `weld ${j}: piece ${j - 1} point on piece ${j}`);
      expectClose(distFromLine(q, before.tangentPoint, before.direction), r, 1e-9 * od, `weld ${j}: piece ${j} point on piece ${j - 1}`);
      const plane = g.weldPlanes[j - 1];
      if (!plane) throw new Error('missing plane');
      expectClose(dot(sub(p, plane.point), plane.normal), 0, 1e-9 * od, `weld ${j}: point on its plane`);
    }
  }
}

describe('miterGeometry', () => {
  it('makes adjacent pieces meet on the same contour at every weld (invariant, within 1e-9 × OD)', () => {
    const g = miterGeometry({ pipe: NPS12_STD, bendDeg: 90, welds: 3, radiusMm: 457.2, tangentMm: 100 });
    expect(g.pieces.map((p) => p.role)).toEqual(['end', 'middle', 'middle', 'end']);
    checkWeldsCoincide(g, stationPhis(64));
  });

  it('makes adjacent pieces meet for any valid elbow (property)', () => {
    fc.assert(
      fc.property(arbMiterSpec, (spec) => checkWeldsCoincide(miterGeometry(spec), stationPhis(16))),
      { numRuns: 150 },
    );
  });

  it('puts each middle piece\'s far cut where its near cut lands when turned 180° about the pipe axis and moved one centre length (invariant)', () => {
    const g = miterGeometry({ pipe: NPS12_STD, bendDeg: 60, welds: 4, radiusMm: 600 });
    const c = (g.spec.cutAngleDeg * Math.PI) / 180;
    const centre = 2 * g.spec.radiusMm * Math.tan(c); // REFERENCES.md: middle piece on the centreline 2 R tan(c)
    for (const piece of g.pieces.filter((p) => p.role === 'middle')) {
      for (const phi of stationPhis(32)) {
        const near = cutPoint(piece.nearCut, phi);
        // Turn 180° about the axis through tangentPoint along direction: the radial part flips.
        const rel = sub(near, piece.tangentPoint);
        const axial = dot(rel, piece.direction);
        const radial = addScaled(rel, piece.direction, -axial);
        const turned = addScaled(addScaled(piece.tangentPoint, piece.direction, axial + centre), radial, -1);
        expectPointClose(turned, cutPoint(piece.farCut, phi + Math.PI), 1e-9 * g.spec.pipe.odMm, `piece ${piece.index} phi ${phi}`);
      }
    }
  });

  it('gives both end pieces the same cut (one template serves both, invariant)', () => {
    const g = miterGeometry({ pipe: NPS12_STD, bendDeg: 75, welds: 2, radiusMm: 500, tangentMm: 80 });
    const first = g.pieces[0];
    const last = g.pieces[g.pieces.length - 1];
    if (!first?.farCut || !last?.nearCut) throw new Error('missing ends');
    for (const phi of stationPhis(32)) {
      const a = hitGenerator(first.farCut.bundle, first.farCut.host, phi)?.axialMm;
      const b = hitGenerator(last.nearCut.bundle, last.nearCut.host, phi)?.axialMm;
      expectClose(a ?? NaN, b ?? NaN, 1e-9 * NPS12_STD.odMm, `end cut at phi ${phi}`);
    }
    expect(first.nearCut).toBeUndefined();
    expect(last.farCut).toBeUndefined();
  });

  it('puts every weld plane through the bend axis, at 2 c between pieces (REFERENCES.md: cut angle B / 2W)', () => {
    const g = miterGeometry({ pipe: NPS12_STD, bendDeg: 90, welds: 3, radiusMm: 457.2 });
    for (const plane of g.weldPlanes) {
      expectClose(dot(sub(g.bendCenter, plane.point), plane.normal), 0, 1e-12, 'centre on plane');
      expectClose(dot(g.bendAxis, plane.normal), 0, 1e-12, 'axis in plane');
    }
    for (let k = 1; k < g.pieces.length; k++) {
      const a = g.pieces[k - 1]?.direction ?? [0, 0, 0];
      const b = g.pieces[k]?.direction ?? [0, 0, 0];
      expectClose((Math.acos(Math.min(1, dot(a, b))) * 180) / Math.PI, 30, 1e-9, `turn at weld ${k}`);
    }
  });
});
