import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { isGirthError } from '@girth/pipes';
import { expectClose } from '../internal/test-support/expect-close.js';
import { developWrap } from './develop-wrap.js';
import { branchAxialClosedForm, branchBundle, headerAlongX, pipeAlongZ, tiltedPlane } from '../internal/test-support/branch-fixtures.js';

const base = { id: 'test-cut', title: 'Test cut', notes: ['note'] } as const;

describe('developWrap', () => {
  it('develops a 90° saddle: cutback = depth(90°) − depth(phi), stretch-out π × OD', () => {
    // MathWorld, "Cylinder-Cylinder Intersection": depth h(phi) = R − sqrt(R² − r² sin² phi).
    const R = 161.925;
    const r = 84.1375;
    const od = 2 * r;
    const t = developWrap({ ...base, bundle: branchBundle(r, 90), host: headerAlongX(R), wrapOdMm: od, stations: 16 });
    const h = (phi: number): number => R - Math.sqrt(R * R - r * r * Math.sin(phi) ** 2);
    expect(t.kind).toBe('wrap');
    expect(t.id).toBe('test-cut');
    expectClose(t.stretchOutMm!, Math.PI * od, 1e-12, 'stretch-out');
    expectClose(
      t.stations.map((s) => s.values.cutback!),
      t.stations.map((s) => h(Math.PI / 2) - h((s.angleDeg * Math.PI) / 180)),
      1e-9,
      'cutback mm',
    );
    expectClose(t.stations.map((s) => s.values.girth!), t.stations.map((_, i) => (Math.PI * od * i) / 16), 1e-9, 'girth mm');
    expect(t.stations.map((s) => s.angleDeg)).toEqual(Array.from({ length: 16 }, (_, i) => 22.5 * i));
    expect(t.stationColumns.map((c) => c.key)).toEqual(['girth', 'cutback']);
  });

  it('develops a plane cut to the miter ordinate', () => {
    // REFERENCES.md, miter: ordinate of a plane cut (D/2) tan(cut) (1 − cos phi); the long point is the heel here.
    const D = 323.85;
    const t = developWrap({ ...base, bundle: pipeAlongZ(D / 2), host: tiltedPlane(11.25), wrapOdMm: D, stations: 32 });
    expectClose(
      t.stations.map((s) => s.values.cutback!),
      t.stations.map((s) => (D / 2) * Math.tan((11.25 * Math.PI) / 180) * (1 - Math.cos((s.angleDeg * Math.PI) / 180))),
      1e-9,
      'ordinate mm',
    );
  });

  it('holds its invariants for any lateral: span π × OD, cutback ≥ 0 and 0 at the long point, lines and labels agree', () => {
    // Invariants of the template (DESIGN.md): stretch-out = π × OD, cutback ≥ 0, zero at the long point.
    fc.assert(
      fc.property(
        fc.double({ min: 20, max: 600, noNaN: true }),
        fc.double({ min: 0.05, max: 0.98, noNaN: true }),
        fc.double({ min: 10, max: 90, noNaN: true }),
        fc.double({ min: -0.95, max: 0.95, noNaN: true }),
        fc.integer({ min: 4, max: 64 }),
        (R, ratio, angleDeg, offsetShare, stations) => {
          const r = ratio * R;
          const e = offsetShare * (R - r);
          const od = 2 * r + 8;
          const t = developWrap({ ...base, bundle: branchBundle(r, angleDeg, e), host: headerAlongX(R), wrapOdMm: od, stations });
          const pts = t.cut[0]!.kind === 'polyline' ? t.cut[0]!.points : [];
          expect(pts[0]![0]).toBe(0);
          expect(pts[pts.length - 1]![0]).toBe(Math.PI * od);
          expect(t.squareLine).toEqual({ kind: 'segment', from: [0, 0], to: [Math.PI * od, 0] });
          expect(Math.min(...pts.map((p) => p[1]))).toBe(0);
          for (const p of pts) expect(p[1]).toBeGreaterThanOrEqual(0);
          // The long point is the true maximum of the closed form: no point of the exact curve lies above the square line.
          const tMax = Math.max(...Array.from({ length: 4001 }, (_, k) => branchAxialClosedForm(R, r, angleDeg, e, (2 * Math.PI * k) / 4000)));
          const first = t.stations[0]!.values.cutback!;
          const longAxial = first + branchAxialClosedForm(R, r, angleDeg, e, 0);
          expect(longAxial).toBeGreaterThanOrEqual(tMax - 1e-9);
          expect(t.stationLines).toHaveLength(stations);
          t.stationLines.forEach((l, i) => {
            expect(l.from).toEqual([t.stations[i]!.values.girth, 0]);
            expect(l.to).toEqual([t.stations[i]!.values.girth, t.stations[i]!.values.cutback]);
          });
          expect(t.labels.map((l) => l.text)).toEqual(stations % 2 === 0 ? ['HEEL', 'TOE'] : ['HEEL']);
        },
      ),
      { numRuns: 60 },
    );
  });

  it('places given labels past the cut line at their girth', () => {
    const R = 100;
    const t = developWrap({
      ...base,
      bundle: branchBundle(50, 90),
      host: headerAlongX(R),
      wrapOdMm: 110,
      stations: 8,
      labels: [{ text: 'SIDE', phiRad: Math.PI / 2 }],
    });
    expect(t.labels).toHaveLength(1);
    const l = t.labels[0]!;
    expect(l.text).toBe('SIDE');
    expectClose(l.at[0], (Math.PI * 110) / 4, 1e-9, 'label girth');
    expect(l.at[1]).toBeGreaterThan(t.stations[2]!.values.cutback!);
  });

  it('rejects a label angle off the girth', () => {
    try {
      developWrap({ ...base, bundle: branchBundle(50, 90), host: headerAlongX(100), wrapOdMm: 110, stations: 8, labels: [{ text: 'X', phiRad: 7 }] });
      expect.unreachable();
    } catch (e) {
      expect(isGirthError(e, 'BAD_OPTION')).toBe(true);
    }
  });
});
