/**
 * JSON and tables of the branch layout (@girth/unroll layoutBranch).
 */
import { describe, expect, it } from 'vitest';
import { layoutBranch } from '@girth/unroll';
import { formatStationTable } from './format-station-table.js';
import { stationTableCsv } from './station-table-csv.js';
import { toResultJson } from './result-json.js';
import { parseCsv } from './test-support/csv-parse.js';

const IN = 25.4;
// NPS 12 STD header and NPS 6 STD branch: OD 12.750 / 6.625 in, walls 0.375 / 0.280 in
// (ASME B36.10M, recalled; REFERENCES.md); ID = OD - 2 wall.
const HEADER = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' };
const BRANCH = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };

describe('tables of layoutBranch', () => {
  const tee = layoutBranch({ header: HEADER, branch: BRANCH, angleDeg: 90 });

  it('gives the DESIGN.md contract for a branch', () => {
    const json = toResultJson(tee, { units: 'in' });
    expect(Object.keys(json).slice(0, 5)).toEqual(['kind', 'units', 'templates', 'warnings', 'pipes']);
    expect(json.kind).toBe('branch');
    // The joint as solved: a centred square tee, set-on, no gap (the defaults), 16 stations.
    expect(json).toMatchObject({ angleDeg: 90, offset: 0, gap: 0, fit: 'set-on', stationCount: 16 });
    expect(json.templates.map((t) => t.id)).toEqual(['branch-cut', 'header-hole']);
    expect(Object.keys(json.templates[0]!.stations[0]!)).toEqual(['n', 'angleDeg', 'girth', 'cutback']);
    expect(Object.keys(json.templates[1]!.stations[0]!)).toEqual(['n', 'angleDeg', 'girth', 'axial']);
    expect(json.templates[0]!.stations.map((s) => s['angleDeg'])).toEqual(Array.from({ length: 16 }, (_, i) => i * 22.5));
    expect(json.pipes.map((p) => [p.label, p.od, p.wall, p.id])).toEqual([
      ['NPS 12 STD', 12.75, 0.375, 12],
      ['NPS 6 STD', 6.625, 0.28, 6.065],
    ]);
  });

  it('gives the tee saddle depth in inches', () => {
    // Set-on: branch ID (radius r) on header OD (radius R). Saddle depth
    // R - sqrt(R² - r² sin² phi) (MathWorld, "Cylinder-Cylinder Intersection"), so the
    // cutbacks span R - sqrt(R² - r²) = 6.375 - sqrt(6.375² - 3.0325²) = 0.7674 in.
    const json = toResultJson(tee, { units: 'in' });
    const cutbacks = json.templates[0]!.stations.map((s) => s['cutback']!);
    const R = 6.375;
    const r = 3.0325;
    expect(Math.abs(Math.max(...cutbacks) - Math.min(...cutbacks) - (R - Math.sqrt(R * R - r * r)))).toBeLessThan(1e-4);
    // Hole: axial +- r at the heel and toe stations (phi 0 and 180).
    const axial = json.templates[1]!.stations.map((s) => s['axial']!);
    expect(Math.abs(Math.max(...axial) - r)).toBeLessThan(1e-4);
    expect(Math.abs(Math.min(...axial) + r)).toBeLessThan(1e-4);
  });

  it('prints and exports the branch cut table', () => {
    const text = formatStationTable(tee.templates[0]!, { format: 'ft-in' });
    expect(text).toContain(`Stretch-out: 1'-8 13/16"`); // pi x 6.625 = 20.813 in
    const csv = parseCsv(stationTableCsv(tee.templates[0]!, { format: 'in' }));
    expect(csv[0]).toEqual(['Station', 'Angle (deg)', 'Girth', 'Cutback']);
    expect(csv).toHaveLength(17);
  });
});
