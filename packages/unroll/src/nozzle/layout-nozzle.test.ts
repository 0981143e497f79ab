import { describe, expect, it } from 'vitest';
import { girthErrorOf } from '@girth/pipes/test-support';
import { hitGenerator, lineRoots, solveNozzle, type NozzleSpec } from '@girth/geometry';
import { layoutNozzle } from './layout-nozzle.js';
import type { Point2 } from '../types.js';

const IN = 25.4;
// An invented 48 in OD vessel with 1/2 in heads; NPS 6 STD 6.625 x 0.280 in (ASME B36.10M, recalled).
const spec: NozzleSpec = {
  head: { type: 'ellipsoidal', odMm: 48 * IN, wallMm: 0.5 * IN },
  nozzle: { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' },
  offsetMm: 12 * IN,
  direction: 'radial',
};

describe('layoutNozzle', () => {
  const layout = layoutNozzle(spec);
  const [cut, hole] = layout.templates;

  it('wraps the cut on the nozzle OD: stretch-out π × OD, cutback ≥ 0 and 0 at the long point', () => {
    expect(cut.kind).toBe('wrap');
    if (cut.kind !== 'wrap') return;
    expect(cut.stretchOutMm).toBeCloseTo(Math.PI * 6.625 * IN, 9); // girth = π × OD (REFERENCES.md)
    const cutbacks = cut.stations.map((s) => s.values.cutback!);
    expect(Math.min(...cutbacks)).toBeGreaterThanOrEqual(0);
    const points = (cut.cut[0] as { points: readonly Point2[] }).points;
    expect(Math.min(...points.map((p) => p[1]))).toBeCloseTo(0, 12);
  });

  it('draws the hole seen along the nozzle axis: a closed outline on the nozzle ID circle, every vertex carried down the axis lands on the head', () => {
    const g = solveNozzle(spec);
    const outline = hole.cut[0] as { points: readonly Point2[]; closed: boolean };
    expect(outline.closed).toBe(true);
    const r = g.holeBundle.radius;
    for (const [x, y] of outline.points) {
      expect(Math.hypot(x, y)).toBeCloseTo(r, 9);
      // Rebuilt: the line through the vertex parallel to the nozzle axis meets the head's outside on the 3D hole curve.
      const phi = Math.atan2(y, x);
      const hit = hitGenerator(g.holeBundle, g.holeHost, phi)!;
      const b = g.holeBundle;
      const origin = [0, 1, 2].map((i) => b.axisPoint[i]! + x * b.heelDirection[i]! + y * b.sideDirection[i]!) as [number, number, number];
      const t = lineRoots(g.holeHost, { origin, direction: b.axisDirection })[0]!.tMm;
      for (let i = 0; i < 3; i++) expect(origin[i]! + t * b.axisDirection[i]!).toBeCloseTo(hit.point[i]!, 9);
    }
  });

  it('states a tape bound that holds: a straight line between the reference meridian and each station is no shorter than around less the bound', () => {
    const g = solveNozzle(spec);
    const n = hole.stations.length;
    hole.stations.forEach((row, i) => {
      const p = hitGenerator(g.holeBundle, g.holeHost, (2 * Math.PI * i) / n)!.point;
      const rho = Math.hypot(p[0], p[1]);
      const onMeridian = [rho, 0, p[2]] as const;
      const chord = Math.hypot(p[0] - onMeridian[0], p[1] - onMeridian[1], p[2] - onMeridian[2]);
      expect(Math.abs(row.values.around!)).toBeGreaterThanOrEqual(chord - 1e-9);
      expect(Math.abs(row.values.around!) - chord).toBeLessThanOrEqual(layout.aroundTapeBoundMm + 1e-9);
    });
    expect(hole.notes.some((line) => /at most .* short/.test(line))).toBe(true);
  });

  it('drops are 0 at the hole highest point and positive elsewhere; meridians grow toward the heel (outboard)', () => {
    const drops = hole.stations.map((s) => s.values.drop!);
    expect(Math.min(...drops)).toBeGreaterThanOrEqual(0);
    const m = hole.stations.map((s) => s.values.meridian!);
    expect(m[0]).toBeGreaterThan(m[8]!);
  });

  it('refuses a nozzle past the knuckle, naming the field', () => {
    const e = girthErrorOf(() => layoutNozzle({ ...spec, offsetMm: 600 }));
    expect([e.code, e.field]).toEqual(['NOZZLE_OFF_HEAD', 'offsetMm']);
  });
});
