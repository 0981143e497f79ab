import { describe, expect, it } from 'vitest';
import { isGirthError } from '@girth/pipes';
import { CAUTION, type Template } from '@girth/unroll';
import { formatStationTable } from './format-station-table.js';
import { INCH, planeCutWrap } from './test-support/fixtures.js';

// NPS 6: OD 6.625 in (ASME B36.10M, recalled; REFERENCES.md). Plane cut at 22.5°,
// the largest cut angle ASME B31.3 para. 304.2.3 allows for multiple miters.
// Ordinate (D/2) tan(c) (1 - cos phi) (REFERENCES.md, miter), worked by hand:
// (6.625 / 2) tan 22.5° = 1.372082 in, so at 45° 0.401872 in, at 90° 1.372082 in,
// at 135° 2.342292 in, at 180° 2.744164 in. Stretch-out pi x 6.625 = 20.813051 in.
// Ordinates are read to the nearest 1/16 in (common practice; REFERENCES.md).
const NPS6 = planeCutWrap(6.625 * INCH, 22.5);

function rowOf(table: string, n: number): string[] {
  const line = table.split('\n').find((l) => l.trim().startsWith(`${n} `));
  if (line === undefined) throw new Error(`no row ${n}`);
  return line.trim().split(/\s{2,}/);
}

describe('formatStationTable', () => {
  it('writes feet-inch-sixteenths by default for ft-in', () => {
    const t = formatStationTable(NPS6, { format: 'ft-in' });
    const lines = t.split('\n');
    expect(lines[0]).toBe('Plane cut 22.5° on OD 6.625 in');
    expect(lines[1]).toBe(`Stretch-out: 1'-8 13/16"`); // 20.813 in = 1 ft 8 13/16 in
    expect(lines[3]!.trim().split(/\s{2,}/)).toEqual(['Station', 'Angle (deg)', 'Girth', 'Cutback']);
    expect(rowOf(t, 1)).toEqual(['1', '0.0', '0"', '0"']);
    expect(rowOf(t, 3)[3]).toBe('3/8"'); // 0.4019 in
    expect(rowOf(t, 5)[3]).toBe('1 3/8"'); // 1.3721 in
    expect(rowOf(t, 7)[3]).toBe('2 5/16"'); // 2.3423 in
    expect(rowOf(t, 9)).toEqual(['9', '180.0', '10 7/16"', '2 3/4"']); // girth 10.4065 in, cutback 2.7442 in
  });

  it('rounds to 1/32 or 1/8 on request', () => {
    expect(rowOf(formatStationTable(NPS6, { format: 'ft-in', fraction: 32 }), 7)[3]).toBe('2 11/32"'); // 2.3423 x 32 = 74.95
    expect(rowOf(formatStationTable(NPS6, { format: 'ft-in', fraction: 8 }), 7)[3]).toBe('2 3/8"'); // 2.3423 x 8 = 18.74
  });

  it('writes feet past 12 inches', () => {
    // NPS 24: OD 24 in (B36.10M, recalled); stretch-out pi x 24 = 75.398 in = 6 ft 3 3/8 in.
    expect(formatStationTable(planeCutWrap(24 * INCH, 22.5), { format: 'ft-in' }).split('\n')[1]).toBe(`Stretch-out: 6'-3 3/8"`);
  });

  it('writes decimal mm and inches', () => {
    // 1.372082 in = 34.851 mm; 2.744164 in = 69.702 mm.
    expect(rowOf(formatStationTable(NPS6, { format: 'mm' }), 5)[3]).toBe('34.9 mm');
    expect(rowOf(formatStationTable(NPS6, { format: 'mm', decimals: 2 }), 9)[3]).toBe('69.70 mm');
    expect(rowOf(formatStationTable(NPS6, { format: 'in' }), 9)[3]).toBe('2.744"');
  });

  it('right-aligns every column and ends with the caution, once', () => {
    const lines = formatStationTable(NPS6, { format: 'ft-in' }).split('\n');
    const body = lines.slice(3, 3 + 2 + 16);
    expect(new Set(body.map((l) => l.length)).size).toBe(1); // headings, rule and rows equally wide
    expect(lines.at(-2)).toBe(CAUTION);
    expect(lines.filter((l) => l.includes('CAUTION'))).toHaveLength(1);
    expect(formatStationTable(NPS6, { format: 'ft-in', caution: false })).not.toContain('CAUTION');
  });

  it('shows as many angle decimals as the stations need', () => {
    const t = formatStationTable(planeCutWrap(6.625 * INCH, 22.5, 32), { format: 'in' }); // 11.25° steps
    expect(rowOf(t, 2)[1]).toBe('11.25');
  });

  it('keeps a heading with line breaks on one line', () => {
    const hostile: Template = { ...NPS6, stationColumns: [{ key: 'cutback', heading: 'Cut\nback\r\n', quantity: 'length' }] };
    const t = formatStationTable(hostile, { format: 'in', caution: false });
    expect(t.split('\n')).toHaveLength(3 + 2 + 16 + 1);
  });

  it('refuses bad options and missing or non-finite values with typed errors', () => {
    const cases: Array<[() => unknown, string, string]> = [
      [() => formatStationTable(NPS6, { format: 'yd' as never }), 'BAD_OPTION', 'options.format'],
      [() => formatStationTable(NPS6, { format: 'ft-in', fraction: 10 as never }), 'BAD_OPTION', ''],
      [
        () => formatStationTable({ ...NPS6, stations: [{ n: 1, angleDeg: 0, values: { girth: 0, cutback: undefined as never } }] }, { format: 'mm' }),
        'NOT_A_NUMBER',
        'template.stations[0].values.cutback',
      ],
      [
        () => formatStationTable({ ...NPS6, stations: [{ n: 1, angleDeg: 0, values: { girth: Number.POSITIVE_INFINITY, cutback: 0 } }] }, { format: 'mm' }),
        'NOT_FINITE',
        'template.stations[0].values.girth',
      ],
      [() => formatStationTable({ ...NPS6, stations: [{ n: 1, angleDeg: Number.NaN, values: {} }] }, { format: 'mm' }), 'NOT_A_NUMBER', 'template.stations[0].angleDeg'],
    ];
    for (const [fn, code, field] of cases) {
      let caught: unknown;
      try {
        fn();
      } catch (e) {
        caught = e;
      }
      expect(isGirthError(caught), String(caught)).toBe(true);
      if (!isGirthError(caught)) continue;
      expect(caught.code).toBe(code);
      if (field) expect(caught.field).toBe(field);
    }
  });

  it('prints a dash where a station has no value in a column (the key is left out of the row)', () => {
    // Invariant of the table layout: a row without a key gets a blank cell, the others keep their values.
    const text = formatStationTable({ ...NPS6, stations: [{ n: 1, angleDeg: 0, values: { girth: 25.4 } }] }, { format: 'in' });
    const row = text.split('\n').find((l) => /^\s*1\s/.test(l));
    expect(row?.trim().split(/\s+/)).toEqual(['1', '0', '1.000"', '-']);
  });
});
