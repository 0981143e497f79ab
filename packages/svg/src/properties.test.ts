import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import type { INode } from 'svgson';
import { templateToSvg } from './template-to-svg.js';
import { coneSector, planeCutWrap, teeHole } from './test-support/fixtures.js';
import { byId, parseSvg, sheetSize } from './test-support/parse.js';
import { pathBounds, readPath } from './test-support/path-geometry.js';
import type { SheetUnits } from './types.js';

/** Every path and rect with its stroke width (own or inherited), in sheet units. */
function strokedShapes(root: INode): { box: { minX: number; minY: number; maxX: number; maxY: number }; sw: number }[] {
  const out: { box: { minX: number; minY: number; maxX: number; maxY: number }; sw: number }[] = [];
  const visit = (n: INode, inherited: number): void => {
    const sw = n.attributes['stroke-width'] !== undefined ? Number(n.attributes['stroke-width']) : inherited;
    const stroked = n.attributes.stroke !== 'none';
    if (n.name === 'path') out.push({ box: pathBounds(readPath(n.attributes.d ?? '')), sw: stroked ? sw : 0 });
    if (n.name === 'rect') {
      const [x, y, w, h] = ['x', 'y', 'width', 'height'].map((k) => Number(n.attributes[k])) as [number, number, number, number];
      out.push({ box: { minX: x, minY: y, maxX: x + w, maxY: y + h }, sw: stroked && n.attributes.stroke ? sw : 0 });
    }
    n.children.forEach((c) => visit(c, sw));
  };
  visit(root, 0);
  return out;
}

function expectInsideSheet(svg: string, marginMm: number, units: SheetUnits): void {
  const root = parseSvg(svg);
  const s = sheetSize(root);
  expect(s.viewBox).toEqual([0, 0, s.width, s.height]);
  const m = units === 'in' ? marginMm / 25.4 : marginMm;
  // Rounding of written numbers: 0.0005 mm (or 0.000005 in) per coordinate.
  const eps = units === 'in' ? 1e-5 : 1e-3;
  for (const { box, sw } of strokedShapes(root)) {
    expect(box.minX - sw / 2).toBeGreaterThanOrEqual(m - eps);
    expect(box.minY - sw / 2).toBeGreaterThanOrEqual(m - eps);
    expect(box.maxX + sw / 2).toBeLessThanOrEqual(s.width - m + eps);
    expect(box.maxY + sw / 2).toBeLessThanOrEqual(s.height - m + eps);
  }
}

describe('invariants over random templates and options', () => {
  const options = fc.record({
    sheetUnits: fc.constantFrom<SheetUnits>('mm', 'in'),
    marginMm: fc.double({ min: 0, max: 100, noNaN: true }),
    overlapMm: fc.double({ min: 0, max: 200, noNaN: true }),
  });

  test('wraps: stretch-out kept, everything drawn (plus half its stroke) inside the margin, no NaN', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 1600, noNaN: true }),
        fc.double({ min: 0, max: 70, noNaN: true }),
        fc.constantFrom(4, 8, 16, 32),
        options,
        (odMm, cutDeg, stations, opts) => {
          const svg = templateToSvg(planeCutWrap(odMm, cutDeg, stations, 4), opts);
          expect(svg).not.toMatch(/NaN|Infinity/);
          expectInsideSheet(svg, opts.marginMm, opts.sheetUnits);
          const cut = pathBounds(readPath(byId(parseSvg(svg), 'cut').children[0]?.attributes.d ?? ''));
          const k = opts.sheetUnits === 'in' ? 25.4 : 1;
          // Stretch-out = pi x OD (DESIGN.md), to the written precision.
          expect(Math.abs((cut.maxX - cut.minX) * k - Math.PI * odMm)).toBeLessThanOrEqual(0.002);
        },
      ),
      { numRuns: 60 },
    );
  });

  test('holes and flat patterns: everything drawn inside the margin', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 20, max: 800, noNaN: true }),
        fc.double({ min: 0.05, max: 1, noNaN: true }),
        options,
        (R, ratio, opts) => {
          expectInsideSheet(templateToSvg(teeHole(R, R * ratio, 64), opts), opts.marginMm, opts.sheetUnits);
          expectInsideSheet(templateToSvg(coneSector(2 * R, 2 * R * (1 - ratio * 0.9), R), opts), opts.marginMm, opts.sheetUnits);
        },
      ),
      { numRuns: 40 },
    );
  });
});
