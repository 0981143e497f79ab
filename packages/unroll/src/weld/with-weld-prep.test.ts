import { describe, expect, it } from 'vitest';
import { expectGirthError } from '@girth/pipes/test-support';
import { layoutBranch } from '../branch/layout-branch.js';
import { describeResult } from '../describe-result.js';
import { layoutMiter } from '../miter/layout-miter.js';
import { layoutPlaneCut } from '../plane-cut/layout-plane-cut.js';
import { weldPrepForBranch } from './weld-prep-branch.js';
import { weldPrepForMiter, weldPrepForPlaneCut } from './weld-prep-cuts.js';
import { layoutBranchCutOnOd } from './branch-od-cut.js';
import { withBranchWeldPrep, withMiterWeldPrep, withPlaneCutWeldPrep } from './with-weld-prep.js';

const IN = 25.4;
// ASME B36.10M (REFERENCES.md, recalled): NPS 12 STD 12.750 x 0.375 in, NPS 6 STD 6.625 x 0.280 in, NPS 10 STD 10.750 x 0.365 in.
const NPS12 = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' };
const NPS6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };
const NPS10 = { odMm: 10.75 * IN, wallMm: 0.365 * IN, label: 'NPS 10 STD' };

describe('withBranchWeldPrep', () => {
  const spec = { header: NPS12, branch: NPS6, angleDeg: 60 };
  const groove = { grooveAngleDeg: 45, landMm: 1.6 };
  const r = withBranchWeldPrep(layoutBranch(spec), weldPrepForBranch(spec, groove));

  it('adds dihedral and torch to the branch cut, torch tilt to the hole, each row from the prep of the same station', () => {
    const [cut, hole] = r.templates;
    expect(cut.stationColumns.map((c) => c.key)).toEqual(['girth', 'cutback', 'dihedral', 'torch']);
    expect(hole.stationColumns.map((c) => c.key)).toEqual(['girth', 'axial', 'torchTilt']);
    for (const s of r.weldPrep!.stations) {
      expect(cut.stations[s.n - 1]!.values.dihedral).toBe(s.dihedralDeg);
      expect(cut.stations[s.n - 1]!.values.torch).toBe(s.torchDeg);
    }
    // Heel and toe of a lateral at 60°: 120° and 60° (AWS D1.1 definition, recalled; REFERENCES.md derived values).
    expect(cut.stations[0]!.values.dihedral).toBeCloseTo(120, 9);
    expect(cut.stations[8]!.values.dihedral).toBeCloseTo(60, 9);
  });

  it('writes the bevel band: torch to 0.1°, 0 where the joint is open, X where the groove is closed', () => {
    const cut = r.templates[0];
    if (cut.kind !== 'wrap') throw new Error('expected a wrap');
    const torch = cut.bands!.find((b) => b.key === 'torch')!;
    const prep = r.weldPrep!.stations;
    torch.cells.forEach((c, i) => {
      const s = prep[i]!;
      expect(c.text).toBe(s.bevel === 'closed' ? 'X' : s.bevel === 'open' ? '0' : s.torchDeg!.toFixed(1));
    });
  });

  it('keeps the notes as facts, so an inch job words the land inch first', () => {
    const inch = describeResult(r, { units: 'in', lengthFormat: 'ft-in' });
    const note = inch.templates[0].notes.find((n) => n.startsWith('Weld prep:'));
    expect(note).toMatch(/land \(root face\) 1\/16" \(1\.6 mm\)/);
    expect(inch.templates[0].notes.some((n) => n.includes('AWS D1.1 definition, recalled'))).toBe(true);
  });

  it('refuses a prep made with another station count', () => {
    expectGirthError(() => withBranchWeldPrep(layoutBranch(spec), weldPrepForBranch(spec, groove, { stations: 8 })), 'BAD_OPTION', 'stations');
  });
});

describe('withPlaneCutWeldPrep and withMiterWeldPrep', () => {
  it('a cut-back at 60°: 60° at the heel, 120° opposite (the plane and the pipe outside)', () => {
    const spec = { pipe: NPS6, angleDeg: 60 };
    const t = withPlaneCutWeldPrep(layoutPlaneCut(spec), weldPrepForPlaneCut(spec, { grooveAngleDeg: 45 })).templates[0];
    expect(t.stations[0]!.values.dihedral).toBeCloseTo(60, 9);
    expect(t.stations[8]!.values.dihedral).toBeCloseTo(120, 9);
  });

  it('every miter wrap gets the columns and the ASME B16.25 square-end note, 37.5° ± 2.5°, land 1/16 ± 1/32 in (recalled)', () => {
    const spec = { pipe: NPS10, bendDeg: 90, welds: 3, radiusMm: 15 * IN };
    const r = describeResult(withMiterWeldPrep(layoutMiter(spec), weldPrepForMiter(spec, { grooveAngleDeg: 75, landMm: IN / 16 })), { units: 'in', lengthFormat: 'ft-in', fraction: 32 });
    expect(r.templates.length).toBe(2);
    for (const t of r.templates) {
      expect(t.stationColumns.map((c) => c.key)).toContain('torch');
      expect(t.notes.join(' ')).toMatch(/ASME B16\.25 weld-end bevel 37\.5° ± 2\.5° from square, land 1\/16" \(1\.6 mm\) ± 1\/32" \(0\.8 mm\) \(recalled\)/);
    }
  });
});

describe('layoutBranchCutOnOd', () => {
  it('cuts on the OD line and draws the ID line as a mark, never on the cut', () => {
    const r = layoutBranchCutOnOd({ header: NPS12, branch: NPS6 });
    const cut = r.templates[0];
    expect(r.contact).toEqual({ branch: 'outside', header: 'outside' });
    expect(cut.cut).toHaveLength(1);
    expect(cut.marks).toHaveLength(1);
    // The ID line is the usual set-on line, moved to the OD cut's square line: the two differ by one constant.
    const plain = layoutBranch({ header: NPS12, branch: NPS6 }).templates[0];
    const shift = cut.stations.map((s, i) => s.values.idCutback! - plain.stations[i]!.values.cutback!);
    for (const d of shift) expect(d).toBeCloseTo(shift[0]!, 9);
  });

  it('refuses a set-in branch and surface overrides', () => {
    expectGirthError(() => layoutBranchCutOnOd({ header: NPS12, branch: NPS6, fit: 'set-in' }), 'BAD_OPTION', 'fit');
    expectGirthError(() => layoutBranchCutOnOd({ header: NPS12, branch: NPS6, contact: { branch: 'inside', header: 'outside' } }), 'BAD_OPTION', 'contact');
  });
});
