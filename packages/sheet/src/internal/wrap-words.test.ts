import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { wrapWords } from './wrap-words.js';

describe('wrapWords', () => {
  it('breaks at spaces and splits over-long words', () => {
    expect(wrapWords('a bb ccc', 4)).toEqual(['a bb', 'ccc']);
    expect(wrapWords('abcdefghij', 4)).toEqual(['abcd', 'efgh', 'ij']);
    expect(wrapWords('   ', 4)).toEqual([]);
    expect(wrapWords('Job: 7   Piece: 9', 40)).toEqual(['Job: 7   Piece: 9']);
  });

  // Invariant: no line too long, and the words come back in order.
  it('keeps every word, in order, within the width', () => {
    fc.assert(
      fc.property(fc.array(fc.stringMatching(/^[a-z]{1,12}$/), { maxLength: 40 }), fc.integer({ min: 1, max: 30 }), (words, width) => {
        const lines = wrapWords(words.join(' '), width);
        expect(lines.every((l) => l.length <= width)).toBe(true);
        expect(lines.join('').replace(/ /g, '')).toBe(words.join(''));
      }),
    );
  });
});
