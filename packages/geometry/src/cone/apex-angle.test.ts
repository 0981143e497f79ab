import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { isGirthError } from '@girth/pipes';
import { coneApexAngleDeg, coneLengthFromApexAngle } from './apex-angle.js';
import { expectNear, reducerArb } from './test-support/cone-checks.js';

describe('apex angle and length', () => {
  it('an 8 in to 5 in cone 4 in long: half-apex angle atan(1.5 / 4) (right-triangle geometry of the REFERENCES.md worked example)', () => {
    // "Drawing Nets" (ceemrr.com, Geometry2/DrawingsNets6): 8 in to 5 in, 4 in long. The half angle
    // follows from the right triangle of rise (D − d)/2 = 1.5 in over 4 in.
    const a = coneApexAngleDeg(3 * 25.4, 4 * 25.4, 'concentric');
    expectNear(a / 2, (Math.atan(1.5 / 4) * 180) / Math.PI, 1e-12, 'half angle deg');
    expectNear(coneLengthFromApexAngle(3 * 25.4, a, 'concentric'), 4 * 25.4, 1e-9, 'length mm');
  });

  it('eccentric: the opposite element makes the apex angle with the flat side, tan = (D − d) / L (invariant)', () => {
    expectNear(coneApexAngleDeg(3, 4, 'eccentric'), (Math.atan(3 / 4) * 180) / Math.PI, 1e-12, 'deg');
  });

  it('length → angle → length returns the length (invariant, both forms)', () => {
    fc.assert(
      fc.property(reducerArb, fc.constantFrom('concentric' as const, 'eccentric' as const), (c, form) => {
        const dd = c.largeDiameterMm - c.smallDiameterMm;
        const a = coneApexAngleDeg(dd, c.lengthMm, form);
        expectNear(coneLengthFromApexAngle(dd, a, form), c.lengthMm, 1e-9 * c.lengthMm, 'length');
      }),
    );
  });

  it('rejects angles outside the open range, naming the field', () => {
    for (const [a, form] of [[0, 'concentric'], [180, 'concentric'], [90, 'eccentric'], [-5, 'eccentric']] as const) {
      try {
        coneLengthFromApexAngle(10, a, form);
        expect.unreachable();
      } catch (e) {
        expect(isGirthError(e, 'OUT_OF_RANGE')).toBe(true);
        expect((e as { field: string }).field).toBe('apexAngleDeg');
      }
    }
    expect(() => coneLengthFromApexAngle(10, NaN, 'concentric')).toThrow(/apexAngleDeg/);
  });
});
