/**
 * Arc helpers on the flat: sweep, end points, bulge, and the arc behind a bulge.
 * Angles in degrees counter-clockwise from +x, as in DXF.
 */

/** Below this sweep (degrees) an arc is degenerate; at 360 minus this it is a full circle. */
export const SWEEP_EPS_DEG = 1e-9;

/** Counter-clockwise sweep from `startDeg` to `endDeg`, in (0, 360]; 360 for a full turn. */
export function sweepDeg(startDeg: number, endDeg: number): number {
  if (Math.abs(endDeg - startDeg) >= 360 - SWEEP_EPS_DEG) return 360;
  return (((endDeg - startDeg) % 360) + 360) % 360;
}

/** The point at `angleDeg` on a circle. */
export function pointOnCircle(cx: number, cy: number, r: number, angleDeg: number): [number, number] {
  const a = (angleDeg * Math.PI) / 180;
  return [cx + r * Math.cos(a), cy + r * Math.sin(a)];
}

/** DXF bulge of an arc of the given counter-clockwise sweep: tan(sweep / 4); negative sweeps run clockwise. */
export function bulgeOfSweep(sweepDegrees: number): number {
  return Math.tan((sweepDegrees * Math.PI) / 180 / 4);
}

/**
 * The arc of a bulged polyline segment from `a` to `b`: centre, radius and the
 * counter-clockwise start/end angles (degrees). Bulge must not be 0.
 */
export function arcOfBulge(
  a: readonly [number, number],
  b: readonly [number, number],
  bulge: number,
): { center: [number, number]; radius: number; startDeg: number; endDeg: number } {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const chord = Math.hypot(dx, dy);
  const sweepRad = 4 * Math.atan(bulge);
  const radius = chord / (2 * Math.abs(Math.sin(sweepRad / 2)));
  // Centre lies on the chord's perpendicular bisector, on the left for a counter-clockwise bulge.
  const mx = (a[0] + b[0]) / 2;
  const my = (a[1] + b[1]) / 2;
  const h = (chord / 2) / Math.tan(sweepRad / 2); // signed distance from chord midpoint to centre
  const center: [number, number] = [mx - (dy / chord) * h, my + (dx / chord) * h];
  const angA = (Math.atan2(a[1] - center[1], a[0] - center[0]) * 180) / Math.PI;
  const angB = (Math.atan2(b[1] - center[1], b[0] - center[0]) * 180) / Math.PI;
  return bulge > 0 ? { center, radius, startDeg: angA, endDeg: angB } : { center, radius, startDeg: angB, endDeg: angA };
}

/** Whether the counter-clockwise arc from `startDeg` to `endDeg` passes through `angleDeg`. */
export function arcContainsAngle(startDeg: number, endDeg: number, angleDeg: number): boolean {
  const sweep = sweepDeg(startDeg, endDeg);
  const along = (((angleDeg - startDeg) % 360) + 360) % 360;
  return along <= sweep;
}
