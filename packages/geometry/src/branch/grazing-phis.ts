/**
 * Where branch generators graze the header: the kinks of the cut, in closed form.
 */

const TWO_PI = 2 * Math.PI;

/** Slack on |sin phi| ≤ 1 for a tangent branch whose sizes carry rounding (relative). */
const SIN_SLACK = 1e-12;

/**
 * Station angles (radians, in [0, 2π), ascending, no repeats) at which a
 * generator of a branch surface of radius `radiusMm`, offset `offsetMm`
 * along +y, grazes a header cylinder of radius `hostRadiusMm` along x.
 *
 * A generator keeps y = e + r sin phi along its length (the branch axis lies
 * in a plane y = e), and a line of fixed y grazes y² + z² = R² exactly when
 * |y| = R. So the kinks are the solutions of e + r sin phi = ±R, which exist
 * only when the branch side is flush with the header side (|e| + r = R).
 *
 * @example grazingPhisRad(0, 100, 100) // [π/2, 3π/2]
 */
export function grazingPhisRad(offsetMm: number, radiusMm: number, hostRadiusMm: number): readonly number[] {
  const out: number[] = [];
  for (const side of [1, -1]) {
    const s = (side * hostRadiusMm - offsetMm) / radiusMm;
    if (Math.abs(s) > 1 + SIN_SLACK) continue;
    const first = Math.asin(Math.max(-1, Math.min(1, s)));
    for (const phi of [first, Math.PI - first]) {
      const p = phi < 0 ? phi + TWO_PI : phi >= TWO_PI ? phi - TWO_PI : phi;
      if (!out.some((q) => Math.abs(q - p) < 1e-12)) out.push(p);
    }
  }
  return out.sort((a, b) => a - b);
}
