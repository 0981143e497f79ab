import { describe, expect, it } from 'vitest';
import { requireOrdinateReference, ORDINATE_REFERENCES, ORDINATE_REFERENCE_WORDS } from './ordinate-reference.js';
import { codeOf } from './test-support/code-of.js';

describe('requireOrdinateReference', () => {
  it('accepts the two references and names each plainly', () => {
    for (const r of ORDINATE_REFERENCES) expect(requireOrdinateReference(r)).toBe(r);
    expect(ORDINATE_REFERENCE_WORDS['short-point']).toBe('measured from the square line through the short point');
  });

  it('rejects an unknown name with a typed error naming the option as the user wrote it', () => {
    expect(codeOf(() => requireOrdinateReference('heel'))).toBe('BAD_OPTION:ordinatesFrom');
    expect(codeOf(() => requireOrdinateReference('Short-Point', '--ordinates-from'))).toBe('BAD_OPTION:--ordinates-from');
    expect(codeOf(() => requireOrdinateReference(undefined))).toBe('BAD_OPTION:ordinatesFrom');
  });
});
