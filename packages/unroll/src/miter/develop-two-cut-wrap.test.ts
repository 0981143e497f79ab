import { describe, expect, it } from 'vitest';
import { isGirthError } from '@girth/pipes';
import { miterGeometry, type MiterCutEnd } from '@girth/geometry';
import { developTwoCutWrap } from './develop-two-cut-wrap.js';
import { expectClose } from '../internal/test-support/expect-close.js';
import { column, cutPolylines } from '../plane-cut/test-support/template-checks.js';

const IN = 25.4;
const NPS10_STD = { odMm: 10.75 * IN, wallMm: 0.365 * IN }; // ASME B36.10M, recalled (REFERENCES.md)

function middleEnds(): { near: MiterCutEnd; far: MiterCutEnd } {
  const g = miterGeometry({ pipe: NPS10_STD, bendDeg: 90, welds: 4, radiusMm: 600 });
  const p = g.pieces[2];
  if (!p?.nearCut || !p.farCut) throw new Error('no middle piece');
  return { near: p.nearCut, far: p.farCut };
}

describe('developTwoCutWrap', () => {
  it('draws both cuts of a middle piece between two square lines, length = span − both cutbacks (invariant)', () => {
    const { near, far } = middleEnds();
    const t = developTwoCutWrap({ near, far, wrapOdMm: NPS10_STD.odMm, stations: 16, id: 'miter-middle', title: 't', notes: [], labels: [] });
    const span = t.marks[0]?.kind === 'segment' ? t.marks[0].from[1] : NaN;
    // REFERENCES.md: the middle piece's back is 2 (R + D/2) tan(c), c = 90 / 8 = 11.25°.
    expectClose(span, 2 * (600 + NPS10_STD.odMm / 2) * Math.tan((11.25 * Math.PI) / 180), 1e-9 * NPS10_STD.odMm, 'span = back');
    const cb = column(t, 'cutback');
    const cbFar = column(t, 'cutbackFar');
    const len = column(t, 'length');
    expectClose(len, cb.map((a, i) => span - a - (cbFar[i] as number)), 1e-9 * NPS10_STD.odMm, 'length');
    const [nearLine, farLine] = cutPolylines(t);
    expect(nearLine?.length).toBeGreaterThan(16);
    // The far cut is the near cut mirrored across the centre line (the piece is symmetric about its middle):
    // equal cutbacks from each end's square line at every station.
    expectClose(cbFar, cb, 1e-9 * NPS10_STD.odMm, 'far cutbacks = near cutbacks');
    const mirrored = (nearLine ?? []).map((p) => span - p[1]);
    expectClose((farLine ?? []).slice(0, 3).map((p) => p[1]), mirrored.slice(0, 3), 1e-9 * NPS10_STD.odMm, 'mirror at the first points');
    const centre = t.marks[1]?.kind === 'segment' ? t.marks[1].from[1] : NaN;
    expectClose(centre, span / 2, 1e-9 * NPS10_STD.odMm, 'centre line halfway');
  });

  it('refuses two ends that are not one pipe seen from opposite ends', () => {
    const { near } = middleEnds();
    try {
      developTwoCutWrap({ near, far: near, wrapOdMm: 273, stations: 16, id: 'x', title: 't', notes: [], labels: [] });
      expect.fail('no error');
    } catch (e) {
      expect(isGirthError(e, 'BAD_OPTION') && e.field).toBe('far');
    }
  });
});
