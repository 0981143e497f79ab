import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { formatLength } from '@girth/pipes';
import { layoutBranch } from '../branch/layout-branch.js';
import { layoutMiter } from '../miter/layout-miter.js';
import { layoutPlaneCut } from '../plane-cut/layout-plane-cut.js';
import { branchFitUp } from './branch-fit-up.js';
import { miterFitUp } from './miter-fit-up.js';
import { planeCutFitUp } from './plane-cut-fit-up.js';
import { withFitUp } from './with-fit-up.js';
import { codeOf } from './test-support/code-of.js';
import { miterArb } from './test-support/joints.js';

const IN = 25.4;
// ASME B36.10M (REFERENCES.md, recalled): NPS 12 STD 12.750 x 0.375 in, NPS 6 STD 6.625 x 0.280 in.
const NPS12 = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' };
const NPS6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };
const tee = { header: NPS12, branch: NPS6 };

describe('withFitUp', () => {
  it('measures a tee from the short point: the station table, each worded ordinate and the stretch of line it is measured along agree', () => {
    const r = withFitUp(layoutBranch(tee, { stations: 16 }), branchFitUp(tee), { ordinatesFrom: 'short-point', format: { format: 'ft-in' } });
    expect(r.ordinatesFrom).toBe('short-point');
    expect(r.fitUp?.kind).toBe('branch-fit-up');
    const [cut, hole] = r.templates;
    expect(cut.stationColumns.map((c) => c.key)).toEqual(['girth', 'ordinate']);
    expect(cut.stationColumns[1]!.heading).toBe('Ordinate, from the square line through the short point');
    const o = cut.ordinates!;
    expect(o.stations).toHaveLength(16);
    for (const s of o.stations) {
      const row = cut.stations[s.n - 1]!;
      expect(s.valueMm).toBe(row.values.ordinate);
      expect(s.text).toBe(formatLength(s.valueMm, { format: 'ft-in' }));
      // The stretch measured is the ordinate itself, on the station's girth (invariant).
      expect(Math.abs(Math.abs(s.to[1] - s.from[1]) - s.valueMm)).toBeLessThan(1e-9);
      expect(s.from[0]).toBe(row.values.girth);
      // It runs from the short-point line (y = full depth) to the cut.
      expect(s.from[1]).toBeCloseTo(o.columns[0]!.fullDepthMm, 12);
    }
    expect(o.referenceLines).toHaveLength(1);
    expect(o.bothLines).toBe(false);
    expect(o.lines[0]).toMatch(/^Ordinates measured from the square line through the short point; full depth of the cut .*leave at least/);
    // The hole keeps its table; both sheets carry the fit-up.
    expect(hole.ordinates).toBeUndefined();
    expect(hole.stations).toEqual(layoutBranch(tee, { stations: 16 }).templates[1].stations);
    expect(hole.fitUpLines?.[0]).toMatch(/^Mark the header along its top line/);
    expect(cut.fitUpLines).toEqual(hole.fitUpLines);
    // The layout's note that the cutback runs from the long point would contradict the table: left out, words and facts alike.
    const plain = layoutBranch(tee, { stations: 16 }).templates[0];
    expect(plain.notes.some((n) => n.startsWith('Cutback is measured'))).toBe(true);
    expect(cut.notes.some((n) => n.startsWith('Cutback is measured'))).toBe(false);
    expect(cut.notes).toHaveLength(plain.notes.length - 1);
    expect(cut.facts?.notes).toHaveLength(plain.notes.length - 1);
  });

  it('from the long point keeps the cutbacks, heads them by their reference, and draws both lines only when asked', () => {
    const spec = { pipe: NPS6, angleDeg: 60 };
    const plain = layoutPlaneCut(spec, { stations: 12 });
    const r = withFitUp(plain, planeCutFitUp(spec));
    const t = r.templates[0];
    expect(t.stations).toEqual(plain.templates[0].stations);
    expect(t.stationColumns[1]!.heading).toBe('Cutback, from the square line through the long point');
    expect(t.ordinates?.referenceLines).toEqual([]);
    for (const s of t.ordinates!.stations) expect(s.from[1]).toBe(0);
    const lined = withFitUp(plain, planeCutFitUp(spec), { referenceLines: true }).templates[0];
    expect(lined.ordinates?.referenceLines).toHaveLength(1);
    expect(lined.ordinates?.bothLines).toBe(true);
  });

  it('gives a middle miter piece both its columns, and every station of every piece adds up to the full depth (property)', () => {
    fc.assert(
      fc.property(miterArb, (spec) => {
        const layout = layoutMiter(spec, { stations: 8 });
        const fit = miterFitUp(spec);
        const long = withFitUp(layout, fit);
        const short = withFitUp(layout, fit, { ordinatesFrom: 'short-point' });
        long.templates.forEach((t, i) => {
          const s = short.templates[i]!;
          for (const c of s.ordinates!.columns) {
            s.stations.forEach((row, k) => {
              const sum = row.values[c.key]! + t.stations[k]!.values[c.cutbackKey]!;
              expect(Math.abs(sum - c.fullDepthMm)).toBeLessThanOrEqual(1e-9 * Math.max(1, c.fullDepthMm));
            });
          }
        });
      }),
      { numRuns: 25, seed: 18 },
    );
  });

  it('refuses an unknown reference and a flag that is not true or false, naming the option', () => {
    const spec = { pipe: NPS6, angleDeg: 60 };
    const layout = layoutPlaneCut(spec);
    const fit = planeCutFitUp(spec);
    expect(codeOf(() => withFitUp(layout, fit, { ordinatesFrom: 'heel' as never }))).toBe('BAD_OPTION:ordinatesFrom');
    expect(codeOf(() => withFitUp(layout, fit, { referenceLines: 'yes' as never }))).toBe('BAD_OPTION:referenceLines');
  });
});
