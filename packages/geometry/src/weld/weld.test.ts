import { describe, expect, it } from 'vitest';
import { expectGirthError } from '@girth/pipes/test-support';
import { solveBranch } from '../branch/solve-branch.js';
import { bevelAtStation } from './bevel.js';
import { holeTorchAtStation } from './hole-torch.js';
import {
  B16_25_BEVEL_DEG,
  B16_25_BEVEL_TOL_DEG,
  B16_25_LAND_MM,
  B16_25_LAND_TOL_MM,
} from './limits.js';
import { resolveGroove } from './resolve-groove.js';
import { dihedralDegFromNormals, weldStationFrame } from './station-frame.js';
import { weldEndBevel } from './weld-end-bevel.js';
import { weldPrepWarnings } from './weld-warnings.js';

const IN = 25.4;
// ASME B36.10M (REFERENCES.md, recalled): NPS 12 STD 12.750 x 0.375 in, NPS 6 STD 6.625 x 0.280 in.
const NPS12 = { odMm: 12.75 * IN, wallMm: 0.375 * IN };
const NPS6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN };
const groove = resolveGroove({ grooveAngleDeg: 45, landMm: 1.6 }, 7.112);

describe('local dihedral angle', () => {
  it('is 180° less the angle between the outward normals (planes meeting square: 90°; flush: 180°; folded: 0°)', () => {
    expect(dihedralDegFromNormals([1, 0, 0], [0, 0, 1])).toBeCloseTo(90, 12);
    expect(dihedralDegFromNormals([0, 0, 1], [0, 0, 1])).toBeCloseTo(180, 12); // flush surfaces: a tangent joint
    expect(dihedralDegFromNormals([0, 0, -1], [0, 0, 1])).toBeCloseTo(0, 12); // folded back on each other
  });
  it('gives A at the toe and 180 − A at the heel of a lateral (AWS D1.1 definition, recalled; REFERENCES.md derived values)', () => {
    for (const a of [30, 45, 60]) {
      const g = solveBranch({ header: NPS12, branch: NPS6, angleDeg: a });
      expect(weldStationFrame(g.cutBundle, g.cutHost, Math.PI).dihedralDeg).toBeCloseTo(a, 9);
      expect(weldStationFrame(g.cutBundle, g.cutHost, 0).dihedralDeg).toBeCloseTo(180 - a, 9);
    }
  });
});

describe('bevel rule', () => {
  it('cuts the groove angle itself at the crown of a tee (dihedral 90°: a radial cut leaves no groove)', () => {
    const b = bevelAtStation(90, 45, groove);
    expect(b).toMatchObject({ status: 'bevel', openingDeg: 0 });
    expect(b.torchDeg).toBeCloseTo(45, 12);
    // Bevel width: (wall − land) tan 45° (right-triangle geometry).
    expect(b.bevelWidthMm).toBeCloseTo(7.112 - 1.6, 12);
  });
  it('needs no bevel where the joint already opens the groove (heel of a 45° lateral, 135°, against 40°)', () => {
    expect(bevelAtStation(135, 40, groove)).toEqual({ status: 'open', torchDeg: 0, bevelWidthMm: 0, openingDeg: 45 });
  });
  it('is closed where the members meet tighter than the groove', () => {
    expect(bevelAtStation(40, 45, groove)).toEqual({ status: 'closed', openingDeg: -50 });
  });
});

describe('header-hole torch, parallel to the branch axis', () => {
  it('stands radial at the crown of a tee and tilts 90 − A at the heel and toe of a lateral (the branch axis is at A to the header axis)', () => {
    expect(holeTorchAtStation(solveBranch({ header: NPS12, branch: NPS6 }), 0).tiltDeg).toBeCloseTo(0, 9);
    const g = solveBranch({ header: NPS12, branch: NPS6, angleDeg: 45 });
    for (const phi of [0, Math.PI]) {
      const t = holeTorchAtStation(g, phi);
      expect(t.tiltDeg).toBeCloseTo(45, 9);
      expect(t.leanAlongHeaderDeg).toBeCloseTo(45, 9); // the branch axis leans toward +x
      expect(t.leanAroundHeaderDeg).toBeCloseTo(0, 9);
    }
  });
  it('at the side of a tee leans around the header by asin(r/R) (the radial there turns by that angle)', () => {
    const g = solveBranch({ header: NPS12, branch: NPS6 });
    const t = holeTorchAtStation(g, Math.PI / 2);
    const expected = (Math.asin(g.holeBundle.radius / (NPS12.odMm / 2)) * 180) / Math.PI;
    expect(t.tiltDeg).toBeCloseTo(expected, 9);
    expect(t.leanAroundHeaderDeg).toBeCloseTo(-expected, 9); // the point is at +y: the vertical torch leans toward −y from its radial
    expect(t.leanAlongHeaderDeg).toBeCloseTo(0, 9);
  });
});

describe('ASME B16.25 weld ends (REFERENCES.md, recalled)', () => {
  it('bevels 37.5° ± 2.5° with a 1/16 in ± 1/32 in land for walls over 3 mm to 22 mm', () => {
    expect(B16_25_BEVEL_DEG).toBe(37.5);
    expect(B16_25_BEVEL_TOL_DEG).toBe(2.5);
    expect(B16_25_LAND_MM).toBeCloseTo(1.6, 1); // 1/16 in = 1.5875 mm
    expect(B16_25_LAND_TOL_MM).toBeCloseTo(0.8, 1); // 1/32 in = 0.79375 mm
    expect(weldEndBevel(7.11)).toMatchObject({ kind: 'single', bevelDeg: 37.5, bevelTolDeg: 2.5, landMm: 25.4 / 16, landTolMm: 25.4 / 32 });
    expect(weldEndBevel(22)).toMatchObject({ kind: 'single' });
  });
  it('cuts walls up to 3 mm square, and walls over 22 mm get the compound bevel (10° above 19 mm, recalled)', () => {
    expect(weldEndBevel(3)).toEqual({ kind: 'square', wallMm: 3 });
    expect(weldEndBevel(25)).toMatchObject({ kind: 'compound', bevelDeg: 37.5, breakMm: 19, upperBevelDeg: 10 });
  });
  it('rejects a wall that is not a positive number', () => {
    expectGirthError(() => weldEndBevel(0), 'NEGATIVE', 'wallMm');
    expectGirthError(() => weldEndBevel(Number.NaN), 'NOT_A_NUMBER', 'wallMm');
  });
});

describe('resolveGroove', () => {
  it('fills in a zero land', () => {
    expect(resolveGroove({ grooveAngleDeg: 37.5 }, 5)).toEqual({ kind: 'groove', grooveAngleDeg: 37.5, landMm: 0, wallMm: 5 });
  });
  it('rejects a groove angle outside (0, 90), a negative land and a land as thick as the wall, naming the option', () => {
    for (const a of [0, 90, -5, 120]) expectGirthError(() => resolveGroove({ grooveAngleDeg: a }, 5), 'OUT_OF_RANGE', 'grooveAngleDeg');
    expectGirthError(() => resolveGroove({ grooveAngleDeg: Number.NaN }, 5), 'NOT_A_NUMBER', 'grooveAngleDeg');
    expectGirthError(() => resolveGroove({ grooveAngleDeg: 45, landMm: -0.1 }, 5), 'NEGATIVE', 'landMm');
    expectGirthError(() => resolveGroove({ grooveAngleDeg: 45, landMm: 5 }, 5), 'OUT_OF_RANGE', 'landMm');
    expectGirthError(() => resolveGroove(null as never, 5), 'BAD_OPTION', 'groove');
  });
});

describe('weldPrepWarnings', () => {
  it('names the stations below the AWS D1.1 prequalified range (30°, recalled), of a tangent joint and of a closed groove', () => {
    const w = weldPrepWarnings(
      [
        { n: 1, dihedralDeg: 170, status: 'open' },
        { n: 2, dihedralDeg: 90, status: 'bevel' },
        { n: 3, dihedralDeg: 20, status: 'closed' },
      ],
      { tubular: true, checkTangent: true },
    );
    expect(w.map((x) => x.code)).toEqual(['DIHEDRAL_BELOW_PREQUALIFIED', 'TANGENT_JOINT', 'GROOVE_CLOSED']);
    expect(w[0]!.message).toMatch(/station 3.*AWS D1\.1.*recalled/);
    expect(w[1]!.message).toMatch(/station 1 /);
    expect(weldPrepWarnings([{ n: 1, dihedralDeg: 20, status: 'bevel' }], { tubular: false, checkTangent: false })).toEqual([]);
  });
});
