import { describe, expect, test } from 'vitest';
import { templateToSvg } from './template-to-svg.js';
import { coneSector, DEMO_JOB, DEMO_PIECE, planeCutWrap, teeHole } from './test-support/fixtures.js';
import { keepGroups, longestDarkRow, renderSvg, resvgOf } from './test-support/render.js';
import { parseSvg, sheetSize } from './test-support/parse.js';
import { expectClose } from './test-support/expect-close.js';

const IN = 25.4;

describe('rendered with resvg: the calibration bar measures true length', () => {
  const wrap = planeCutWrap(168.275, 30); // NPS 6 OD 6.625 in (ASME B36.10M, recalled)

  test('100 mm bar at 254 dpi is 1000 px long, within 2 px', () => {
    // 254 dpi = 10 px per mm (1 in = 25.4 mm exactly, by definition).
    const only = keepGroups(templateToSvg(wrap), ['calibration']);
    const run = longestDarkRow(renderSvg(only, 254));
    expectClose(run, 1000, 2, 'bar length, px');
  });

  test('100 mm bar at resvg default 96 dpi is 377.95 px long, within 2 px', () => {
    const only = keepGroups(templateToSvg(wrap), ['calibration']);
    expectClose(longestDarkRow(renderSvg(only, 96)), (100 / IN) * 96, 2, 'bar length, px');
  });

  test('4 in bar on an inch sheet at 100 dpi is 400 px long, within 2 px', () => {
    const only = keepGroups(templateToSvg(wrap, { sheetUnits: 'in' }), ['calibration']);
    expectClose(longestDarkRow(renderSvg(only, 100)), 400, 2, 'bar length, px');
  });

  test('the whole sheet renders at its physical size', () => {
    const svg = templateToSvg(wrap);
    const s = sheetSize(parseSvg(svg));
    const pic = renderSvg(svg, 254);
    expectClose(pic.width, s.width * 10, 1, 'picture width, px');
    expectClose(pic.height, s.height * 10, 1, 'picture height, px');
  });
});

describe('rendered with resvg: nothing is clipped and the margin stays clear', () => {
  const cases = {
    wrap: planeCutWrap(168.275, 30),
    'wrap, steep': planeCutWrap(60.325, 60, 32),
    hole: teeHole(161.925, 57.15),
    flat: coneSector(8 * IN, 5 * IN, 4 * IN),
  };
  const hostileWide = 'WWWWWWWWWWMMMMMMMMMM@@@@@@@@@@%%%%%%%%%%WWWWWWWWWWMMMMMMMMMM';

  for (const [name, t] of Object.entries(cases)) {
    for (const units of ['mm', 'in'] as const) {
      for (const marginMm of [0, 10]) {
        test(`${name}, ${units} sheet, margin ${marginMm} mm`, () => {
          const svg = templateToSvg(t, { sheetUnits: units, marginMm, job: hostileWide, piece: DEMO_PIECE });
          const s = sheetSize(parseSvg(svg));
          const bbox = resvgOf(svg).getBBox();
          expect(bbox).toBeDefined();
          if (!bbox) return;
          // Everything drawn (strokes and glyphs, as resvg measures them) within the sheet less
          // its margin; resvg's path boxes are approximate, so allow 0.05 mm.
          const m = marginMm / (units === 'in' ? IN : 1);
          const tol = 0.05 / (units === 'in' ? IN : 1);
          expect(bbox.x).toBeGreaterThanOrEqual(m - tol);
          expect(bbox.y).toBeGreaterThanOrEqual(m - tol);
          expect(bbox.x + bbox.width).toBeLessThanOrEqual(s.width - m + tol);
          expect(bbox.y + bbox.height).toBeLessThanOrEqual(s.height - m + tol);
        });
      }
    }
  }

  test('a demo sheet with the usual labels is not much wider than its drawing', () => {
    const t = planeCutWrap(168.275, 30);
    const s = sheetSize(parseSvg(templateToSvg(t, { job: DEMO_JOB, piece: DEMO_PIECE })));
    // Stretch-out 528.7 mm + 25 mm tab + margins: the title block does not widen it.
    expect(s.width).toBeLessThan(Math.PI * 168.275 + 25 + 2 * 10 + 30);
  });
});
