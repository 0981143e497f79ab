import { describe, expect, it } from 'vitest';
import { branchFitUp } from './branch-fit-up.js';
import { miterFitUp } from './miter-fit-up.js';
import { planeCutFitUp } from './plane-cut-fit-up.js';
import { branchFitUpLines, miterFitUpLines, ordinateReferenceLine, planeCutFitUpLines } from './fit-up-text.js';
import type { OrdinateColumn } from './ordinates-from.js';

const IN = 25.4;
// ASME B36.10M (REFERENCES.md, recalled): NPS 12 STD 12.750 x 0.375 in, NPS 6 STD 6.625 x 0.280 in (ID 6.065 in).
const NPS12 = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' };
const NPS6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };

describe('fit-up text', () => {
  it('words a 45° lateral in feet and inches: marks r / sin A, rise = run, chord 2 L sin 22.5°, 45 in of arc on 57.3 in', () => {
    // Closed forms: heel/toe at rho / sin A along the top line (rho = 3.0325 in, the NPS 6 STD ID radius, and 3.3125 in, its OD radius);
    // tan 45° = 1; chord 2 × 12 × sin 22.5° = 9.184 in; 57.3 rule (common practice): one inch of arc per degree.
    const lines = branchFitUpLines(branchFitUp({ header: NPS12, branch: NPS6, angleDeg: 45 }, { runMm: 12 * IN, chordRadiusMm: 12 * IN }), { format: 'in' });
    expect(lines).toHaveLength(2);
    expect(lines[0]).toContain('along its top line');
    expect(lines[0]).toContain(`hole heel ${(3.0325 * Math.SQRT2).toFixed(3)}" toward the heel end`);
    expect(lines[0]).toContain(`weld toe ${(3.3125 * Math.SQRT2).toFixed(3)}"`);
    expect(lines[1]).toContain('45° between branch centreline and header');
    expect(lines[1]).toContain('over a run of 12.000" along the header from the crossing the other line rises 12.000"');
    expect(lines[1]).toContain(`are ${(24 * Math.sin(Math.PI / 8)).toFixed(3)}" apart`);
    expect(lines[1]).toContain('on a radius of 57.296" the arc between the lines is 45.000" (1.000" per degree)');
  });

  it('words an offset tee in millimetres, with the offset round the header and a square check', () => {
    // Arc of a circle: R asin(e/R) round the header OD (R = 161.925 mm, e = 50 mm).
    const lines = branchFitUpLines(branchFitUp({ header: NPS12, branch: NPS6, offsetMm: 50 }, { arcUnitMm: 10 }), { format: 'mm' });
    const R = NPS12.odMm / 2;
    expect(lines[0]).toContain('along its offset line');
    expect(lines[1]).toContain(`Offset line: ${(R * Math.asin(50 / R)).toFixed(1)} mm round the header OD from the top line to the positive-offset side`);
    expect(lines[2]).toContain('the lines stand square: check with a square');
    expect(lines[2]).toContain('on a radius of 573.0 mm the arc between the lines is 900.0 mm (10.0 mm per degree)');
  });

  it('words the miter weld lines and centre to face, and the plane cut', () => {
    // REFERENCES.md (miter): 90° in 3 welds on R = 18 in: c = 15°, welds at R tan c (1 + 2i); centre to face R tan 45° = R (ASME B16.9 long radius, NPS 12).
    const lines = miterFitUpLines(miterFitUp({ pipe: { ...NPS12, npsIn: 12 }, bendDeg: 90, welds: 3, radiusNps: 1.5 }), { format: 'in' });
    const t = 18 * Math.tan(Math.PI / 12);
    expect(lines[0]).toContain(`weld 1 at ${t.toFixed(3)}", weld 2 at ${(3 * t).toFixed(3)}", weld 3 at ${(5 * t).toFixed(3)}"`);
    expect(lines[1]).toContain('centre to face 18.000"');
    expect(lines[2]).toContain('30° between the axes of the pieces at each weld');
    // REFERENCES.md: plane-cut ordinate (D/2) tan c (1 − cos phi); the centreline at phi = 90°: (D/2) tan 30°.
    const plane = planeCutFitUpLines(planeCutFitUp({ pipe: NPS6, angleDeg: 60 }), { format: 'in' });
    expect(plane[0]).toContain(`${(3.3125 * Math.tan(Math.PI / 6)).toFixed(3)}" from the square line through the long point`);
  });

  it('names the reference and the stock to leave past the short-point line', () => {
    const column: OrdinateColumn = {
      key: 'ordinate', cutbackKey: 'cutback', heading: 'Ordinate from short point', reference: 'short-point',
      referenceWords: 'measured from the square line through the short point', fullDepthMm: 30.1625, stockPastShortPointMm: 30.1625,
      shortPointAngleDeg: 90, longPointAngleDeg: 0,
    };
    expect(ordinateReferenceLine(column, { format: 'ft-in' })).toBe(
      'Ordinates measured from the square line through the short point; full depth of the cut 1 3/16" (long point to short point): leave at least 1 3/16" of pipe past the short-point line.',
    );
    expect(ordinateReferenceLine({ ...column, reference: 'long-point', referenceWords: 'measured from the square line through the long point' }, { format: 'mm' })).toBe(
      'Ordinates measured from the square line through the long point; full depth of the cut 30.2 mm (long point to short point).',
    );
  });
});
