import { describe, expect, it } from 'vitest';
import { angleFact, describeFacts, describeLength, describeLine, factLine, lengthFact, textLine } from './facts.js';
import { describeResult } from './describe-result.js';
import { layoutBranch } from './branch/layout-branch.js';

// Expected words are arithmetic on the exact inch (1 in = 25.4 mm, NIST SP 811 Appendix B, recalled)
// and the trade's way of writing tape readings (common practice): 15 1/4 in = 387.35 mm = 1'-3 1/4".
const MM = 15.25 * 25.4;

describe('describeLength', () => {
  it('writes mm jobs mm first, inches in brackets (the default)', () => {
    expect(describeLength(MM)).toBe('387.4 mm (15.250 in)');
    expect(describeLength(MM, { units: 'mm', lengthFormat: 'ft-in' })).toBe('387.4 mm (15.250 in)');
  });

  it('writes inch jobs inch first: decimal inches, or feet-inch-fractions when asked', () => {
    expect(describeLength(MM, { units: 'in' })).toBe('15.250" (387.4 mm)');
    expect(describeLength(MM, { units: 'in', lengthFormat: 'ft-in' })).toBe(`1'-3 1/4" (387.4 mm)`);
    // 1/16 in = 1.5875 mm; to 1/8 in it rounds half away from zero to 1/8 in (common practice).
    expect(describeLength(25.4 / 16, { units: 'in', lengthFormat: 'ft-in' })).toBe('1/16" (1.6 mm)');
    expect(describeLength(25.4 / 16, { units: 'in', lengthFormat: 'ft-in', fraction: 8 })).toBe('1/8" (1.6 mm)');
  });
});

describe('fact lines', () => {
  it('keeps lengths and angles typed and merges the text between them', () => {
    const line = factLine`Root gap ${lengthFact(3.175)} at ${angleFact(45)}, pieces ${3}${textLine('.')}`;
    expect(line).toEqual([
      { kind: 'text', text: 'Root gap ' },
      { kind: 'length', mm: 3.175 },
      { kind: 'text', text: ' at ' },
      { kind: 'angle', deg: 45 },
      { kind: 'text', text: ', pieces 3.' },
    ]);
    // 3.175 mm = 1/8 in exactly.
    expect(describeLine(line, { units: 'in', lengthFormat: 'ft-in' })).toBe('Root gap 1/8" (3.2 mm) at 45°, pieces 3.');
    expect(describeFacts([line, textLine('x')])).toEqual(['Root gap 3.2 mm (0.125 in) at 45°, pieces 3.', 'x']);
    expect(describeLine([angleFact(126.4, 2), angleFact(22.5)])).toBe('126.40°22.5°');
  });
});

describe('describeResult', () => {
  // NPS 12 STD on which NPS 6 STD sits: OD 12.750 / 6.625 in, walls 0.375 / 0.280 in (ASME B36.10M, recalled).
  const header = { odMm: 12.75 * 25.4, wallMm: 0.375 * 25.4, label: 'NPS 12 STD' };
  const branch = { odMm: 6.625 * 25.4, wallMm: 0.28 * 25.4, label: 'NPS 6 STD' };
  const layout = layoutBranch({ header, branch, angleDeg: 90, offsetMm: 25.4 });

  it('rewords every template from its facts in the job unit, and changes nothing else', () => {
    const inch = describeResult(layout, { units: 'in', lengthFormat: 'ft-in' });
    expect(inch.templates[0].notes[0]).toBe(`Header NPS 12 STD: OD 1'-0 3/4" (323.9 mm), wall 3/8" (9.5 mm), ID 1'-0" (304.8 mm).`);
    expect(inch.templates[1].title).toBe(`Header hole: NPS 6 STD on NPS 12 STD, 90°, set-on, offset 1" (25.4 mm)`);
    expect(layout.templates[1].title).toBe('Header hole: NPS 6 STD on NPS 12 STD, 90°, set-on, offset 25.4 mm (1.000 in)');
    expect(inch.templates.map((t) => t.stations)).toEqual(layout.templates.map((t) => t.stations));
    expect(inch.templates[0].notes).toHaveLength(layout.templates[0].notes.length);
    // The default wording is the describe step with no options: layouts and the step agree.
    expect(describeResult(layout, {})).toEqual(layout);
  });
});
