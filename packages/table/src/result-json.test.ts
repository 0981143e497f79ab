import { describe, expect, it } from 'vitest';
import { isGirthError } from '@girth/pipes';
import { toResultJson } from './result-json.js';
import { INCH, planeCutOrdinateMm, sampleResult } from './test-support/fixtures.js';

describe('toResultJson', () => {
  it('has exactly the contract keys of DESIGN.md', () => {
    const json = toResultJson(sampleResult(), { units: 'in' });
    expect(Object.keys(json)).toEqual(['kind', 'units', 'templates', 'warnings', 'pipes', 'angleDeg', 'offset', 'gap', 'fit', 'contact', 'stationCount']);
    expect(json.kind).toBe('branch');
    expect(json.units).toBe('in');
    expect(json.templates.map((t) => t.id)).toEqual(['plane-cut', 'header-hole']);
    expect(Object.keys(json.templates[0]!)).toEqual(['id', 'title', 'stretchOut', 'stations']);
    expect(Object.keys(json.templates[1]!)).toEqual(['id', 'title', 'stations']);
    expect(Object.keys(json.templates[0]!.stations[0]!)).toEqual(['n', 'angleDeg', 'girth', 'cutback']);
    expect(Object.keys(json.templates[1]!.stations[0]!)).toEqual(['n', 'angleDeg', 'girth', 'axial']);
    expect(json.warnings).toEqual([{ code: 'SHALLOW_LATERAL', message: 'a made-up warning for the test', field: 'angleDeg' }]);
    expect(Object.keys(json.pipes[0]!)).toEqual(['role', 'label', 'od', 'wall', 'id']);
  });

  it('converts mm to inches exactly (25.4 mm = 1 in) and removes float noise', () => {
    const json = toResultJson(sampleResult(), { units: 'in' });
    // 25.4 mm is exactly 1 in (international inch, 1959).
    expect(json.templates[1]!.stations[0]!['axial']).toBe(1);
    expect(json.templates[1]!.stations[1]!['axial']).toBe(-1);
    // NPS 6 STD: OD 6.625, wall 0.280, ID 6.065 in (ASME B36.10M, recalled; ID = OD - 2 wall).
    expect(json.pipes[0]).toEqual({ role: 'branch', label: 'NPS 6 STD', od: 6.625, wall: 0.28, id: 6.065 });
    // Stretch-out pi x 6.625 in, and the toe ordinate D tan 22.5° (REFERENCES.md, miter), to 1e-6 in.
    expect(Math.abs(json.templates[0]!.stretchOut! - Math.PI * 6.625)).toBeLessThanOrEqual(5e-7);
    const toe = json.templates[0]!.stations[8]!;
    expect(toe['angleDeg']).toBe(180);
    expect(Math.abs(toe['cutback']! - 6.625 * Math.tan(Math.PI / 8))).toBeLessThanOrEqual(5e-7);
    // Every number is a multiple of 1e-6 of the unit.
    for (const s of json.templates[0]!.stations) for (const v of Object.values(s)) expect(Math.abs(v * 1e6 - Math.round(v * 1e6))).toBeLessThan(1e-6);
  });

  it('keeps millimetres in mm', () => {
    const json = toResultJson(sampleResult(), { units: 'mm' });
    expect(json.units).toBe('mm');
    expect(json.pipes[0]!.od).toBe(168.275);
    expect(Math.abs(json.templates[0]!.stations[4]!['cutback']! - planeCutOrdinateMm(6.625 * INCH, 22.5, 90))).toBeLessThanOrEqual(5e-7);
  });

  it('writes the joint\'s own fields, lengths in the unit and angles in degrees', () => {
    // 25.4 mm = 1 in exactly; a 1/16 in gap is 0.0625 in = 1.5875 mm (arithmetic on the inch).
    const inch = toResultJson(sampleResult(), { units: 'in' });
    expect(inch).toMatchObject({ angleDeg: 67.5, offset: 1, gap: 0.0625, fit: 'set-on', contact: { branch: 'inside', header: 'outside' }, stationCount: 16 });
    const mm = toResultJson(sampleResult(), { units: 'mm' });
    expect(mm).toMatchObject({ angleDeg: 67.5, offset: 25.4, gap: 1.5875, stationCount: 16 });
  });

  it('serialises to JSON without loss (no NaN, no undefined)', () => {
    const json = toResultJson(sampleResult(), { units: 'in' });
    expect(JSON.parse(JSON.stringify(json))).toEqual(json);
  });

  it('refuses bad units, non-finite lengths and reserved column keys with typed errors', () => {
    const base = sampleResult();
    const wrap = base.templates[0]!;
    const cases: Array<[() => unknown, string, string]> = [
      [() => toResultJson(base, { units: 'ft' as never }), 'BAD_OPTION', 'options.units'],
      [
        () => toResultJson({ ...base, templates: [{ ...wrap, stations: [{ n: 1, angleDeg: 0, values: { girth: Number.NaN, cutback: 0 } }] }, base.templates[1]] }, { units: 'mm' }),
        'NOT_A_NUMBER',
        'templates[0].stations[0].values.girth',
      ],
      [() => toResultJson({ ...base, pipes: [{ ...base.pipes[0]!, odMm: Infinity }] }, { units: 'in' }), 'NOT_FINITE', 'pipes[0].odMm'],
      [() => toResultJson({ ...base, templates: [{ ...wrap, stationColumns: [{ key: 'n', heading: 'N', quantity: 'length' }] }, base.templates[1]] }, { units: 'in' }), 'BAD_JOB', 'templates[0].stationColumns'],
      [() => toResultJson({ ...base, offsetMm: Number.NaN }, { units: 'in' }), 'NOT_A_NUMBER', 'offsetMm'],
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
      expect(caught.field).toBe(field);
    }
  });

  it('keeps a very large finite length as a number (never null) when it cannot be rounded to 1e-6', () => {
    // Invariant: 1e300 mm times 1e6 overflows; the value must pass through unrounded, and JSON must not write null.
    const base = sampleResult();
    const [first, second] = base.templates;
    const big = { ...first, stations: first.stations.map((st) => ({ ...st, values: { ...st.values, cutback: 1e300 } })) };
    const json = JSON.parse(JSON.stringify(toResultJson({ ...base, templates: [big, second] }, { units: 'mm' })));
    expect(json.templates[0].stations[0].cutback).toBe(1e300);
  });
});

