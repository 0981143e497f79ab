import { describe, expect, it } from 'vitest';
import { branchAxisDirection } from '@girth/geometry';
import { GirthError } from '@girth/pipes';
import { layoutPad, TELL_TALE_HOLE_MM } from './layout-pad.js';
import { signedArea } from './pad-outline.js';
import type { PadSpec } from './types.js';
import type { Point2 } from '../types.js';

// NPS 12 STD and NPS 6 STD: ASME B36.10M OD 323.85 / 168.275 mm, wall 9.525 / 7.112 mm (recalled).
const header = { odMm: 323.85, wallMm: 9.525, label: 'NPS 12 STD' };
const branch = { odMm: 168.275, wallMm: 7.112, label: 'NPS 6 STD' };
const R = header.odMm / 2;
const r = branch.odMm / 2;
const CHORD_MM = 0.05;

function girthErrorOf(f: () => unknown): GirthError {
  try {
    f();
  } catch (e) {
    if (e instanceof GirthError) return e;
    throw e;
  }
  throw new Error('no error thrown');
}

/** Plate point on the mid surface back to the header OD in 3D (header axis along x, top line +z): the stated rule undone. */
function onHeaderOd(p: Point2, t: number): [number, number, number] {
  const theta = p[0] / (R + t / 2);
  return [p[1], R * Math.sin(theta), R * Math.cos(theta)];
}

/** Distance from a 3D point to the branch axis (through (0, offset, 0)). */
function fromBranchAxis(q: readonly number[], angleDeg: number, offsetMm = 0): number {
  const d = branchAxisDirection((angleDeg * Math.PI) / 180);
  const v = [q[0]!, q[1]! - offsetMm, q[2]!];
  const along = v[0]! * d[0] + v[1]! * d[1] + v[2]! * d[2];
  return Math.hypot(v[0]! - along * d[0], v[1]! - along * d[1], v[2]! - along * d[2]);
}

/**
 * The exact 3D curve where the branch OD meets the header OD, found apart
 * from the library: along each branch generator, bisection on the header
 * cylinder's implicit equation y² + z² = R² (test oracle, no closed form).
 */
function exactHole(angleDeg: number, n: number): [number, number, number][] {
  const a = (angleDeg * Math.PI) / 180;
  const d = [Math.cos(a), 0, Math.sin(a)]; // a unit axis in the x-z plane at angle a to the header axis
  const u = [-Math.sin(a), 0, Math.cos(a)];
  const v = [0, 1, 0];
  const out: [number, number, number][] = [];
  for (let i = 0; i < n; i++) {
    const phi = (2 * Math.PI * i) / n;
    const base = [r * (Math.cos(phi) * u[0]! + Math.sin(phi) * v[0]!), r * Math.sin(phi), r * Math.cos(phi) * u[2]!];
    const at = (s: number): number[] => [base[0]! + s * d[0]!, base[1]! + s * d[1]!, base[2]! + s * d[2]!];
    const f = (s: number): number => { const p = at(s); return p[1]! ** 2 + p[2]! ** 2 - R * R; };
    // The outer root: inside the header where the generator crosses z = 0, outside 4 R beyond.
    let lo = -base[2]! / d[2]!;
    let hi = 4 * R;
    for (let k = 0; k < 200; k++) { const m = (lo + hi) / 2; if (f(m) > 0) hi = m; else lo = m; }
    const p = at((lo + hi) / 2);
    out.push([p[0]!, p[1]!, p[2]!]);
  }
  return out;
}

/** Least distance over the header OD surface from a point to a curve on it (cylinder geodesic: straight in the development). */
function overSurface(q: readonly number[], curve: readonly (readonly number[])[]): number {
  let best = Infinity;
  for (const c of curve) {
    let dt = Math.atan2(q[1]!, q[2]!) - Math.atan2(c[1]!, c[2]!);
    dt = Math.atan2(Math.sin(dt), Math.cos(dt));
    best = Math.min(best, Math.hypot(R * dt, q[0]! - c[0]!));
  }
  return best;
}

describe('layoutPad', () => {
  const t = 9.525;
  const tee: PadSpec = { branch: { header, branch }, thicknessMm: t, widthMm: 84 };

  it('inner contour lies on the exact hole (branch OD on header OD) once undone from the mid surface, chords included', () => {
    for (const angleDeg of [90, 60, 45]) {
      const layout = layoutPad({ ...tee, branch: { header, branch, angleDeg } });
      const hole = layout.templates[0].cut[1]!;
      if (hole.kind !== 'polyline') throw new Error('polyline expected');
      const pts = hole.points;
      for (let i = 0; i < pts.length; i++) {
        const p = pts[i]!;
        const q = pts[(i + 1) % pts.length]!;
        expect(Math.abs(fromBranchAxis(onHeaderOd(p, t), angleDeg) - r)).toBeLessThan(1e-6);
        const mid: Point2 = [(p[0] + q[0]) / 2, (p[1] + q[1]) / 2];
        expect(Math.abs(fromBranchAxis(onHeaderOd(mid, t), angleDeg) - r)).toBeLessThan(CHORD_MM);
      }
    }
  });

  it('a tee hole spans the branch OD along the header and R·asin(r/R)·(R + t/2)/R around it (closed form of a tee, common practice)', () => {
    const rows = layoutPad(tee).templates[0].stations;
    expect(rows[0]!.values.holeAxial).toBeCloseTo(-r, 6); // station 1, heel side
    expect(rows[4]!.values.holeGirth).toBeCloseTo(R * Math.asin(r / R) * ((R + t / 2) / R), 6);
  });

  it('the outer edge rebuilt on the header lies at the given width over the surface from the exact hole', () => {
    for (const [angleDeg, w] of [[90, 84], [45, 50], [60, 120]] as const) {
      const layout = layoutPad({ branch: { header, branch, angleDeg }, thicknessMm: t, widthMm: w });
      expect(layout.widthMm).toBe(w);
      const curve = exactHole(angleDeg, 20000);
      const outer = layout.templates[0].cut[0]!;
      if (outer.kind !== 'polyline') throw new Error('polyline expected');
      for (const p of outer.points.filter((_, i) => i % 9 === 0)) {
        expect(Math.abs(overSurface(onHeaderOd(p, t), curve) - w)).toBeLessThan(CHORD_MM);
      }
    }
  });

  it('an outside size gives a round edge of that diameter over the header OD around the branch axis', () => {
    const layout = layoutPad({ branch: { header, branch }, thicknessMm: t, outsideMm: 2 * branch.odMm });
    const outer = layout.templates[0].cut[0]!;
    if (outer.kind !== 'polyline') throw new Error('polyline expected');
    const k = (R + t / 2) / R;
    for (const p of outer.points) expect(Math.hypot(p[0] / k, p[1])).toBeCloseTo(branch.odMm, 6);
    expect(layout.widthMm).toBeCloseTo(2 * branch.odMm / 2 - Math.hypot(R * Math.asin(r / R), 0), 3); // widest reach of a tee hole is around the header
  });

  it('closed contours wound for the cutting table: outer counter-clockwise, hole clockwise; the tell-tale hole sits in the ring', () => {
    const tpl = layoutPad(tee).templates[0];
    const [outer, hole] = tpl.cut;
    if (outer?.kind !== 'polyline' || hole?.kind !== 'polyline') throw new Error('polylines expected');
    expect(outer.closed && hole.closed).toBe(true);
    expect(signedArea(outer.points)).toBeGreaterThan(0);
    expect(signedArea(hole.points)).toBeLessThan(0);
    const vent = tpl.marks.find((m) => m.kind === 'polyline');
    if (vent?.kind !== 'polyline') throw new Error('vent circle expected');
    const cx = vent.points.reduce((a, p) => a + p[0], 0) / vent.points.length;
    const cy = vent.points.reduce((a, p) => a + p[1], 0) / vent.points.length;
    expect(Math.hypot(vent.points[0]![0] - cx, vent.points[0]![1] - cy)).toBeCloseTo(TELL_TALE_HOLE_MM / 2, 6);
    expect(cy).toBeCloseTo(-r - 42, 6); // halfway across the 84 mm ring on the heel side
    expect(tpl.notes.join(' ')).toMatch(/does not size reinforcement/);
  });

  it('typed errors name the size field', () => {
    expect([girthErrorOf(() => layoutPad({ ...tee, widthMm: 0 })).code, girthErrorOf(() => layoutPad({ ...tee, widthMm: 0 })).field]).toEqual(['NEGATIVE', 'widthMm']);
    expect(girthErrorOf(() => layoutPad({ ...tee, widthMm: -5 })).field).toBe('widthMm');
    const small = girthErrorOf(() => layoutPad({ branch: { header, branch }, thicknessMm: t, outsideMm: branch.odMm }));
    expect([small.code, small.field]).toEqual(['PAD_SIZE', 'outsideMm']);
    const round = girthErrorOf(() => layoutPad({ ...tee, widthMm: 2000 }));
    expect([round.code, round.field]).toEqual(['PAD_SIZE', 'widthMm']);
    expect(girthErrorOf(() => layoutPad({ ...tee, outsideMm: 400 })).code).toBe('BAD_OPTION');
    expect(girthErrorOf(() => layoutPad({ ...tee, thicknessMm: 0 })).field).toBe('thicknessMm');
  });
});
