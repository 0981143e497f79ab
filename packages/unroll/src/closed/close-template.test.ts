import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { expectGirthError } from '@girth/pipes/test-support';
import { layoutBranch } from '../branch/layout-branch.js';
import { layoutMiter } from '../miter/layout-miter.js';
import { layoutPlaneCut } from '../plane-cut/layout-plane-cut.js';
import { layoutConcentricCone } from '../cone/concentric.js';
import type { Point2, Template, WrapTemplate } from '../types.js';
import { closeTemplate, DEFAULT_STUB_MARGIN_MM } from './close-template.js';

const IN = 25.4;
// ASME B36.10M (recalled, REFERENCES.md): NPS 12 STD 12.750 x 0.375 in, NPS 6 STD 6.625 x 0.280 in.
const NPS12 = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' };
const NPS6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };

function contour(t: Template): readonly Point2[] {
  expect(t.cut).toHaveLength(1);
  const part = t.cut[0]!;
  if (part.kind !== 'polyline') throw new Error('expected a polyline');
  expect(part.closed).toBe(true);
  return part.points;
}

/** Shoelace area, mm² (positive counter-clockwise). */
function area(points: readonly Point2[]): number {
  let a = 0;
  points.forEach((p, i) => {
    const q = points[(i + 1) % points.length]!;
    a += p[0] * q[1] - q[0] * p[1];
  });
  return a / 2;
}

/** True when segments ab and cd cross at a point inside both (not at shared ends). */
function crosses(a: Point2, b: Point2, c: Point2, d: Point2): boolean {
  const o = (p: Point2, q: Point2, r: Point2): number => (q[0] - p[0]) * (r[1] - p[1]) - (q[1] - p[1]) * (r[0] - p[0]);
  const d1 = o(a, b, c);
  const d2 = o(a, b, d);
  const d3 = o(c, d, a);
  const d4 = o(c, d, b);
  const eps = 1e-9;
  return ((d1 > eps && d2 < -eps) || (d1 < -eps && d2 > eps)) && ((d3 > eps && d4 < -eps) || (d3 < -eps && d4 > eps));
}

function selfCrossings(points: readonly Point2[]): number {
  let count = 0;
  const n = points.length;
  for (let i = 0; i < n; i++) {
    for (let j = i + 2; j < n; j++) {
      if (i === 0 && j === n - 1) continue;
      if (crosses(points[i]!, points[(i + 1) % n]!, points[j]!, points[(j + 1) % n]!)) count++;
    }
  }
  return count;
}

describe('closeTemplate: a single-cut wrap', () => {
  const cut = layoutBranch({ header: NPS12, branch: NPS6, angleDeg: 45 }).templates[0] as WrapTemplate;
  const open = cut.cut[0]!;
  if (open.kind !== 'polyline') throw new Error('expected a polyline');
  const deepest = Math.max(...open.points.map((p) => p[1]));

  it('is one closed contour: the cut line, both seam edges and the square end at the stub length', () => {
    const part = closeTemplate(cut, { stubMm: 400 });
    const pts = contour(part);
    expect(pts.slice(0, open.points.length)).toEqual(open.points);
    expect(pts.slice(-2)).toEqual([[cut.stretchOutMm, 400], [0, 400]]);
    expect(part.closedPart).toEqual({ stubMm: 400 });
    // The enclosed area is the stretch-out times the stub less the area above the cut line (trapezoids).
    let underCut = 0;
    for (let i = 1; i < open.points.length; i++) {
      const [x0, y0] = open.points[i - 1]!;
      const [x1, y1] = open.points[i]!;
      underCut += ((x1 - x0) * (y0 + y1)) / 2;
    }
    expect(Math.abs(area(pts))).toBeCloseTo(cut.stretchOutMm * 400 - underCut, 6);
    expect(selfCrossings(pts)).toBe(0);
  });

  it('defaults the stub to the deepest cutback plus the margin', () => {
    expect(closeTemplate(cut).closedPart?.stubMm).toBeCloseTo(deepest + DEFAULT_STUB_MARGIN_MM, 9);
  });

  it('moves station lines onto the part, from the cut to the square end', () => {
    const part = closeTemplate(cut, { stubMm: 400 });
    part.stationLines.forEach((s, i) => {
      expect(s.from[0]).toBe(s.to[0]);
      expect(s.from[1]).toBeCloseTo(cut.stations[i]!.values.cutback!, 9);
      expect(s.to[1]).toBe(400);
    });
    expect(part.stations).toBe(cut.stations);
  });

  it('refuses a stub no longer than the cut, naming the option', () => {
    expectGirthError(() => closeTemplate(cut, { stubMm: deepest }), 'OUT_OF_RANGE', 'options.stubMm');
    expectGirthError(() => closeTemplate(cut, { stubMm: Number.NaN }), 'NOT_A_NUMBER', 'options.stubMm');
  });

  it('closes every plane cut without crossing itself (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 20, max: 90, noNaN: true }), fc.double({ min: 1, max: 500, noNaN: true }), (angleDeg, margin) => {
        const t = layoutPlaneCut({ pipe: NPS6, angleDeg }).templates[0]!;
        const line = t.cut[0]!;
        if (line.kind !== 'polyline') throw new Error('expected a polyline');
        const stub = Math.max(...line.points.map((p) => p[1])) + margin;
        const pts = contour(closeTemplate(t, { stubMm: stub }));
        expect(selfCrossings(pts)).toBe(0);
        expect(Math.abs(area(pts))).toBeGreaterThan(0);
      }),
      { numRuns: 40 },
    );
  });
});

describe('closeTemplate: a miter middle piece', () => {
  const layout = layoutMiter({ pipe: NPS12, bendDeg: 90, pieces: 4, radiusMm: 1.5 * 12 * IN });
  const middle = layout.templates.find((t) => t.id === 'miter-middle') as WrapTemplate;

  it('is one closed piece: near cut, far cut walked back, no crossing', () => {
    const part = closeTemplate(middle);
    const pts = contour(part);
    const [near, far] = middle.cut as readonly { points: readonly Point2[] }[];
    expect(pts).toHaveLength(near!.points.length + far!.points.length);
    expect(selfCrossings(pts)).toBe(0);
    // Station lines run from cut to cut: their length is the station table's generator length.
    part.stationLines.forEach((s, i) => expect(s.to[1] - s.from[1]).toBeCloseTo(middle.stations[i]!.values.length!, 6));
  });
});

describe('closeTemplate: holes and flat patterns', () => {
  it('keeps a header hole and a cone as they are', () => {
    const hole = layoutBranch({ header: NPS12, branch: NPS6 }).templates[1];
    const cone = layoutConcentricCone({ largeDiameterMm: 8 * IN, smallDiameterMm: 5 * IN, lengthMm: 4 * IN, thicknessMm: 0 }).templates[0]!;
    expect(closeTemplate(hole).cut).toBe(hole.cut);
    expect(closeTemplate(cone).cut).toBe(cone.cut);
  });
});
