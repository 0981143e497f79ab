/**
 * Two things every DXF golden (all in mm) leaves unchecked: text heights in an
 * inch file, and a stand-alone ARC's start and end angles. Checked against the
 * DXF reference (AutoCAD DXF Reference, recalled): TEXT group 40 is the height
 * in drawing units; ARC groups 50/51 are the start and end angles in degrees,
 * counter-clockwise, and do not scale with the unit. Read back with dxf-parser
 * (which gives ARC angles in radians).
 */
import { describe, expect, it } from 'vitest';
import type { Template } from '@girth/unroll';
import { templateToDxf } from './template-to-dxf.js';
import type { DxfVersion } from './types.js';
import { teeHole } from './test-support/fixtures.js';
import { parseDxf } from './test-support/read-back.js';

const MM_PER_INCH = 25.4; // exact by definition (international inch, 1959)
const DEG = Math.PI / 180;

/** A header hole (NPS 12 header, NPS 6 STD ID branch; ASME B36.10M, recalled) with a label and a lone mark arc added. */
function holeWithArcAndLabel(): Template {
  const hole = teeHole(12.75 * MM_PER_INCH, (6.625 - 2 * 0.28) * MM_PER_INCH);
  return {
    ...hole,
    marks: [...hole.marks, { kind: 'arc', center: [127, 63.5], radiusMm: 38.1, startDeg: 30, endDeg: 120 }],
    // Far above the hole, where nothing else is placed, so the label stays on its own point.
    labels: [...hole.labels, { text: 'WELD SIDE', at: [50.8, 254], heightMm: 12.7 }],
  };
}

describe.each(['AC1021', 'R12'] as const)('templateToDxf %s', (version: DxfVersion) => {
  for (const units of ['in', 'mm'] as const) {
    const k = units === 'in' ? 1 / MM_PER_INCH : 1;
    const dxf = parseDxf(templateToDxf(holeWithArcAndLabel(), { units, version }));
    const entities = dxf.entities as unknown as Record<string, unknown>[];

    it(`${units}: a label 12.7 mm high is a TEXT ${12.7 * k} ${units} high at its point in ${units}`, () => {
      const label = entities.find((e) => e.type === 'TEXT' && e.text === 'WELD SIDE') as { textHeight: number; startPoint: { x: number }; endPoint?: { x: number; y: number } } | undefined;
      expect(label).toBeDefined();
      expect(Math.abs(label!.textHeight - 12.7 * k)).toBeLessThan(1e-6);
      // Centred text (the sheet plan's rule, shared with the SVG): the label is
      // centred on its point, so the alignment point (group 11, baseline centre)
      // is at the point's x and half the cap height (12.7 / 2 mm) below it.
      const at = label!.endPoint ?? (label!.startPoint as { x: number; y: number });
      expect(Math.abs(at.x - 50.8 * k)).toBeLessThan(1e-6);
      expect(Math.abs(at.y - (254 - 12.7 / 2) * k)).toBeLessThan(1e-6);
    });

    it(`${units}: every TEXT is as high in ${units} as its mm height divided by ${1 / k}, none 25.4 times too large or small`, () => {
      const heights = entities.filter((e) => e.type === 'TEXT').map((e) => e.textHeight as number);
      expect(heights.length).toBeGreaterThan(3);
      // Sheet text is a few mm high (common practice: 2.5-10 mm); in inches about 0.1-0.4.
      for (const h of heights) {
        expect(h * (units === 'in' ? MM_PER_INCH : 1)).toBeGreaterThan(1);
        expect(h * (units === 'in' ? MM_PER_INCH : 1)).toBeLessThan(30);
      }
    });

    it(`${units}: the lone arc is an ARC from 30° to 120° (angles unscaled), centre and radius in ${units}`, () => {
      const arcs = entities.filter((e) => e.type === 'ARC') as unknown as { center: { x: number; y: number }; radius: number; startAngle: number; endAngle: number }[];
      expect(arcs).toHaveLength(1);
      const arc = arcs[0]!;
      expect(Math.abs(arc.startAngle - 30 * DEG)).toBeLessThan(1e-9);
      expect(Math.abs(arc.endAngle - 120 * DEG)).toBeLessThan(1e-9);
      expect(Math.abs(arc.radius - 38.1 * k)).toBeLessThan(1e-6);
      expect(Math.abs(arc.center.x - 127 * k)).toBeLessThan(1e-6);
      expect(Math.abs(arc.center.y - 63.5 * k)).toBeLessThan(1e-6);
    });
  }
});
