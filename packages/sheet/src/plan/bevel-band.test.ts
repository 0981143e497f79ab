import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { layoutBranch, layoutMiter, weldPrepForBranch, weldPrepForMiter, withBranchWeldPrep, withMiterWeldPrep, type Template } from '@girth/unroll';
import { planSheet } from '../plan-sheet.js';
import { EMPTY_BOX, partBox, unionBox } from '../internal/box.js';
import type { Box, SheetText } from '../types.js';

const IN = 25.4;
// ASME B36.10M (REFERENCES.md, recalled): NPS 12 STD 12.750 x 0.375 in, NPS 6 STD 6.625 x 0.280 in, NPS 1 STD 1.315 x 0.133 in.
const NPS12 = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' };
const NPS6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };
const NPS1 = { odMm: 1.315 * IN, wallMm: 0.133 * IN, label: 'NPS 1 STD' };

const overlaps = (a: Box, b: Box): boolean => a.minX < b.maxX && b.minX < a.maxX && a.minY < b.maxY && b.minY < a.maxY;

function lateral(branch = NPS6, stations = 16): Template {
  const spec = { header: NPS12, branch, angleDeg: 45 };
  return withBranchWeldPrep(layoutBranch(spec, { stations }), weldPrepForBranch(spec, { grooveAngleDeg: 45, landMm: 1.6 }, { stations })).templates[0];
}

function bandTexts(t: Template): { cells: SheetText[]; headings: SheetText[]; cutBox: Box; others: SheetText[] } {
  const plan = planSheet(t);
  const texts = plan.items.filter((i): i is SheetText => i.kind === 'text');
  let cutBox = EMPTY_BOX;
  for (const p of t.cut) cutBox = unionBox(cutBox, partBox(p));
  for (const p of t.marks) cutBox = unionBox(cutBox, partBox(p));
  return {
    cells: texts.filter((x) => x.role === 'bevel-band'),
    headings: texts.filter((x) => x.role === 'bevel-band-heading'),
    cutBox,
    others: texts.filter((x) => !x.role.startsWith('bevel-band') && !x.role.startsWith('title') && x.role !== 'caution' && x.role !== 'calibration-caption'),
  };
}

describe('bevel band on a wrap with weld prep', () => {
  it('writes the torch and the dihedral angle under every station of a 45° lateral, below the cut line and the station numbers', () => {
    const t = lateral();
    const { cells, headings, cutBox, others } = bandTexts(t);
    expect(headings.map((h) => h.lines[0])).toEqual(['Torch angle (deg)', 'Dihedral (deg)']);
    expect(cells).toHaveLength(32);
    // Toe of a lateral at A: dihedral A (AWS D1.1 definition, recalled; REFERENCES.md derived value).
    const toeDihedral = cells.filter((c) => c.stations?.[0] === 9).map((c) => c.lines[0]);
    expect(toeDihedral).toContain('45.0');
    for (const c of [...cells, ...headings]) {
      expect(c.box.maxY, 'the band lies wholly below the cut line (never crosses it)').toBeLessThan(cutBox.minY);
      for (const o of others) expect(overlaps(c.box, o.box), `${c.lines[0]} against ${o.role} ${o.lines[0]}`).toBe(false);
    }
  });

  it('cells never run into each other, down to NPS 1 at 360 stations (fewer cells written, never overlapping)', () => {
    fc.assert(
      fc.property(fc.constantFrom(NPS1, NPS6), fc.integer({ min: 4, max: 360 }), (branch, stations) => {
        const { cells, headings } = bandTexts(lateral(branch, stations));
        expect(cells.length).toBeGreaterThan(0);
        const all = [...cells, ...headings];
        for (let i = 0; i < all.length; i++) for (let j = i + 1; j < all.length; j++) expect(overlaps(all[i]!.box, all[j]!.box)).toBe(false);
        for (const c of cells) expect(c.fontMm).toBeGreaterThanOrEqual(1.2);
      }),
      { numRuns: 10 },
    );
  });

  it('a middle miter piece (cut lines at both ends) keeps the band clear of both', () => {
    const spec = { pipe: NPS6, bendDeg: 90, welds: 3, radiusMm: 1.5 * 6 * IN };
    const layout = withMiterWeldPrep(layoutMiter(spec), weldPrepForMiter(spec, { grooveAngleDeg: 75, landMm: 1.6 }));
    for (const t of layout.templates) {
      const { cells, cutBox } = bandTexts(t);
      expect(cells.length).toBe(32);
      for (const c of cells) expect(c.box.maxY).toBeLessThan(cutBox.minY);
    }
  });

  it('a wrap without weld prep plans no band', () => {
    const spec = { header: NPS12, branch: NPS6, angleDeg: 45 };
    expect(bandTexts(layoutBranch(spec).templates[0]).cells).toHaveLength(0);
  });
});
