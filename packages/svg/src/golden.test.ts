import { describe, test } from 'vitest';
import { fileURLToPath } from 'node:url';
import { templateToSvg } from './template-to-svg.js';
import { coneSector, DEMO_JOB, DEMO_PIECE, planeCutWrap, teeHole } from './test-support/fixtures.js';
import { expectGolden } from './test-support/golden.js';

const GOLDEN_DIR = fileURLToPath(new URL('./__golden__', import.meta.url));
const IN = 25.4;

// One sheet per kind of template. Regenerate on purpose only: UPDATE_GOLDEN=1 pnpm exec vitest run
describe('golden SVG sheets', () => {
  test('wrap: plane cut-back, NPS 6 (6.625 in OD, ASME B36.10M, recalled), 30°', () => {
    expectGolden(GOLDEN_DIR, 'wrap-plane-cut', templateToSvg(planeCutWrap(6.625 * IN, 30), { job: DEMO_JOB, piece: DEMO_PIECE }));
  });

  test('wrap on an inch sheet with a 1 in tab', () => {
    expectGolden(
      GOLDEN_DIR,
      'wrap-plane-cut-in',
      templateToSvg(planeCutWrap(4.5 * IN, 22.5), { job: DEMO_JOB, piece: 'Spool 3-A', sheetUnits: 'in', overlapMm: IN }),
    );
  });

  test('hole: NPS 4 square on NPS 12 (ASME B36.10M ODs, recalled)', () => {
    expectGolden(GOLDEN_DIR, 'hole-tee', templateToSvg(teeHole((12.75 * IN) / 2, (4.5 * IN) / 2, 128), { job: DEMO_JOB, piece: DEMO_PIECE }));
  });

  test('flat: cone 8 in to 5 in, 4 in long (ceemrr "Drawing Nets" worked example)', () => {
    expectGolden(GOLDEN_DIR, 'flat-cone', templateToSvg(coneSector(8 * IN, 5 * IN, 4 * IN), { job: DEMO_JOB, piece: DEMO_PIECE }));
  });
});
