/**
 * The edges of the branch layout: an offset at and past the flush limit, a
 * set-in branch as large as the header bore, bad input, and the warnings the
 * piping code calls for. Exact values come from the test oracle; limits from
 * first principles and REFERENCES.md.
 */
import { describe, expect, it } from 'vitest';
import { isGirthError } from '@girth/pipes';
import { girthErrorOf } from '@girth/pipes/test-support';
import { layoutBranch } from '@girth/unroll';
import { exactBranchStations, exactHoleStations, exactLongPoint, type OracleBranchSpec } from '../oracle/index.js';
import { expectClose } from '../support/expect-close.js';
import { stationColumn, templateById } from '../support/template-access.js';

const IN = 25.4;
// ASME B36.10M, recalled (REFERENCES.md): NPS 12 OD 12.750 in, NPS 6 OD 6.625 in, STD walls .375 / .280 in.
const NPS12_STD = { odMm: 12.75 * IN, wallMm: 0.375 * IN };
const NPS6_STD = { odMm: 6.625 * IN, wallMm: 0.28 * IN };
const R = NPS12_STD.odMm / 2;
/** Set-on: the branch ID side is flush with the header OD side when the offset is R - r_ID (first principles). */
const FLUSH_OFFSET_MM = R - (NPS6_STD.odMm / 2 - NPS6_STD.wallMm);

function compareWithOracle(spec: OracleBranchSpec, tolMm: number, label: string): void {
  const result = layoutBranch(spec, { stations: 16 });
  const exact = exactBranchStations(spec, 16, exactLongPoint(spec));
  expectClose(stationColumn(templateById(result, 'branch-cut'), 'cutback'), exact.map((s) => s.cutbackMm), tolMm, `${label}: cutback`);
  const hole = exactHoleStations(spec, 16);
  const t = templateById(result, 'header-hole');
  expectClose(stationColumn(t, 'girth'), hole.map((s) => s.girthMm), tolMm, `${label}: hole girth`);
  expectClose(stationColumn(t, 'axial'), hole.map((s) => s.axialMm), tolMm, `${label}: hole axial`);
}

describe('tangency: the flush offset and a set-in branch as large as the header bore', () => {
  // At exact tangency the flank generator grazes the header: z = sqrt(R² - y²) turns rounding of y
  // (~eps R) into ~sqrt(eps) R = 1.5e-8 R. Tolerance 1e-7 R, about 7 sqrt(eps) R (0.016 mm here).
  const grazeTolMm = 1e-7 * R;

  it('an offset exactly at the flush limit is laid out and agrees with the oracle to the graze precision', () => {
    compareWithOracle({ header: NPS12_STD, branch: NPS6_STD, offsetMm: FLUSH_OFFSET_MM }, grazeTolMm, 'flush offset');
    compareWithOracle({ header: NPS12_STD, branch: NPS6_STD, offsetMm: -FLUSH_OFFSET_MM, angleDeg: 60 }, grazeTolMm, 'flush offset, other side, 60°');
  });

  it('a set-in branch whose OD equals the header ID (flanks graze at 90°) agrees with the oracle to the graze precision', () => {
    // Written as 2 (OD/2 - wall) so that branch OD/2 equals header ID/2 to the last bit (a graze, not a miss by rounding).
    const branch = { odMm: 2 * (NPS12_STD.odMm / 2 - NPS12_STD.wallMm), wallMm: 0.375 * IN };
    compareWithOracle({ header: NPS12_STD, branch, fit: 'set-in' }, grazeTolMm, 'set-in, OD = header ID');
    compareWithOracle({ header: NPS12_STD, branch, fit: 'set-in', angleDeg: 45 }, grazeTolMm, 'set-in, OD = header ID, 45°');
  });

  it('1 µm past the flush limit is refused: GirthError OFFSET_MISSES on offsetMm', () => {
    const err = girthErrorOf(() => layoutBranch({ header: NPS12_STD, branch: NPS6_STD, offsetMm: FLUSH_OFFSET_MM + 1e-3 }));
    expect(isGirthError(err, 'OFFSET_MISSES')).toBe(true);
    expect(isGirthError(err) && err.field).toBe('offsetMm');
  });
});

describe('bad input gets a typed error naming the field (DESIGN.md: typed errors with a stable code)', () => {
  const cases: readonly { readonly name: string; readonly run: () => unknown; readonly field: RegExp }[] = [
    { name: 'angle 0°', run: () => layoutBranch({ header: NPS12_STD, branch: NPS6_STD, angleDeg: 0 }), field: /angle/i },
    { name: 'angle 90.5°', run: () => layoutBranch({ header: NPS12_STD, branch: NPS6_STD, angleDeg: 90.5 }), field: /angle/i },
    { name: 'angle NaN', run: () => layoutBranch({ header: NPS12_STD, branch: NPS6_STD, angleDeg: Number.NaN }), field: /angle/i },
    { name: 'negative gap', run: () => layoutBranch({ header: NPS12_STD, branch: NPS6_STD, gapMm: -1 }), field: /gap/i },
    { name: 'set-in branch OD above header ID', run: () => layoutBranch({ header: NPS12_STD, branch: { odMm: 310, wallMm: 5 }, fit: 'set-in' }), field: /branch/i },
    { name: 'set-on branch ID above header OD', run: () => layoutBranch({ header: NPS6_STD, branch: NPS12_STD }), field: /branch/i },
    { name: 'wall leaving no bore', run: () => layoutBranch({ header: NPS12_STD, branch: { odMm: 100, wallMm: 50 } }), field: /branch/i },
  ];
  for (const c of cases) {
    it(`${c.name}: GirthError with a code and a field`, () => {
      const err = girthErrorOf(c.run);
      expect(isGirthError(err), `expected a GirthError, got ${String(err)}`).toBe(true);
      if (isGirthError(err)) {
        expect(err.code.length).toBeGreaterThan(0);
        expect(err.field).toMatch(c.field);
      }
    });
  }
});

describe('warnings that the piping code calls for (ASME B31.3 para. 304.3.1(b), REFERENCES.md)', () => {
  const mentions3043 = (r: ReturnType<typeof layoutBranch>): boolean => r.warnings.some((w) => w.message.includes('304.3.1'));

  it('a branch below 45° or off the header axis is flagged as outside the reinforcement rules', () => {
    expect(mentions3043(layoutBranch({ header: NPS12_STD, branch: NPS6_STD, angleDeg: 44 }))).toBe(true);
    expect(mentions3043(layoutBranch({ header: NPS12_STD, branch: NPS6_STD, offsetMm: 10 }))).toBe(true);
  });

  it('a centred branch at 45° to 90° is not', () => {
    for (const angleDeg of [45, 60, 90]) expect(mentions3043(layoutBranch({ header: NPS12_STD, branch: NPS6_STD, angleDeg }))).toBe(false);
  });
});
