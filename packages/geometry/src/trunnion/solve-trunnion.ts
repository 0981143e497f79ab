/**
 * A trunnion or branch on an elbow: which surfaces meet, the generator lines
 * of the cut and of the hole, and the checks that keep the hole on the bend.
 */
import { GirthError, requireInRange, requireNonNegative } from '@girth/pipes';
import { hitGenerator } from '../generators.js';
import { FIT_CONTACT } from '../branch/resolve-branch-spec.js';
import type { BranchFit } from '../branch/types.js';
import { resolvePipeSection } from '../pipe-section.js';
import { offsetSurface, surfaceNormal } from '../surfaces/line-intersection.js';
import { torusLocal, torusPoint, type TorusSurface } from '../surfaces/torus.js';
import type { GeneratorBundle } from '../types.js';
import { cross, dot, type Vec3 } from '../vec3.js';
import { elbowSurface, resolveElbowSpec } from './elbow-spec.js';
import type { ResolvedTrunnionSpec, TrunnionDirection, TrunnionGeometry, TrunnionSpec } from './types.js';

/** Generators looked at around the trunnion when checking its hole stays on the bend (every 3.75°). */
const CHECK_GENERATORS = 96;
/** Smallest sine of the angle between a trunnion generator and the elbow where it meets it: 1°, as for a branch. */
const MIN_MEETING_SINE = Math.sin(Math.PI / 180);
const DEG = Math.PI / 180;

/**
 * Solves a trunnion (or branch) on an elbow. The elbow's frame: bend centre
 * at the origin, bend axis +z, inlet end at bend angle 0 on +x, the bend
 * turning toward +y. The trunnion axis meets the elbow's outside at
 * `alongDeg` along the bend and `aroundDeg` around the cross-section from the
 * extrados (positive toward +z); it runs along the elbow's normal there, or
 * parallel to the inlet or outlet end's axis (the sense that leaves the
 * elbow). Set-on cuts the trunnion ID to the elbow's outside; set-in its OD
 * to the elbow's inside; a root gap moves the surface met out by the gap.
 * Station 1 (HEEL) is the trunnion's side toward the inlet end (the side
 * toward +z when its axis runs along the bend).
 *
 * @throws GirthError the errors of `resolveElbowSpec` (fields `elbow.*`) and
 *   `resolvePipeSection` (fields `branch.*`); `OUT_OF_RANGE` (`alongDeg`,
 *   `aroundDeg`) outside 0..bend and −180..180; `BAD_CHOICE` (`direction`,
 *   `fit`); `NEGATIVE` (`gapMm`); `BRANCH_TOO_LARGE` (field `branch`) for a
 *   trunnion OD above the elbow's OD, or one whose generators miss the elbow;
 *   `TRUNNION_OFF_ELBOW` (field `alongDeg`) when the hole or the cut runs
 *   past an end of the bend; `OUT_OF_RANGE` (`direction`) when a generator
 *   meets the elbow at less than 1°.
 * @example
 * const g = solveTrunnion({ elbow: { pipe: { odMm: 323.85, wallMm: 9.525, npsIn: 12 } },
 *   branch: { odMm: 219.075, wallMm: 8.179 }, alongDeg: 45 });
 * g.spec.elbow.bendRadiusMm // 457.2 (1.5 × 12 in)
 */
export function solveTrunnion(spec: TrunnionSpec): TrunnionGeometry {
  if (spec === null || typeof spec !== 'object') {
    throw new GirthError('EMPTY_INPUT', 'spec', 'spec: give the elbow, the trunnion and where it goes', spec);
  }
  const elbow = resolveElbowSpec(spec.elbow);
  const branch = resolvePipeSection(spec.branch, 'branch');
  const alongDeg = spec.alongDeg === undefined ? elbow.bendDeg / 2 : requireInRange(spec.alongDeg, 'alongDeg', 0, elbow.bendDeg);
  const aroundDeg = spec.aroundDeg === undefined ? 0 : requireInRange(spec.aroundDeg, 'aroundDeg', -180, 180);
  const direction = resolveDirection(spec.direction);
  const fit = resolveFit(spec.fit);
  const contact = FIT_CONTACT[fit];
  const gapMm = spec.gapMm === undefined ? 0 : requireNonNegative(spec.gapMm, 'gapMm');
  if (branch.odMm > elbow.pipe.odMm) {
    throw new GirthError(
      'BRANCH_TOO_LARGE',
      'branch',
      `branch: a ${branch.label} trunnion (OD ${branch.odMm.toFixed(2)} mm) is larger than the ${elbow.label} (OD ${elbow.pipe.odMm.toFixed(2)} mm) it sits on`,
      branch.odMm,
    );
  }

  const elbowInside = elbowSurface(elbow, elbow.pipe.idMm / 2);
  const elbowOutside = elbowSurface(elbow, elbow.pipe.odMm / 2);
  const cutRadiusMm = (contact.branch === 'inside' ? branch.idMm : branch.odMm) / 2;
  const cutHost = offsetSurface(contact.header === 'outside' ? elbowOutside : elbowInside, gapMm) as TorusSurface;

  const point = torusPoint(elbowOutside, alongDeg * DEG, aroundDeg * DEG);
  const n = surfaceNormal(elbowOutside, point);
  const axis = trunnionAxis(direction, n, elbow.bendDeg * DEG);
  const bundle = makeBundle(point, axis, alongDeg * DEG, cutRadiusMm);
  checkOnBend(bundle, cutHost, elbow.bendDeg, branch.label, elbow.label);
  if (cutHost.tubeRadiusMm !== elbowOutside.tubeRadiusMm) checkOnBend(bundle, elbowOutside, elbow.bendDeg, branch.label, elbow.label);
  checkMeeting(bundle, cutHost);

  const s: ResolvedTrunnionSpec = { kind: 'trunnion-spec', elbow, branch, alongDeg, aroundDeg, direction, fit, contact, gapMm };
  return {
    kind: 'trunnion-geometry',
    spec: s,
    elbowInside,
    elbowOutside,
    axisPointMm: point,
    branchAxisDirection: axis,
    tiltFromNormalDeg: Math.acos(Math.min(1, Math.max(-1, dot(axis, n)))) / DEG,
    cutRadiusMm,
    cutBundle: bundle,
    cutHost,
    holeBundle: bundle,
    holeHost: elbowOutside,
    warnings: [],
  };
}

/** The trunnion axis, away from the elbow: the normal, or ± the inlet (+y) or outlet end's axis, whichever leaves the elbow. */
function trunnionAxis(direction: TrunnionDirection, n: Vec3, bendRad: number): Vec3 {
  if (direction === 'normal') return n;
  const leg: Vec3 = direction === 'inlet' ? [0, 1, 0] : [-Math.sin(bendRad), Math.cos(bendRad), 0];
  const k = dot(leg, n);
  if (!(Math.abs(k) >= MIN_MEETING_SINE)) {
    throw new GirthError('OUT_OF_RANGE', 'direction', `direction: a trunnion parallel to the ${direction} end's axis runs along the elbow's surface at this point; place it elsewhere or use the normal`, direction);
  }
  return k > 0 ? leg : [-leg[0], -leg[1], -leg[2]];
}

/** The generator bundle on `point` along `axis` (away from the elbow): heel toward the inlet end (−bend tangent), else toward +z. */
function makeBundle(point: Vec3, axis: Vec3, alongRad: number, radius: number): GeneratorBundle {
  const back: Vec3 = [Math.sin(alongRad), -Math.cos(alongRad), 0];
  let k = dot(back, axis);
  let h: Vec3 = [back[0] - k * axis[0], back[1] - k * axis[1], back[2] - k * axis[2]];
  if (Math.hypot(h[0], h[1], h[2]) < 1e-6) {
    k = axis[2];
    h = [-k * axis[0], -k * axis[1], 1 - k * axis[2]];
  }
  const len = Math.hypot(h[0], h[1], h[2]);
  const heel: Vec3 = [h[0] / len, h[1] / len, h[2] / len];
  const toward: Vec3 = [-axis[0], -axis[1], -axis[2]];
  return { radius, axisPoint: point, axisDirection: toward, heelDirection: heel, sideDirection: cross(toward, heel) };
}

/** Every generator meets `host`, and within the bend (0..bendDeg): else the trunnion is too large or runs off an end. */
function checkOnBend(bundle: GeneratorBundle, host: TorusSurface, bendDeg: number, branchLabel: string, elbowLabel: string): void {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < CHECK_GENERATORS; i++) {
    const hit = hitGenerator(bundle, host, (2 * Math.PI * i) / CHECK_GENERATORS);
    if (hit === undefined) {
      throw new GirthError('BRANCH_TOO_LARGE', 'branch', `branch: the ${branchLabel} trunnion reaches past the ${elbowLabel} as placed (some of its lines miss the elbow); choose a smaller trunnion, a direction nearer square to the elbow, or another place`, undefined);
    }
    const b = torusLocal(host, hit.point).bendRad / DEG;
    lo = Math.min(lo, b);
    hi = Math.max(hi, b);
  }
  if (lo < 0 || hi > bendDeg) {
    throw new GirthError(
      'TRUNNION_OFF_ELBOW',
      'alongDeg',
      `alongDeg: as placed the ${branchLabel} trunnion's hole runs from ${lo.toFixed(1)}° to ${hi.toFixed(1)}° along the bend, past the ${elbowLabel}'s ends (0° to ${bendDeg}°); move it along the bend or choose a smaller trunnion`,
      undefined,
    );
  }
}

/** Refuses generators that meet the elbow at less than 1°. */
function checkMeeting(bundle: GeneratorBundle, host: TorusSurface): void {
  for (let i = 0; i < CHECK_GENERATORS; i++) {
    const phi = (2 * Math.PI * i) / CHECK_GENERATORS;
    const hit = hitGenerator(bundle, host, phi);
    if (hit === undefined) continue;
    const sine = -dot(surfaceNormal(host, hit.point), bundle.axisDirection);
    if (!(sine >= MIN_MEETING_SINE)) {
      throw new GirthError('OUT_OF_RANGE', 'direction', `direction: the trunnion meets the elbow at less than 1° at ${((360 * i) / CHECK_GENERATORS).toFixed(0)}° around it; turn it toward the elbow's normal`, undefined);
    }
  }
}

function resolveDirection(value: unknown): TrunnionDirection {
  if (value === undefined) return 'normal';
  if (value === 'normal' || value === 'inlet' || value === 'outlet') return value;
  throw new GirthError('BAD_CHOICE', 'direction', `direction: must be 'normal', 'inlet' or 'outlet', got ${JSON.stringify(value)}`, value);
}

function resolveFit(value: unknown): BranchFit {
  if (value === undefined) return 'set-on';
  if (value === 'set-on' || value === 'set-in') return value;
  throw new GirthError('BAD_CHOICE', 'fit', `fit: must be 'set-on' or 'set-in', got ${JSON.stringify(value)}`, value);
}
