import { describe, expect, it } from 'vitest';
import { expectGirthError } from '@girth/pipes/test-support';
import { developWrap } from '../wrap/develop-wrap.js';
import { layoutBranch } from '../branch/layout-branch.js';
import { branchAxialClosedForm, branchBundle, headerAlongX } from '../internal/test-support/branch-fixtures.js';
import { distanceToSegment } from '../internal/test-support/segment-distance.js';
import { closeTemplate } from '../closed/close-template.js';
import type { Point2, WrapTemplate } from '../types.js';
import { onDevelopmentSurface } from './development-surface.js';
import { describeTemplate } from '../describe-result.js';

const IN = 25.4;
// ASME B36.10M (recalled, REFERENCES.md): NPS 12 STD OD 12.750 in; NPS 6 STD OD 6.625 in, wall 0.280 in.
const R_HEADER = (12.75 * IN) / 2;
const OD_BRANCH = 6.625 * IN;
const WALL = 0.28 * IN;
const TOL = 0.05;

function cutPoints(t: WrapTemplate): readonly Point2[] {
  const part = t.cut[0]!;
  if (part.kind !== 'polyline') throw new Error('expected a polyline');
  return part.points;
}

describe('onDevelopmentSurface: the mid-thickness of a rolled plate', () => {
  const angleDeg = 50;
  const od = developWrap({
    bundle: branchBundle(OD_BRANCH / 2, angleDeg),
    host: headerAlongX(R_HEADER),
    wrapOdMm: OD_BRANCH,
    stations: 16,
    chordToleranceMm: TOL,
    id: 'branch-cut',
    title: 'Branch cut',
    notes: [],
  });
  const mid = onDevelopmentSurface(od, { surface: 'mid', plateThicknessMm: WALL }) as WrapTemplate;

  it('has the flat width pi x (OD - t) (common practice: neutral surface at mid-thickness)', () => {
    expect(mid.stretchOutMm).toBeCloseTo(Math.PI * (OD_BRANCH - WALL), 9);
    const xs = cutPoints(mid).map((p) => p[0]);
    expect(Math.max(...xs) - Math.min(...xs)).toBeCloseTo(Math.PI * (OD_BRANCH - WALL), 9);
    expect(mid.development).toEqual({ surface: 'mid', diameterMm: OD_BRANCH - WALL, odMm: OD_BRANCH, plateThicknessMm: WALL });
    expect(mid.notes.at(-1)).toMatch(/mid-thickness diameter/);
    mid.stations.forEach((s, i) => {
      expect(s.values.girth).toBeCloseTo((od.stations[i]!.values.girth! * (OD_BRANCH - WALL)) / OD_BRANCH, 9);
      expect(s.values.cutback).toBe(od.stations[i]!.values.cutback);
    });
  });

  it('rolled back onto the mid surface, the cut edge lies on the exact cut line within the chord tolerance', () => {
    // Test helper: roll the flat part back to (phi, axial) on the mid surface (radius (OD - t) / 2) and develop the
    // exact cut line (closed form, y² + z² = R²) on the same surface; the flat and the rolled surface are isometric,
    // so a distance on the flat bounds the 3D distance.
    const rMid = (OD_BRANCH - WALL) / 2;
    const n = 4000;
    const axial = (phi: number): number => branchAxialClosedForm(R_HEADER, OD_BRANCH / 2, angleDeg, 0, phi);
    let longAxial = -Infinity;
    for (let i = 0; i <= n; i++) longAxial = Math.max(longAxial, axial((2 * Math.PI * i) / n));
    const exact: Point2[] = [];
    for (let i = 0; i <= n; i++) {
      const phi = (2 * Math.PI * i) / n;
      exact.push([phi * rMid, longAxial - axial(phi)]);
    }
    const closed = closeTemplate(mid, { stubMm: 300 });
    const part = closed.cut[0]!;
    if (part.kind !== 'polyline') throw new Error('expected a polyline');
    const cutEdge = part.points.slice(0, -2);
    let worst = 0;
    for (let i = 1; i < cutEdge.length; i++) {
      const a = cutEdge[i - 1]!;
      const b = cutEdge[i]!;
      for (const s of [0, 0.25, 0.5, 0.75]) {
        const p: Point2 = [a[0] + (b[0] - a[0]) * s, a[1] + (b[1] - a[1]) * s];
        let best = Infinity;
        const k = Math.round((p[0] / (2 * Math.PI * rMid)) * n);
        for (let j = Math.max(1, k - 40); j <= Math.min(n, k + 40); j++) best = Math.min(best, distanceToSegment(p, exact[j - 1]!, exact[j]!));
        worst = Math.max(worst, best);
      }
    }
    expect(worst).toBeLessThanOrEqual(TOL + 1e-3);
  });

  it('leaves an OD development as laid out', () => {
    const same = onDevelopmentSurface(od) as WrapTemplate;
    expect(same.cut).toBe(od.cut);
    expect(same.development).toEqual({ surface: 'od', diameterMm: OD_BRANCH, odMm: OD_BRANCH });
  });

  it('develops a header hole on the header plate mid surface', () => {
    const NPS12 = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' };
    const hole = layoutBranch({ header: NPS12, branch: { odMm: OD_BRANCH, wallMm: WALL, label: 'NPS 6 STD' } }).templates[1];
    const midHole = onDevelopmentSurface(hole, { surface: 'mid', plateThicknessMm: NPS12.wallMm });
    const k = (NPS12.odMm - NPS12.wallMm) / NPS12.odMm;
    midHole.stations.forEach((s, i) => {
      expect(s.values.girth).toBeCloseTo(hole.stations[i]!.values.girth! * k, 9);
      expect(s.values.axial).toBe(hole.stations[i]!.values.axial);
    });
  });

  it('restates the stretch-out a layout note gives, and words again in inches', () => {
    const NPS12 = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' };
    const cut = layoutBranch({ header: NPS12, branch: { odMm: OD_BRANCH, wallMm: WALL, label: 'NPS 6 STD' } }).templates[0];
    const mid = onDevelopmentSurface(cut, { surface: 'mid', plateThicknessMm: WALL });
    const oldText = (Math.PI * OD_BRANCH).toFixed(1);
    const newText = (Math.PI * (OD_BRANCH - WALL)).toFixed(1);
    expect(cut.notes.join(' ')).toContain(`${oldText} mm`);
    expect(mid.notes.join(' ')).not.toContain(`${oldText} mm`);
    expect(mid.notes.join(' ')).toContain(`${newText} mm`);
    expect(describeTemplate(mid, { units: 'in' }).notes.at(-1)).toMatch(/^Cut flat from 0\.280" \(7\.1 mm\) plate/);
  });

  it('refuses a missing, negative or too thick plate, naming the option', () => {
    expectGirthError(() => onDevelopmentSurface(od, { surface: 'mid' }), 'MISSING_INPUT', 'options.plateThicknessMm');
    expectGirthError(() => onDevelopmentSurface(od, { surface: 'mid', plateThicknessMm: -1 }), 'NEGATIVE', 'options.plateThicknessMm');
    expectGirthError(() => onDevelopmentSurface(od, { surface: 'mid', plateThicknessMm: OD_BRANCH / 2 }), 'WALL_TOO_THICK', 'options.plateThicknessMm');
    expectGirthError(() => onDevelopmentSurface(od, { surface: 'id' as 'od' }), 'BAD_CHOICE', 'options.surface');
  });
});
