import { PLATE_MM } from '@girth/pipes';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { makeConeFrustum, maxPlateThicknessMm } from '@girth/geometry';
import type { Template } from '../types.js';
import { layoutEccentricCone } from './eccentric.js';
import type { EccentricSeam } from './types.js';
import { d2, d3, expectNear, polylineLength, reducerArb, rollBack, turn2, type P2, type V3 } from './test-support/cone-test-support.js';

/** The drawn outline of a piece split into its large edge and its small edge, point for point. */
function edges(t: Template): { a: P2[]; b: P2[] } {
  const part = t.cut[0];
  if (part?.kind !== 'polyline' || !part.closed) throw new Error('expected one closed polyline');
  const n = part.points.length / 2;
  return { a: part.points.slice(0, n) as P2[], b: (part.points.slice(n) as P2[]).reverse() };
}

/** True points of the end circles (thin plate) at grid index i from the seam. */
function circlePoints(D: number, d: number, L: number, seam: EccentricSeam, runs: number, from: number, count: number) {
  const R = D / 2;
  const r = d / 2;
  const s = seam === 'flat-side' ? 0 : Math.PI;
  const A: V3[] = [];
  const B: V3[] = [];
  for (let i = 0; i < count; i++) {
    const t = s + (2 * Math.PI * (from + i)) / runs;
    A.push([R * Math.cos(t), R * Math.sin(t), 0]);
    B.push([R - r + r * Math.cos(t), r * Math.sin(t), L]);
  }
  return { A, B };
}

describe('eccentric cone: elements (invariants of a cone with one side flat)', () => {
  it('the flat-side element equals the length L; the opposite one is sqrt(L² + (D − d)²)', () => {
    fc.assert(
      fc.property(reducerArb, fc.constantFrom<EccentricSeam>('flat-side', 'opposite'), fc.double({ min: 0, max: 0.95, noNaN: true }), (c, seam, tf) => {
        const R = c.largeDiameterMm / 2;
        const rr = c.smallDiameterMm / 2;
        const given = makeConeFrustum({ largeRadiusMm: R, smallRadiusMm: rr, lengthMm: c.lengthMm, offsetMm: R - rr });
        // Plates up to the limit of limits.ts (PLATE_MM, 500 mm) and short of closing the small end.
        const t = Math.min(tf * maxPlateThicknessMm(given, 'outside'), PLATE_MM.max);
        const r = layoutEccentricCone({ ...c, thicknessMm: t }, { stations: 8, seam, chordToleranceMm: 0.5 });
        const rows = r.templates[0]!.stations;
        const flatRow = rows.find((x) => x.angleDeg === (seam === 'flat-side' ? 0 : 180))!;
        const oppRow = rows.find((x) => x.angleDeg === (seam === 'flat-side' ? 180 : 0))!;
        const L = c.lengthMm;
        expectNear(flatRow.values.element!, L, 1e-9 * L, 'flat-side element');
        expectNear(oppRow.values.element!, Math.hypot(L, c.largeDiameterMm - c.smallDiameterMm), 1e-9 * (L + c.largeDiameterMm), 'opposite element');
      }),
      { numRuns: 40 },
    );
  });

  it('the table gives true lengths: elements, diagonals and steps between points of the end circles (thin plate)', () => {
    const D = 406.4;
    const d = 219.1;
    const L = 380;
    const r = layoutEccentricCone({ largeDiameterMm: D, smallDiameterMm: d, lengthMm: L, thicknessMm: 0 }, { stations: 12 });
    const { A, B } = circlePoints(D, d, L, 'flat-side', 12, 0, 13);
    for (const [i, row] of r.templates[0]!.stations.entries()) {
      expectNear(row.values.element!, d3(A[i]!, B[i]!), 1e-9, `element ${row.n}`);
      if (i === 0) {
        expect(row.values.diagonal).toBeUndefined();
        continue;
      }
      expectNear(row.values.diagonal!, d3(A[i - 1]!, B[i]!), 1e-9, `diagonal ${row.n}`);
      expectNear(row.values.largeStep!, 2 * (D / 2) * Math.sin(Math.PI / 12), 1e-9, `large step ${row.n}`);
      expectNear(row.values.smallStep!, 2 * (d / 2) * Math.sin(Math.PI / 12), 1e-9, `small step ${row.n}`);
    }
  });
});

describe('eccentric cone: the pattern rolls back into the cone', () => {
  it('folding the drawn triangles by their flat lengths puts every end point on its circle, at its height, within 1e-6 mm', () => {
    fc.assert(
      fc.property(reducerArb, fc.constantFrom<EccentricSeam>('flat-side', 'opposite'), fc.constantFrom(1, 2, 4), (c, seam, k) => {
        const r = layoutEccentricCone({ ...c, thicknessMm: 0 }, { stations: 16, segments: k, seam, chordToleranceMm: 0.2 });
        const runs = 16 * r.outline.subStationsPerStation;
        const R = c.largeDiameterMm / 2;
        const rr = c.smallDiameterMm / 2;
        r.templates.forEach((t, j) => {
          const { a, b } = edges(t);
          const truth = circlePoints(c.largeDiameterMm, c.smallDiameterMm, c.lengthMm, seam, runs, (j * runs) / k, a.length);
          // Every flat triangle turns the way the true one does seen from outside: nothing is mirrored or folded over.
          const seenFromOutside = (p: V3, q: V3, w: V3): number => {
            const u: V3 = [q[0] - p[0], q[1] - p[1], q[2] - p[2]];
            const v: V3 = [w[0] - p[0], w[1] - p[1], w[2] - p[2]];
            const n: V3 = [u[1] * v[2] - u[2] * v[1], u[2] * v[0] - u[0] * v[2], u[0] * v[1] - u[1] * v[0]];
            const cz = (p[2] + q[2] + w[2]) / 3;
            const axis: V3 = [((R - rr) * cz) / c.lengthMm, 0, cz];
            const cx = (p[0] + q[0] + w[0]) / 3 - axis[0];
            const cy = (p[1] + q[1] + w[1]) / 3 - axis[1];
            return Math.sign(n[0] * cx + n[1] * cy);
          };
          for (let i = 0; i + 1 < a.length; i++) {
            const [A0, A1, B0, B1] = [truth.A[i]!, truth.A[i + 1]!, truth.B[i]!, truth.B[i + 1]!];
            expect(Math.sign(turn2(a[i]!, b[i]!, b[i + 1]!))).toBe(seenFromOutside(A0, B0, B1));
            expect(Math.sign(turn2(a[i]!, b[i + 1]!, a[i + 1]!))).toBe(seenFromOutside(A0, B1, A1));
          }
          const back = rollBack(a, b, truth.A, truth.B);
          back.a.forEach((p, i) => {
            expectNear(p[2], 0, 1e-6, `large end height, point ${i}`);
            expectNear(Math.hypot(p[0], p[1]), R, 1e-6, `large end radius, point ${i}`);
          });
          back.b.forEach((p, i) => {
            expectNear(p[2], c.lengthMm, 1e-6, `small end height, point ${i}`);
            expectNear(Math.hypot(p[0] - (R - rr), p[1]), rr, 1e-6, `small end radius, point ${i}`);
          });
        });
      }),
      { numRuns: 20 },
    );
  });

  it('the drawn edges measure π D and π d, short by no more than the chord tolerance (thin plate)', () => {
    fc.assert(
      fc.property(reducerArb, fc.constantFrom(0.01, 0.05, 0.5), (c, tol) => {
        const r = layoutEccentricCone({ ...c, thicknessMm: 0 }, { chordToleranceMm: tol });
        const { a, b } = edges(r.templates[0]!);
        const large = polylineLength(a);
        const small = polylineLength(b);
        expect(large).toBeLessThanOrEqual(Math.PI * c.largeDiameterMm + 1e-9);
        expect(Math.PI * c.largeDiameterMm - large).toBeLessThanOrEqual(tol);
        expect(small).toBeLessThanOrEqual(Math.PI * c.smallDiameterMm + 1e-9);
        expect(Math.PI * c.smallDiameterMm - small).toBeLessThanOrEqual(tol);
        expect(r.outline.maxChordErrorMm).toBeLessThanOrEqual(tol);
        // The true girths reported for the ends are the circles' (Richardson-extrapolated chords).
        expectNear(r.ends.large.meanGirthMm, Math.PI * c.largeDiameterMm, 1e-6 * c.largeDiameterMm, 'large girth');
        expectNear(r.ends.small.meanGirthMm, Math.PI * c.smallDiameterMm, 1e-6 * c.largeDiameterMm, 'small girth');
      }),
      { numRuns: 30 },
    );
  });

  it('with plate thickness, every rebuilt end point lies half the thickness inside the outside cone, in its end plane', () => {
    const D = 610;
    const d = 323.9;
    const L = 600;
    const t = 12;
    const r = layoutEccentricCone({ largeDiameterMm: D, smallDiameterMm: d, lengthMm: L, thicknessMm: t }, { stations: 8, chordToleranceMm: 0.5 });
    const { a, b } = edges(r.templates[0]!);
    const runs = 8 * r.outline.subStationsPerStation;
    // Targets: the mean surface found independently, by pushing the outside circle points t/2 along a numerically
    // differentiated normal and sliding back into the end plane.
    const R = D / 2;
    const rr = d / 2;
    const out = (th: number, end: 'A' | 'B'): V3 =>
      end === 'A' ? [R * Math.cos(th), R * Math.sin(th), 0] : [R - rr + rr * Math.cos(th), rr * Math.sin(th), L];
    const mean = (th: number): { A: V3; B: V3 } => {
      const h = 1e-6;
      const pa = out(th, 'A');
      const pb = out(th, 'B');
      const tan: V3 = [(out(th + h, 'A')[0] - out(th - h, 'A')[0]) / (2 * h), (out(th + h, 'A')[1] - out(th - h, 'A')[1]) / (2 * h), 0];
      const u: V3 = [pb[0] - pa[0], pb[1] - pa[1], pb[2] - pa[2]];
      const nx = tan[1] * u[2] - tan[2] * u[1];
      const ny = tan[2] * u[0] - tan[0] * u[2];
      const nz = tan[0] * u[1] - tan[1] * u[0];
      const nn = Math.hypot(nx, ny, nz);
      const m = -t / 2 / nn;
      const slide = -(m * nz) / L;
      const sh: V3 = [m * nx + slide * u[0], m * ny + slide * u[1], 0];
      return { A: [pa[0] + sh[0], pa[1] + sh[1], 0], B: [pb[0] + sh[0], pb[1] + sh[1], L] };
    };
    const targets = a.map((_, i) => mean((2 * Math.PI * i) / runs));
    const back = rollBack(a, b, targets.map((x) => x.A), targets.map((x) => x.B));
    // Distance to the outside cone by brute force over its elements (no normals involved).
    const toCone = (p: V3): number => {
      const f = (th: number): number => lineDistance(p, out(th, 'A'), out(th, 'B'));
      let best = 0;
      for (let k = 1; k < 720; k++) if (f((2 * Math.PI * k) / 720) < f((2 * Math.PI * best) / 720)) best = k;
      let lo = (2 * Math.PI * (best - 1)) / 720;
      let hi = (2 * Math.PI * (best + 1)) / 720;
      const g = (Math.sqrt(5) - 1) / 2;
      while (hi - lo > 1e-13) {
        const x1 = hi - g * (hi - lo);
        const x2 = lo + g * (hi - lo);
        if (f(x1) < f(x2)) hi = x2;
        else lo = x1;
      }
      return f((lo + hi) / 2);
    };
    for (const [i, p] of back.a.entries()) {
      expectNear(p[2], 0, 1e-6, `large height ${i}`);
      if (i % 5 === 0) expectNear(toCone(p), t / 2, 1e-6, `large to outside ${i}`);
    }
    for (const [i, p] of back.b.entries()) {
      expectNear(p[2], L, 1e-6, `small height ${i}`);
      if (i % 5 === 0) expectNear(toCone(p), t / 2, 1e-6, `small to outside ${i}`);
    }
    for (const [i, p] of back.a.entries()) expectNear(d3(p, targets[i]!.A), 0, 1e-6, `large point ${i}`);
  });
});

function lineDistance(p: V3, a: V3, b: V3): number {
  const u: V3 = [b[0] - a[0], b[1] - a[1], b[2] - a[2]];
  const w: V3 = [p[0] - a[0], p[1] - a[1], p[2] - a[2]];
  const s = (w[0] * u[0] + w[1] * u[1] + w[2] * u[2]) / (u[0] * u[0] + u[1] * u[1] + u[2] * u[2]);
  return Math.hypot(w[0] - s * u[0], w[1] - s * u[1], w[2] - s * u[2]);
}

describe('eccentric cone: segments', () => {
  it('the pieces add up to the whole: girths, and the turn of the elements on the flat (thin plate)', () => {
    const spec = { largeDiameterMm: 508, smallDiameterMm: 273, lengthMm: 460, thicknessMm: 0 };
    const whole = layoutEccentricCone(spec, { stations: 24 });
    const turnOf = (t: Template): number => {
      let sum = 0;
      for (let i = 1; i < t.stationLines.length; i++) {
        const p = t.stationLines[i - 1]!;
        const q = t.stationLines[i]!;
        const a1 = Math.atan2(p.from[1] - p.to[1], p.from[0] - p.to[0]);
        const a2 = Math.atan2(q.from[1] - q.to[1], q.from[0] - q.to[0]);
        let dA = a2 - a1;
        while (dA > Math.PI) dA -= 2 * Math.PI;
        while (dA < -Math.PI) dA += 2 * Math.PI;
        sum += dA;
      }
      return sum;
    };
    const wholeTurn = turnOf(whole.templates[0]!);
    const wholeGirth = polylineLength(edges(whole.templates[0]!).a);
    for (const k of [2, 3, 4, 6]) {
      const r = layoutEccentricCone(spec, { stations: 24, segments: k });
      expect(r.templates.map((t) => t.id)).toEqual(Array.from({ length: k }, (_, i) => `cone-pattern-${i + 1}`));
      expectNear(r.templates.reduce((s, t) => s + turnOf(t), 0), wholeTurn, 1e-9, `turn, ${k} pieces`);
      expectNear(r.templates.reduce((s, t) => s + polylineLength(edges(t).a), 0), wholeGirth, 1e-6, `large girth, ${k} pieces`);
      // Neighbouring pieces meet on the same element.
      for (let j = 0; j + 1 < k; j++) {
        const last = r.templates[j]!.stations.at(-1)!;
        const first = r.templates[j + 1]!.stations[0]!;
        expect(last.n).toBe(first.n);
        expectNear(last.values.element!, first.values.element!, 1e-12, 'shared element');
      }
    }
  });
});

describe('eccentric cone: template', () => {
  it('is a closed outline with station lines on the elements, labels, no caution of its own and the result contract', () => {
    const r = layoutEccentricCone(
      { largeDiameterMm: 323.9, smallDiameterMm: 219.1, lengthMm: 305, thicknessMm: 8, largeLabel: 'DN 300', smallLabel: 'DN 200' },
      { stations: 12, seam: 'opposite' },
    );
    expect(r.kind).toBe('reducer');
    expect(r.form).toBe('eccentric');
    const t = r.templates[0]!;
    expect(t.id).toBe('cone-pattern');
    expect(t.kind).toBe('flat');
    expect(t.title).toContain('DN 300 to DN 200');
    // No caution in the notes (the exporters print `CAUTION` once per sheet, file and table; a caution in the notes showed twice).
    expect(t.notes.filter((x) => /caution/i.test(x))).toEqual([]);
    expect(t.labels.map((l) => l.text)).toEqual(['SEAM', 'SEAM', 'FLAT SIDE']);
    expect(r.pipes.map((p) => [p.role, p.label, p.odMm, p.idMm])).toEqual([
      ['large-end', 'DN 300', 323.9, 323.9 - 16],
      ['small-end', 'DN 200', 219.1, 219.1 - 16],
    ]);
    const { a, b } = edges(t);
    // Station lines run from the large edge to the small edge at every station, each as long as its element.
    expect(t.stationLines).toHaveLength(13);
    for (const [i, line] of t.stationLines.entries()) {
      expectNear(d2(line.from, line.to), t.stations[i]!.values.element!, 1e-9, `station line ${line.n}`);
      expect(a.some((p) => p[0] === line.from[0] && p[1] === line.from[1])).toBe(true);
      expect(b.some((p) => p[0] === line.to[0] && p[1] === line.to[1])).toBe(true);
    }
    // On the plate: bounding rectangle from (0, 0), middle element upright with the large end on top.
    const all = [...a, ...b];
    expectNear(Math.min(...all.map((p) => p[0])), 0, 1e-9, 'min x');
    expectNear(Math.min(...all.map((p) => p[1])), 0, 1e-9, 'min y');
    expectNear(Math.max(...all.map((p) => p[0])), r.pieces[0]!.widthMm, 1e-9, 'width');
    expectNear(Math.max(...all.map((p) => p[1])), r.pieces[0]!.heightMm, 1e-9, 'height');
    const mid = t.stationLines[6]!;
    expectNear(mid.from[0], mid.to[0], 1e-9, 'middle element upright');
    expect(mid.from[1]).toBeGreaterThan(mid.to[1]);
    // Seam opposite: the pattern is symmetric about the flat side in the middle.
    for (let i = 0; i <= 12; i++) {
      const p = t.stationLines[i]!;
      const q = t.stationLines[12 - i]!;
      expectNear(p.from[0] + q.from[0], 2 * mid.from[0], 1e-6, `mirror x ${i}`);
      expectNear(p.from[1], q.from[1], 1e-6, `mirror y ${i}`);
    }
  });

  it('marks the flat side when it falls between stations', () => {
    const r = layoutEccentricCone({ largeDiameterMm: 300, smallDiameterMm: 200, lengthMm: 250, thicknessMm: 0 }, { stations: 5, seam: 'opposite' });
    const t = r.templates[0]!;
    expect(t.marks).toHaveLength(1);
    const m = t.marks[0]!;
    if (m.kind !== 'segment') throw new Error('expected a segment');
    expectNear(d2(m.from, m.to), 250, 1e-9, 'flat side is L long');
  });
});
