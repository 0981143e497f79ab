/**
 * Arc-fitted cut lines checked against the independent oracle (test/oracle:
 * bisection on the signed distance to each surface, no library math): every
 * fitted arc, sampled densely, stays within the DXF arc tolerance (0.05 mm, the
 * templates' chord tolerance) of the exact cut curve, and the fit needs far
 * fewer entities than the sampled chords. The DXF text is read back by
 * dxf-parser, a reader independent of the writer, and its bulges rebuild the
 * same arcs.
 *
 * Pipe ODs: ASME B36.10M (recalled; REFERENCES.md): NPS 8 8.625 in, NPS 12
 * 12.75 in, NPS 6 6.625 in, NPS 4 4.5 in.
 */
import { describe, expect, it } from 'vitest';
import DxfParser from 'dxf-parser';
import { layoutBranch, type Template } from '@girth/unroll';
import { ARC_SAMPLE_SHARE, ARC_TOLERANCE_MM, fitTemplateArcs, templateToDxf } from '@girth/dxf';
import { branchCutS, exactLongPoint, type OracleBranchSpec } from '../oracle/index.js';
import { templateById } from '../support/template-access.js';

const IN = 25.4;

interface Case {
  readonly name: string;
  readonly spec: OracleBranchSpec;
}

const CASES: readonly Case[] = [
  { name: '45° lateral NPS 8 on NPS 12', spec: { header: { odMm: 12.75 * IN, wallMm: 0.375 * IN }, branch: { odMm: 8.625 * IN, wallMm: 0.322 * IN }, angleDeg: 45 } },
  { name: '90° tee NPS 12 on NPS 12 (grazing)', spec: { header: { odMm: 12.75 * IN, wallMm: 0.375 * IN }, branch: { odMm: 12.75 * IN, wallMm: 0.375 * IN }, angleDeg: 90 } },
  { name: '60° lateral NPS 4 on NPS 6, offset 20 mm', spec: { header: { odMm: 6.625 * IN, wallMm: 0.28 * IN }, branch: { odMm: 4.5 * IN, wallMm: 0.237 * IN }, angleDeg: 60, offsetMm: 20 } },
];

/** Points along an arc (bulged segment from a to b), `n` + 1 of them. */
function arcSamples(a: readonly [number, number], b: readonly [number, number], bulge: number, n: number): Array<[number, number]> {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const chord = Math.hypot(dx, dy);
  const sweep = 4 * Math.atan(bulge);
  const h = chord / 2 / Math.tan(sweep / 2);
  const cx = (a[0] + b[0]) / 2 - (dy / chord) * h;
  const cy = (a[1] + b[1]) / 2 + (dx / chord) * h;
  const r = Math.hypot(a[0] - cx, a[1] - cy);
  const a0 = Math.atan2(a[1] - cy, a[0] - cx);
  return Array.from({ length: n + 1 }, (_, k) => [cx + r * Math.cos(a0 + (sweep * k) / n), cy + r * Math.sin(a0 + (sweep * k) / n)]);
}

/**
 * Distance from (x, y) to the exact cut y = f(x) (f from the oracle): the least
 * distance to the curve sampled every 0.01 mm of girth within ±2 mm of x
 * (or the vertical distance when that is already under half the tolerance).
 */
function distanceToCut(f: (x: number) => number, x: number, y: number): number {
  let best = Math.abs(y - f(x));
  // The vertical distance bounds the true one from above: search only when it is not already small enough.
  if (best <= ARC_TOLERANCE_MM / 2) return best;
  for (let dx = -2; dx <= 2; dx += 0.01) best = Math.min(best, Math.hypot(dx, y - f(x + dx)));
  return best;
}

function cutOf(c: Case): { template: Template; f: (x: number) => number } {
  const template = templateById(layoutBranch(c.spec), 'branch-cut');
  const wrapR = c.spec.branch.odMm / 2;
  const lp = exactLongPoint(c.spec);
  return { template, f: (x) => branchCutS(c.spec, x / wrapR) - lp.sMm };
}

describe('arc-fitted cut lines against the oracle', () => {
  for (const c of CASES) {
    it(`${c.name}: every fitted arc within ${ARC_TOLERANCE_MM} mm of the exact cut`, () => {
      const { template, f } = cutOf(c);
      const fit = fitTemplateArcs(template, ARC_TOLERANCE_MM * ARC_SAMPLE_SHARE);
      expect(fit.maxDeviationMm).toBeLessThanOrEqual(ARC_TOLERANCE_MM * ARC_SAMPLE_SHARE);
      let worst = 0;
      let arcs = 0;
      for (const part of fit.template.cut) {
        if (part.kind === 'arc') {
          arcs++;
          const sweep = ((part.endDeg - part.startDeg + 360) % 360) * (Math.PI / 180);
          const a0 = (part.startDeg * Math.PI) / 180;
          const n = Math.max(20, Math.ceil((sweep * part.radiusMm) / 0.5));
          for (let k = 0; k <= n; k++) {
            const t = a0 + (sweep * k) / n;
            worst = Math.max(worst, distanceToCut(f, part.center[0] + part.radiusMm * Math.cos(t), part.center[1] + part.radiusMm * Math.sin(t)));
          }
        } else if (part.kind === 'polyline') {
          for (let i = 0; i + 1 < part.points.length; i++) {
            const [ax, ay] = part.points[i]!;
            const [bx, by] = part.points[i + 1]!;
            for (let k = 0; k <= 10; k++) worst = Math.max(worst, distanceToCut(f, ax + ((bx - ax) * k) / 10, ay + ((by - ay) * k) / 10));
          }
        }
      }
      expect(arcs).toBeGreaterThan(0);
      expect(worst, `${c.name}: worst distance ${worst} mm`).toBeLessThanOrEqual(ARC_TOLERANCE_MM);
    });
  }

  it('45° lateral NPS 8 on NPS 12: at least 5x fewer cut entities than the sampled chords', () => {
    const { template } = cutOf(CASES[0]!);
    const fit = fitTemplateArcs(template, ARC_TOLERANCE_MM * ARC_SAMPLE_SHARE);
    expect(fit.fittedCount * 5).toBeLessThanOrEqual(fit.chordCount);
  });

  for (const version of ['AC1021', 'R12'] as const) {
    it(`${version}: dxf-parser reads the bulges back; each rebuilt arc lies on the exact cut (45° lateral)`, () => {
      const { template, f } = cutOf(CASES[0]!);
      const lines = new DxfParser().parseSync(templateToDxf(template, { version, curves: 'lines' }))!;
      const arcsDxf = new DxfParser().parseSync(templateToDxf(template, { version, curves: 'arcs' }))!;
      type V = { x: number; y: number; bulge?: number };
      const cutPoly = (doc: typeof lines): V[] => {
        const polys = doc.entities.filter((e) => e.layer === 'CUT' && (e.type === 'LWPOLYLINE' || e.type === 'POLYLINE')) as unknown as Array<{ vertices: V[] }>;
        expect(polys).toHaveLength(1);
        return polys[0]!.vertices;
      };
      const chordV = cutPoly(lines);
      const arcV = cutPoly(arcsDxf);
      expect(arcV.filter((v) => (v.bulge ?? 0) !== 0).length).toBeGreaterThan(0);
      expect(arcV.length * 5).toBeLessThanOrEqual(chordV.length);
      // The sheet places the template by a shift: find it from the first template point and the first chord vertex.
      const first = (template.cut[0] as { points: ReadonlyArray<readonly [number, number]> }).points[0]!;
      const sx = chordV[0]!.x - first[0];
      const sy = chordV[0]!.y - first[1];
      let worst = 0;
      for (let i = 0; i + 1 < arcV.length; i++) {
        const a = arcV[i]!;
        const b = arcV[i + 1]!;
        const pts = (a.bulge ?? 0) === 0 ? [[a.x, a.y], [b.x, b.y]] as Array<[number, number]> : arcSamples([a.x, a.y], [b.x, b.y], a.bulge!, 40);
        for (const [x, y] of pts) worst = Math.max(worst, distanceToCut(f, x - sx, y - sy));
      }
      // Written to 6 decimals (coordinates) and 10 (bulges): well inside the tolerance.
      expect(worst).toBeLessThanOrEqual(ARC_TOLERANCE_MM);
    });
  }
});
