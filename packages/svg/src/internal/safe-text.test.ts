import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { attrText, textLines } from './safe-text.js';
import { escapeXml } from './xml.js';

describe('textLines', () => {
  test('splits at CR LF, CR and LF, drops controls, keeps printable text', () => {
    expect(textLines('a\r\nb\rc\nd')).toEqual(['a', 'b', 'c', 'd']);
    expect(textLines('x\u0000\u0008\u001f\u007f\u0085y')).toEqual(['xy']);
    expect(textLines('tab\there')).toEqual(['tab here']);
    expect(textLines('Ø 168.3 — 45°')).toEqual(['Ø 168.3 — 45°']);
  });

  test('drops lone surrogates and bidi overrides, keeps paired surrogates', () => {
    expect(textLines('a\uD800b\uDC00c')).toEqual(['abc']);
    expect(textLines('\u202Eevil\u202C')).toEqual(['evil']);
    expect(textLines('pipe 🔧')).toEqual(['pipe 🔧']);
  });

  test('every character left is one XML 1.0 allows (XML 1.0, production [2] Char)', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary' }), (s) => {
        for (const line of textLines(s)) {
          for (const ch of line) {
            const cp = ch.codePointAt(0) as number;
            const ok = cp === 0x9 || (cp >= 0x20 && cp <= 0xd7ff) || (cp >= 0xe000 && cp <= 0xfffd) || cp >= 0x10000;
            expect(ok, `U+${cp.toString(16)}`).toBe(true);
          }
        }
      }),
    );
  });
});

describe('attrText', () => {
  test('one line, breaks as spaces', () => {
    expect(attrText('a\nb\r\nc')).toBe('a b c');
  });
});

describe('escapeXml', () => {
  test('leaves no markup character and decodes back to the text (XML 1.0 predefined entities, section 4.6)', () => {
    const decode = (s: string) =>
      s.replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&apos;/g, "'").replace(/&amp;/g, '&');
    fc.assert(
      fc.property(fc.array(fc.constantFrom(']', '>', ']]>', 'a', '<', '&', '"', "'", '&amp;')), (parts) => {
        const line = parts.join('');
        const out = escapeXml(line);
        expect(out).not.toMatch(/[<>"']/);
        expect(out.replace(/&(amp|lt|gt|quot|apos);/g, '')).not.toContain('&');
        expect(decode(out)).toBe(line);
      }),
    );
  });
});
