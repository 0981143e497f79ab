import { describe, expect, it } from 'vitest';
import { expectClose } from './test-support/expect-close.js';
import { chordDeviationModel } from './chord-deviation.js';

describe('chordDeviationModel', () => {
  it('is exact for a parabola: sagitta of y = 4 h s (1 − s) is h, half chords h / 4', () => {
    // Invariant of the parabola: halving a chord quarters its sagitta (elementary geometry).
    const h = 2.5;
    const p = (s: number): [number, number] => [10 * s, 4 * h * s * (1 - s)];
    const d = chordDeviationModel(p(0), p(0.25), p(0.5), p(0.75), p(1));
    expectClose(d.whole, h, 1e-12, 'whole');
    expectClose(d.halves, h / 4, 1e-12, 'halves');
    expectClose(d.endTrend, h / 2, 1e-12, 'end trend');
  });

  it('sees an S-curve between the probes that the probes alone understate', () => {
    // y = s (1 − s)(s − 1/2): the probes give 3/64, the true peak is 1/(12√3) at s = 1/2 ± 1/(2√3).
    const p = (s: number): [number, number] => [s, s * (1 - s) * (s - 0.5)];
    const d = chordDeviationModel(p(0), p(0.25), p(0.5), p(0.75), p(1));
    expect(d.whole).toBeGreaterThanOrEqual(1 / (12 * Math.sqrt(3)) - 1e-6);
  });

  it('flags a sharp turn next to an end through the end check', () => {
    // A corner at s = 0.01: deviation c (1 − s) beyond it, which no quartic through the probes reaches.
    const c = 1;
    const p = (s: number): [number, number] => [s, s < 0.01 ? 0 : -c * (1 - s)];
    const d = chordDeviationModel([0, 0], p(0.25), p(0.5), p(0.75), [1, 0]);
    expectClose(d.endTrend, c, 1e-12, 'end trend');
    expect(d.whole).toBeGreaterThanOrEqual(c);
  });
});
