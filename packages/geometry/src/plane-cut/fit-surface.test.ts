import { describe, expect, it } from 'vitest';
import { isGirthError } from '@girth/pipes';
import { resolvePipeSection } from '../pipe-section.js';
import { fitRadiusMm } from './fit-surface.js';

describe('fitRadiusMm', () => {
  it('takes the OD or the bore (ID = OD − 2 × wall, common practice)', () => {
    const p = resolvePipeSection({ odMm: 100, wallMm: 5 });
    expect(fitRadiusMm(p, 'od')).toBe(50);
    expect(fitRadiusMm(p, 'id')).toBe(45);
    let err: unknown;
    try {
      fitRadiusMm(p, 'mid' as never);
    } catch (e) {
      err = e;
    }
    expect(isGirthError(err) && `${err.code}:${err.field}`).toBe('BAD_CHOICE:fitSurface');
  });
});
