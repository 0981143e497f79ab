import { describe, expect, it } from 'vitest';
import { PDFDocument, StandardFonts } from 'pdf-lib';
import { printable } from './glyphs.js';

describe('text for the standard fonts (WinAnsi only)', () => {
  it('keeps what Helvetica has (°, Ø, ½, ×) and writes the rest as a fitter would type it', async () => {
    const doc = await PDFDocument.create();
    const font = await doc.embedFont(StandardFonts.Helvetica);
    expect(printable(font, '45° Ø 10 ½ × 2')).toBe('45° Ø 10 ½ × 2');
    expect(printable(font, '\u2300 6 5\u2032-3\u2033 \u2212 \u2248 \u2192')).toBe('Ø 6 5\'-3" - ~ ->');
    expect(printable(font, 'caf\u0065\u0301')).toBe('cafe?');
    // Every result encodes without throwing (pdf-lib throws on a glyph the font lacks).
    for (const s of ['\u2300\u2032\u2033\u2248\u2192\u2264\u2265', '\u4e2d\u6587', 'a\u0301']) expect(() => font.encodeText(printable(font, s))).not.toThrow();
  });
});
