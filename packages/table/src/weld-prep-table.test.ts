import { describe, expect, it } from 'vitest';
import { layoutBranch, layoutPlaneCut, weldPrepForBranch, weldPrepForPlaneCut, withBranchWeldPrep, withPlaneCutWeldPrep } from '@girth/unroll';
import { formatStationTable } from './format-station-table.js';
import { toResultJson } from './result-json.js';
import { stationTableCsv } from './station-table-csv.js';

const IN = 25.4;
// ASME B36.10M (REFERENCES.md, recalled): NPS 12 STD 12.750 x 0.375 in, NPS 6 STD 6.625 x 0.280 in.
const NPS12 = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' };
const NPS6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };
const spec = { header: NPS12, branch: NPS6, angleDeg: 45 };
const result = withBranchWeldPrep(layoutBranch(spec), weldPrepForBranch(spec, { grooveAngleDeg: 45, landMm: 1.6 }));

describe('weld prep in the station tables', () => {
  it('writes Dihedral and Torch angle in degrees to 0.1 (heel of a 45° lateral: 135.0, AWS D1.1 definition, recalled)', () => {
    const text = formatStationTable(result.templates[0], { format: 'ft-in' });
    const lines = text.split('\n');
    expect(lines[3]).toMatch(/Dihedral \(deg\)\s+Torch angle \(deg\)$/);
    expect(lines[5]).toMatch(/135\.0\s+0\.0$/);
    const csv = stationTableCsv(result.templates[0], { format: 'in', decimals: 3 }).split('\r\n');
    expect(csv[0]!.endsWith(',Dihedral (deg),Torch angle (deg)')).toBe(true);
    expect(csv[9]!.split(',').slice(-2)).toEqual(['45.0', '']); // toe: closed groove, no torch angle
  });

  it('never writes -0.0 for an angle that rounds to zero', () => {
    const cut = { pipe: NPS6, angleDeg: 90 };
    // A value a hair under zero (float noise) is written 0.0.
    const t = withPlaneCutWeldPrep(layoutPlaneCut(cut), weldPrepForPlaneCut(cut, { grooveAngleDeg: 45 })).templates[0];
    const forged = { ...t, stations: t.stations.map((s) => ({ ...s, values: { ...s.values, torch: -1e-9 } })) };
    expect(stationTableCsv(forged, { format: 'mm' })).not.toContain('-0.0');
  });
});

describe('weld prep in the JSON contract', () => {
  it('adds weldPrep with lengths in the result unit and angles in degrees, only when asked for', () => {
    const json = toResultJson(result, { units: 'in' });
    const prep = json.weldPrep as { land: number; wall: number; stations: { bevelWidth?: number; torchDeg?: number }[]; hole: unknown[] };
    expect(prep.land).toBeCloseTo(1.6 / IN, 6);
    expect(prep.wall).toBe(0.28);
    const crown = prep.stations.find((s) => s.torchDeg !== undefined && s.torchDeg > 1)!;
    // Bevel width (wall − land) tan(torch), right-triangle geometry.
    expect(crown.bevelWidth).toBeCloseTo(((0.28 * IN - 1.6) * Math.tan((crown.torchDeg! * Math.PI) / 180)) / IN, 5);
    expect(prep.hole).toHaveLength(16);
    expect(toResultJson(layoutBranch(spec), { units: 'in' })).not.toHaveProperty('weldPrep');
  });
});
