import { describe, expect, it } from 'vitest';
import { isGirthError } from '@girth/pipes';
import { defaultWeldZoneMm, layoutShellPlate } from './layout-shell-plate.js';
import type { ShellPlateSpec } from './types.js';

const IN = 25.4;
// ASME B36.10M, recalled: NPS 24 STD 24.000 x .375 in; NPS 6 STD 6.625 x .280 in.
const HEADER = { odMm: 24 * IN, wallMm: 0.375 * IN, label: 'NPS 24 STD' };
const NPS6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };
const base: ShellPlateSpec = { header: HEADER, lengthMm: 3000, seamClockHours: 3, branches: [{ name: 'N1', branch: NPS6, stationMm: 1000, clockHours: 12 }] };
const codes = (s: ShellPlateSpec): string[] => layoutShellPlate(s).warnings.map((w) => w.code);
const thrown = (f: () => unknown): { code: string; field: string } => {
  try {
    f();
  } catch (e) {
    if (isGirthError(e)) return { code: e.code, field: e.field };
    throw e;
  }
  throw new Error('no error');
};

describe('layoutShellPlate', () => {
  it('plate width is pi x (OD - t) (common practice: neutral surface at mid-thickness) and its outline is the full rectangle', () => {
    const r = layoutShellPlate(base);
    const w = Math.PI * (HEADER.odMm - HEADER.wallMm);
    expect(r.plateWidthMm).toBeCloseTo(w, 9);
    const outer = r.templates[0]!.cut[0]!;
    expect(outer.kind === 'polyline' && outer.points).toEqual([[0, 0], [w, 0], [w, 3000], [0, 3000]]);
    expect(r.templates[0]!.notes.join(' ')).toMatch(/mid-thickness/);
    expect(r.warnings).toEqual([]);
  });

  it('every hole lies inside the plate and holds its centre mark', () => {
    const r = layoutShellPlate(base);
    const hole = r.templates[0]!.cut[1]!;
    if (hole.kind !== 'polyline') throw new Error('not a polyline');
    for (const p of hole.points) {
      expect(p[0]).toBeGreaterThan(0);
      expect(p[0]).toBeLessThan(r.plateWidthMm);
    }
    // Seam at 3, branch at 12: nine hours clockwise, 3/4 of the girth.
    expect(r.holes[0]!.girthMm).toBeCloseTo(0.75 * r.plateWidthMm, 9);
  });

  it('warns when a hole crosses the long seam, and when the seam is in its weld zone', () => {
    expect(codes({ ...base, seamClockHours: 12 })).toEqual(['HOLE_CROSSES_SEAM']);
    // Branch ID ~154 mm: half-width on the plate ~77 mm; seam 1 h (~157 mm of mid girth) away leaves ~80 mm, inside a 100 mm zone.
    expect(codes({ ...base, seamClockHours: 11, weldZoneMm: 100 })).toEqual(['HOLE_NEAR_SEAM']);
    expect(codes({ ...base, seamClockHours: 11, weldZoneMm: 50 })).toEqual([]);
  });

  it('warns when two weld zones overlap and refuses overlapping holes naming the branch', () => {
    const two = (stationMm: number): ShellPlateSpec => ({ ...base, branches: [...base.branches, { name: 'N2', branch: NPS6, stationMm, clockHours: 12 }] });
    // Holes ~154 mm long axially: 250 mm apart leaves ~96 mm between edges, under 2 x 50 mm.
    expect(codes(two(1250))).toEqual(['WELD_ZONES_OVERLAP']);
    expect(codes(two(1400))).toEqual([]);
    expect(thrown(() => layoutShellPlate(two(1100)))).toEqual({ code: 'HOLES_OVERLAP', field: 'branches[1]' });
  });

  it('sees holes close across the long seam', () => {
    const s: ShellPlateSpec = {
      ...base,
      seamClockHours: 12,
      branches: [
        { name: 'N1', branch: NPS6, stationMm: 1000, clockHours: 0.6 },
        { name: 'N2', branch: NPS6, stationMm: 1000, clockHours: 11.4 },
      ],
    };
    expect(codes(s)).toContain('WELD_ZONES_OVERLAP');
  });

  it('splits a long shell into equal courses, each its own part, and warns of a hole over a course seam', () => {
    const r = layoutShellPlate({ ...base, maxPlateLengthMm: 1200 });
    expect(r.courses).toBe(3);
    expect(r.templates.map((t) => t.id)).toEqual(['shell-course-1', 'shell-course-2', 'shell-course-3']);
    expect(r.courseLengthMm).toBeCloseTo(1000, 9);
    // The hole centred at 1000 mm straddles the seam between courses 1 and 2.
    expect(r.warnings.map((w) => w.code)).toEqual(['HOLE_CROSSES_COURSE_SEAM']);
    const moved = layoutShellPlate({ ...base, maxPlateLengthMm: 1200, branches: [{ ...base.branches[0]!, stationMm: 1500 }] });
    expect(moved.warnings).toEqual([]);
    expect(moved.holes[0]).toMatchObject({ course: 2 });
    expect(moved.holes[0]!.axialMm).toBeCloseTo(500, 9);
    expect(moved.templates[1]!.cut).toHaveLength(2);
    expect(moved.templates[0]!.cut).toHaveLength(1);
  });

  it('default weld zone: 50 mm, or twice the wall on heavy wall', () => {
    expect(defaultWeldZoneMm(9.53)).toBe(50);
    expect(defaultWeldZoneMm(40)).toBe(80);
  });

  it('bad input: typed errors naming the field', () => {
    expect(thrown(() => layoutShellPlate({ ...base, lengthMm: 0 }))).toMatchObject({ field: 'lengthMm' });
    expect(thrown(() => layoutShellPlate({ ...base, seamClockHours: 13 }))).toEqual({ code: 'OUT_OF_RANGE', field: 'seamClockHours' });
    expect(thrown(() => layoutShellPlate({ ...base, branches: [{ ...base.branches[0]!, stationMm: 20 }] }))).toEqual({ code: 'OUT_OF_RANGE', field: 'branches[0].stationMm' });
    expect(thrown(() => layoutShellPlate({ ...base, branches: [{ ...base.branches[0]!, angleDeg: 0 }] }))).toMatchObject({ field: 'branches[0].angleDeg' });
    expect(thrown(() => layoutShellPlate({ ...base, branches: [{ ...base.branches[0]!, name: ' ' }] }))).toEqual({ code: 'EMPTY_INPUT', field: 'branches[0].name' });
    expect(thrown(() => layoutShellPlate({ ...base, maxPlateLengthMm: 10 }))).toEqual({ code: 'OUT_OF_RANGE', field: 'maxPlateLengthMm' });
    expect(thrown(() => layoutShellPlate({ ...base, weldZoneMm: -1 }))).toMatchObject({ field: 'weldZoneMm' });
  });
});
