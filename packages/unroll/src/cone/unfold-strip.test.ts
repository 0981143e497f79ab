import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import type { Vec3 } from '@girth/geometry';
import { GirthError } from '@girth/pipes';
import { unfoldStrip } from './unfold-strip.js';
import { d2, d3, expectNear } from './test-support/cone-test-support.js';

describe('unfoldStrip', () => {
  it('a cylinder unrolls into a rectangle: its girth the sum of the chords, its height the length (common geometry)', () => {
    fc.assert(
      fc.property(fc.double({ min: 5, max: 2000, noNaN: true }), fc.double({ min: 1, max: 3000, noNaN: true }), fc.integer({ min: 3, max: 400 }), (R, L, n) => {
        const A: Vec3[] = [];
        const B: Vec3[] = [];
        for (let i = 0; i <= n; i++) {
          const t = (2 * Math.PI * i) / n;
          A.push([R * Math.cos(t), R * Math.sin(t), 0]);
          B.push([R * Math.cos(t), R * Math.sin(t), -L]);
        }
        const s = unfoldStrip(A, B, [1, 0, 0]);
        const chord = 2 * R * Math.sin(Math.PI / n);
        s.large.forEach((p, i) => {
          expectNear(p[1], 0, 1e-9 * (R + L), `large y ${i}`);
          expectNear(Math.abs(p[0]), i * chord, 1e-9 * (R + L) * (i + 1), `large x ${i}`);
        });
        s.small.forEach((p, i) => {
          expectNear(p[1], -L, 1e-9 * (R + L), `small y ${i}`);
          expectNear(Math.abs(p[0]), i * chord, 1e-9 * (R + L) * (i + 1), `small x ${i}`);
        });
      }),
      { numRuns: 100 },
    );
  });

  it('keeps every element, diagonal and step at its 3D length (invariant)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.double({ min: -1, max: 1, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true })), { minLength: 3, maxLength: 40 }),
        (jitter) => {
          const n = jitter.length;
          const A: Vec3[] = [];
          const B: Vec3[] = [];
          jitter.forEach(([u, v], i) => {
            A.push([100 * i, 5 * u, 0]);
            B.push([100 * i + 20 * v, 5 * v, 300]);
          });
          const s = unfoldStrip(A, B, [0, -1, 0]);
          for (let i = 0; i < n; i++) expectNear(d2(s.large[i]!, s.small[i]!), d3(A[i]!, B[i]!), 1e-9, `element ${i}`);
          for (let i = 0; i + 1 < n; i++) {
            expectNear(d2(s.large[i]!, s.small[i + 1]!), d3(A[i]!, B[i + 1]!), 1e-9, `diagonal ${i}`);
            expectNear(d2(s.large[i]!, s.large[i + 1]!), d3(A[i]!, A[i + 1]!), 1e-9, `large step ${i}`);
            expectNear(d2(s.small[i]!, s.small[i + 1]!), d3(B[i]!, B[i + 1]!), 1e-9, `small step ${i}`);
          }
        },
      ),
    );
  });

  it('seen from the other side, the strip comes out mirrored', () => {
    const A: Vec3[] = [[0, 0, 0], [10, 0, 0], [20, 0, 0]];
    const B: Vec3[] = [[0, 0, 5], [10, 0, 5], [20, 0, 5]];
    const front = unfoldStrip(A, B, [0, 1, 0]);
    const back = unfoldStrip(A, B, [0, -1, 0]);
    front.large.forEach((p, i) => expectNear(p[0], -back.large[i]![0], 1e-12, `mirror ${i}`));
  });

  it('rejects edges of different lengths and touching points', () => {
    expect(() => unfoldStrip([[0, 0, 0]], [[0, 0, 1]], [1, 0, 0])).toThrow(GirthError);
    expect(() => unfoldStrip([[0, 0, 0], [1, 0, 0]], [[0, 0, 1]], [1, 0, 0])).toThrow(/same number/);
    expect(() => unfoldStrip([[0, 0, 0], [0, 0, 0]], [[0, 0, 1], [1, 0, 1]], [0, 1, 0])).toThrow(/zero length/);
  });
});
