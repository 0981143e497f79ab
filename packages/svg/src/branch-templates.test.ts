import { describe, expect, test } from 'vitest';
import { layoutBranch } from '@girth/unroll';
import { templateToSvg } from './template-to-svg.js';
import { DEMO_JOB, DEMO_PIECE } from './test-support/fixtures.js';
import { byId, elements, parseSvg, sheetSize, textOf } from './test-support/parse.js';
import { pathBounds, readPath } from './test-support/path-geometry.js';
import { resvgOf, strictParse } from './test-support/render.js';
import { expectClose } from './test-support/expect-close.js';
import type { INode } from 'svgson';

const IN = 25.4;
// ASME B36.10M (recalled; REFERENCES.md): NPS 12 STD OD 12.750 in wall 0.375 in; NPS 6 STD OD 6.625 in wall 0.280 in.
const HEADER = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' };
const BRANCH = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };

function cutBounds(root: INode) {
  const all = elements(byId(root, 'cut'), 'path').map((p) => pathBounds(readPath(p.attributes.d ?? '')));
  return {
    w: Math.max(...all.map((b) => b.maxX)) - Math.min(...all.map((b) => b.minX)),
    h: Math.max(...all.map((b) => b.maxY)) - Math.min(...all.map((b) => b.minY)),
  };
}

function expectInsideMargin(svg: string, marginMm: number): void {
  const s = sheetSize(parseSvg(svg));
  const b = resvgOf(svg).getBBox();
  expect(b).toBeDefined();
  if (!b) return;
  // resvg's path boxes are approximate: 0.05 mm.
  expect(b.x).toBeGreaterThanOrEqual(marginMm - 0.05);
  expect(b.y).toBeGreaterThanOrEqual(marginMm - 0.05);
  expect(b.x + b.width).toBeLessThanOrEqual(s.width - marginMm + 0.05);
  expect(b.y + b.height).toBeLessThanOrEqual(s.height - marginMm + 0.05);
}

describe('branch templates from layoutBranch', () => {
  test('lateral at 45°: the branch cut wraps the branch OD with its tab, the hole has none', () => {
    const [cut, hole] = layoutBranch({ header: HEADER, branch: BRANCH, angleDeg: 45 }).templates;
    const cutSvg = templateToSvg(cut, { job: DEMO_JOB, piece: DEMO_PIECE });
    strictParse(cutSvg);
    const cutRoot = parseSvg(cutSvg);
    // Stretch-out = pi x branch OD (DESIGN.md; common practice), within 0.01 mm.
    expectClose(cutBounds(cutRoot).w, Math.PI * BRANCH.odMm, 0.01, 'branch cut width');
    expect(elements(byId(cutRoot, 'overlap'), 'rect')).toHaveLength(1);
    expect(textOf(byId(cutRoot, 'title-block'))).toContain('Wrap on the 168.275 mm OD: edge x = 0 on the heel line');
    expectInsideMargin(cutSvg, 10);

    const holeSvg = templateToSvg(hole, { job: DEMO_JOB, piece: DEMO_PIECE });
    strictParse(holeSvg);
    const holeRoot = parseSvg(holeSvg);
    expect(byId(holeRoot, 'overlap').children).toEqual([]);
    expectInsideMargin(holeSvg, 10);
  });

  test('tee, set-on: the hole spans the branch ID along the header and 2 R asin(r/R) around it', () => {
    // MathWorld, "Cylinder-Cylinder Intersection" (REFERENCES.md), with the set-on rule of
    // DESIGN.md (common practice): the hole is the branch ID (r) on the header OD (R).
    const [, hole] = layoutBranch({ header: HEADER, branch: BRANCH, angleDeg: 90 }).templates;
    const root = parseSvg(templateToSvg(hole));
    const R = HEADER.odMm / 2;
    const r = (BRANCH.odMm - 2 * BRANCH.wallMm) / 2;
    const b = cutBounds(root);
    // The layout draws chords within 0.05 mm of the curve (its default chord tolerance).
    expectClose(b.h, 2 * r, 0.06, 'hole length along the header');
    expectClose(b.w, 2 * R * Math.asin(r / R), 0.06, 'hole width around the header');
  });
});
