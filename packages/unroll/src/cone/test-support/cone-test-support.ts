/**
 * Test helpers for reducer patterns, independent of the code under test:
 * plain vector arithmetic, polyline lengths, and the roll-back that folds a
 * flat triangle strip back into 3D. Lives under `test-support/`, which the
 * build leaves out; only tests import it.
 */

export type P2 = readonly [number, number];
export type V3 = readonly [number, number, number];


export const d2 = (a: P2, b: P2): number => Math.hypot(a[0] - b[0], a[1] - b[1]);
export const d3 = (a: V3, b: V3): number => Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);
const sub3 = (a: V3, b: V3): V3 => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
const dot3 = (a: V3, b: V3): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const cross3 = (a: V3, b: V3): V3 => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
const scale3 = (a: V3, k: number): V3 => [a[0] * k, a[1] * k, a[2] * k];
const add3 = (...vs: V3[]): V3 => vs.reduce<V3>((s, v) => [s[0] + v[0], s[1] + v[1], s[2] + v[2]], [0, 0, 0]);
const unit3 = (a: V3): V3 => scale3(a, 1 / Math.hypot(a[0], a[1], a[2]));

/** Length of an open polyline on the flat. */
export function polylineLength(points: readonly P2[]): number {
  let sum = 0;
  for (let i = 1; i < points.length; i++) sum += d2(points[i - 1] as P2, points[i] as P2);
  return sum;
}

/** Signed area ×2 of the turn p→q→r on the flat (> 0 counter-clockwise). */
export function turn2(p: P2, q: P2, r: P2): number {
  return (q[0] - p[0]) * (r[1] - p[1]) - (q[1] - p[1]) * (r[0] - p[0]);
}

/**
 * Folds a flat strip back into 3D, the way rolling does: the triangles
 * (a_i, b_i, b_i+1) and (a_i, b_i+1, a_i+1) keep the side lengths they have on
 * the flat, and each is hinged on the side it shares with the one before by
 * the fold angle the true surface has there (from `trueA`, `trueB`). Only the
 * first triangle is pinned to the true surface (at a_0, toward b_0 and b_1).
 * Returns the rebuilt points; if the flat lengths were wrong anywhere, every
 * point after it drifts off the true edges.
 */
export function rollBack(
  flatA: readonly P2[],
  flatB: readonly P2[],
  trueA: readonly V3[],
  trueB: readonly V3[],
): { readonly a: readonly V3[]; readonly b: readonly V3[] } {
  const n = flatA.length;
  type Key = readonly ['a' | 'b', number];
  const flat = (k: Key): P2 => (k[0] === 'a' ? flatA : flatB)[k[1]] as P2;
  const truth = (k: Key): V3 => (k[0] === 'a' ? trueA : trueB)[k[1]] as V3;
  const built = new Map<string, V3>();
  const id = (k: Key): string => `${k[0]}${k[1]}`;
  const tris: (readonly [Key, Key, Key])[] = [];
  for (let i = 0; i + 1 < n; i++) {
    tris.push([['a', i], ['b', i], ['b', i + 1]]);
    tris.push([['a', i], ['b', i + 1], ['a', i + 1]]);
  }
  // Seed: the first triangle, pinned at a_0 and turned into the true triangle's plane.
  const [s0, s1, s2] = tris[0] as readonly [Key, Key, Key];
  const U0 = truth(s0);
  const e0 = unit3(sub3(truth(s1), U0));
  built.set(id(s0), U0);
  built.set(id(s1), add3(U0, scale3(e0, d2(flat(s0), flat(s1)))));
  {
    const f0 = flat(s0);
    const f1 = flat(s1);
    const f2 = flat(s2);
    const L = d2(f0, f1);
    const along = ((f2[0] - f0[0]) * (f1[0] - f0[0]) + (f2[1] - f0[1]) * (f1[1] - f0[1])) / L;
    const perp = Math.abs(turn2(f0, f1, f2)) / L;
    const t2 = sub3(truth(s2), U0);
    const inPlane = unit3(sub3(t2, scale3(e0, dot3(t2, e0))));
    built.set(id(s2), add3(U0, scale3(e0, along), scale3(inPlane, perp)));
  }
  for (let k = 1; k < tris.length; k++) {
    const prev = tris[k - 1] as readonly [Key, Key, Key];
    const cur = tris[k] as readonly [Key, Key, Key];
    const shared = cur.filter((x) => prev.some((y) => id(y) === id(x)));
    const w = cur.find((x) => !prev.some((y) => id(y) === id(x))) as Key;
    const x = prev.find((y) => !cur.some((z) => id(z) === id(y))) as Key;
    const [u, v] = shared as [Key, Key];
    // Where w sits against the hinge u–v on the flat.
    const fu = flat(u);
    const fv = flat(v);
    const fw = flat(w);
    const L = d2(fu, fv);
    const along = ((fw[0] - fu[0]) * (fv[0] - fu[0]) + (fw[1] - fu[1]) * (fv[1] - fu[1])) / L;
    const perp = Math.abs(turn2(fu, fv, fw)) / L;
    // The fold angle of the true surface at this hinge.
    const fold = (U: V3, V: V3, X: V3, W: V3 | undefined): { e: V3; d0: V3; bn: V3; delta: number } => {
      const e = unit3(sub3(V, U));
      const xu = sub3(X, U);
      const d0 = scale3(unit3(sub3(xu, scale3(e, dot3(xu, e)))), -1);
      const bn = cross3(e, d0);
      if (W === undefined) return { e, d0, bn, delta: 0 };
      const wu = sub3(W, U);
      const r = sub3(wu, scale3(e, dot3(wu, e)));
      return { e, d0, bn, delta: Math.atan2(dot3(r, bn), dot3(r, d0)) };
    };
    const { delta } = fold(truth(u), truth(v), truth(x), truth(w));
    const U = built.get(id(u)) as V3;
    const V = built.get(id(v)) as V3;
    const X = built.get(id(x)) as V3;
    const { e, d0, bn } = fold(U, V, X, undefined);
    built.set(id(w), add3(U, scale3(e, along), scale3(d0, perp * Math.cos(delta)), scale3(bn, perp * Math.sin(delta))));
  }
  return {
    a: flatA.map((_, i) => built.get(`a${i}`) as V3),
    b: flatB.map((_, i) => built.get(`b${i}`) as V3),
  };
}

export { expectNear, reducerArb } from '@girth/geometry/test-support';
