import { describe, expect, it } from 'vitest';
import { clipMarksOnCut } from './clip-marks.js';
import type { SheetEntity } from './sheet.js';

const box: SheetEntity = { kind: 'polyline', layer: 'cut', closed: true, vertices: [[0, 0, 0], [10, 0, 0], [10, 5, 0], [0, 5, 0]] };

describe('clipMarksOnCut', () => {
  it('drops a mark lying wholly on a cut edge and keeps one crossing the part', () => {
    const onEdge: SheetEntity = { kind: 'line', layer: 'mark', from: [0, 0], to: [0, 5] };
    const across: SheetEntity = { kind: 'line', layer: 'mark', from: [4, 0], to: [4, 5] };
    const out = clipMarksOnCut([box, onEdge, across], 1e-6);
    expect(out).toEqual([box, across]);
  });
  it('keeps the part of a mark that runs past the cut edge', () => {
    const longer: SheetEntity = { kind: 'line', layer: 'mark', from: [-3, 0], to: [12, 0] };
    const out = clipMarksOnCut([box, longer], 1e-6).filter((e) => e.layer === 'mark');
    expect(out).toEqual([
      { kind: 'line', layer: 'mark', from: [-3, 0], to: [0, 0] },
      { kind: 'line', layer: 'mark', from: [10, 0], to: [12, 0] },
    ]);
  });
});
