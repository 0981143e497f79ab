/**
 * Golden files: one fixture per template kind (wrap, hole, flat) in both DXF
 * versions, compared after normalising handles and float noise. Regenerate with
 * `UPDATE_GOLDEN=1 pnpm exec vitest run` (in packages/dxf) and review the diff.
 */
import { describe, expect, it } from 'vitest';
import type { Template } from '@girth/unroll';
import { templateToDxf } from './template-to-dxf.js';
import type { DxfVersion } from './types.js';
import { conePattern, planeCutWrap, teeHole } from './test-support/fixtures.js';
import { expectGolden, normaliseDxf } from './test-support/golden.js';

const MM_PER_INCH = 25.4;
const FIXTURES: Readonly<Record<string, Template>> = {
  // NPS 6 (OD 6.625 in) plane cut at 22.5°, 33 points along the girth.
  wrap: planeCutWrap(6.625 * MM_PER_INCH, 22.5, 33, 8),
  // NPS 6 STD branch ID (6.065 in) on NPS 12 (OD 12.750 in), 48 points.
  hole: teeHole(12.75 * MM_PER_INCH, 6.065 * MM_PER_INCH, 48),
  // 8 in to 5 in cone, 4 in long.
  flat: conePattern(8 * MM_PER_INCH, 5 * MM_PER_INCH, 4 * MM_PER_INCH),
};
const OPTIONS = { job: 'J-4471 (Harrow Creek pump house)', piece: 'SP-09' } as const;

describe('golden DXF files', () => {
  for (const [name, template] of Object.entries(FIXTURES)) {
    for (const version of ['AC1021', 'R12'] as readonly DxfVersion[]) {
      it(`${name} ${version}`, () => {
        expectGolden(`${name}.${version.toLowerCase()}.dxf`, templateToDxf(template, { ...OPTIONS, version }), (t) => normaliseDxf(t));
      });
    }
  }

  it('differs between two runs only in handles, which the harness normalises', () => {
    const a = templateToDxf(FIXTURES['hole']!, OPTIONS);
    const b = templateToDxf(FIXTURES['hole']!, OPTIONS);
    expect(a).not.toBe(b); // dxf-writer's handle counter is process-wide (LIBRARIES.md)
    expect(normaliseDxf(a)).toBe(normaliseDxf(b));
    const r12 = templateToDxf(FIXTURES['hole']!, { ...OPTIONS, version: 'R12' });
    expect(templateToDxf(FIXTURES['hole']!, { ...OPTIONS, version: 'R12' })).toBe(r12); // R12 has no handles
  });
});
