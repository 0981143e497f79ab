import { describe, expect, it } from 'vitest';
import { CAUTION } from './caution.js';

describe('CAUTION', () => {
  it('says what the project rules require: verify, qualified procedures, the code, geometry only', () => {
    // ASME B31.1 and B31.3 are the power and process piping codes that govern this work (common practice).
    expect(CAUTION.startsWith('CAUTION: ')).toBe(true);
    for (const words of ['verify against the actual pipe before cutting', 'qualified procedures', 'ASME B31.1/B31.3', 'local rules', 'licensed practice', 'does not size reinforcement']) {
      expect(CAUTION, words).toContain(words);
    }
  });

  it('is one line of printable ASCII, so DXF text and terminals carry it unchanged', () => {
    expect(CAUTION).toMatch(/^[\x20-\x7E]+$/);
  });
});
