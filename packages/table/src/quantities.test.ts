import { describe, expect, it } from 'vitest';
import type { Template } from '@girth/unroll';
import { formatStationTable } from './format-station-table.js';
import { stationTableCsv } from './station-table-csv.js';
import { toResultJson } from './result-json.js';
import { INCH, planeCutWrap } from './test-support/fixtures.js';

// A wrap with one column of each quantity. An angle (45°) and a count (3) must come out
// unchanged in every unit; only the length converts (25.4 mm = 1 in exactly, 1959 definition).
function mixed(): Template {
  const base = planeCutWrap(6.625 * INCH, 22.5);
  return {
    ...base,
    stationColumns: [
      { key: 'cutback', heading: 'Cutback', quantity: 'length' },
      { key: 'bevel', heading: 'Bevel (deg)', quantity: 'angle' },
      { key: 'passes', heading: 'Passes', quantity: 'count' },
    ],
    stations: [{ n: 1, angleDeg: 0, values: { cutback: INCH, bevel: 45, passes: 3 } }],
  };
}

describe('station columns convert by quantity', () => {
  it('text table in inches: 1 in, 45 and 3 (the angle is not divided by 25.4)', () => {
    const row = formatStationTable(mixed(), { format: 'in', decimals: 3 }).split('\n').find((l) => l.trim().startsWith('1 '));
    expect(row?.trim().split(/\s{2,}/)).toEqual(['1', '0', '1.000"', '45', '3']);
  });

  it('CSV in inches: the same three values', () => {
    const lines = stationTableCsv(mixed(), { format: 'in', decimals: 3 }).trim().split(/\r?\n/);
    expect(lines[1]!.split(',').slice(2)).toEqual(['"1.000"""', '45', '3']); // RFC 4180: a quote inside a field is doubled
  });

  it('JSON in inches: cutback 1, bevel 45, passes 3', () => {
    const json = toResultJson(
      { kind: 'plane-cut', templates: [mixed()], pipes: [], warnings: [], angleDeg: 90, cutAngleDeg: 0, gapMm: 0, fitSurface: 'od', stations: 1, centerCutbackMm: 0, gapSetbackMm: 0 },
      { units: 'in' },
    );
    expect(json.templates[0]!.stations[0]).toEqual({ n: 1, angleDeg: 0, cutback: 1, bevel: 45, passes: 3 });
  });
});
