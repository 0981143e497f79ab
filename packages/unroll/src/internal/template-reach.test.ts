/**
 * Layouts refuse, naming the input at fault, a joint whose template would
 * reach past the 1 km the exporters draw, instead of laying it out for an
 * exporter to refuse late on a point of the template (the joints below are
 * ones `pnpm fuzz` met as late refusals, or the same kind).
 */
import { describe, expect, it } from 'vitest';
import { TEMPLATE_REACH_MM } from '@girth/pipes';
import { expectGirthError } from '@girth/pipes/test-support';
import { layoutConcentricCone } from '../cone/concentric.js';
import { layoutEccentricCone } from '../cone/eccentric.js';
import { layoutMiter } from '../miter/layout-miter.js';
import { layoutPlaneCut } from '../plane-cut/layout-plane-cut.js';
import { templateReachMm } from './template-reach.js';

const pipe = { odMm: 293.921, wallMm: 17.569, label: 'P294' };

describe('templateReachMm', () => {
  it('a square cut of NPS 6 (OD 168.3 mm) reaches its stretch-out, pi x OD = 528.7 mm (circumference, common practice)', () => {
    const t = layoutPlaneCut({ pipe: { odMm: 168.3, wallMm: 7.11, label: 'NPS 6 STD' }, angleDeg: 90 }).templates[0]!;
    expect(templateReachMm(t)).toBeGreaterThanOrEqual(Math.PI * 168.3 - 1e-9);
    expect(templateReachMm(t)).toBeLessThan(Math.PI * 168.3 + 200); // the stretch-out and the labels beside it
  });
});

describe('a miter whose pieces would reach past 1 km', () => {
  // One weld, 154.05° bend: the end piece runs R tan(77.02°) = 4.34 R from the
  // tangent point to the cut (miter geometry, common practice).
  const spec = { pipe, bendDeg: 154.0479, welds: 1 };

  it('is refused on the radius it was given', () => {
    expect(expectGirthError(() => layoutMiter({ ...spec, radiusMm: 425_094 }), 'OUT_OF_RANGE', 'radiusMm').message).toMatch(/would reach 1\.8\d km, beyond the 1 km Girth lays out; give a smaller centreline radius or more welds/);
  });

  it('lays out below the bound', () => {
    const radiusMm = (0.95 * TEMPLATE_REACH_MM) / Math.tan((77.02 * Math.PI) / 180) - pipe.odMm;
    const result = layoutMiter({ ...spec, radiusMm });
    for (const t of result.templates) {
      expect(templateReachMm(t)).toBeLessThanOrEqual(TEMPLATE_REACH_MM);
    }
  });
});

describe('a concentric cone whose pattern would reach past 1 km', () => {
  const layout = layoutConcentricCone;
  // 12 m to 11 m at a 0.6° included angle: the pattern's outer radius is
  // R / sin(0.3°) = 6000 / 0.005236 = 1,146 m (cone development, common practice).
  const big = { largeDiameterMm: 12_000, smallDiameterMm: 11_000, thicknessMm: 0 };

  it('given by its included angle, is refused on the angle', () => {
    expect(expectGirthError(() => layout({ ...big, apexAngleDeg: 0.6 }), 'OUT_OF_RANGE', 'apexAngleDeg').message).toMatch(/would reach \d\.\d+ km, beyond the 1 km/);
  });

  it('given by its length, is refused on the length', () => {
    const lengthMm = 500 / Math.tan((0.3 * Math.PI) / 180); // 95,493 mm: the same 0.6°
    expect(expectGirthError(() => layout({ ...big, lengthMm }), 'OUT_OF_RANGE', 'lengthMm').message).toMatch(/would reach \d\.\d+ km, beyond the 1 km/);
  });

  it('a little steeper, it lays out within the bound', () => {
    const result = layout({ ...big, apexAngleDeg: 1.5 });
    for (const t of result.templates) expect(templateReachMm(t)).toBeLessThanOrEqual(TEMPLATE_REACH_MM);
  });

  it('the eccentric cone of the same sizes is laid out element by element on its plate and stays within reach', () => {
    // Its flat side runs along the slant (95 m here); no ring sector about a far apex.
    for (const t of layoutEccentricCone({ ...big, apexAngleDeg: 0.6 }).templates) expect(templateReachMm(t)).toBeLessThanOrEqual(TEMPLATE_REACH_MM);
  });
});
