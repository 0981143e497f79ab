import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { isGirthError } from '@girth/pipes';
import type { BranchSpec } from '@girth/geometry';
import type { Point2, Template } from '../types.js';
import { distanceToSegment } from '../internal/test-support/segment-distance.js';
import { expectClose } from '../internal/test-support/expect-close.js';
import { branchAxialClosedForm, holeClosedForm } from '../internal/test-support/branch-fixtures.js';
import { layoutBranch } from './layout-branch.js';

const IN = 25.4;
const DEG = Math.PI / 180;
// ASME B36.10M (REFERENCES.md, recalled): NPS 12 STD 12.750 x 0.375 in, NPS 6 STD 6.625 x 0.280 in.
const NPS12 = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' };
const NPS6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };

const cutbacks = (t: Template): number[] => t.stations.map((s) => s.values.cutback!);
const col = (t: Template, key: string): number[] => t.stations.map((s) => s.values[key]!);
const points = (t: Template): readonly Point2[] => {
  const part = t.cut[0]!;
  if (part.kind !== 'polyline') throw new Error('expected a polyline');
  return part.points;
};

/** Random valid joints: header 50–900 mm, branch up to the header, 15–90°, offsets within the header side. */
const jointArb = fc
  .record({
    headerOd: fc.double({ min: 50, max: 900, noNaN: true }),
    headerWallShare: fc.double({ min: 0.01, max: 0.2, noNaN: true }),
    branchShare: fc.double({ min: 0.1, max: 1, noNaN: true }),
    branchWallShare: fc.double({ min: 0.01, max: 0.2, noNaN: true }),
    angleDeg: fc.double({ min: 15, max: 90, noNaN: true }),
    offsetShare: fc.double({ min: -0.98, max: 0.98, noNaN: true }),
    fit: fc.constantFrom('set-on' as const, 'set-in' as const),
    gapMm: fc.constantFrom(0, 1.6, 3.2),
    stations: fc.integer({ min: 4, max: 48 }),
  })
  .map((j) => {
    const header = { odMm: j.headerOd, wallMm: j.headerOd * j.headerWallShare };
    const R = j.fit === 'set-on' ? header.odMm / 2 : header.odMm / 2 - header.wallMm;
    const branchOd = j.fit === 'set-on' ? (2 * R * j.branchShare) / (1 - 2 * j.branchWallShare) : 2 * R * j.branchShare;
    const branch = { odMm: Math.min(branchOd, header.odMm), wallMm: Math.min(branchOd, header.odMm) * j.branchWallShare };
    const r = j.fit === 'set-on' ? branch.odMm / 2 - branch.wallMm : branch.odMm / 2;
    const spec: BranchSpec = { header, branch, angleDeg: j.angleDeg, offsetMm: j.offsetShare * Math.max(0, Math.min(R, header.odMm / 2) - r), fit: j.fit, gapMm: j.gapMm };
    return { spec, stations: j.stations, R, r };
  });

describe('layoutBranch', () => {
  it('gives a 90° set-on tee the saddle depth of two cylinders', () => {
    // MathWorld, "Cylinder-Cylinder Intersection": h(phi) = R − sqrt(R² − r² sin² phi); branch ID on header OD (common practice).
    const layout = layoutBranch({ header: NPS12, branch: NPS6 });
    const R = NPS12.odMm / 2;
    const r = (NPS6.odMm - 2 * NPS6.wallMm) / 2;
    const h = (phi: number): number => R - Math.sqrt(R * R - r * r * Math.sin(phi) ** 2);
    const [cut] = layout.templates;
    expect(cut.id).toBe('branch-cut');
    if (cut.kind !== 'wrap') throw new Error('the branch cut is a wrap');
    expectClose(cutbacks(cut), cut.stations.map((s) => h(90 * DEG) - h(s.angleDeg * DEG)), 1e-9, 'tee cutback mm');
    expectClose(cut.stretchOutMm, Math.PI * NPS6.odMm, 1e-9, 'stretch-out = π × branch OD');
    expect(cut.wrapOdMm).toBe(NPS6.odMm);
  });

  it('cuts an equal tee (OD to OD) on the planes x = ±z: cutback R |cos phi| (Steinmetz curve)', () => {
    // Wikipedia, "Steinmetz curve": equal cylinders at 90° meet in plane ellipses x = ±z, so the branch cut is R |cos phi| deep.
    const layout = layoutBranch({ header: NPS12, branch: NPS12, contact: { branch: 'outside', header: 'outside' } }, { stations: 12 });
    const R = NPS12.odMm / 2;
    const [cut, hole] = layout.templates;
    expectClose(cutbacks(cut), cut.stations.map((s) => R * Math.abs(Math.cos(s.angleDeg * DEG))), 1e-9, 'equal tee cutback mm');
    // The hole: axial = −R cos phi and girth = R · phi on [−90°, 90°] (the ellipse seen on the header).
    expectClose(col(hole, 'axial'), hole.stations.map((s) => -R * Math.cos(s.angleDeg * DEG)), 1e-9, 'hole axial mm');
    expectClose(col(hole, 'girth'), hole.stations.map((s) => R * Math.asin(Math.sin(s.angleDeg * DEG))), 1e-7, 'hole girth mm');
  });

  it('matches the closed form of two cylinders for any lateral, offset, fit and gap', () => {
    // Closed form from y² + z² = R² (see branch-fixtures); set-on: branch ID on header OD, set-in: branch OD on header ID
    // (common practice); a root gap g cuts to the header surface grown by g (gap square to the surface).
    fc.assert(
      fc.property(jointArb, ({ spec, stations, R, r }) => {
        const layout = layoutBranch(spec, { stations });
        const [cut, hole] = layout.templates;
        const A = spec.angleDeg!;
        const e = spec.offsetMm!;
        const g = spec.gapMm!;
        const phis = cut.stations.map((s) => s.angleDeg * DEG);
        const t = phis.map((phi) => branchAxialClosedForm(R + g, r, A, e, phi));
        let tMax = -Infinity;
        for (let k = 0; k < 20_000; k++) tMax = Math.max(tMax, branchAxialClosedForm(R + g, r, A, e, (2 * Math.PI * k) / 20_000));
        // Station cutbacks: the long point found by the layout is the true one to within the dense grid's step,
        // and never short of it by more than the graze precision of the intersection (TANGENCY_REL_EPS: a graze
        // within about 1e-6 R counts as touching, which matters only for sides within ~1e-10 mm of flush).
        const longAxial = cutbacks(cut).map((c, i) => c + t[i]!);
        expectClose(longAxial, longAxial.map(() => tMax), 1e-3, 'long point axial mm');
        for (const v of longAxial) expect(v).toBeGreaterThanOrEqual(tMax - 1e-6 * (R + g) - 1e-9);
        const holeR = spec.header.odMm / 2;
        expectClose(col(hole, 'girth'), phis.map((phi) => holeClosedForm(holeR, r, A, e, phi)[0]), 1e-7, 'hole girth mm');
        expectClose(col(hole, 'axial'), phis.map((phi) => holeClosedForm(holeR, r, A, e, phi)[1]), 1e-7, 'hole axial mm');
      }),
      { numRuns: 80 },
    );
  });

  it('holds the template invariants: span π × OD, cutback ≥ 0 and 0 at the long point, closed hole within the header girth', () => {
    // DESIGN.md invariants: closure, stretch-out = π × OD, cutback ≥ 0.
    fc.assert(
      fc.property(jointArb, ({ spec, stations }) => {
        const layout = layoutBranch(spec, { stations });
        const [cut, hole] = layout.templates;
        const pts = points(cut);
        expect(pts[0]![0]).toBe(0);
        expect(pts[pts.length - 1]![0]).toBe(Math.PI * spec.branch.odMm);
        expect(pts[pts.length - 1]![1]).toBe(pts[0]![1]); // the wrap closes on itself
        expect(Math.min(...pts.map((p) => p[1]))).toBe(0);
        for (const c of cutbacks(cut)) expect(c).toBeGreaterThanOrEqual(0);
        expect(hole.kind).toBe('hole');
        const part = hole.cut[0]!;
        expect(part.kind === 'polyline' && part.closed).toBe(true);
        const halfGirth = (Math.PI * spec.header.odMm) / 2;
        for (const p of points(hole)) expect(Math.abs(p[0])).toBeLessThanOrEqual(halfGirth);
        expect(hole.stations.map((s) => [s.n, s.angleDeg])).toEqual(cut.stations.map((s) => [s.n, s.angleDeg]));
        expect(cut.stations.map((s) => s.angleDeg)).toEqual(Array.from({ length: stations }, (_, i) => (360 * i) / stations));
      }),
      { numRuns: 80 },
    );
  });

  it('makes centred joints symmetric: cutback(phi) = cutback(360° − phi)', () => {
    // Invariant: a centred branch is mirror-symmetric about the plane of both axes.
    fc.assert(
      fc.property(jointArb, ({ spec, stations }) => {
        const layout = layoutBranch({ ...spec, offsetMm: 0 }, { stations });
        const [cut, hole] = layout.templates;
        const mirror = (v: number[]): number[] => v.map((_, i) => v[(stations - i) % stations]!);
        expectClose(cutbacks(cut), mirror(cutbacks(cut)), 1e-9, 'cutback symmetry mm');
        expectClose(col(hole, 'axial'), mirror(col(hole, 'axial')), 1e-9, 'hole axial symmetry mm');
        expectClose(col(hole, 'girth'), mirror(col(hole, 'girth')).map((v) => -v), 1e-9, 'hole girth antisymmetry mm');
      }),
      { numRuns: 60 },
    );
  });

  it('honours the chord tolerance on both templates (midpoints against the exact curve)', () => {
    // Invariant: no drawn chord departs from the exact curve (closed form) by more than the tolerance.
    fc.assert(
      fc.property(jointArb, fc.double({ min: 0.01, max: 0.5, noNaN: true }), ({ spec, stations, R, r }, tol) => {
        const layout = layoutBranch(spec, { stations, chordToleranceMm: tol });
        const [cut, hole] = layout.templates;
        const A = spec.angleDeg!;
        const e = spec.offsetMm!;
        const g = spec.gapMm!;
        const rw = spec.branch.odMm / 2;
        const pts = points(cut);
        const shift = pts[0]![1] + branchAxialClosedForm(R + g, r, A, e, 0); // cutback + axial = long point axial
        const exactCut = (phi: number): Point2 => [rw * phi, shift - branchAxialClosedForm(R + g, r, A, e, phi)];
        for (let i = 1; i < pts.length; i++) {
          const pa = pts[i - 1]!;
          const pb = pts[i]!;
          const mid = exactCut((pa[0] + pb[0]) / (2 * rw));
          const d = distanceToSegment(mid, pa, pb);
          if (d > tol + 1e-7) throw new Error(`branch-cut chord ${i}: ${d} mm > ${tol} mm`);
        }
        // The hole: each vertex's phi from the closed form inverted (sin phi from the girth, cos phi from the axial),
        // then the exact point at the mid-angle of each chord.
        const holeR = spec.header.odMm / 2;
        const hp = points(hole);
        const phiOf = (p: Point2, prev: number): number => {
          const z = holeR * Math.cos(p[0] / holeR);
          const sin = (holeR * Math.sin(p[0] / holeR) - e) / r;
          const cos = (z * Math.cos(A * DEG) - p[1] * Math.sin(A * DEG)) / r;
          let phi = Math.atan2(sin, cos);
          while (phi < prev - 1e-9) phi += 2 * Math.PI;
          return phi;
        };
        let phiA = 0;
        for (let i = 1; i <= hp.length; i++) {
          const pa = hp[i - 1]!;
          const pb = hp[i % hp.length]!;
          const phiB = i === hp.length ? 2 * Math.PI : phiOf(pb, phiA);
          expect(phiB).toBeGreaterThan(phiA);
          const q = holeClosedForm(holeR, r, A, e, (phiA + phiB) / 2);
          const d = distanceToSegment(q, pa, pb);
          if (d > tol + 1e-7) throw new Error(`header-hole chord ${i}: ${d} mm > ${tol} mm`);
          phiA = phiB;
        }
      }),
      { numRuns: 25 },
    );
  });

  it('puts kinks on sample points (branch side flush with the header side)', () => {
    // Flush offset: |e| + r = R; the generator at 90° grazes the header (closed form e + r sin phi = R).
    const R = NPS12.odMm / 2;
    const r = (NPS6.odMm - 2 * NPS6.wallMm) / 2;
    const layout = layoutBranch({ header: NPS12, branch: NPS6, offsetMm: R - r }, { stations: 6 });
    const [cut, hole] = layout.templates;
    const rw = NPS6.odMm / 2;
    expect(points(cut).some((p) => Math.abs(p[0] - rw * (Math.PI / 2)) < 1e-9)).toBe(true);
    // On the header the graze is at girth R · π/2 (the header's side line), axial (0 cos A − 0)/sin A = 0 for a tee.
    expect(points(hole).some((p) => Math.abs(p[0] - (R * Math.PI) / 2) < 1e-7 && Math.abs(p[1]) < 1e-7)).toBe(true);
  });

  it('echoes the joint, lists the pipes and carries the warnings and titles, leaving the caution to the exporters', () => {
    const layout = layoutBranch({ header: NPS12, branch: NPS6, angleDeg: 30, offsetMm: 12.7, gapMm: 1.6, fit: 'set-on' });
    expect(layout).toMatchObject({ kind: 'branch', angleDeg: 30, offsetMm: 12.7, gapMm: 1.6, fit: 'set-on', stations: 16 });
    expect(layout.contact).toEqual({ branch: 'inside', header: 'outside' });
    expect(layout.pipes.map((p) => [p.role, p.label])).toEqual([
      ['header', 'NPS 12 STD'],
      ['branch', 'NPS 6 STD'],
    ]);
    expectClose(layout.pipes[1]!.idMm, 6.065 * IN, 1e-9, 'branch ID (ASME B36.10M, recalled: NPS 6 STD ID 6.065 in)');
    expect(layout.warnings.map((w) => w.code)).toEqual(['REINFORCEMENT_RULES_ANGLE', 'REINFORCEMENT_RULES_OFFSET']);
    const [cut, hole] = layout.templates;
    expect(cut.title).toBe('Branch cut: NPS 6 STD on NPS 12 STD, 30°, set-on, offset 12.7 mm (0.500 in), root gap 1.6 mm (0.063 in)');
    expect(hole.title).toMatch(/^Header hole: NPS 6 STD on NPS 12 STD, 30°, set-on/);
    for (const t of [cut, hole]) {
      // No caution in the notes (the exporters print `CAUTION` once per sheet, file and table; a caution in the notes showed twice).
      expect(t.notes.filter((n) => /caution/i.test(n))).toEqual([]);
      expect(t.notes.some((n) => /HEEL/.test(n))).toBe(true);
      expect(t.notes.filter((n) => n.startsWith('Warning:'))).toHaveLength(2);
    }
    expect(cut.stationColumns.map((c) => c.key)).toEqual(['girth', 'cutback']);
    expect(hole.stationColumns.map((c) => c.key)).toEqual(['girth', 'axial']);
    expect(hole.labels.map((l) => l.text)).toEqual(['HEEL', 'TOE', 'TOP LINE']);
    const override = layoutBranch({ header: NPS12, branch: NPS6, contact: { branch: 'outside', header: 'outside' } });
    expect(override.templates[0].title).toBe('Branch cut: NPS 6 STD on NPS 12 STD, 90°, branch OD on header OD');
  });

  it('tells each template what it goes on: the branch cut wraps the branch OD from the heel, the hole lies on the header OD', () => {
    // The hole template is marked on the header (common practice), so its sheet needs the header OD to say so.
    const [cut, hole] = layoutBranch({ header: NPS12, branch: NPS6 }).templates;
    if (cut?.kind !== 'wrap' || hole?.kind !== 'hole') throw new Error('expected a wrap and a hole');
    expect(cut.startLine).toBe('heel');
    expect(hole.wrapOdMm).toBe(NPS12.odMm);
  });

  it('marks the hole centre where the branch axis pierces the header OD', () => {
    // A 45° lateral's axis reaches the header top R · cot 45° = R along the header (right-triangle geometry).
    const layout = layoutBranch({ header: NPS12, branch: NPS6, angleDeg: 45 });
    const hole = layout.templates[1];
    const R = NPS12.odMm / 2;
    const arms = hole.marks.filter((m) => m.kind === 'segment').slice(2);
    const centre = arms.map((m) => (m.kind === 'segment' ? [(m.from[0] + m.to[0]) / 2, (m.from[1] + m.to[1]) / 2] : []));
    expectClose(centre[0]!, [0, R], 1e-9, 'centre mark');
    expectClose(centre[1]!, [0, R], 1e-9, 'centre mark');
  });

  it('marks the hole centre of an OFFSET lateral at 60° where its axis pierces the header OD', () => {
    // Right-triangle geometry: the branch axis runs in the plane y = e and
    // pierces the header OD at height z = sqrt(R² − e²), which lies
    // R · asin(e / R) round the girth from the top line (arc length) and
    // z · cot 60° along the header from where the axis crosses it. 60° (not
    // 45°) so a sin/cos swap shows; e = 2 in toward +y (README: offsets move
    // the branch toward +y, and hole girth grows toward +y).
    const e = 2 * IN;
    const layout = layoutBranch({ header: NPS12, branch: NPS6, angleDeg: 60, offsetMm: e });
    const hole = layout.templates[1];
    const R = NPS12.odMm / 2;
    const z = Math.sqrt(R * R - e * e);
    const expected = [R * Math.asin(e / R), z / Math.tan(60 * DEG)];
    const arms = hole.marks.filter((m) => m.kind === 'segment').slice(2);
    expect(arms).toHaveLength(2);
    for (const m of arms) {
      if (m.kind !== 'segment') continue;
      expectClose([(m.from[0] + m.to[0]) / 2, (m.from[1] + m.to[1]) / 2], expected, 1e-9, 'offset centre mark');
    }
    // The mark is a cross: one arm along the girth, one along the header.
    const [a, b] = arms as { from: Point2; to: Point2 }[];
    expect(a!.from[1]).toBeCloseTo(a!.to[1], 12);
    expect(b!.from[0]).toBeCloseTo(b!.to[0], 12);
  });

  it('rejects bad stations and options, and passes on the joint errors', () => {
    const ok: BranchSpec = { header: NPS12, branch: NPS6 };
    const codeOf = (f: () => unknown): string | undefined => {
      try {
        f();
      } catch (e) {
        if (isGirthError(e)) return `${e.code}:${e.field}`;
        throw e;
      }
      return undefined;
    };
    expect(codeOf(() => layoutBranch(ok, { stations: 3 }))).toBe('OUT_OF_RANGE:stations');
    expect(codeOf(() => layoutBranch(ok, { stations: 361 }))).toBe('OUT_OF_RANGE:stations');
    expect(codeOf(() => layoutBranch(ok, { stations: 16.5 }))).toBe('OUT_OF_RANGE:stations');
    expect(codeOf(() => layoutBranch(ok, { stations: Number.NaN }))).toBe('NOT_A_NUMBER:stations');
    expect(codeOf(() => layoutBranch(ok, { chordToleranceMm: -1 }))).toBe('NEGATIVE:chordToleranceMm');
    expect(codeOf(() => layoutBranch(ok, null as never))).toBe('BAD_OPTION:options');
    expect(codeOf(() => layoutBranch({ ...ok, angleDeg: 95 }))).toBe('OUT_OF_RANGE:angleDeg');
    expect(codeOf(() => layoutBranch({ header: NPS6, branch: NPS12 }))).toBe('BRANCH_TOO_LARGE:branch');
    expect(codeOf(() => layoutBranch({ ...ok, offsetMm: 100 }))).toBe('OFFSET_MISSES:offsetMm');
    expect(codeOf(() => layoutBranch(ok, { stations: 4 }))).toBeUndefined();
    expect(codeOf(() => layoutBranch(ok, { stations: 360 }))).toBeUndefined();
  });
});
