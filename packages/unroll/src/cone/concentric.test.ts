import { PLATE_MM } from '@girth/pipes';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { frustumNormal, makeConeFrustum, makeConeSheet, maxPlateThicknessMm, sheetElement } from '@girth/geometry';
import type { Arc2, Point2, Segment2 } from '../types.js';
import { layoutConcentricCone } from './concentric.js';
import { describeResult } from '../describe-result.js';
import { unfoldStrip } from './unfold-strip.js';
import { d2, expectNear, reducerArb } from './test-support/cone-test-support.js';

const IN = 25.4;
const arcPoint = (a: Arc2, deg: number): Point2 => [
  a.center[0] + a.radiusMm * Math.cos((deg * Math.PI) / 180),
  a.center[1] + a.radiusMm * Math.sin((deg * Math.PI) / 180),
];

describe('concentric cone: published worked example', () => {
  it('8 in to 5 in, 4 in long, thin plate: pattern radii 11.39 in and 7.12 in, sweep 126.4°', () => {
    // Source: public geometry page "Drawing Nets" (ceemrr.com, Geometry2/DrawingsNets6), worked example; method
    // also in L. Longfield, Sheet Metal Drafting (1921). Checked to the precision the example gives
    // (0.01 in: ± 0.005 in; 0.1°: ± 0.05°).
    const r = layoutConcentricCone({ largeDiameterMm: 8 * IN, smallDiameterMm: 5 * IN, lengthMm: 4 * IN, thicknessMm: 0 });
    expectNear(r.pattern.outerRadius / IN, 11.39, 0.005, 'outer radius, in');
    expectNear(r.pattern.innerRadius / IN, 7.12, 0.005, 'inner radius, in');
    expectNear(r.pattern.sweepDeg, 126.4, 0.05, 'sweep, deg');
  });
});

describe('concentric cone: development formulas (invariants)', () => {
  it('s = sqrt(L² + ((D − d)/2)²), radii D s/(D − d) and d s/(D − d), sweep 180° (D − d)/s; the outer arc rolls back to π D', () => {
    // Formulas: REFERENCES.md "Concentric cone development" (ceemrr.com Drawing Nets; Longfield 1921).
    fc.assert(
      fc.property(reducerArb, fc.constantFrom(4, 7, 16, 32), (c, n) => {
        const { largeDiameterMm: D, smallDiameterMm: d, lengthMm: L } = c;
        const r = layoutConcentricCone({ ...c, thicknessMm: 0 }, { stations: n });
        const s = Math.hypot(L, (D - d) / 2);
        const tol = 1e-9 * Math.max(D * s / (D - d), 1);
        expectNear(r.pattern.slantHeight, s, 1e-9 * s, 'slant');
        expectNear(r.pattern.outerRadius, (D * s) / (D - d), tol, 'outer radius');
        expectNear(r.pattern.innerRadius, (d * s) / (D - d), tol, 'inner radius');
        expectNear(r.pattern.sweepDeg, (180 * (D - d)) / s, 1e-9, 'sweep');
        // Rolls back: arc length = radius x sweep in radians = π D (and π d).
        const t = r.templates[0]!;
        const outer = t.cut[0] as Arc2;
        const inner = t.cut[2] as Arc2;
        expectNear((outer.radiusMm * (outer.endDeg - outer.startDeg) * Math.PI) / 180, Math.PI * D, 1e-9 * D, 'outer arc = π D');
        expectNear((inner.radiusMm * (inner.endDeg - inner.startDeg) * Math.PI) / 180, Math.PI * d, 1e-9 * D, 'inner arc = π d');
        expectNear(t.stations.at(-1)!.values.outerArc!, Math.PI * D, 1e-9 * D, 'table outer arc at the closing edge');
        expectNear(t.stations.at(-1)!.values.innerArc!, Math.PI * d, 1e-9 * D, 'table inner arc at the closing edge');
        expect(t.stations).toHaveLength(n + 1);
      }),
      { numRuns: 200 },
    );
  });

  it('the cut is one closed loop: outer arc, left edge, inner arc, right edge; edges are elements of length s', () => {
    fc.assert(
      fc.property(reducerArb, fc.double({ min: 0, max: 0.95, noNaN: true }), (c, tf) => {
        const given = makeConeFrustum({ largeRadiusMm: c.largeDiameterMm / 2, smallRadiusMm: c.smallDiameterMm / 2, lengthMm: c.lengthMm });
        // Plates up to the limit of limits.ts (PLATE_MM, 500 mm) and short of closing the small end.
        const r = layoutConcentricCone({ ...c, thicknessMm: Math.min(tf * maxPlateThicknessMm(given, 'outside'), PLATE_MM.max) });
        const [outer, left, inner, right] = r.templates[0]!.cut as [Arc2, Segment2, Arc2, Segment2];
        const tol = 1e-9 * r.pattern.outerRadius;
        expectNear(d2(arcPoint(outer, outer.endDeg), left.from), 0, tol, 'outer end → left edge');
        expectNear(d2(left.to, arcPoint(inner, inner.endDeg)), 0, tol, 'left edge → inner end');
        expectNear(d2(arcPoint(inner, inner.startDeg), right.from), 0, tol, 'inner start → right edge');
        expectNear(d2(right.to, arcPoint(outer, outer.startDeg)), 0, tol, 'right edge → outer start');
        expectNear(d2(left.from, left.to), r.pattern.slantHeight, tol, 'left edge length');
        expectNear(d2(right.from, right.to), r.pattern.slantHeight, tol, 'right edge length');
      }),
      { numRuns: 100 },
    );
  });

  it('plate size, chord and rise match a dense sampling of the drawn arcs', () => {
    for (const spec of [
      { largeDiameterMm: 8 * IN, smallDiameterMm: 5 * IN, lengthMm: 4 * IN },
      { largeDiameterMm: 1000, smallDiameterMm: 100, lengthMm: 150 }, // sweep over 180°
      { largeDiameterMm: 610, smallDiameterMm: 508, lengthMm: 900 },
    ]) {
      for (const k of [1, 2, 3]) {
        const r = layoutConcentricCone({ ...spec, thicknessMm: 0 }, { stations: 12, segments: k });
        const t = r.templates[0]!;
        const piece = r.pieces[0]!;
        const outer = t.cut[0] as Arc2;
        const inner = t.cut[2] as Arc2;
        const pts: Point2[] = [];
        for (let i = 0; i <= 20000; i++) {
          const deg = outer.startDeg + ((outer.endDeg - outer.startDeg) * i) / 20000;
          pts.push(arcPoint(outer, deg), arcPoint(inner, deg));
        }
        const xs = pts.map((p) => p[0]);
        const ys = pts.map((p) => p[1]);
        const sag = 1e-6 * outer.radiusMm; // sampling error of 20000 steps
        expectNear(Math.min(...xs), 0, sag, 'min x');
        expectNear(Math.min(...ys), 0, sag, 'min y');
        expectNear(Math.max(...xs), piece.widthMm, sag, 'width');
        expectNear(Math.max(...ys), piece.heightMm, sag, 'height');
        const a = arcPoint(outer, outer.startDeg);
        const b = arcPoint(outer, outer.endDeg);
        expectNear(d2(a, b), piece.outerChordMm, 1e-9 * outer.radiusMm, 'outer chord');
        const mid = arcPoint(outer, (outer.startDeg + outer.endDeg) / 2);
        const riseFromChord = Math.abs((b[0] - a[0]) * (mid[1] - a[1]) - (b[1] - a[1]) * (mid[0] - a[0])) / d2(a, b);
        expectNear(riseFromChord, piece.outerRiseMm, 1e-9 * outer.radiusMm, 'outer rise');
        expect(piece.centerMm).toEqual(outer.center);
      }
    }
  });
});

describe('concentric cone: plate thickness', () => {
  it('develops the mean surface: mean diameters D − t / cos(half angle) for outside, D + t / cos for inside', () => {
    // Rule of makeConeSheet (mean surface t/2 inside the given one, square to the cone surface).
    const D = 406.4;
    const d = 273;
    const L = 300;
    const t = 10;
    const cosA = L / Math.hypot(L, (D - d) / 2);
    const out = layoutConcentricCone({ largeDiameterMm: D, smallDiameterMm: d, lengthMm: L, thicknessMm: t });
    expectNear(out.ends.large.meanGirthMm, Math.PI * (D - t / cosA), 1e-9, 'outside given: large mean girth');
    expectNear(out.ends.small.meanGirthMm, Math.PI * (d - t / cosA), 1e-9, 'outside given: small mean girth');
    expectNear(out.pattern.slantHeight, Math.hypot(L, (D - d) / 2), 1e-9, 'slant unchanged by thickness');
    const ins = layoutConcentricCone({ largeDiameterMm: D, smallDiameterMm: d, lengthMm: L, thicknessMm: t, diametersAt: 'inside' });
    expectNear(ins.ends.large.meanGirthMm, Math.PI * (D + t / cosA), 1e-9, 'inside given: large mean girth');
    const mean = layoutConcentricCone({ largeDiameterMm: D, smallDiameterMm: d, lengthMm: L, thicknessMm: t, diametersAt: 'mean' });
    expectNear(mean.pattern.outerRadius, layoutConcentricCone({ largeDiameterMm: D, smallDiameterMm: d, lengthMm: L, thicknessMm: 0 }).pattern.outerRadius, 1e-9, 'mean given: as thin');
    expect(out.pipes.map((p) => [p.role, p.odMm, p.wallMm, p.idMm])).toEqual([
      ['large-end', D, t, D - 2 * t],
      ['small-end', d, t, d - 2 * t],
    ]);
  });
});

describe('concentric cone: agrees with triangulation', () => {
  it('unfolding the right cone triangle by triangle puts every point on the two arcs, and the stations where the template has them', () => {
    // Two independent developments: the closed-form annular sector, and the general strip unfolding.
    const D = 355.6;
    const d = 219.1;
    const L = 330;
    const r = layoutConcentricCone({ largeDiameterMm: D, smallDiameterMm: d, lengthMm: L, thicknessMm: 0 }, { stations: 16 });
    const t = r.templates[0]!;
    const f = makeConeFrustum({ largeRadiusMm: D / 2, smallRadiusMm: d / 2, lengthMm: L });
    const sheet = makeConeSheet(f, 0);
    const runs = 16 * 64;
    const els = Array.from({ length: runs + 1 }, (_, i) => sheetElement(sheet, (2 * Math.PI * i) / runs));
    const strip = unfoldStrip(els.map((e) => e.large), els.map((e) => e.small), frustumNormal(f, 0));
    // Apex on the flat: on the first element, extended past the small end by the ratio of the pattern radii.
    const a0 = strip.large[0]!;
    const b0 = strip.small[0]!;
    const k = r.pattern.outerRadius / (r.pattern.outerRadius - r.pattern.innerRadius);
    const apex: Point2 = [a0[0] + (b0[0] - a0[0]) * k, a0[1] + (b0[1] - a0[1]) * k];
    strip.large.forEach((p, i) => expectNear(d2(p, apex), r.pattern.outerRadius, 1e-6, `large point ${i} on the outer arc`));
    strip.small.forEach((p, i) => expectNear(d2(p, apex), r.pattern.innerRadius, 1e-6, `small point ${i} on the inner arc`));
    // Same placement rule as the template (middle element upright, large end up, corner at 0, 0).
    const mid = runs / 2;
    const ang = Math.PI / 2 - Math.atan2(strip.large[mid]![1] - strip.small[mid]![1], strip.large[mid]![0] - strip.small[mid]![0]);
    const rot = (p: Point2): Point2 => [Math.cos(ang) * p[0] - Math.sin(ang) * p[1], Math.sin(ang) * p[0] + Math.cos(ang) * p[1]];
    const centerFlat = rot(apex);
    const templateCenter = (t.cut[0] as Arc2).center;
    const shift: Point2 = [templateCenter[0] - centerFlat[0], templateCenter[1] - centerFlat[1]];
    // The polygon falls short of the true sweep by the sum of its chords' angles: far below 0.01 mm at 64 runs per station.
    for (const line of t.stationLines) {
      const i = (line.n - 1) * 64;
      const p = rot(strip.large[i]!);
      expectNear(d2([p[0] + shift[0], p[1] + shift[1]], line.from), 0, 0.01, `station ${line.n}, large end`);
    }
  });
});

describe('concentric cone: segments', () => {
  it('the sweeps of the pieces add up to the whole, and each piece lists its stations edge to edge', () => {
    fc.assert(
      fc.property(reducerArb, fc.constantFrom(2, 3, 4, 6, 12), (c, k) => {
        const whole = layoutConcentricCone({ ...c, thicknessMm: 0 }, { stations: 24 });
        const r = layoutConcentricCone({ ...c, thicknessMm: 0 }, { stations: 24, segments: k });
        expect(r.templates.map((t) => t.id)).toEqual(Array.from({ length: k }, (_, i) => `cone-pattern-${i + 1}`));
        const sum = r.templates.reduce((s, t) => s + ((t.cut[0] as Arc2).endDeg - (t.cut[0] as Arc2).startDeg), 0);
        expectNear(sum, whole.pattern.sweepDeg, 1e-9, 'sum of piece sweeps');
        expectNear(r.pieces.reduce((s, p) => s + p.sweepDeg, 0), whole.pattern.sweepDeg, 1e-9, 'sum of piece sweeps (result)');
        const girth = r.templates.reduce((s, t) => s + t.stations.at(-1)!.values.outerArc!, 0);
        expectNear(girth, Math.PI * c.largeDiameterMm, 1e-9 * c.largeDiameterMm, 'girths add up to π D');
        r.templates.forEach((t, j) => {
          expect(t.stations.map((s) => s.n)).toEqual(Array.from({ length: 24 / k + 1 }, (_, i) => (j * 24) / k + i + 1));
        });
      }),
      { numRuns: 50 },
    );
  });
});

describe('concentric cone: template', () => {
  it('carries labels, station lines on the radii, notes with the dimensions and no caution of their own', () => {
    const r = layoutConcentricCone({ largeDiameterMm: 219.1, smallDiameterMm: 168.3, lengthMm: 152, thicknessMm: 6, largeLabel: 'NPS 8 STD', smallLabel: 'NPS 6 STD' });
    const t = describeResult(r, { units: 'in' }).templates[0]!;
    expect(t.id).toBe('cone-pattern');
    expect(t.kind).toBe('flat');
    expect(t.title).toBe('Concentric cone: NPS 8 STD to NPS 6 STD');
    expect(t.labels.filter((l) => l.text === 'SEAM')).toHaveLength(2);
    // An inch job reads inches first (1 in = 25.4 mm exactly), mm in brackets.
    expect(t.notes.some((x) => x.includes(`outer radius ${(r.pattern.outerRadius / 25.4).toFixed(3)}" (${r.pattern.outerRadius.toFixed(1)} mm)`))).toBe(true);
    expect(r.templates[0]!.notes.some((x) => x.includes(`outer radius ${r.pattern.outerRadius.toFixed(1)} mm (${(r.pattern.outerRadius / 25.4).toFixed(3)} in)`))).toBe(true);
    // No caution in the notes (the exporters print `CAUTION` once per sheet, file and table; a caution in the notes showed twice).
    expect(t.notes.filter((x) => /caution/i.test(x))).toEqual([]);
    const outer = t.cut[0] as Arc2;
    for (const line of t.stationLines) {
      expectNear(d2(line.from, outer.center), r.pattern.outerRadius, 1e-9, 'from on outer arc');
      expectNear(d2(line.to, outer.center), r.pattern.innerRadius, 1e-9, 'to on inner arc');
    }
    // Station 1 on the right-hand edge, numbers rising to the left.
    expect(t.stationLines[0]!.from[0]).toBeGreaterThan(t.stationLines[1]!.from[0]);
    expect(r.warnings).toEqual([]);
  });

  it('warns when the half-apex angle passes 30°', () => {
    const r = layoutConcentricCone({ largeDiameterMm: 400, smallDiameterMm: 200, apexAngleDeg: 70, thicknessMm: 0 });
    expect(r.warnings.map((w) => w.code)).toEqual(['STEEP_CONE']);
    expectNear(r.lengthMm, 100 / Math.tan((35 * Math.PI) / 180), 1e-9, 'length from the angle');
  });
});
