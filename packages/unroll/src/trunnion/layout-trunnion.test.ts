import { describe, expect, it } from 'vitest';
import { girthErrorOf } from '@girth/pipes/test-support';
import { hitGenerator, lineRoots, solveTrunnion, torusPoint, type TrunnionSpec } from '@girth/geometry';
import { layoutTrunnion } from './layout-trunnion.js';
import type { Point2 } from '../types.js';

const IN = 25.4;
// An invented NPS 12 STD long radius elbow with an NPS 6 STD support trunnion; 12.75 x 0.375 in, 6.625 x 0.280 in (ASME B36.10M, recalled).
const spec: TrunnionSpec = {
  elbow: { pipe: { odMm: 12.75 * IN, wallMm: 0.375 * IN, npsIn: 12, label: 'NPS 12 STD' } },
  branch: { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' },
  alongDeg: 45,
  aroundDeg: 30,
};

describe('layoutTrunnion', () => {
  const layout = layoutTrunnion(spec);
  const [cut, hole] = layout.templates;
  const g = solveTrunnion(spec);

  it('wraps the cut on the trunnion OD: stretch-out π × OD, cutback ≥ 0 and 0 at the long point', () => {
    expect(cut.kind).toBe('wrap');
    if (cut.kind !== 'wrap') return;
    expect(cut.stretchOutMm).toBeCloseTo(Math.PI * 6.625 * IN, 9); // girth = π × OD (REFERENCES.md)
    const cutbacks = cut.stations.map((s) => s.values.cutback!);
    expect(Math.min(...cutbacks)).toBeGreaterThanOrEqual(0);
    expect(Math.min(...cutbacks)).toBeCloseTo(0, 9);
  });

  it('draws the hole seen along the trunnion axis: each vertex carried down the axis lands on the elbow on the 3D hole curve', () => {
    const outline = hole.cut[0] as { points: readonly Point2[]; closed: boolean };
    expect(outline.closed).toBe(true);
    const b = g.holeBundle;
    for (const [x, y] of outline.points) {
      expect(Math.hypot(x, y)).toBeCloseTo(b.radius, 9);
      const hit = hitGenerator(b, g.holeHost, Math.atan2(y, x))!;
      const origin = [0, 1, 2].map((i) => b.axisPoint[i]! + x * b.heelDirection[i]! + y * b.sideDirection[i]!) as [number, number, number];
      const t = lineRoots(g.holeHost, { origin, direction: b.axisDirection })[0]!.tMm;
      for (let i = 0; i < 3; i++) expect(origin[i]! + t * b.axisDirection[i]!).toBeCloseTo(hit.point[i]!, 9);
    }
  });

  it('tape around and along rebuild each station on the elbow; a straight chord on the parallel is never shorter than along less the stated bound', () => {
    const R = 18 * IN; // 1.5 x NPS 12 (ASME B16.9, recalled)
    const r = (12.75 * IN) / 2;
    const n = hole.stations.length;
    hole.stations.forEach((row, i) => {
      const p = hitGenerator(g.holeBundle, g.holeHost, (2 * Math.PI * i) / n)!.point;
      const psi = row.values.around! / r;
      const rho = R + r * Math.cos(psi);
      const theta = row.values.along! / rho;
      const q = torusPoint(g.holeHost, theta, psi);
      for (let k = 0; k < 3; k++) expect(q[k]!).toBeCloseTo(p[k]!, 9);
      const chord = 2 * rho * Math.sin(theta / 2);
      expect(chord).toBeGreaterThanOrEqual(row.values.along! - layout.alongTapeBoundMm - 1e-9);
    });
    expect(layout.alongTapeBoundMm).toBeGreaterThan(0);
    expect(hole.notes.join(' ')).toContain('Error bound');
  });

  it('echoes the B16.9 long radius and refuses a trunnion off the bend, naming the field', () => {
    expect(layout.bendRadiusMm).toBeCloseTo(18 * IN, 12);
    expect(girthErrorOf(() => layoutTrunnion({ ...spec, alongDeg: 3 }))).toMatchObject({ code: 'TRUNNION_OFF_ELBOW', field: 'alongDeg' });
    expect(girthErrorOf(() => layoutTrunnion(spec, { stations: 2 }))).toMatchObject({ field: 'stations' });
  });
});
