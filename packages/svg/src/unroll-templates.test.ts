import { describe, expect, test } from 'vitest';
import { CAUTION, layoutBranch, layoutConcentricCone, layoutEccentricCone, layoutMiter, layoutPlaneCut, type Template } from '@girth/unroll';
import { templateToSvg } from './template-to-svg.js';
import { DEMO_JOB, DEMO_PIECE } from './test-support/fixtures.js';
import { byId, elements, parseSvg, sheetSize, textOf } from './test-support/parse.js';
import { readPath } from './test-support/path-geometry.js';
import { resvgOf, strictParse } from './test-support/render.js';
import { expectClose } from './test-support/expect-close.js';

const IN = 25.4;

/** Everything resvg draws lies inside the sheet less its margin (0.05 mm for resvg's approximate path boxes). */
function expectInsideMargin(svg: string, marginMm: number): void {
  const s = sheetSize(parseSvg(svg));
  const k = s.unit === 'in' ? IN : 1;
  const b = resvgOf(svg).getBBox();
  expect(b).toBeDefined();
  if (!b) return;
  const m = marginMm / k;
  const tol = 0.05 / k;
  expect(b.x).toBeGreaterThanOrEqual(m - tol);
  expect(b.y).toBeGreaterThanOrEqual(m - tol);
  expect(b.x + b.width).toBeLessThanOrEqual(s.width - m + tol);
  expect(b.y + b.height).toBeLessThanOrEqual(s.height - m + tol);
}

describe('templates made by @girth/unroll', () => {
  test('concentric cone: the published worked example keeps its radii and sweep on the sheet', () => {
    // REFERENCES.md; "Drawing Nets" (ceemrr.com, Geometry2/DrawingsNets6): an 8 in to 5 in cone
    // 4 in long has pattern radii 11.39 and 7.12 in and a 126.4° sweep (thin sheet: thickness 0).
    const layout = layoutConcentricCone({ largeDiameterMm: 8 * IN, smallDiameterMm: 5 * IN, lengthMm: 4 * IN, thicknessMm: 0 });
    const template = layout.templates[0] as Template;
    const svg = templateToSvg(template, { sheetUnits: 'in', job: DEMO_JOB, piece: DEMO_PIECE });
    strictParse(svg);
    const root = parseSvg(svg);
    const arcPaths = elements(byId(root, 'cut'), 'path')
      .map((p) => readPath(p.attributes.d ?? ''))
      .filter((p) => p.arcs.length > 0);
    expect(arcPaths).toHaveLength(2);
    const radii = arcPaths.map((p) => p.arcs[0]?.r ?? NaN).sort((a, b) => a - b);
    expectClose(radii[0] as number, 7.12, 0.005, 'inner radius, in');
    expectClose(radii[1] as number, 11.39, 0.005, 'outer radius, in');
    for (const p of arcPaths) expectClose(p.arcs.reduce((s, a) => s + Math.abs(a.sweepDeg), 0), 126.4, 0.05, 'sweep, degrees');
    expect(byId(root, 'overlap').children).toEqual([]);
    expect(textOf(byId(root, 'title-block'))).toContain(template.title);
    expectInsideMargin(svg, 10);
  });

  test('concentric cone in 4 segments and an eccentric cone: every template draws inside its margin', () => {
    const spec = { largeDiameterMm: 323.85, smallDiameterMm: 168.275, lengthMm: 356, thicknessMm: 6 };
    const templates = [
      ...layoutConcentricCone(spec, { segments: 4 }).templates,
      ...layoutEccentricCone(spec).templates,
    ];
    expect(templates.length).toBeGreaterThanOrEqual(5);
    for (const t of templates) {
      for (const sheetUnits of ['mm', 'in'] as const) {
        const svg = templateToSvg(t, { sheetUnits, marginMm: 5 });
        expect(svg).not.toMatch(/NaN|Infinity/);
        expectInsideMargin(svg, 5);
        // Every station line is numbered (lines from one point share a number).
        const named = elements(byId(parseSvg(svg), 'stations'), 'text').flatMap((e) =>
          (e.attributes['data-station'] ?? '').split(' ').map(Number),
        );
        expect(new Set(named)).toEqual(new Set(t.stationLines.map((l) => l.n)));
      }
    }
  });

  test('every joint\'s sheet shows the caution once: in the title block, not again among the notes', () => {
    // NPS 12 STD and NPS 6 STD: OD 12.750 / 6.625 in, walls 0.375 / 0.280 in (ASME B36.10M, recalled;
    // REFERENCES.md). Miter radius 1.5 x NPS, as a long-radius elbow (ASME B16.9, recalled).
    const nps12 = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD', npsIn: 12 };
    const nps6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD', npsIn: 6 };
    const cone = { largeDiameterMm: nps12.odMm, smallDiameterMm: nps6.odMm, lengthMm: 356, thicknessMm: 6 };
    const sheets = [
      layoutBranch({ header: nps12, branch: nps6, angleDeg: 45 }), layoutPlaneCut({ pipe: nps6, angleDeg: 60 }),
      layoutMiter({ pipe: nps12, bendDeg: 90, pieces: 4, radiusNps: 1.5 }), layoutConcentricCone(cone), layoutEccentricCone(cone),
    ].flatMap((layout) => layout.templates.map((t) => parseSvg(templateToSvg(t))));
    expect(sheets).toHaveLength(2 + 1 + 2 + 1 + 1);
    for (const root of sheets) {
      const printed = elements(root, 'text').map(textOf).join('\n');
      expect(printed.split('CAUTION')).toHaveLength(2);
      // The caution is broken into lines to the sheet's width: compared with the spaces taken out.
      expect(textOf(byId(root, 'title-block')).replace(/\s+/g, '').split(CAUTION.replace(/\s+/g, ''))).toHaveLength(2);
    }
  });
});
