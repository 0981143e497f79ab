import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { PAPERS } from './paper.js';
import { BAND_MM, GUTTER_MM, pagesAlong, planTiles, rowLetters } from './tile-plan.js';

/**
 * Pages along one side counted the slow way, independent of `pagesAlong`:
 * add pages until n windows, overlapping by `ov`, reach the length.
 */
function pagesByCounting(length: number, window: number, ov: number): number {
  let n = 1;
  while (n * window - (n - 1) * ov < length - 1e-6) n++;
  return n;
}

describe('page count follows from the printable area and the overlap', () => {
  for (const name of ['letter', 'a4'] as const) {
    it(`${name}: tiles = the fewer of portrait and landscape counts, windows cover the sheet, neighbours overlap exactly`, () => {
      const paper = PAPERS[name];
      if (paper.kind !== 'sheet') throw new Error('cut sheet expected');
      fc.assert(
        fc.property(
          fc.double({ min: 20, max: 2500, noNaN: true }),
          fc.double({ min: 20, max: 1500, noNaN: true }),
          fc.double({ min: 0, max: 40, noNaN: true }),
          fc.double({ min: 0, max: 20, noNaN: true }),
          (w, h, ov, margin) => {
            // The printable area is the paper less the margin; the window is that less the gutters and the band.
            const count = (pw: number, ph: number) => {
              const ww = pw - 2 * margin - 2 * GUTTER_MM;
              const wh = ph - 2 * margin - 2 * GUTTER_MM - BAND_MM;
              return pagesByCounting(w, ww, ov) * pagesByCounting(h, wh, ov);
            };
            const expected = Math.min(count(paper.widthMm, paper.heightMm), count(paper.heightMm, paper.widthMm));
            if (expected > 200) return;
            const plan = planTiles(w, h, { paper: name, overlapMm: ov, marginMm: margin });
            expect(plan.tiles.length).toBe(expected);
            expect(plan.pageCount).toBe(expected > 1 ? expected + 1 : 1);
            const last = plan.tiles[plan.tiles.length - 1]!;
            expect(last.window.x + last.window.width).toBeGreaterThanOrEqual(w - 1e-6);
            expect(last.window.y + last.window.height).toBeGreaterThanOrEqual(h - 1e-6);
            for (const t of plan.tiles) {
              if (t.col > 0) {
                const left = plan.tiles[t.row * plan.cols + t.col - 1]!;
                expect(left.window.x + left.window.width - t.window.x).toBeCloseTo(ov, 9);
                expect(t.neighbours.left).toBe(left.label);
              }
            }
          },
        ),
        { numRuns: 300 },
      );
    });
  }

  it('pagesAlong agrees with counting (a worked case: 500 mm on 200 mm windows overlapping 10 mm is 3 pages)', () => {
    expect(pagesAlong(500, 200, 10)).toBe(3);
    expect(pagesAlong(390, 200, 10)).toBe(2);
    expect(pagesAlong(390.0001, 200, 10)).toBe(3);
    expect(pagesAlong(200, 200, 10)).toBe(1);
  });

  it('labels rows A..Z, AA.. and columns from 1', () => {
    expect([0, 1, 25, 26, 27].map(rowLetters)).toEqual(['A', 'B', 'Z', 'AA', 'AB']);
    const plan = planTiles(500, 500, { paper: 'letter', orientation: 'portrait' });
    expect(plan.tiles.map((t) => t.label).slice(0, 4)).toEqual(['A1', 'A2', 'A3', 'B1']);
    expect(plan.tiles[4]!.neighbours).toEqual({ up: 'A2', down: 'C2', left: 'B1', right: 'B3' });
  });

  it('every target lies inside an overlap strip', () => {
    const plan = planTiles(1200, 700, { paper: 'a4' });
    expect(plan.targets.length).toBeGreaterThan(0);
    for (const [u, v] of plan.targets) {
      expect(plan.strips.some((s) => u >= s.x && u <= s.x + s.width && v >= s.y && v <= s.y + s.height)).toBe(true);
    }
  });
});

describe('roll output: one page per roll width, as long as the sheet', () => {
  it('a sheet narrower than the roll takes one page, the roll width across', () => {
    for (const name of ['roll-24in', 'roll-36in', 'roll-610mm', 'roll-914mm'] as const) {
      const roll = PAPERS[name].widthMm;
      const plan = planTiles(1975, 500, { paper: name });
      expect(plan.pageCount).toBe(1);
      expect(Math.min(plan.pageWidthMm, plan.pageHeightMm)).toBe(roll);
      expect(Math.max(plan.pageWidthMm, plan.pageHeightMm)).toBeGreaterThanOrEqual(1975);
    }
  });

  it('a sheet wider than the roll both ways takes one strip per roll width', () => {
    fc.assert(
      fc.property(fc.double({ min: 700, max: 4000, noNaN: true }), fc.double({ min: 700, max: 4000, noNaN: true }), (w, h) => {
        const plan = planTiles(w, h, { paper: 'roll-24in' });
        const across = plan.orientation === 'portrait' ? w : h;
        const window = 609.6 - 2 * 6.35 - 2 * GUTTER_MM - (plan.orientation === 'portrait' ? 0 : BAND_MM);
        expect(plan.tiles.length).toBe(pagesByCounting(across, window, 12.7));
        expect(plan.orientation === 'portrait' ? plan.rows : plan.cols).toBe(1);
        expect(plan.orientation === 'portrait' ? plan.pageWidthMm : plan.pageHeightMm).toBe(609.6);
      }),
      { numRuns: 100 },
    );
  });
});
