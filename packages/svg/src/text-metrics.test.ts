import { describe, expect, test } from 'vitest';
import { textWidthMm } from '@girth/sheet';
import { CAUTION } from '@girth/unroll';
import { resvgOf } from './test-support/render.js';

/** Width of a line as resvg sets it in DejaVu Sans (the widest font the sheet names), mm. */
function realWidthMm(text: string, fontMm: number, bold: boolean): number {
  const esc = text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
  const svg =
    `<svg xmlns="http://www.w3.org/2000/svg" width="3000mm" height="30mm" viewBox="0 0 3000 30">` +
    `<text x="10" y="20" font-size="${fontMm}" font-family="DejaVu Sans"${bold ? ' font-weight="bold"' : ''}>${esc}</text></svg>`;
  return resvgOf(svg).getBBox()?.width ?? NaN;
}

describe('textWidthMm over-estimates DejaVu Sans, so nothing is clipped', () => {
  const samples = [
    'HEEL', 'TOE', 'TOP LINE', 'WWWWWWWWWW', 'MMMMMMMMMM', 'mmmmmmmmmm', '0123456789', '<<<<>>>>', '&&&&', '%%%%@@@@',
    '________________', 'ÆØÅ æøå ßü', 'Job: J-4417 Brinewell cooling loop · Piece: Spool 12-B', CAUTION,
  ];
  for (const bold of [false, true]) {
    for (const s of samples) {
      test(`${bold ? 'bold' : 'regular'} ${JSON.stringify(s.slice(0, 24))}`, () => {
        const real = realWidthMm(s, 10, bold);
        expect(real).toBeGreaterThan(0);
        expect(textWidthMm(s, 10, bold)).toBeGreaterThanOrEqual(real);
      });
    }
  }
});
