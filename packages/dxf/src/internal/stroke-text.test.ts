import { describe, expect, it } from 'vitest';
import { dxfSafeText } from '../dxf-text.js';
import { hasStrokeGlyph, strokeGlyph } from './stroke-font.js';
import { strokeChars, strokeText } from './stroke-text.js';

describe('stroke font', () => {
  it('draws every character of the template text a sheet uses', () => {
    const sample = 'Branch cut: NPS 6 STD on NPS 12 STD, 45°, set-on. Stretch-out 529.1 mm (20.832 in) #1/2 "A" (x) ± Ø = + ? ! [ ] < > _ * % ; \' 0123456789';
    for (const ch of strokeChars(dxfSafeText(sample))) if (ch !== ' ') expect(hasStrokeGlyph(ch), ch).toBe(true);
  });
  it('keeps every stroke inside the 4 x 6 grid', () => {
    for (const ch of 'ABCDEFGHIJKLMNOPQRSTUVWXYZ0123456789.,:;-+/()\'"%°#=*?!<>_[]^Ø±') {
      for (const stroke of strokeGlyph(ch)!) {
        expect(stroke.length, ch).toBeGreaterThanOrEqual(2);
        for (const [x, y] of stroke) {
          expect(x, ch).toBeLessThanOrEqual(4);
          expect(y, ch).toBeLessThanOrEqual(6);
        }
      }
    }
  });
  it('reads the degree code back as the sign and lays a line out at the cap height', () => {
    expect(strokeChars('45%%d')).toEqual(['4', '5', '°']);
    const lines = strokeText('T', [10, 20], 6, 'left', 'mark');
    expect(lines).toEqual([
      { kind: 'polyline', layer: 'mark', closed: false, vertices: [[10, 26, 0], [14, 26, 0]] },
      { kind: 'polyline', layer: 'mark', closed: false, vertices: [[12, 20, 0], [12, 26, 0]] },
    ]);
  });
});
