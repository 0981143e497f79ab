/**
 * From a joint as written to its layout: resolve pipe names and lengths, then
 * call the library. The command line and the job file both come through here.
 */
import { GirthError, requireInteger } from '@girth/pipes';
import {
  layoutBranch,
  layoutConcentricCone,
  layoutEccentricCone,
  layoutMiter,
  layoutPlaneCut,
  describeResult,
  type LayoutResult,
} from '@girth/unroll';
import { readLength, readPipe, readPipeOrDiameter, renameField } from './read-inputs.js';
import type { BranchInput, CutbackInput, JointContext, JointInput, MiterInput, ReducerInput } from './types.js';

/** Library field names and the input names a user wrote for them. */
const FIELD_NAMES: Readonly<Record<string, string>> = {
  angleDeg: 'angle',
  offsetMm: 'offset',
  gapMm: 'gap',
  bendDeg: 'bend',
  welds: 'welds',
  pieces: 'pieces',
  radiusMm: 'radius',
  radiusNps: 'radiusNps',
  tangentMm: 'tangent',
  fitSurface: 'surface',
  largeDiameterMm: 'large',
  smallDiameterMm: 'small',
  lengthMm: 'length',
  apexAngleDeg: 'includedAngle',
  thicknessMm: 'plate',
  diametersAt: 'diameters',
  seam: 'seam',
  fit: 'fit',
  stations: 'stations',
  segments: 'segments',
};

/**
 * Lays out any joint, its templates worded in the job's unit (`ctx.describe`).
 * @throws GirthError for bad input, its field named as the user wrote it
 *   (`--offset` or `pieces[1].offset`).
 * @example layoutJoint({ joint: 'branch', header: 'NPS 12 STD', branch: 'NPS 6 STD' }, ctx)
 */
export function layoutJoint(input: JointInput, ctx: JointContext): LayoutResult {
  requireInteger(ctx.stations, ctx.fieldName('stations'), 4, 360);
  try {
    return describeResult(layoutOf(input, ctx), ctx.describe);
  } catch (error) {
    throw renameField(error, (field) => {
      // Already named as the user wrote it (`--header`, `pieces[1].header`).
      if (field.startsWith(ctx.fieldPrefix)) return undefined;
      const root = field.split(/[.[]/)[0] ?? field;
      const name = FIELD_NAMES[root] ?? (['header', 'branch', 'pipe', 'large', 'small'].includes(root) ? root : undefined);
      return name === undefined ? undefined : ctx.fieldName(name);
    });
  }
}

/** The library's layout of one joint, worded by default (mm first). */
function layoutOf(input: JointInput, ctx: JointContext): LayoutResult {
  switch (input.joint) {
    case 'branch':
      return branch(input, ctx);
    case 'miter':
      return miter(input, ctx);
    case 'cutback':
      return cutback(input, ctx);
    case 'reducer':
      return reducer(input, ctx);
  }
}

function branch(input: BranchInput, ctx: JointContext): LayoutResult {
  const surfaces = input.branchSurface ?? input.headerSurface;
  if (surfaces !== undefined && (input.branchSurface === undefined || input.headerSurface === undefined)) {
    const missing = input.branchSurface === undefined ? 'branchSurface' : 'headerSurface';
    throw new GirthError('BAD_OPTION', ctx.fieldName(missing), `${ctx.fieldName(missing)}: give both branch and header surfaces to override the fit`);
  }
  return layoutBranch(
    {
      header: readPipe(input.header, 'header', ctx),
      branch: readPipe(input.branch, 'branch', ctx),
      angleDeg: input.angle ?? 90,
      offsetMm: readLength(input.offset, 'offset', ctx, { allowNegative: true }) ?? 0,
      fit: input.fit ?? 'set-on',
      gapMm: readLength(input.gap, 'gap', ctx) ?? 0,
      ...(input.branchSurface !== undefined && input.headerSurface !== undefined
        ? { contact: { branch: input.branchSurface, header: input.headerSurface } }
        : {}),
    },
    { stations: ctx.stations },
  );
}

function miter(input: MiterInput, ctx: JointContext): LayoutResult {
  const pipe = readPipe(input.pipe, 'pipe', ctx);
  const radiusMm = readLength(input.radius, 'radius', ctx);
  const tangentMm = readLength(input.tangent, 'tangent', ctx);
  return layoutMiter(
    {
      pipe,
      bendDeg: input.bend,
      ...(input.welds !== undefined ? { welds: input.welds } : {}),
      ...(input.pieces !== undefined ? { pieces: input.pieces } : {}),
      ...(radiusMm !== undefined ? { radiusMm } : {}),
      ...(input.radiusNps !== undefined ? { radiusNps: input.radiusNps } : {}),
      ...(tangentMm !== undefined ? { tangentMm } : {}),
      ...(input.surface !== undefined ? { fitSurface: input.surface } : {}),
    },
    { stations: ctx.stations },
  );
}

function cutback(input: CutbackInput, ctx: JointContext): LayoutResult {
  return layoutPlaneCut(
    {
      pipe: readPipe(input.pipe, 'pipe', ctx),
      angleDeg: input.angle,
      gapMm: readLength(input.gap, 'gap', ctx) ?? 0,
      ...(input.surface !== undefined ? { fitSurface: input.surface } : {}),
    },
    { stations: ctx.stations },
  );
}

function reducer(input: ReducerInput, ctx: JointContext): LayoutResult {
  const large = readPipeOrDiameter(input.large, 'large', ctx);
  const small = readPipeOrDiameter(input.small, 'small', ctx);
  const lengthMm = readLength(input.length, 'length', ctx);
  const spec = {
    largeDiameterMm: large.diameterMm,
    smallDiameterMm: small.diameterMm,
    largeLabel: large.label,
    smallLabel: small.label,
    thicknessMm: readLength(input.plate, 'plate', ctx) ?? 0,
    ...(lengthMm !== undefined ? { lengthMm } : {}),
    ...(input.includedAngle !== undefined ? { apexAngleDeg: input.includedAngle } : {}),
    ...(input.diameters !== undefined ? { diametersAt: input.diameters } : {}),
  };
  const options = { stations: ctx.stations, ...(input.segments !== undefined ? { segments: input.segments } : {}) };
  return input.eccentric === true
    ? layoutEccentricCone(spec, { ...options, ...(input.seam !== undefined ? { seam: input.seam } : {}) })
    : layoutConcentricCone(spec, options);
}
