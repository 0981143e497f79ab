import { describe, expect, test } from 'vitest';
import { girthErrorOf } from '@girth/pipes/test-support';
import type { PathPart, Point2, Template } from '@girth/unroll';
import { arcSweepDeg, checkTemplate } from '@girth/sheet';
import { templateToSvg } from './template-to-svg.js';
import { coneSector, planeCutWrap, teeHole } from './test-support/fixtures.js';

const wrap = planeCutWrap(114.3, 30);

function withPoint(t: Template, index: number, p: Point2): Template {
  const cut = t.cut[0] as Extract<PathPart, { kind: 'polyline' }>;
  const points = cut.points.map((q, i) => (i === index ? p : q));
  return { ...t, cut: [{ ...cut, points }] };
}

describe('checkTemplate', () => {
  test('the test fixtures pass', () => {
    for (const t of [wrap, teeHole(161.925, 57.15), coneSector(203.2, 127, 101.6)]) expect(() => checkTemplate(t)).not.toThrow();
  });

  test('a NaN coordinate is refused with its field path, and no SVG is made', () => {
    const e = girthErrorOf(() => templateToSvg(withPoint(wrap, 14, [10, NaN])));
    expect(e.code).toBe('NOT_A_NUMBER');
    expect(e.field).toBe('template.cut[0].points[14][1]');
  });

  test('an infinite coordinate is refused', () => {
    const e = girthErrorOf(() => checkTemplate(withPoint(wrap, 3, [Infinity, 0])));
    expect(e.code).toBe('NOT_FINITE');
    expect(e.field).toBe('template.cut[0].points[3][0]');
  });

  test('a coordinate beyond 1 km is refused', () => {
    const e = girthErrorOf(() => checkTemplate(withPoint(wrap, 0, [0, 2e6])));
    expect(e.code).toBe('OUT_OF_RANGE');
  });

  test('bad station lines, labels and marks are refused with their field', () => {
    const s = wrap.stationLines[2]!;
    expect(girthErrorOf(() => checkTemplate({ ...wrap, stationLines: [{ ...s, to: [NaN, 0] }] })).field).toBe(
      'template.stationLines[0].to[0]',
    );
    expect(girthErrorOf(() => checkTemplate({ ...wrap, labels: [{ text: 'A', at: [0, 0], heightMm: 0 }] })).code).toBe('NEGATIVE');
    expect(
      girthErrorOf(() => checkTemplate({ ...wrap, marks: [{ kind: 'segment', from: [0, 0], to: [0, -Infinity] }] })).field,
    ).toBe('template.marks[0].to[1]');
  });

  test('arcs need a positive radius and a sweep', () => {
    const arc = { kind: 'arc' as const, center: [0, 0] as const, radiusMm: 10, startDeg: 30, endDeg: 30 };
    expect(girthErrorOf(() => checkTemplate({ ...wrap, cut: [arc] })).code).toBe('OUT_OF_RANGE');
    expect(girthErrorOf(() => checkTemplate({ ...wrap, cut: [{ ...arc, endDeg: 40, radiusMm: -1 }] })).code).toBe('NEGATIVE');
  });

  test('a template with nothing to cut, or a wrap without its stretch-out, is refused', () => {
    expect(girthErrorOf(() => checkTemplate({ ...wrap, cut: [] })).code).toBe('EMPTY_INPUT');
    const { stretchOutMm: _s, ...noStretch } = wrap;
    const e = girthErrorOf(() => checkTemplate(noStretch as Template));
    expect(e.code).toBe('EMPTY_INPUT');
    expect(e.field).toBe('template.stretchOutMm');
  });

  test('a polyline needs two points', () => {
    const e = girthErrorOf(() => checkTemplate({ ...wrap, cut: [{ kind: 'polyline', points: [[0, 0]], closed: false }] }));
    expect(e.field).toBe('template.cut[0].points');
  });
});

describe('arcSweepDeg', () => {
  test('counter-clockwise sweep in (0, 360]', () => {
    expect(arcSweepDeg(0, 90)).toBe(90);
    expect(arcSweepDeg(350, 10)).toBe(20);
    expect(arcSweepDeg(0, 360)).toBe(360);
    expect(arcSweepDeg(-30, 30)).toBe(60);
    expect(arcSweepDeg(90, 90)).toBe(0);
  });
});
