/**
 * Weld preparation through the command line, as a fitter gets it: the closed
 * values of the local dihedral angle in the JSON, the CSV columns, the sheet
 * notes and the B16.25 weld-end figures.
 *
 * Sources: the dihedral angle is AWS D1.1's definition for tubular
 * connections (recalled): the angle between the outsides of the two members,
 * square to the weld line. Closed values (derived, REFERENCES.md): 180 − A at
 * the heel and A at the toe of a lateral at A; 90 at the crown of a tee; at the
 * side of a tee 90 + asin(d/D), where the header's tangent has turned by
 * asin(d/D) (d the branch surface that meets the header, D the header OD).
 * Pipe sizes ASME B36.10M (recalled): NPS 12 STD 12.750 x 0.375 in, NPS 6 STD
 * 6.625 x 0.280 in (ID 6.065 in), NPS 10 XS 10.750 x 0.500 in, NPS 8 XS
 * 8.625 x 0.500 in (ID 7.625 in).
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runCaptured, runJson } from './test-support/capture.js';
import { makeTempDir, removeTempDir } from './test-support/temp-dir.js';

const DEG = 180 / Math.PI;
type Station = Record<string, number>;
interface Json {
  readonly templates: readonly { readonly id: string; readonly stations: readonly Station[] }[];
  readonly warnings: readonly { readonly code: string; readonly message: string }[];
  readonly weldPrep?: Record<string, unknown> & { readonly stations: readonly Station[] };
}
const json = async (argv: readonly string[]): Promise<Json> => (await runJson(argv)) as unknown as Json;
const LATERAL = (a: number) => ['branch', '--header', 'NPS 12 STD', '--branch', 'NPS 6 STD', '--angle', String(a), '--groove-angle', '45', '--land', '1/16'];

describe('girth branch --groove-angle: the local dihedral angle at the closed stations', () => {
  it('is 180 − A at the heel and A at the toe of laterals at 30°, 45° and 60°, in the cut template and in weldPrep', async () => {
    for (const a of [30, 45, 60]) {
      const r = await json(LATERAL(a));
      const cut = r.templates[0]!;
      expect(cut.id).toBe('branch-cut');
      expect(cut.stations[0]!.dihedral).toBeCloseTo(180 - a, 6); // heel, station 1
      expect(cut.stations[8]!.dihedral).toBeCloseTo(a, 6); // toe, station 9 of 16
      expect(r.weldPrep!.stations[8]!.dihedralDeg).toBeCloseTo(a, 6);
      expect(r.weldPrep).toMatchObject({ kind: 'branch-weld-prep', grooveAngleDeg: 45, land: 0.0625, fit: 'set-on' });
    }
  });

  it('is 90 at the crown of a tee and 90 + asin(d/D) at its sides, d the branch ID (set-on) or OD (--cut-on od)', async () => {
    const tee = ['branch', '--header', 'NPS 10 XS', '--branch', 'NPS 8 XS', '--groove-angle', '37.5'];
    const onId = await json(tee);
    const onOd = await json([...tee, '--cut-on', 'od']);
    for (const [r, dIn] of [[onId, 7.625], [onOd, 8.625]] as const) {
      const s = r.templates[0]!.stations;
      expect(s[0]!.dihedral).toBeCloseTo(90, 6); // crown (heel of a tee)
      const side = 90 + Math.asin(dIn / 10.75) * DEG;
      expect(s[4]!.dihedral).toBeCloseTo(side, 6); // station 5, phi 90°
      expect(s[12]!.dihedral).toBeCloseTo(side, 6); // station 13, phi 270°
      // Torch angle = groove + 90 − dihedral where positive (the rule of bevelAtStation): 37.5 at the crown.
      expect(s[0]!.torch).toBeCloseTo(37.5, 6);
    }
    // The OD cut carries the ID line's cutback; at the crown both lines meet the header at the same point.
    // At the side the square line passes through the OD line (cutback 0) and the ID line stands
    // sqrt(R² − r_id²) − sqrt(R² − r_od²) back from it (circle geometry, the header seen end on).
    const od = onOd.templates[0]!.stations;
    expect(od[0]!.idCutback).toBeCloseTo(od[0]!.cutback!, 6);
    expect(od[4]!.cutback).toBeCloseTo(0, 6);
    const R = 10.75 / 2;
    expect(od[4]!.idCutback).toBeCloseTo(Math.sqrt(R * R - (7.625 / 2) ** 2) - Math.sqrt(R * R - (8.625 / 2) ** 2), 6);
  });

  it('warns of a tangent (flare) joint at the sides of an equal tee cut OD to OD, and leaves the contract alone without weld prep', async () => {
    const flare = await json(['branch', '--header', 'NPS 8 XS', '--branch', 'NPS 8 XS', '--cut-on', 'od', '--groove-angle', '45']);
    expect(flare.warnings.map((w) => w.code)).toContain('TANGENT_JOINT');
    const plain = await json(['branch', '--header', 'NPS 12 STD', '--branch', 'NPS 6 STD', '--angle', '45']);
    expect(plain.weldPrep).toBeUndefined();
    expect(Object.keys(plain.templates[0]!.stations[0]!)).toEqual(['n', 'angleDeg', 'girth', 'cutback']);
  });

  it('warns below the 30° AWS D1.1 prequalified dihedral (recalled) at the toe of a 25° lateral', async () => {
    const r = await json(LATERAL(25));
    const w = r.warnings.find((x) => x.code === 'DIHEDRAL_BELOW_PREQUALIFIED');
    expect(w?.message).toMatch(/AWS D1\.1.*recalled/);
    expect(w?.message).not.toMatch(/[a-z]+Deg\b/);
  });
});

describe('girth miter --groove-angle: the elbow square ends get the ASME B16.25 weld end (recalled)', () => {
  it('37.5° ± 2.5° with a 1/16 in ± 1/32 in land for NPS 10 STD (wall 0.365 in)', async () => {
    const r = await json(['miter', '--pipe', 'NPS 10 STD', '--bend', '90', '--welds', '3', '--radius-nps', '1.5', '--groove-angle', '75', '--land', '1/16']);
    expect(r.weldPrep!.squareEnds).toEqual({ kind: 'single', wall: 0.365, bevelDeg: 37.5, bevelTolDeg: 2.5, land: 0.0625, landTol: 0.03125 });
    // Throat of a 15° cut: the pieces' outsides meet at 180 − 2·15 = 150° (REFERENCES.md miter geometry).
    expect(r.templates[0]!.stations[0]!.dihedral).toBeCloseTo(150, 6);
  });
});

describe('girth miter --gap: the root gap comes off the pieces and the stock', () => {
  it('an NPS 10 STD 90° elbow, 3 welds, gap 1/8 in: the stock is 3 × g / cos 15° shorter (each end set back g/2 square to its weld plane; right-triangle geometry)', async () => {
    const ell = ['miter', '--pipe', 'NPS 10 STD', '--bend', '90', '--welds', '3', '--radius-nps', '1.5'];
    const plain = (await runJson(ell)) as { stockLength: number; gap?: number };
    const gapped = (await runJson([...ell, '--gap', '1/8'])) as { stockLength: number; gap?: number };
    expect(plain.gap).toBeUndefined();
    expect(gapped.gap).toBe(0.125);
    expect(plain.stockLength - gapped.stockLength).toBeCloseTo((3 * 0.125) / Math.cos((15 * Math.PI) / 180), 5); // contract rounds to 1e-6 in
  });
});

describe('files', () => {
  let tmp = '';
  beforeAll(() => {
    tmp = makeTempDir('weld');
  });
  afterAll(() => removeTempDir(tmp));

  it('the CSV has the dihedral and torch columns as plain degrees to 0.1 with the unit in the header row; the sheet states the convention', async () => {
    const run = await runCaptured([...LATERAL(45), '--csv', join(tmp, 'lat.csv'), '--svg', join(tmp, 'lat.svg')]);
    expect(run.code, run.err).toBe(0);
    const rows = readFileSync(join(tmp, 'lat.branch-cut.csv'), 'utf8').trim().split('\r\n');
    const head = rows[0]!.split(',');
    expect(head.slice(-2)).toEqual(['Dihedral (deg)', 'Torch angle (deg)']);
    expect(rows[1]!.split(',').slice(-2)).toEqual(['135.0', '0.0']); // heel of a 45° lateral: already open
    expect(rows[9]!.split(',').at(-2)).toBe('45.0'); // toe: dihedral A
    expect(rows[9]!.split(',').at(-1)).toBe(''); // closed groove: no torch angle
    const svg = readFileSync(join(tmp, 'lat.branch-cut.svg'), 'utf8');
    expect(svg).toContain('Torch angle: from square to the pipe wall (radial)');
    expect(svg).toContain('class="bevel-band"');
  });
});
