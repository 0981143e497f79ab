import { describe, expect, it } from 'vitest';
import { GirthError, type GirthErrorCode } from '@girth/pipes';
import { layoutConcentricCone } from './concentric.js';
import { layoutEccentricCone } from './eccentric.js';
import type { ConeSpec, EccentricConeOptions } from './types.js';

const good: ConeSpec = { largeDiameterMm: 219.1, smallDiameterMm: 168.3, lengthMm: 152, thicknessMm: 6 };

function expectError(run: () => unknown, code: GirthErrorCode, field: string, message?: RegExp): void {
  try {
    run();
  } catch (e) {
    expect(e).toBeInstanceOf(GirthError);
    const g = e as GirthError;
    expect([g.code, g.field]).toEqual([code, field]);
    if (message) expect(g.message).toMatch(message);
    return;
  }
  throw new Error(`expected GirthError ${code} on ${field}`);
}

const both = [
  ['concentric', (s: ConeSpec, o: EccentricConeOptions = {}) => layoutConcentricCone(s, o)],
  ['eccentric', (s: ConeSpec, o: EccentricConeOptions = {}) => layoutEccentricCone(s, o)],
] as const;

describe.each(both)('%s cone: bad input gets a typed error naming the field and the limit', (_, layout) => {
  it('small diameter not smaller than the large one', () => {
    expectError(() => layout({ ...good, smallDiameterMm: 219.1 }), 'OUT_OF_RANGE', 'smallDiameterMm', /must be smaller than the large end \(219\.10 mm\)/);
    expectError(() => layout({ ...good, smallDiameterMm: 300 }), 'OUT_OF_RANGE', 'smallDiameterMm');
  });
  it('degenerate sizes (limits.ts): ends closer than 1 mm, an included angle under 0.5°, diameters outside 3 mm..20 m', () => {
    // 12.75 in to 12.7499 in: ends 0.00254 mm apart gave a pattern "74375 ft" in radius with a 0.00° sweep.
    const nearlyCylinder = { largeDiameterMm: 12.75 * 25.4, smallDiameterMm: 12.7499 * 25.4, lengthMm: 200, thicknessMm: 0 };
    expectError(() => layout(nearlyCylinder), 'OUT_OF_RANGE', 'smallDiameterMm', /difference between the end diameters must be at least 1(\.00)? mm.*roll a cylinder/);
    // 10 mm apart over 2000 mm: 2 atan(5 / 2000) = 0.286°, or atan(10 / 2000) = 0.286° eccentric; both under 0.5°.
    expectError(() => layout({ ...good, smallDiameterMm: good.largeDiameterMm - 10, lengthMm: 2000 }), 'OUT_OF_RANGE', 'lengthMm', /included angle .* must be at least 0\.5°, got 0\.286°/);
    expectError(() => layout({ ...good, largeDiameterMm: 25_000 }), 'OUT_OF_RANGE', 'largeDiameterMm', /at most 20000(\.00)? mm/);
    expectError(() => layout({ ...good, smallDiameterMm: 2 }), 'OUT_OF_RANGE', 'smallDiameterMm', /at least 3(\.00)? mm/);
    expectError(() => layout({ largeDiameterMm: 6000, smallDiameterMm: 4000, lengthMm: 2000, thicknessMm: 600 }), 'OUT_OF_RANGE', 'thicknessMm', /at most 500(\.00)? mm/);
  });
  it('a cone near the limit lays out with a SHALLOW_CONE warning, not a zero-width pattern', () => {
    // 10 mm apart over 200 mm: included angle 2 atan(5 / 200) = 2.864° concentric, atan(10 / 200) = 2.862° eccentric: just above 2.5°, no warning;
    // over 250 mm: 2.291° and 2.290°, under 2.5°: a warning, and the layout still comes out.
    const near = { ...good, smallDiameterMm: good.largeDiameterMm - 10 };
    expect(layout({ ...near, lengthMm: 200 }).warnings.map((w) => w.code)).not.toContain('SHALLOW_CONE');
    const r = layout({ ...near, lengthMm: 250 });
    expect(r.warnings.map((w) => w.code)).toContain('SHALLOW_CONE');
    expect(r.warnings.find((w) => w.code === 'SHALLOW_CONE')?.message).toMatch(/only 2\.29\d°/);
  });
  it('zero or negative sizes and length', () => {
    expectError(() => layout({ ...good, lengthMm: 0 }), 'NEGATIVE', 'lengthMm', /greater than 0/);
    expectError(() => layout({ ...good, lengthMm: -5 }), 'NEGATIVE', 'lengthMm');
    expectError(() => layout({ ...good, largeDiameterMm: 0 }), 'NEGATIVE', 'largeDiameterMm');
    expectError(() => layout({ ...good, smallDiameterMm: -1 }), 'NEGATIVE', 'smallDiameterMm');
    expectError(() => layout({ ...good, thicknessMm: -1 }), 'NEGATIVE', 'thicknessMm');
  });
  it('NaN and Infinity', () => {
    expectError(() => layout({ ...good, largeDiameterMm: NaN }), 'NOT_A_NUMBER', 'largeDiameterMm');
    expectError(() => layout({ ...good, lengthMm: Infinity }), 'NOT_FINITE', 'lengthMm');
    expectError(() => layout({ ...good, thicknessMm: NaN }), 'NOT_A_NUMBER', 'thicknessMm');
    expectError(() => layout({ ...good, lengthMm: undefined, apexAngleDeg: NaN }), 'NOT_A_NUMBER', 'apexAngleDeg');
    expectError(() => layout({ ...good, thicknessMm: undefined as unknown as number }), 'NOT_A_NUMBER', 'thicknessMm');
  });
  it('both or neither of length and apex angle', () => {
    expectError(() => layout({ ...good, apexAngleDeg: 20 }), 'BAD_OPTION', 'apexAngleDeg', /not both/);
    expectError(() => layout({ ...good, lengthMm: undefined }), 'MISSING_INPUT', 'lengthMm');
  });
  it('apex angle outside its range', () => {
    expectError(() => layout({ ...good, lengthMm: undefined, apexAngleDeg: 0 }), 'OUT_OF_RANGE', 'apexAngleDeg');
    expectError(() => layout({ ...good, lengthMm: undefined, apexAngleDeg: 180 }), 'OUT_OF_RANGE', 'apexAngleDeg');
  });
  it('plate too thick for the small end', () => {
    expectError(() => layout({ ...good, thicknessMm: 84.15 }), 'WALL_TOO_THICK', 'thicknessMm', /thinner than \d+\.\d{3} mm/);
    expectError(() => layout({ ...good, thicknessMm: 200 }), 'WALL_TOO_THICK', 'thicknessMm');
    // Inside diameters given: still no thicker than the small end's radius.
    expectError(() => layout({ ...good, diametersAt: 'inside', thicknessMm: 168.3 / 2 }), 'WALL_TOO_THICK', 'thicknessMm');
  });
  it('stations outside 4..360, segments outside 1..stations or not dividing them', () => {
    expectError(() => layout(good, { stations: 3 }), 'OUT_OF_RANGE', 'stations', /from 4 to 360/);
    expectError(() => layout(good, { stations: 361 }), 'OUT_OF_RANGE', 'stations');
    expectError(() => layout(good, { stations: 16.5 }), 'OUT_OF_RANGE', 'stations');
    expectError(() => layout(good, { segments: 0 }), 'OUT_OF_RANGE', 'segments', /from 1 to 16/);
    expectError(() => layout(good, { stations: 8, segments: 9 }), 'OUT_OF_RANGE', 'segments');
    expectError(() => layout(good, { stations: 16, segments: 3 }), 'BAD_OPTION', 'segments', /multiple of 3/);
  });
  it('unknown surface, labels and spec of the wrong kind', () => {
    expectError(() => layout({ ...good, diametersAt: 'middle' as never }), 'BAD_CHOICE', 'diametersAt');
    expectError(() => layout({ ...good, largeLabel: 42 as unknown as string }), 'BAD_OPTION', 'largeLabel');
    expectError(() => layout(null as unknown as ConeSpec), 'BAD_JOB', 'spec');
  });
});

describe('eccentric cone: its own options', () => {
  it('unknown seam, chord tolerance outside 0.001..5 mm, apex angle of 90° or more', () => {
    expectError(() => layoutEccentricCone(good, { seam: 'top' as never }), 'BAD_CHOICE', 'seam');
    expectError(() => layoutEccentricCone(good, { chordToleranceMm: 0 }), 'OUT_OF_RANGE', 'chordToleranceMm');
    expectError(() => layoutEccentricCone(good, { chordToleranceMm: 6 }), 'OUT_OF_RANGE', 'chordToleranceMm');
    expectError(() => layoutEccentricCone({ ...good, lengthMm: undefined, apexAngleDeg: 90 }), 'OUT_OF_RANGE', 'apexAngleDeg');
  });
});
