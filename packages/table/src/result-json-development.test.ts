import { describe, expect, it } from 'vitest';
import { closeTemplate, layoutBranch, onDevelopmentSurface, type BranchLayout } from '@girth/unroll';
import { toResultJson } from './result-json.js';

const IN = 25.4;
// ASME B36.10M (recalled, REFERENCES.md): NPS 12 STD 12.750 x 0.375 in, NPS 6 STD 6.625 x 0.280 in.
const NPS12 = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' };
const NPS6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };

describe('toResultJson: development surface and closed parts', () => {
  const layout = layoutBranch({ header: NPS12, branch: NPS6, angleDeg: 45 });
  const cut = closeTemplate(onDevelopmentSurface(layout.templates[0], { surface: 'mid', plateThicknessMm: NPS6.wallMm }), { stubMm: 300 });
  const result: BranchLayout = { ...layout, templates: [cut, layout.templates[1]] };

  it('states the surface, diameter, plate and rule, in the job unit (common practice: mid-thickness of a rolled plate)', () => {
    const json = toResultJson(result, { units: 'in' });
    const t = json.templates[0]!;
    expect(t.development?.surface).toBe('mid');
    expect(t.development?.diameter).toBeCloseTo(6.625 - 0.28, 6);
    expect(t.development?.od).toBeCloseTo(6.625, 6);
    expect(t.development?.plateThickness).toBeCloseTo(0.28, 6);
    expect(t.development?.rule).toMatch(/mid-thickness diameter 6\.345"/);
    expect(t.stretchOut).toBeCloseTo(Math.PI * (6.625 - 0.28), 5);
    expect(t.closedPart?.stub).toBeCloseTo(300 / IN, 6);
    expect(json.templates[1]!.development).toBeUndefined();
  });
});
