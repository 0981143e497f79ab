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
    expectError(() => layout({ ...good, smallDiameterMm: 219.1 }), 'OUT_OF_RANGE', 'smallDiameterMm', /must be smaller than the large end \(219\.1 mm\)/);
    expectError(() => layout({ ...good, smallDiameterMm: 300 }), 'OUT_OF_RANGE', 'smallDiameterMm');
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
    expectError(() => layout({ ...good, lengthMm: undefined }), 'BAD_OPTION', 'lengthMm');
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
    expectError(() => layout({ ...good, diametersAt: 'middle' as never }), 'BAD_OPTION', 'diametersAt');
    expectError(() => layout({ ...good, largeLabel: 42 as unknown as string }), 'BAD_OPTION', 'largeLabel');
    expectError(() => layout(null as unknown as ConeSpec), 'BAD_JOB', 'spec');
  });
});

describe('eccentric cone: its own options', () => {
  it('unknown seam, chord tolerance outside 0.001..5 mm, apex angle of 90° or more', () => {
    expectError(() => layoutEccentricCone(good, { seam: 'top' as never }), 'BAD_OPTION', 'seam');
    expectError(() => layoutEccentricCone(good, { chordToleranceMm: 0 }), 'OUT_OF_RANGE', 'chordToleranceMm');
    expectError(() => layoutEccentricCone(good, { chordToleranceMm: 6 }), 'OUT_OF_RANGE', 'chordToleranceMm');
    expectError(() => layoutEccentricCone({ ...good, lengthMm: undefined, apexAngleDeg: 90 }), 'OUT_OF_RANGE', 'apexAngleDeg');
  });
});
