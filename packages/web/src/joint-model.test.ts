import { resolvePipe } from '@girth/pipes';
import { layoutBranch, layoutConcentricCone, layoutMiter, layoutPlaneCut } from '@girth/unroll';
import { describe, expect, it } from 'vitest';
import { jointModel } from './joint-model.js';

const dist = (p: readonly number[], q: readonly number[]): number => Math.hypot(p[0]! - q[0]!, p[1]! - q[1]!, p[2]! - q[2]!);

describe('jointModel', () => {
  it('a lateral: the cut line lies on the header OD and the branch OD; the heel is on the obtuse side', () => {
    const header = resolvePipe('NPS 12 STD');
    const branch = resolvePipe('NPS 8 STD');
    const model = jointModel(layoutBranch({ header, branch, angleDeg: 45, fit: 'set-on' }));
    const R = header.odMm / 2;
    const r = branch.odMm / 2;
    const b = [Math.cos(Math.PI / 4), 0, Math.sin(Math.PI / 4)];
    for (const p of model.cutLines[0]!) {
      expect(Math.hypot(p[1]!, p[2]!)).toBeCloseTo(R, 6);
      const along = p[0]! * b[0]! + p[2]! * b[2]!;
      expect(Math.hypot(p[0]! - along * b[0]!, p[1]!, p[2]! - along * b[2]!)).toBeCloseTo(r, 6);
    }
    const heel = model.labels.find((l) => l.text === 'HEEL')!.at;
    const toe = model.labels.find((l) => l.text === 'TOE')!.at;
    // DESIGN.md: the heel is on the obtuse side (-x for a branch leaning toward +x), the toe in the crotch (+x).
    expect(heel[0]).toBeLessThan(toe[0]!);
  });

  it('a plane cut: the cut line lies in the plane', () => {
    const model = jointModel(layoutPlaneCut({ pipe: resolvePipe('NPS 6 STD'), angleDeg: 60 }));
    const n = [-Math.sin(Math.PI / 3), 0, -Math.cos(Math.PI / 3)];
    for (const p of model.cutLines[0]!) expect(p[0]! * n[0]! + p[2]! * n[2]!).toBeCloseTo(0, 6);
  });

  it('a miter: each weld ring is a closed loop on its weld plane, pieces meet there', () => {
    const result = layoutMiter({ pipe: resolvePipe('NPS 10 STD'), bendDeg: 90, welds: 3, radiusNps: 1.5 });
    const model = jointModel(result);
    expect(model.cutLines.length).toBe(3);
    model.cutLines.forEach((ring, k) => {
      const theta = ((2 * k + 1) * result.cutAngleDeg * Math.PI) / 180;
      for (const p of ring) expect(-Math.sin(theta) * p[0]! + Math.cos(theta) * p[1]!).toBeCloseTo(0, 6);
      expect(dist(ring[0]!, ring[ring.length - 1]!)).toBeCloseTo(0, 6);
    });
  });

  it('a concentric cone: its ends have the given diameters, its length is the given length', () => {
    const result = layoutConcentricCone({ largeDiameterMm: 323.85, smallDiameterMm: 219.075, lengthMm: 177.8, thicknessMm: 9.525 });
    const grid = jointModel(result).surfaces[0]!.grid;
    for (const [a, b] of grid) {
      expect(Math.hypot(a![0]!, a![1]!)).toBeCloseTo(323.85 / 2, 6);
      expect(Math.hypot(b![0]!, b![1]!)).toBeCloseTo(219.075 / 2, 6);
      expect(b![2]).toBeCloseTo(177.8, 9);
    }
  });
});
