import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { GirthError } from '../errors.js';
import { girthErrorOf } from '../test-support/girth-error-of.js';
import { expectClose } from '../internal/test-support/expect-close.js';
import { parseLength } from './parse.js';
import { MM_PER_FOOT, MM_PER_INCH, inchesToMm, lengthToMm, mmToInches, mmToLength } from './units.js';

/** Floating-point slack for exact conversions, mm. */
const EPS_MM = 1e-9;

describe('unit constants', () => {
  it('uses the exact international inch and foot', () => {
    // 1 in = 25.4 mm exactly (international yard and pound agreement of 1959;
    // NIST SP 811, Appendix B), recalled; 1 ft = 12 in = 304.8 mm.
    expect(MM_PER_INCH).toBe(25.4);
    expect(MM_PER_FOOT).toBe(304.8);
    expectClose(lengthToMm(16, 'in'), 406.4, EPS_MM, '16 in');
    expectClose(mmToLength(406.4, 'in'), 16, 1e-12, '406.4 mm');
    expect(lengthToMm(406.4, 'mm')).toBe(406.4);
  });

  it('lands on the decimal result for common inch values', () => {
    // 0.375 in = 9.525 mm and 16 in = 406.4 mm exactly (1 in = 25.4 mm).
    expect(inchesToMm(0.375)).toBe(9.525);
    expect(inchesToMm(16)).toBe(406.4);
    expect(mmToInches(406.4)).toBe(16);
    expect(mmToInches(9.525)).toBe(0.375);
    // Every sixteenth up to 100 in converts to the double nearest k x 25.4 / 16.
    for (let k = 0; k <= 1600; k++) expect(inchesToMm(k / 16)).toBe((k * 254) / 160);
  });
});

describe('parseLength: accepted forms', () => {
  // Expected values are plain arithmetic on the exact inch (25.4 mm) and foot (304.8 mm).
  const inch25_11_16 = 25.6875 * MM_PER_INCH; // 652.4625 mm
  const cases: ReadonlyArray<readonly [string, number, 'mm' | 'in' | undefined]> = [
    [`2'-1 11/16"`, inch25_11_16, undefined],
    [`2' 1-11/16"`, inch25_11_16, undefined],
    [`2'1 11/16"`, inch25_11_16, undefined],
    [`2'-1-11/16"`, inch25_11_16, undefined],
    [`2 ft 1 11/16 in`, inch25_11_16, undefined],
    [`25 11/16`, inch25_11_16, 'in'],
    [`25 11/16`, 25.6875, 'mm'],
    [`25-11/16"`, inch25_11_16, undefined],
    [`25.6875in`, inch25_11_16, undefined],
    [`25.6875"`, inch25_11_16, undefined],
    [`25.6875 inches`, inch25_11_16, undefined],
    [`25.6875 IN`, inch25_11_16, undefined],
    [`  25 11/16 " `, inch25_11_16, undefined],
    [`3/4"`, 19.05, undefined],
    [`652mm`, 652, 'in'],
    [`652 MM`, 652, undefined],
    [`65.2cm`, 652, 'in'],
    [`0.652m`, 652, undefined],
    [`0.652 metres`, 652, undefined],
    [`2ft`, 609.6, undefined],
    [`2 feet`, 609.6, undefined],
    [`5'`, 1524, undefined],
    [`5'-0"`, 1524, undefined],
    [`1'6"`, 457.2, undefined],
    [`1ft 6in`, 457.2, undefined],
    [`.375`, 0.375, undefined],
    [`.375`, 9.525, 'in'],
    [`12`, 12, undefined],
    [`12.`, 12, undefined],
    [`+12mm`, 12, undefined],
    [`0`, 0, 'in'],
    [`6 in.`, 152.4, undefined],
    [`6''`, 152.4, undefined],
    // Typographic marks as pasted from documents.
    [`2′–1 11⁄16″`, inch25_11_16, undefined],
    [`2’-1 11/16”`, inch25_11_16, undefined],
    [`6½"`, 6.5 * MM_PER_INCH, undefined],
    [`½"`, 12.7, undefined],
  ];
  for (const [text, mm, unit] of cases) {
    it(`reads ${JSON.stringify(text)}${unit ? ` in a ${unit} job` : ''}`, () => {
      expectClose(parseLength(text, unit ? { unit } : {}), mm, EPS_MM, text);
    });
  }

  it('reads numbers in the job unit', () => {
    expectClose(parseLength(16, { unit: 'in' }), 406.4, EPS_MM, '16 in');
    expect(parseLength(406.4)).toBe(406.4);
    expect(parseLength(0)).toBe(0);
  });

  it('reads negative lengths only when allowed, and never returns -0', () => {
    expectClose(parseLength('-2in', { allowNegative: true }), -50.8, EPS_MM, '-2in');
    expectClose(parseLength(`-2'-1 11/16"`, { allowNegative: true }), -inch25_11_16, EPS_MM, 'negative ft-in');
    expectClose(parseLength(-3, { allowNegative: true, unit: 'in' }), -76.2, EPS_MM, '-3 in');
    expect(Object.is(parseLength('-0'), 0)).toBe(true);
    expect(Object.is(parseLength(-0), 0)).toBe(true);
  });

  it('agrees on every way of writing the same feet-inch-sixteenths', () => {
    fc.assert(
      fc.property(fc.nat(40), fc.nat(11), fc.nat(15), (feet, inches, sixteenths) => {
        const expected = ((feet * 12 + inches) * 16 + sixteenths) / 16 * MM_PER_INCH;
        const frac = sixteenths === 0 ? '' : ` ${sixteenths}/16`;
        const forms = [
          `${feet}'-${inches}${frac}"`,
          `${feet}' ${inches}${frac.replace(' ', '-')}"`,
          `${feet}ft ${inches}${frac} in`,
          `${feet * 12 + inches}${frac}"`,
          `${(feet * 12 + inches + sixteenths / 16).toString()}in`,
        ];
        for (const form of forms) expectClose(parseLength(form), expected, 1e-9 * Math.max(1, expected), form);
        expectClose(parseLength(`${feet * 12 + inches}${frac}`, { unit: 'in' }), expected, 1e-9 * Math.max(1, expected), 'bare');
      }),
    );
  });
});

describe('parseLength: bad input gets a typed error', () => {
  const cases: ReadonlyArray<readonly [unknown, string]> = [
    ['', 'EMPTY_INPUT'],
    ['   ', 'EMPTY_INPUT'],
    ['abc', 'BAD_LENGTH'],
    ['in 12', 'BAD_LENGTH'],
    ['--5', 'BAD_LENGTH'],
    ['12 x 5', 'BAD_LENGTH'],
    [`1" 11/16`, 'BAD_LENGTH'],
    [`2'-1mm`, 'BAD_LENGTH'],
    [`1' six`, 'BAD_LENGTH'],
    ['12 in 5', 'BAD_LENGTH'],
    ['18.5 1/4', 'BAD_LENGTH'],
    ['12 inn', 'UNKNOWN_UNIT'],
    ['5 mmm', 'UNKNOWN_UNIT'],
    ['5 yd', 'UNKNOWN_UNIT'],
    ['1/0', 'DIVIDE_BY_ZERO'],
    [`2'-1 11/0"`, 'DIVIDE_BY_ZERO'],
    ['-5mm', 'NEGATIVE'],
    [-5, 'NEGATIVE'],
    [Number.NaN, 'NOT_A_NUMBER'],
    [Number.POSITIVE_INFINITY, 'NOT_FINITE'],
    ['9'.repeat(400), 'NOT_FINITE'],
    [null, 'BAD_LENGTH'],
  ];
  for (const [input, code] of cases) {
    it(`refuses ${JSON.stringify(input) ?? String(input)} with ${code}`, () => {
      const e = girthErrorOf(() => parseLength(input as string));
      expect(e.code).toBe(code);
      expect(e.field).toBe('length');
      expect(e.message.startsWith('length:')).toBe(true);
    });
  }

  it('names the caller’s field and the accepted units', () => {
    const e = girthErrorOf(() => parseLength('12 inn', { field: 'offset' }));
    expect(e.field).toBe('offset');
    expect(e.message).toMatch(/did you mean in\?/);
    expect(e.message).toMatch(/mm, cm, m, in/);
    expect(e.value).toBe('12 inn');
    expect(girthErrorOf(() => parseLength('5 mmm')).message).toMatch(/did you mean mm\?/);
  });

  it('quotes accepted forms when it cannot read the text', () => {
    expect(girthErrorOf(() => parseLength('abc')).message).toMatch(/2'-1 11\/16"/);
  });

  it('never returns NaN or an infinite value for any text', () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 24 }), (text) => {
        try {
          const mm = parseLength(text, { allowNegative: true });
          expect(Number.isFinite(mm)).toBe(true);
        } catch (e) {
          expect(e).toBeInstanceOf(GirthError);
        }
      }),
      { numRuns: 2000 },
    );
  });
});
