import { describe, expect, it } from 'vitest';
import { girthErrorOf } from '@girth/pipes/test-support';
import { hitGenerator } from '../generators.js';
import { lineRoots, surfaceNormal } from '../surfaces/line-intersection.js';
import { headSurface, resolveHeadSpec } from './head-spec.js';
import { solveNozzle } from './solve-nozzle.js';
import type { HeadSpec, NozzleSpec } from './types.js';

const IN = 25.4;
// An invented vessel: 48 in OD, 1/2 in wall heads. Nozzle NPS 6 STD: 6.625 x 0.280 in (ASME B36.10M, recalled).
const HEAD_2_1: HeadSpec = { type: 'ellipsoidal', odMm: 48 * IN, wallMm: 0.5 * IN };
const NPS6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };

/** Height of the head's surface (offset from the inside) on the axis, above the tangent line. */
const crownHeight = (spec: HeadSpec, offset: number): number => -lineRoots(headSurface(resolveHeadSpec(spec), offset), { origin: [0, 0, 0], direction: [0, 0, -1] })[0]!.tMm;

describe('head shapes from type, size and wall', () => {
  it('2:1 ellipsoidal: inside depth D/4 with D the inside diameter (ASME Section VIII Div. 1 UG-32(d), recalled)', () => {
    const id = 48 * IN - IN;
    expect(resolveHeadSpec(HEAD_2_1).insideDepthMm).toBeCloseTo(id / 4, 12);
    expect(crownHeight(HEAD_2_1, 0)).toBeCloseTo(id / 4, 9);
    expect(crownHeight(HEAD_2_1, 0.5 * IN)).toBeCloseTo(id / 4 + 0.5 * IN, 9);
    expect(resolveHeadSpec({ ...HEAD_2_1, ratio: 3 }).insideDepthMm).toBeCloseTo(id / 6, 12);
  });

  it('hemispherical: radius D/2 (inside ID/2, outside OD/2)', () => {
    const spec: HeadSpec = { type: 'hemispherical', odMm: 48 * IN, wallMm: 0.5 * IN };
    expect(crownHeight(spec, 0)).toBeCloseTo((47 * IN) / 2, 9);
    expect(crownHeight(spec, 0.5 * IN)).toBeCloseTo((48 * IN) / 2, 9);
  });

  it('ASME F&D: inside crown radius = OD, knuckle = 6 % of OD (UG-32(e), recalled); 80-10: 80 % and 10 % (common practice, recalled)', () => {
    const fd = resolveHeadSpec({ type: 'flanged-and-dished', odMm: 48 * IN, wallMm: 0.5 * IN });
    expect(fd.crownRadiusMm).toBeCloseTo(48 * IN, 12);
    expect(fd.knuckleRadiusMm).toBeCloseTo(0.06 * 48 * IN, 12);
    const a = (47 * IN) / 2;
    const L = 48 * IN;
    const r = 0.06 * 48 * IN;
    // Depth of a torispherical head: L − sqrt((L − r)² − (a − r)²) (the standard construction of crown and knuckle).
    expect(fd.insideDepthMm).toBeCloseTo(L - Math.sqrt((L - r) ** 2 - (a - r) ** 2), 9);
    expect(crownHeight({ type: 'flanged-and-dished', odMm: 48 * IN, wallMm: 0.5 * IN }, 0)).toBeCloseTo(fd.insideDepthMm, 9);
    const t = resolveHeadSpec({ type: '80-10', odMm: 48 * IN, wallMm: 0.5 * IN });
    expect([t.crownRadiusMm, t.knuckleRadiusMm]).toEqual([expect.closeTo(0.8 * 48 * IN, 12), expect.closeTo(0.1 * 48 * IN, 12)]);
  });

  it('refuses heads that are not heads, naming the field', () => {
    const code = (spec: HeadSpec): [string, string] => {
      const e = girthErrorOf(() => resolveHeadSpec(spec));
      return [e.code, e.field];
    };
    expect(code({ ...HEAD_2_1, type: 'flat' as never })).toEqual(['BAD_CHOICE', 'head.type']);
    expect(code({ ...HEAD_2_1, ratio: 5 })).toEqual(['OUT_OF_RANGE', 'head.ratio']);
    expect(code({ type: 'torispherical', odMm: 1000, wallMm: 10 })).toEqual(['MISSING_INPUT', 'head.crownRadiusMm']);
    expect(code({ type: 'torispherical', odMm: 1000, wallMm: 10, crownRadiusMm: 400, knuckleRadiusMm: 60 })).toEqual(['OUT_OF_RANGE', 'head.crownRadiusMm']);
    expect(code({ type: 'torispherical', odMm: 1000, wallMm: 10, crownRadiusMm: 1000, knuckleRadiusMm: 600 })).toEqual(['OUT_OF_RANGE', 'head.knuckleRadiusMm']);
    expect(code({ ...HEAD_2_1, crownRadiusMm: 1000 })).toEqual(['BAD_OPTION', 'head.crownRadiusMm']);
  });
});

describe('solveNozzle', () => {
  const base: NozzleSpec = { head: HEAD_2_1, nozzle: NPS6, offsetMm: 300 };

  it('sets a hillside nozzle parallel to the vessel axis with its heel outboard', () => {
    const g = solveNozzle(base);
    expect(g.nozzleAxisDirection).toEqual([0, 0, 1]);
    expect(g.axisPointMm[0]).toBe(300);
    expect(g.cutBundle.heelDirection).toEqual([1, 0, 0]);
    expect(g.cutRadiusMm).toBeCloseTo(((6.625 - 0.56) * IN) / 2, 12);
    // Every station's cut point lies on the head's outside; the heel (outboard) generator reaches furthest down.
    const hits = Array.from({ length: 16 }, (_, i) => hitGenerator(g.cutBundle, g.cutHost, (2 * Math.PI * i) / 16)!);
    const zs = hits.map((h) => h.point[2]);
    expect(Math.min(...zs)).toBe(zs[0]);
  });

  it('sets a radial nozzle along the head normal where its axis meets the outside', () => {
    const g = solveNozzle({ ...base, direction: 'radial' });
    const n = surfaceNormal(g.headOutside, g.axisPointMm);
    for (let i = 0; i < 3; i++) expect(g.nozzleAxisDirection[i]).toBeCloseTo(n[i]!, 14);
    expect(g.spec.tiltDeg).toBeGreaterThan(0);
  });

  it('refuses a nozzle whose hole runs past the knuckle onto the flange, giving the largest offset', () => {
    const e = girthErrorOf(() => solveNozzle({ ...base, offsetMm: 560 }));
    expect([e.code, e.field]).toEqual(['NOZZLE_OFF_HEAD', 'offsetMm']);
    const limit = Number(/at most ([\d.]+) mm/.exec(e.message)?.[1]);
    expect(() => solveNozzle({ ...base, offsetMm: limit - 0.1 })).not.toThrow();
    expect(girthErrorOf(() => solveNozzle({ ...base, offsetMm: limit + 0.1 })).code).toBe('NOZZLE_OFF_HEAD');
    expect(girthErrorOf(() => solveNozzle({ ...base, offsetMm: 5000 })).code).toBe('NOZZLE_OFF_HEAD');
  });

  it('refuses a tilt without the angled direction, and an angled nozzle without one', () => {
    expect(girthErrorOf(() => solveNozzle({ ...base, tiltDeg: 10 })).field).toBe('tiltDeg');
    expect(girthErrorOf(() => solveNozzle({ ...base, direction: 'angle' })).code).toBe('MISSING_INPUT');
    expect(girthErrorOf(() => solveNozzle({ ...base, direction: 'angle', tiltDeg: 85 })).code).toBe('OUT_OF_RANGE');
  });

  it('warns when the hole of a nozzle in a flanged and dished head reaches into the knuckle', () => {
    const head: HeadSpec = { type: 'flanged-and-dished', odMm: 48 * IN, wallMm: 0.5 * IN };
    expect(solveNozzle({ head, nozzle: NPS6, offsetMm: 100 }).warnings).toEqual([]);
    expect(solveNozzle({ head, nozzle: NPS6, offsetMm: 510 }).warnings.map((w) => w.code)).toEqual(['NOZZLE_IN_KNUCKLE']);
  });
});
