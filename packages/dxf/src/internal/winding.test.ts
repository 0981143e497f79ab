import { describe, expect, it } from 'vitest';
import { orientContours, reverseClosed, signedArea } from './winding.js';
import type { SheetEntity, SheetVertex } from './sheet.js';

const square = (x0: number, y0: number, s: number): SheetVertex[] => [
  [x0, y0, 0],
  [x0 + s, y0, 0],
  [x0 + s, y0 + s, 0],
  [x0, y0 + s, 0],
];

describe('signedArea', () => {
  it('counts a circle of two half-circle bulges as pi r² (geometry: bulge 1 is a half turn)', () => {
    expect(signedArea([[1, 0, 1], [-1, 0, 1]])).toBeCloseTo(Math.PI, 12);
    expect(signedArea([[1, 0, -1], [-1, 0, -1]])).toBeCloseTo(-Math.PI, 12);
  });
  it('adds the circular segment of a bulged side to the polygon (square with a half-disc on top)', () => {
    const v: SheetVertex[] = [[0, 0, 0], [2, 0, 0], [2, 2, 1], [0, 2, 0]];
    expect(signedArea(v)).toBeCloseTo(4 + Math.PI / 2, 12);
    expect(signedArea(reverseClosed(v))).toBeCloseTo(-(4 + Math.PI / 2), 12);
  });
});

describe('orientContours', () => {
  const outer: SheetEntity = { kind: 'polyline', layer: 'cut', closed: true, vertices: reverseClosed(square(0, 0, 10)) };
  const hole: SheetEntity = { kind: 'polyline', layer: 'cut', closed: true, vertices: square(3, 3, 2) };
  it('winds the outer contour counter-clockwise and the hole inside it clockwise', () => {
    const [o, h] = orientContours([outer, hole], 0) as Extract<SheetEntity, { kind: 'polyline' }>[];
    expect(signedArea(o!.vertices)).toBeCloseTo(100, 12);
    expect(signedArea(h!.vertices)).toBeCloseTo(-4, 12);
  });
  it('winds a lone hole template clockwise (its inside is scrap)', () => {
    const [h] = orientContours([hole], 1) as Extract<SheetEntity, { kind: 'polyline' }>[];
    expect(signedArea(h!.vertices)).toBeLessThan(0);
  });
});
