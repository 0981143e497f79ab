import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { dxfSafeText } from './dxf-text.js';
import { MAX_TEXT_CHARS } from './tolerances.js';

describe('dxfSafeText', () => {
  // %%c, %%d, %%p are the DXF special-character codes for diameter, degree and
  // plus-minus (AutoCAD DXF Reference, TEXT "control codes"; recalled).
  it('writes the diameter, degree and plus-minus signs as DXF control codes', () => {
    expect(dxfSafeText('Ø168.3')).toBe('%%c168.3');
    expect(dxfSafeText('⌀ 6.625"')).toBe('%%c 6.625"');
    expect(dxfSafeText('45° ± 2.5°')).toBe('45%%d %%p 2.5%%d');
  });

  it('transliterates accents and common signs, and marks the rest with ?', () => {
    expect(dxfSafeText('Tê à 90°, Straße')).toBe('Te a 90%%d, Strasse');
    expect(dxfSafeText('1½" × 2 – 3')).toBe('11/2" x 2 - 3');
    expect(dxfSafeText('管道')).toBe('??');
  });

  it('keeps a label with line breaks and group codes on one line', () => {
    expect(dxfSafeText('A\n0\nLINE\n8\n0')).toBe('A 0 LINE 8 0');
    expect(dxfSafeText('A\r\n0\r\nCIRCLE\u0000\u001b\u2028x')).toBe('A 0 CIRCLE x');
  });

  it('escapes a percent before another % and carets so they are not read as codes', () => {
    expect(dxfSafeText('50%')).toBe('50%');
    expect(dxfSafeText('5%Ø')).toBe('5%%%%%c');
    expect(dxfSafeText('%%u')).toBe('%%%%u');
    expect(dxfSafeText('a^Jb')).toBe('a^ Jb');
  });

  it('cuts long text to the R12 limit', () => {
    expect(dxfSafeText('x'.repeat(1000)).length).toBe(MAX_TEXT_CHARS);
  });

  // Invariant: whatever the input, the output is printable ASCII on one line and
  // within the length limit (fast-check, full Unicode strings).
  it('always gives one line of printable ASCII', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 400 }), (s) => {
        const out = dxfSafeText(s);
        return /^[\x20-\x7E]*$/.test(out) && out.length <= MAX_TEXT_CHARS && out === out.trim();
      }),
      { numRuns: 500 },
    );
  });

  // The fast paths (plain ASCII; ASCII with the signs written as codes) give what
  // the general path gives: a trailing line break sends any text down the general
  // path and, flattened to a space and trimmed, changes nothing else.
  it('its fast paths agree with the general path', () => {
    const alphabet = fc.constantFrom('a', 'Z', '7', ' ', '"', "'", '/', '-', '.', '\u00B0', '\u00B1', '\u00D8', '\u00F8', '\u2205', '\u2300', '%', '^', '\u00E9', '\u00BD');
    fc.assert(
      fc.property(fc.string({ unit: alphabet, maxLength: 300 }), (s) => dxfSafeText(s) === dxfSafeText(`${s}\n`)),
      { numRuns: 1000 },
    );
    expect(dxfSafeText(' Lateral 45\u00B0, \u00D8 8.625" \u00B1 1/16" ')).toBe('Lateral 45%%d, %%c 8.625" %%p 1/16"');
  });
});
