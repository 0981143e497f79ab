import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { miterCutAngleDeg } from './cut-angle.js';
import { expectClose } from '../plane-cut/test-support/expect-close.js';

describe('miterCutAngleDeg', () => {
  it('is the change of direction at a joint divided by two (ASME B31.3 para. 304.2.3, REFERENCES.md)', () => {
    // A 90° elbow in 3 welds changes direction by 30° at each joint: cut angle 15°.
    expect(miterCutAngleDeg(90, 3)).toBe(15);
    // A 90° elbow in 2 welds: 45° per joint, 22.5° cut (the code's limit for multiple miters).
    expect(miterCutAngleDeg(90, 2)).toBe(22.5);
    // A single 90° miter: the whole change at one joint, 45° cut.
    expect(miterCutAngleDeg(90, 1)).toBe(45);
  });

  it('equals B / (2 W) for any bend and weld count (REFERENCES.md, miter)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 180, noNaN: true }), fc.integer({ min: 1, max: 90 }), (b, w) => {
        const perJoint = b / w; // change of direction at each of W equal joints
        expectClose(miterCutAngleDeg(b, w), perJoint / 2, 1e-12, 'cut angle');
      }),
    );
  });

  it('rejects bends outside (0, 180] and weld counts outside 1..90', () => {
    expect(() => miterCutAngleDeg(0, 2)).toThrow(/bendDeg/);
    expect(() => miterCutAngleDeg(181, 2)).toThrow(/bendDeg/);
    expect(() => miterCutAngleDeg(90, 0)).toThrow(/welds/);
    expect(() => miterCutAngleDeg(90, 1.5)).toThrow(/welds/);
  });
});
