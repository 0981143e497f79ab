/**
 * DXF of templates made by Girth's own layouts (@girth/unroll), read back with
 * dxf-parser and audited with ezdxf.
 */
import { describe, expect, it } from 'vitest';
import { CAUTION, layoutBranch, layoutConcentricCone, layoutEccentricCone, layoutMiter, layoutPlaneCut, type Template } from '@girth/unroll';
import { templateToDxf } from './template-to-dxf.js';
import { expectClose } from './test-support/close.js';
import { bulgeRadius, polylinesOf } from './test-support/contours.js';
import { auditWithEzdxf, parseDxf } from './test-support/read-back.js';

const IN = 25.4;

describe('DXF of unroll layouts', () => {
  // Worked example ("Drawing Nets", ceemrr.com Geometry2/DrawingsNets6; REFERENCES.md):
  // an 8 in to 5 in cone 4 in long has pattern radii 11.39 and 7.12 in and a 126.4° sweep.
  it('writes a concentric cone pattern as ONE closed CUT polyline with the published radii', () => {
    const layout = layoutConcentricCone({ largeDiameterMm: 8 * IN, smallDiameterMm: 5 * IN, lengthMm: 4 * IN, thicknessMm: 0 });
    for (const version of ['AC1021', 'R12'] as const) {
      const dxf = parseDxf(templateToDxf(layout.templates[0]!, { units: 'in', version }));
      const cut = polylinesOf(dxf).filter((p) => p.layer === 'CUT');
      expect(cut).toHaveLength(1);
      expect(dxf.entities.filter((e) => e.layer === 'CUT')).toHaveLength(1);
      const c = cut[0]!;
      expect(c.closed).toBe(true);
      const radii = c.vertices
        .map((v, i) => [v, c.vertices[(i + 1) % c.vertices.length]!] as const)
        .filter(([v]) => v[2] !== 0)
        .map(([a, b]) => bulgeRadius(a, b))
        .sort((x, y) => x - y);
      expect(radii).toHaveLength(2);
      expectClose(radii[0]!, 7.12, 0.005, `inner radius (${version})`);
      expectClose(radii[1]!, 11.39, 0.005, `outer radius (${version})`);
    }
  });

  it('audits clean with ezdxf for concentric and eccentric cone patterns', () => {
    const concentric = layoutConcentricCone({ largeDiameterMm: 8 * IN, smallDiameterMm: 5 * IN, lengthMm: 4 * IN, thicknessMm: 0 });
    const eccentric = layoutEccentricCone({ largeDiameterMm: 8 * IN, smallDiameterMm: 5 * IN, lengthMm: 4 * IN, thicknessMm: 0 });
    const files: Record<string, string> = {};
    for (const version of ['AC1021', 'R12'] as const) {
      files[`concentric-${version}`] = templateToDxf(concentric.templates[0]!, { version });
      files[`eccentric-${version}`] = templateToDxf(eccentric.templates[0]!, { version });
    }
    for (const [key, report] of Object.entries(auditWithEzdxf(files))) {
      expect(report.hasErrors, `${key}: ${report.errors.join('; ')}`).toBe(false);
      // Each pattern is one closed contour to cut.
      expect(report.closedByLayer['CUT'], key).toBe(1);
    }
  });

  it('writes the caution once per file, whole over its TEXT lines, for every joint (the notes carry none)', () => {
    // ASME B36.10M, recalled (REFERENCES.md): NPS 10 STD OD 10.750 in wall 0.365 in; NPS 4 STD OD 4.500 in wall 0.237 in.
    const run = { odMm: 10.75 * IN, wallMm: 0.365 * IN, label: 'NPS 10 STD', npsIn: 10 };
    const small = { odMm: 4.5 * IN, wallMm: 0.237 * IN, label: 'NPS 4 STD', npsIn: 4 };
    const reducer = { largeDiameterMm: run.odMm, smallDiameterMm: small.odMm, lengthMm: 250, thicknessMm: 8 };
    const templates: Template[] = [];
    for (const layout of [layoutBranch({ header: run, branch: small, angleDeg: 60, offsetMm: 20 }), layoutPlaneCut({ pipe: run, angleDeg: 75 })]) templates.push(...layout.templates);
    for (const layout of [layoutMiter({ pipe: small, bendDeg: 45, welds: 2, radiusNps: 1.5 }), layoutConcentricCone(reducer), layoutEccentricCone(reducer)]) templates.push(...layout.templates);
    expect(templates.map((t) => t.id)).toEqual(['branch-cut', 'header-hole', 'plane-cut', 'miter-end', 'miter-middle', 'cone-pattern', 'cone-pattern']);
    for (const t of templates) {
      const texts = parseDxf(templateToDxf(t, { version: 'R12' })).entities.flatMap((e) => (e.type === 'TEXT' ? [(e as unknown as { text: string }).text] : []));
      expect(texts.filter((x) => /CAUTION/i.test(x)), t.id).toHaveLength(1);
      // Broken to the sheet's width into TEXT lines that read whole in order.
      expect(texts.join(' '), t.id).toContain(CAUTION);
    }
  });
});
