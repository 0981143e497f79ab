/**
 * A nozzle in a dished head: which surfaces meet, the generator lines of the
 * cut and of the hole, and the checks that keep the hole on the dish.
 */
import { formatLengthBoth, GirthError, NOZZLE_TILT_DEG, requireNonNegative, requireWithin, type GirthWarning } from '@girth/pipes';
import { hitGenerator } from '../generators.js';
import { FIT_CONTACT } from '../branch/resolve-branch-spec.js';
import { resolvePipeSection } from '../pipe-section.js';
import { headLocal } from '../surfaces/head-of-revolution.js';
import { type HeadSurface } from '../surfaces/heads.js';
import { lineRoots, offsetSurface, surfaceNormal } from '../surfaces/line-intersection.js';
import { torisphericalShape } from '../surfaces/torispherical-head.js';
import type { GeneratorBundle } from '../types.js';
import { cross, dot, type Vec3 } from '../vec3.js';
import { headSurface, resolveHeadSpec } from './head-spec.js';
import type { BranchFit } from '../branch/types.js';
import type { NozzleDirection, NozzleGeometry, NozzleSpec, ResolvedHeadSpec, ResolvedNozzleSpec } from './types.js';

/** Generators looked at around the nozzle when checking the hole stays on the dish (every 7.5°), before the lowest is refined. */
const CHECK_GENERATORS = 48;
/** Golden-section steps refining the lowest point of the hole (the bracket shrinks to 1e-6 of 15°). */
const LOWEST_POINT_STEPS = 30;
/** Smallest sine of the angle between a nozzle generator and the head where it meets it: 1°, as for a branch (MIN_JOINT_ANGLE_DEG). */
const MIN_MEETING_SINE = Math.sin(Math.PI / 180);
/** Steps of the search for the largest offset that keeps the hole on the dish (for the error message): 2^-40 of the radius. */
const LIMIT_SEARCH_STEPS = 40;

/** Stable codes of the warnings {@link solveNozzle} gives. */
export type NozzleWarningCode = 'NOZZLE_IN_KNUCKLE';

/**
 * Solves a nozzle in a dished head. The head's frame: vessel axis +z out
 * through the crown, the tangent line's centre at the origin; the nozzle sits
 * in the x-z plane at distance `offsetMm` from the centre line on the +x side.
 * A hillside nozzle's axis is the line x = offset parallel to the vessel
 * axis; a radial or angled nozzle's axis passes through the point of the
 * head's outside at that distance, along the head's normal there or tilted
 * `tiltDeg` from the vessel axis.
 *
 * Set-on cuts the nozzle ID to the head's outside; set-in the nozzle OD to
 * the head's inside; a root gap moves the surface met out by the gap along
 * its normal. The hole is the contacting nozzle surface on the head's
 * outside. Station 1 (the heel) is the nozzle's outboard side.
 *
 * @throws GirthError every error of `resolveHeadSpec` (fields `head.*`) and
 *   `resolvePipeSection` (fields `nozzle.*`); `NEGATIVE` for a negative
 *   `offsetMm` or `gapMm`; `BAD_CHOICE` for an unknown `direction` or `fit`;
 *   `MISSING_INPUT` (`tiltDeg`) for `angle` without a tilt, `BAD_OPTION`
 *   (`tiltDeg`) for a tilt with another direction; `OUT_OF_RANGE` (`tiltDeg`)
 *   outside −80..80°; `NOZZLE_OFF_HEAD` (field `offsetMm`) when the hole or the
 *   cut runs past the tangent line onto the straight flange, or off the head
 *   (the message gives the largest offset that fits); `OUT_OF_RANGE`
 *   (`tiltDeg`, or `direction` when not angled) when a nozzle generator meets
 *   the head at less than 1°.
 * @example
 * const g = solveNozzle({ head: { type: 'ellipsoidal', odMm: 1219.2, wallMm: 12.7 },
 *   nozzle: { odMm: 168.275, wallMm: 7.112 }, offsetMm: 300 });
 * g.cutRadiusMm // 77.0255 (nozzle ID / 2, set-on)
 */
export function solveNozzle(spec: NozzleSpec): NozzleGeometry {
  if (spec === null || typeof spec !== 'object') {
    throw new GirthError('EMPTY_INPUT', 'spec', 'spec: give the head, the nozzle and where it goes', spec);
  }
  const head = resolveHeadSpec(spec.head);
  const nozzle = resolvePipeSection(spec.nozzle, 'nozzle');
  const offsetMm = spec.offsetMm === undefined ? 0 : requireNonNegative(spec.offsetMm, 'offsetMm');
  const direction = resolveDirection(spec.direction);
  if (direction !== 'angle' && spec.tiltDeg !== undefined) {
    throw new GirthError('BAD_OPTION', 'tiltDeg', `tiltDeg: only an angled nozzle (direction 'angle') takes a tilt; this one is ${direction}`, spec.tiltDeg);
  }
  if (direction === 'angle' && spec.tiltDeg === undefined) {
    throw new GirthError('MISSING_INPUT', 'tiltDeg', "tiltDeg: an angled nozzle needs its tilt from the vessel axis", undefined);
  }
  const givenTilt = direction === 'angle' ? requireWithin(spec.tiltDeg, 'tiltDeg', NOZZLE_TILT_DEG) : 0;
  const fit = resolveFit(spec.fit);
  const contact = FIT_CONTACT[fit];
  const gapMm = spec.gapMm === undefined ? 0 : requireNonNegative(spec.gapMm, 'gapMm');

  const headInside = headSurface(head, 0);
  const headOutside = headSurface(head, head.wallMm);
  const cutRadiusMm = (contact.branch === 'inside' ? nozzle.idMm : nozzle.odMm) / 2;
  const cutHost = offsetSurface(contact.header === 'outside' ? headOutside : headInside, gapMm) as HeadSurface;

  const place = (offset: number): Placement | undefined => placeNozzle(headOutside, offset, direction, givenTilt);
  const placed = place(offsetMm);
  const frame = placed === undefined ? undefined : bundles(placed, cutRadiusMm);
  // The cut host is the outside itself for a set-on nozzle with no gap: check it once.
  const sameHost = cutHost.offsetMm === headOutside.offsetMm;
  const fits = (f: Frame | undefined): boolean => f !== undefined && staysOnDish(f.bundle, cutHost) && (sameHost || staysOnDish(f.bundle, headOutside));
  if (!fits(frame)) throw offHead(head, nozzle.label, offsetMm, (o) => fits(placeOrUndefined(place(o), cutRadiusMm)));
  const ok = frame as Frame;
  checkMeeting(ok.bundle, cutHost, direction);
  const tiltDeg = (Math.atan2(ok.placement.axis[0], ok.placement.axis[2]) * 180) / Math.PI;

  const s: ResolvedNozzleSpec = { kind: 'nozzle-spec', head, nozzle, offsetMm, direction, tiltDeg, fit, contact, gapMm };
  return {
    kind: 'nozzle-geometry',
    spec: s,
    headInside,
    headOutside,
    axisPointMm: ok.placement.point,
    nozzleAxisDirection: ok.placement.axis,
    cutRadiusMm,
    cutBundle: ok.bundle,
    cutHost,
    holeBundle: ok.bundle,
    holeHost: headOutside,
    warnings: nozzleWarnings(head, headOutside, ok.bundle),
  };
}

interface Placement {
  readonly point: Vec3;
  readonly axis: Vec3;
}

interface Frame {
  readonly placement: Placement;
  readonly bundle: GeneratorBundle;
}

function placeOrUndefined(p: Placement | undefined, radius: number): Frame | undefined {
  return p === undefined ? undefined : bundles(p, radius);
}

/** The point of the head's outside at distance `offset` from the centre line (in the x-z plane, +x), and the nozzle axis there. */
function placeNozzle(outside: HeadSurface, offset: number, direction: NozzleDirection, tiltDeg: number): Placement | undefined {
  const top = lineRoots(outside, { origin: [offset, 0, 0], direction: [0, 0, -1] });
  // The vertical line x = offset meets the dish above the tangent line: its root is at t < 0 (above the origin).
  const first = top[0];
  if (first === undefined || !(first.tMm < 0)) return undefined;
  const point: Vec3 = [offset, 0, -first.tMm];
  if (direction === 'hillside') return { point, axis: [0, 0, 1] };
  if (direction === 'radial') return { point, axis: surfaceNormal(outside, point) };
  const t = (tiltDeg * Math.PI) / 180;
  return { point, axis: [Math.sin(t), 0, Math.cos(t)] };
}

/** The generator bundle of a nozzle surface of radius `radius` on `placement`: heel outboard, side = axis toward the head × heel. */
function bundles(placement: Placement, radius: number): Frame {
  const d = placement.axis;
  const outward: Vec3 = [1, 0, 0];
  const k = dot(outward, d);
  const h0: Vec3 = [outward[0] - k * d[0], outward[1] - k * d[1], outward[2] - k * d[2]];
  const n = Math.hypot(h0[0], h0[1], h0[2]);
  const heel: Vec3 = [h0[0] / n, h0[1] / n, h0[2] / n];
  const toward: Vec3 = [-d[0], -d[1], -d[2]];
  return {
    placement,
    bundle: { radius, axisPoint: placement.point, axisDirection: toward, heelDirection: heel, sideDirection: cross(toward, heel) },
  };
}

/** Height above the tangent line of the first meeting of the generator at `phi`, or −∞ when it misses. */
function meetingHeight(bundle: GeneratorBundle, host: HeadSurface, phi: number): number {
  const hit = hitGenerator(bundle, host, phi);
  return hit === undefined ? -Infinity : headLocal(host, hit.point).zMm;
}

/** True when every generator of `bundle` meets `host` on its dish (at or above the tangent line): sampled every 5°, the lowest refined. */
function staysOnDish(bundle: GeneratorBundle, host: HeadSurface): boolean {
  const step = (2 * Math.PI) / CHECK_GENERATORS;
  let low = 0;
  let lowZ = Infinity;
  for (let i = 0; i < CHECK_GENERATORS; i++) {
    const z = meetingHeight(bundle, host, i * step);
    if (!(z >= 0)) return false;
    if (z < lowZ) [low, lowZ] = [i, z];
  }
  // Golden-section refinement of the lowest point between its neighbours.
  let a = (low - 1) * step;
  let b = (low + 1) * step;
  const g = (Math.sqrt(5) - 1) / 2;
  for (let i = 0; i < LOWEST_POINT_STEPS; i++) {
    const c = b - g * (b - a);
    const e = a + g * (b - a);
    const zc = meetingHeight(bundle, host, c);
    const ze = meetingHeight(bundle, host, e);
    if (!(zc >= 0) || !(ze >= 0)) return false;
    if (zc <= ze) b = e;
    else a = c;
  }
  return true;
}

/** Refuses generators that meet the head at less than 1° (the nozzle lying along the head). */
function checkMeeting(bundle: GeneratorBundle, host: HeadSurface, direction: NozzleDirection): void {
  for (let i = 0; i < CHECK_GENERATORS; i++) {
    const phi = (2 * Math.PI * i) / CHECK_GENERATORS;
    const hit = hitGenerator(bundle, host, phi);
    if (hit === undefined) continue;
    const sine = -dot(surfaceNormal(host, hit.point), bundle.axisDirection);
    if (!(sine >= MIN_MEETING_SINE)) {
      const field = direction === 'angle' ? 'tiltDeg' : 'direction';
      throw new GirthError('OUT_OF_RANGE', field, `${field}: the nozzle meets the head at less than 1° at ${((360 * i) / CHECK_GENERATORS).toFixed(0)}° around it; tilt it toward the head's normal`, undefined);
    }
  }

}

function offHead(head: ResolvedHeadSpec, nozzleLabel: string, offsetMm: number, fitsAt: (offset: number) => boolean): GirthError {
  let lo = 0;
  let hi = head.odMm / 2;
  const fitsAtAll = fitsAt(0);
  if (fitsAtAll) {
    for (let i = 0; i < LIMIT_SEARCH_STEPS; i++) {
      const mid = (lo + hi) / 2;
      if (fitsAt(mid)) lo = mid;
      else hi = mid;
    }
  }
  const limit = fitsAtAll
    ? `; at this size and direction the offset may be at most ${formatLengthBoth(lo)}`
    : '; this nozzle does not fit on the dish even at the centre: choose a smaller nozzle';
  return new GirthError(
    'NOZZLE_OFF_HEAD',
    'offsetMm',
    `offsetMm: at an offset of ${formatLengthBoth(offsetMm)} the ${nozzleLabel} nozzle's hole runs past the knuckle onto the straight flange or off the ${head.label}${limit}`,
    offsetMm,
  );
}

/** A torispherical head's hole reaching into the knuckle: a warning. */
function nozzleWarnings(head: ResolvedHeadSpec, outside: HeadSurface, bundle: GeneratorBundle): readonly GirthWarning[] {
  if (outside.kind !== 'torispherical-head') return [];
  const shape = torisphericalShape(outside);
  const k = outside.radiusMm - outside.knuckleRadiusMm;
  const zc = shape.crownCentreZMm;
  for (let i = 0; i < CHECK_GENERATORS; i++) {
    const hit = hitGenerator(bundle, outside, (2 * Math.PI * i) / CHECK_GENERATORS);
    if (hit === undefined) continue;
    const p = headLocal(outside, hit.point);
    if (p.rhoMm * -zc - (p.zMm - zc) * k > 0) {
      return [
        {
          code: 'NOZZLE_IN_KNUCKLE',
          field: 'offsetMm',
          message: `The hole reaches into the knuckle of the ${head.label}; openings are usually kept in the crown (common practice). Girth lays out geometry only and does not size reinforcement; have the design checked under the governing code.`,
        },
      ];
    }
  }
  return [];
}

function resolveDirection(value: unknown): NozzleDirection {
  if (value === undefined) return 'hillside';
  if (value === 'hillside' || value === 'radial' || value === 'angle') return value;
  throw new GirthError('BAD_CHOICE', 'direction', `direction: must be 'hillside', 'radial' or 'angle', got ${JSON.stringify(value)}`, value);
}

function resolveFit(value: unknown): BranchFit {
  if (value === undefined) return 'set-on';
  if (value === 'set-on' || value === 'set-in') return value;
  throw new GirthError('BAD_CHOICE', 'fit', `fit: must be 'set-on' or 'set-in', got ${JSON.stringify(value)}`, value);
}


