import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isGirthError } from '@girth/pipes';
import type { PathPart, Point2 } from '@girth/unroll';
import { expectClose } from '../test-support/close.js';
import { joinParts } from './join-parts.js';

const EPS = 1e-4;
const seg = (from: Point2, to: Point2): PathPart => ({ kind: 'segment', from, to });

describe('joinParts', () => {
  it('joins segments that meet into one closed polyline, walking parts backwards as needed', () => {
    // A unit square given as four segments, the third one reversed.
    const out = joinParts([seg([0, 0], [1, 0]), seg([1, 0], [1, 1]), seg([0, 1], [1, 1]), seg([0, 1], [0, 0])], 'cut', 'cut', EPS);
    expect(out).toHaveLength(1);
    const p = out[0]!;
    expect(p.kind).toBe('polyline');
    if (p.kind !== 'polyline') return;
    expect(p.closed).toBe(true);
    expect(p.vertices.map((v) => [v[0], v[1]])).toEqual([[0, 0], [1, 0], [1, 1], [0, 1]]);
  });

  it('reverses the first part when only its start meets the second', () => {
    const out = joinParts([seg([1, 0], [0, 0]), seg([1, 0], [2, 0])], 'mark', 'm', EPS);
    expect(out).toHaveLength(1);
    const p = out[0]!;
    if (p.kind !== 'polyline') throw new Error('expected a polyline');
    expect(p.closed).toBe(false);
    expect(p.vertices.map((v) => v[0])).toEqual([0, 1, 2]);
  });

  it('keeps a lone arc as a true arc, a full turn as a circle, a lone segment as a line', () => {
    const out = joinParts(
      [
        { kind: 'arc', center: [0, 0], radiusMm: 10, startDeg: 0, endDeg: 90 },
        { kind: 'arc', center: [100, 0], radiusMm: 5, startDeg: 0, endDeg: 360 },
        seg([200, 0], [210, 0]),
      ],
      'cut',
      'cut',
      EPS,
    );
    expect(out.map((e) => e.kind)).toEqual(['arc', 'circle', 'line']);
  });

  // Bulge sign: positive = counter-clockwise (AutoCAD DXF Reference, group 42; recalled).
  it('turns an arc walked backwards into a negative bulge', () => {
    const out = joinParts(
      [seg([0, 10], [0, 20]), { kind: 'arc', center: [0, 0], radiusMm: 20, startDeg: 0, endDeg: 90 }],
      'cut',
      'cut',
      EPS,
    );
    const p = out[0]!;
    if (p.kind !== 'polyline') throw new Error('expected a polyline');
    expect(p.vertices).toHaveLength(3);
    expectClose(p.vertices[1]![2], -Math.tan(Math.PI / 8), 1e-12, 'bulge of the reversed quarter arc');
  });

  it('names the offending field for bad numbers', () => {
    const bad: PathPart = { kind: 'polyline', points: [[0, 0], [1, Number.NaN]], closed: false };
    expect(() => joinParts([bad], 'cut', 'template.cut', EPS)).toThrowError(/template\.cut\[0\]\.points\[1\]\[1\]/);
    try {
      joinParts([seg([0, 0], [Infinity, 0])], 'cut', 'template.cut', EPS);
      expect.unreachable();
    } catch (e) {
      expect(isGirthError(e, 'NOT_FINITE')).toBe(true);
    }
    expect(() => joinParts([{ kind: 'arc', center: [0, 0], radiusMm: 0, startDeg: 0, endDeg: 90 }], 'cut', 'c', EPS)).toThrowError(/radiusMm/);
    expect(() => joinParts([{ kind: 'polyline', points: [[1, 1], [1, 1]], closed: true }], 'cut', 'c', EPS)).toThrowError(/2 distinct points/);
  });

  // Invariant: a closed polygon cut into segments, given in any rotation and with
  // any of them reversed, comes back as ONE closed polyline through the same corners.
  it('closes any polygon given as shuffled-direction segments', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.integer({ min: -1000, max: 1000 }), fc.integer({ min: -1000, max: 1000 })), { minLength: 3, maxLength: 30 }),
        fc.array(fc.boolean(), { minLength: 30, maxLength: 30 }),
        (raw, flips) => {
          // Distinct consecutive corners (integer grid, so exactly distinct or equal).
          const pts = raw.filter((p, i) => i === 0 || p[0] !== raw[i - 1]![0] || p[1] !== raw[i - 1]![1]);
          if (pts.length < 3 || (pts[0]![0] === pts[pts.length - 1]![0] && pts[0]![1] === pts[pts.length - 1]![1])) return;
          const parts = pts.map((p, i) => {
            const q = pts[(i + 1) % pts.length]!;
            return flips[i] ? seg(q, p) : seg(p, q);
          });
          const out = joinParts(parts, 'cut', 'cut', EPS);
          expect(out).toHaveLength(1);
          const e = out[0]!;
          if (e.kind !== 'polyline') throw new Error('expected a polyline');
          expect(e.closed).toBe(true);
          const corners = new Set(pts.map((p) => `${p[0]},${p[1]}`));
          expect(new Set(e.vertices.map((v) => `${v[0]},${v[1]}`))).toEqual(corners);
        },
      ),
    );
  });
});
