import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { wrapToWidth } from './wrap-width.js';
import { textWidthMm } from './text-metrics.js';

describe('wrapToWidth', () => {
  it('breaks at spaces to the width and keeps a fitting line whole', () => {
    expect(wrapToWidth('Wrap on the OD of the pipe', 1000, 3)).toEqual(['Wrap on the OD of the pipe']);
    expect(wrapToWidth('   ', 10, 3)).toEqual([]);
    const lines = wrapToWidth('Wrap on the OD of the pipe', 30, 3);
    expect(lines.length).toBeGreaterThan(1);
    expect(lines.join(' ')).toBe('Wrap on the OD of the pipe');
  });
  // Invariant: every line within the width (unless a single character is wider), the words back in order.
  it('keeps every word, in order, within the width', () => {
    fc.assert(
      fc.property(fc.array(fc.stringMatching(/^[A-Za-z0-9]{1,14}$/), { maxLength: 30 }), fc.double({ min: 3, max: 300, noNaN: true }), fc.boolean(), (words, width, bold) => {
        const lines = wrapToWidth(words.join(' '), width, 3, bold);
        for (const l of lines) expect(textWidthMm(l, 3, bold) <= width || [...l].length === 1).toBe(true);
        expect(lines.join('').replace(/ /g, '')).toBe(words.join(''));
      }),
    );
  });
});
