/**
 * A dished head from its type, size and wall: the inside profile the trade's
 * names stand for, and the head's surfaces.
 */
import { formatLengthBoth, GirthError, HEAD_RATIO, requireNonNegative, requirePositive, requireWithin } from '@girth/pipes';
import { resolvePipeSection } from '../pipe-section.js';
import type { HeadSurface } from '../surfaces/heads.js';
import { torisphericalShape } from '../surfaces/torispherical-head.js';
import type { HeadSpec, HeadType, ResolvedHeadSpec } from './types.js';

/** Ellipsoidal head ratio when none is given: the 2:1 head (ASME Section VIII Div. 1 UG-32(d), recalled). */
export const DEFAULT_HEAD_RATIO = 2;
/** ASME flanged and dished head: inside crown radius as a share of the OD (UG-32(e): not more than the skirt's OD; recalled). */
export const FD_CROWN_SHARE_OF_OD = 1;
/** ASME flanged and dished head: inside knuckle radius as a share of the OD (UG-32(e): not less than 6 % of the skirt's OD; recalled). */
export const FD_KNUCKLE_SHARE_OF_OD = 0.06;
/** 80-10 head: inside crown radius as a share of the OD (common practice, recalled). */
export const HEAD_80_10_CROWN_SHARE_OF_OD = 0.8;
/** 80-10 head: inside knuckle radius as a share of the OD (common practice, recalled). */
export const HEAD_80_10_KNUCKLE_SHARE_OF_OD = 0.1;

const TYPES: readonly HeadType[] = ['ellipsoidal', 'hemispherical', 'flanged-and-dished', '80-10', 'torispherical'];

/**
 * Checks a head and works out its inside profile: ellipsoidal inside depth
 * ID / (2 × ratio) (ID / 4 for 2:1); hemispherical depth ID / 2; the
 * torispherical kinds' crown and knuckle radii (F&D: crown = OD, knuckle =
 * 6 % OD; 80-10: crown 80 %, knuckle 10 % of the OD) and their depth.
 *
 * @throws GirthError `EMPTY_INPUT` (field `head`) when no head is given;
 *   `BAD_CHOICE` (`head.type`); the pipe checks on `head.odMm` and
 *   `head.wallMm`; `OUT_OF_RANGE` (`head.ratio`, 1 to 4); `MISSING_INPUT`
 *   (`head.crownRadiusMm`, `head.knuckleRadiusMm`) for a custom
 *   torispherical head without its radii; `OUT_OF_RANGE` on those radii when
 *   they make no head (knuckle not below half the ID, crown below half the
 *   ID, knuckle above the crown); `BAD_OPTION` when a field is given that the
 *   type does not use.
 * @example resolveHeadSpec({ type: 'ellipsoidal', odMm: 1219.2, wallMm: 12.7 }).insideDepthMm // 298.45 (ID / 4)
 */
export function resolveHeadSpec(spec: HeadSpec): ResolvedHeadSpec {
  if (spec === null || typeof spec !== 'object') {
    throw new GirthError('EMPTY_INPUT', 'head', 'head: give the head type, OD and wall', spec);
  }
  const type = spec.type;
  if (!TYPES.includes(type)) {
    throw new GirthError('BAD_CHOICE', 'head.type', `head.type: must be one of ${TYPES.map((t) => `'${t}'`).join(', ')}, got ${JSON.stringify(type)}`, type);
  }
  const pipe = resolvePipeSection({ odMm: spec.odMm, wallMm: spec.wallMm, ...(spec.label === undefined ? {} : { label: spec.label }) }, 'head');
  const straightFlangeMm = spec.straightFlangeMm === undefined ? 0 : requireNonNegative(spec.straightFlangeMm, 'head.straightFlangeMm');
  const unused = (field: 'ratio' | 'crownRadiusMm' | 'knuckleRadiusMm'): void => {
    if (spec[field] !== undefined) {
      throw new GirthError('BAD_OPTION', `head.${field}`, `head.${field}: a ${type} head does not take it`, spec[field]);
    }
  };
  const label = spec.label === undefined ? `${type === 'ellipsoidal' ? `${spec.ratio ?? DEFAULT_HEAD_RATIO}:1 ellipsoidal` : typeWords(type)} head` : pipe.label;
  const base = { kind: 'head-spec' as const, type, odMm: pipe.odMm, wallMm: pipe.wallMm, idMm: pipe.idMm, label, straightFlangeMm };
  const a = pipe.idMm / 2;
  if (type === 'ellipsoidal' || type === 'hemispherical') {
    unused('crownRadiusMm');
    unused('knuckleRadiusMm');
    if (type === 'hemispherical') unused('ratio');
    const ratio = type === 'hemispherical' ? 1 : spec.ratio === undefined ? DEFAULT_HEAD_RATIO : requireWithin(spec.ratio, 'head.ratio', HEAD_RATIO);
    return { ...base, insideDepthMm: pipe.idMm / (2 * ratio), ...(type === 'ellipsoidal' ? { ratio } : {}) };
  }
  unused('ratio');
  let crown: number;
  let knuckle: number;
  if (type === 'torispherical') {
    if (spec.crownRadiusMm === undefined) throw new GirthError('MISSING_INPUT', 'head.crownRadiusMm', 'head.crownRadiusMm: a torispherical head needs its inside crown radius', undefined);
    if (spec.knuckleRadiusMm === undefined) throw new GirthError('MISSING_INPUT', 'head.knuckleRadiusMm', 'head.knuckleRadiusMm: a torispherical head needs its inside knuckle radius', undefined);
    crown = requirePositive(spec.crownRadiusMm, 'head.crownRadiusMm');
    knuckle = requirePositive(spec.knuckleRadiusMm, 'head.knuckleRadiusMm');
  } else {
    unused('crownRadiusMm');
    unused('knuckleRadiusMm');
    const [c, k] = type === 'flanged-and-dished' ? [FD_CROWN_SHARE_OF_OD, FD_KNUCKLE_SHARE_OF_OD] : [HEAD_80_10_CROWN_SHARE_OF_OD, HEAD_80_10_KNUCKLE_SHARE_OF_OD];
    crown = c * pipe.odMm;
    knuckle = k * pipe.odMm;
  }
  if (!(knuckle < a)) {
    throw new GirthError('OUT_OF_RANGE', 'head.knuckleRadiusMm', `head.knuckleRadiusMm: the knuckle radius ${formatLengthBoth(knuckle)} must be below half the ID, ${formatLengthBoth(a)}`, knuckle);
  }
  if (!(crown >= a)) {
    throw new GirthError('OUT_OF_RANGE', 'head.crownRadiusMm', `head.crownRadiusMm: the crown radius ${formatLengthBoth(crown)} must be at least half the ID, ${formatLengthBoth(a)}`, crown);
  }
  const depth = torisphericalShape({ radiusMm: a, crownRadiusMm: crown, knuckleRadiusMm: knuckle }).depthMm;
  return { ...base, insideDepthMm: depth, crownRadiusMm: crown, knuckleRadiusMm: knuckle };
}

function typeWords(type: HeadType): string {
  switch (type) {
    case 'ellipsoidal':
      return 'ellipsoidal';
    case 'hemispherical':
      return 'hemispherical';
    case 'flanged-and-dished':
      return 'flanged and dished';
    case '80-10':
      return '80-10 torispherical';
    case 'torispherical':
      return 'torispherical';
  }
}

/**
 * The head's surface moved out by `offsetMm` from its inside (0: the inside;
 * the wall: the outside), in the head's frame: vessel axis +z out through
 * the crown, tangent line's centre at the origin, reference meridian +x.
 * @example headSurface(resolveHeadSpec(spec), spec.wallMm) // the outside
 */
export function headSurface(head: ResolvedHeadSpec, offsetMm: number): HeadSurface {
  const frame = { axisPoint: [0, 0, 0] as const, axisDirection: [0, 0, 1] as const, zeroDirection: [1, 0, 0] as const, offsetMm, straightFlangeMm: head.straightFlangeMm };
  const radiusMm = head.idMm / 2;
  if (head.type === 'hemispherical') return { kind: 'hemispherical-head', ...frame, radiusMm };
  if (head.type === 'ellipsoidal') return { kind: 'ellipsoidal-head', ...frame, radiusMm, depthMm: head.insideDepthMm };
  return { kind: 'torispherical-head', ...frame, radiusMm, crownRadiusMm: head.crownRadiusMm as number, knuckleRadiusMm: head.knuckleRadiusMm as number };
}
