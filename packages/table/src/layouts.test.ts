/**
 * Tables and JSON of results made by Girth's own layouts (@girth/unroll).
 */
import { describe, expect, it } from 'vitest';
import { CAUTION, layoutBranch, layoutConcentricCone, layoutEccentricCone, layoutMiter, layoutPlaneCut } from '@girth/unroll';
import { formatStationTable } from './format-station-table.js';
import { toResultJson } from './result-json.js';

const IN = 25.4;

describe('tables of unroll layouts', () => {
  // Worked example ("Drawing Nets", ceemrr.com Geometry2/DrawingsNets6; REFERENCES.md):
  // an 8 in to 5 in cone 4 in long, slant sqrt(4² + 1.5²) = 4.272 in. The outer arc
  // of the pattern is the large end's girth pi x 8 = 25.133 in (a development keeps
  // lengths; common practice).
  const cone = layoutConcentricCone({ largeDiameterMm: 8 * IN, smallDiameterMm: 5 * IN, lengthMm: 4 * IN, thicknessMm: 0 });

  it('gives the contract JSON of a concentric cone in inches', () => {
    const json = toResultJson(cone, { units: 'in' });
    expect(json.kind).toBe('reducer');
    const t = json.templates[0]!;
    expect(Object.keys(t.stations[0]!).slice(0, 2)).toEqual(['n', 'angleDeg']);
    const last = t.stations.at(-1)!;
    expect(last['angleDeg']).toBe(360);
    expect(Math.abs(last['outerArc']! - Math.PI * 8)).toBeLessThan(1e-5);
    expect(Math.abs(last['innerArc']! - Math.PI * 5)).toBeLessThan(1e-5);
    expect(Math.abs(t.stations[0]!['element']! - Math.hypot(4, 1.5))).toBeLessThan(1e-5);
  });

  it('writes the cone pattern, radii in inches and the sweep in degrees', () => {
    const json = toResultJson(cone, { units: 'in' });
    const pattern = json['pattern'] as { sweepDeg: number; slantHeight: number };
    expect(Math.abs(pattern.sweepDeg - 126.4)).toBeLessThan(0.05); // published 126.4°
    expect(Math.abs(pattern.slantHeight - Math.hypot(4, 1.5))).toBeLessThan(1e-5); // slant 4.272 in, as published
  });

  it('prints the cone stations in feet-inch-sixteenths', () => {
    const text = formatStationTable(cone.templates[0]!, { format: 'ft-in' });
    const last = text.split('\n').find((l) => l.trim().startsWith('17 '))!;
    // 25.133 in = 2 ft 1 1/8 in (1.133 x 16 = 18.1); 15.708 in = 1 ft 3 11/16 in (3.708 x 16 = 59.3);
    // element 4.272 in = 4 1/4 in (4.272 x 16 = 68.4).
    expect(last.trim().split(/\s{2,}/)).toEqual(['17', '360.0', `2'-1 1/8"`, `1'-3 11/16"`, '4 1/4"']);
  });

  it('ends every joint\'s table with the caution, once', () => {
    // DN 200 and DN 100: OD 219.1 and 114.3 mm (EN 10220 series 1, recalled; REFERENCES.md), walls of our choosing.
    const dn200 = { odMm: 219.1, wallMm: 6.3, label: 'DN 200' };
    const dn100 = { odMm: 114.3, wallMm: 3.6, label: 'DN 100' };
    const byKind = {
      branch: layoutBranch({ header: dn200, branch: dn100, angleDeg: 90, fit: 'set-in' }),
      planeCut: layoutPlaneCut({ pipe: dn100, angleDeg: 50 }),
      miter: layoutMiter({ pipe: dn200, bendDeg: 60, welds: 2, radiusMm: 300 }),
      concentric: layoutConcentricCone({ largeDiameterMm: 219.1, smallDiameterMm: 114.3, lengthMm: 200, thicknessMm: 6 }),
      eccentric: layoutEccentricCone({ largeDiameterMm: 219.1, smallDiameterMm: 114.3, lengthMm: 200, thicknessMm: 6 }),
    };
    for (const [kind, layout] of Object.entries(byKind)) {
      for (const template of layout.templates) {
        const lines = formatStationTable(template, { format: 'mm' }).trimEnd().split('\n');
        expect(lines.at(-1), kind).toBe(CAUTION);
        expect(lines.filter((l) => /caution/i.test(l)), kind).toHaveLength(1);
      }
    }
  });
});
