/**
 * @girth/geometry: the 3D geometry of pipe joints. Host surfaces (header
 * cylinders, weld and cut planes, cones), the generator lines of the cut pipe,
 * and the exact intersection of each with its host, for branches, plane cuts,
 * miters and cone reducers. Millimetres and radians throughout.
 *
 * The public surface is this list, by name: modules inside may move or split
 * without changing it. Anything not named here is internal.
 *
 * @packageDocumentation
 * @module @girth/geometry
 */

export { add, sub, scale, addScaled, dot, cross, norm, normalize } from './vec3.js';
export type { Vec3 } from './vec3.js';
export type { Line3, CylinderSurface, PlaneSurface, HostSurface, GeneratorBundle } from './types.js';
export { TANGENCY_REL_EPS, DEFAULT_CHORD_TOLERANCE_MM, SHALLOW_LATERAL_WARN_DEG, MIN_JOINT_ANGLE_DEG } from './tolerances.js';
export { generatorLine, hitGenerator } from './generators.js';
export type { GeneratorHit } from './generators.js';
export { resolvePipeSection } from './pipe-section.js';
export type { PipeSection, ResolvedPipeSection } from './pipe-section.js';
export { intersectLine, offsetSurface, surfaceNormal } from './surfaces/line-intersection.js';
export type { ConeFrustum, DiameterSurface, ConeSheet, ConeElement, ConeForm } from './cone/types.js';
export {
  makeConeFrustum,
  frustumElement,
  frustumApex,
  frustumNormal,
  elementInclinationRad,
} from './cone/frustum.js';
export type { ConeFrustumInput } from './cone/frustum.js';
export { coneLengthFromApexAngle, coneApexAngleDeg } from './cone/apex-angle.js';
export { maxEndShiftFactor, maxPlateThicknessMm, makeConeSheet, sheetElement } from './cone/sheet.js';
export type {
  BranchFit,
  PipeFace,
  BranchContact,
  BranchSpec,
  BranchPipeSection,
  ResolvedBranchSpec,
  BranchGeometry,
} from './branch/types.js';
export { resolveBranchSpec, DEFAULT_BRANCH_ANGLE_DEG, FIT_CONTACT } from './branch/resolve-branch-spec.js';
export { branchAxisDirection, branchBundle } from './branch/branch-frame.js';
export { branchWarnings, REINFORCEMENT_RULES_MIN_ANGLE_DEG } from './branch/branch-warnings.js';
export type { BranchWarningCode } from './branch/branch-warnings.js';
export { solveBranch } from './branch/solve-branch.js';
export { fitRadiusMm } from './plane-cut/fit-surface.js';
export type { CutFitSurface } from './plane-cut/fit-surface.js';
export type { PlaneCutSpec, PlaneCutGeometry } from './plane-cut/types.js';
export { SHALLOW_PLANE_CUT_WARN_DEG } from './plane-cut/limits.js';
export { planeCutGeometry } from './plane-cut/plane-cut-geometry.js';
export type {
  MiterSpec,
  ResolvedMiterSpec,
  MiterCutEnd,
  MiterPiece3d,
  MiterGeometry,
  MiterPieceCut,
  MiterStockCut,
  MiterStockPlan,
  MiterCutList,
} from './miter/types.js';
export { MAX_MITER_WELDS, B31_3_MULTIPLE_MITER_MAX_CUT_DEG, MAX_MITER_RADIUS_MM } from './miter/limits.js';
export { miterCutAngleDeg } from './miter/cut-angle.js';
export { miterRadiusConstantAMm, codeMinMiterRadiusMm } from './miter/code-min-radius.js';
export { resolveMiterSpec } from './miter/resolve-miter-spec.js';
export { miterWarnings } from './miter/miter-warnings.js';
export { miterGeometry } from './miter/elbow-geometry.js';
export { miterCutList } from './miter/cut-list.js';

// Added in this wave: host surfaces, limits, weld preparation, fit-up, typed templates and their wording.
export { coneOps } from './surfaces/cone.js';
export type { ConeSurface } from './surfaces/cone.js';
export { SURFACES, surfaceOpsFor } from './surfaces/table.js';
export type { HostKind, SurfaceTableOption } from './surfaces/table.js';
export type { FlatPoint, HostShape, LineRoot, SurfaceOps, SurfaceTable } from './surfaces/types.js';
export { cylinderOps } from './surfaces/cylinder.js';
export { planeOps } from './surfaces/plane.js';
export { developPoint, lineRoots, undevelopPoint } from './surfaces/line-intersection.js';
export type { LineSurfaceOptions } from './surfaces/line-intersection.js';
export { GRAZE_SINE_TOL, findGrazingPhis } from './surfaces/grazing.js';
export { minimizeOnInterval } from './internal/golden-min.js';
export { frustumConeSurface } from './cone/frustum-surface.js';
export type { BevelStatus, GrooveSpec, ResolvedGroove, StationBevel, WeldStationFrame } from './weld/types.js';
export { AWS_D1_1_PREQUALIFIED_MAX_DIHEDRAL_DEG, AWS_D1_1_PREQUALIFIED_MIN_DIHEDRAL_DEG, B16_25_BEVEL_DEG, B16_25_BEVEL_TOL_DEG, B16_25_COMPOUND_BREAK_MM, B16_25_COMPOUND_UPPER_DEG, B16_25_LAND_MM, B16_25_LAND_TOL_MM, B16_25_SINGLE_BEVEL_MAX_WALL_MM, B16_25_SQUARE_MAX_WALL_MM, TANGENT_JOINT_WARN_DIHEDRAL_DEG } from './weld/limits.js';
export { resolveGroove } from './weld/resolve-groove.js';
export { dihedralDegFromNormals, pipeRadialDirection, weldStationFrame } from './weld/station-frame.js';
export { bevelAtStation } from './weld/bevel.js';
export { headerIdSurface, holeTorchAtStation } from './weld/hole-torch.js';
export type { HoleTorchAtStation } from './weld/hole-torch.js';
export { weldEndBevel } from './weld/weld-end-bevel.js';
export type { WeldEndBevel } from './weld/weld-end-bevel.js';
export { weldPrepWarnings } from './weld/weld-warnings.js';
export type { WeldPrepWarningCode, WeldPrepWarningOptions, WeldPrepWarningStation } from './weld/weld-warnings.js';

// An elbow body (torus) as a host.
export { torusOps, torusLocal, torusPoint, torusTapePosition } from './surfaces/torus.js';
export type { TorusSurface, TorusLocalPoint, TorusTapePosition } from './surfaces/torus.js';

// A trunnion or branch on an elbow.
export type { ElbowRadius, ElbowSpec, ResolvedElbowSpec, TrunnionDirection, TrunnionSpec, ResolvedTrunnionSpec, TrunnionGeometry } from './trunnion/types.js';
export { resolveElbowSpec, elbowSurface, LONG_RADIUS_PER_NPS, SHORT_RADIUS_PER_NPS, LONG_RADIUS_NPS_HALF_IN } from './trunnion/elbow-spec.js';
export { solveTrunnion } from './trunnion/solve-trunnion.js';

// Dished heads as hosts, and the nozzle joint.
export { hemisphericalHeadOps } from './surfaces/hemispherical-head.js';
export type { HemisphericalHeadSurface } from './surfaces/hemispherical-head.js';
export { ellipsoidalHeadOps } from './surfaces/ellipsoidal-head.js';
export type { EllipsoidalHeadSurface } from './surfaces/ellipsoidal-head.js';
export { torisphericalHeadOps, torisphericalShape } from './surfaces/torispherical-head.js';
export type { TorisphericalHeadSurface, TorisphericalShape } from './surfaces/torispherical-head.js';
export { headOps, headLocal, headZeroDirection } from './surfaces/head-of-revolution.js';
export type { HeadSurfaceBase, HeadProfile, HeadLocalPoint, MeridianDistance } from './surfaces/head-of-revolution.js';
export { headDishDepthMm, headTapePosition, parallelTapeShortfallMm } from './surfaces/heads.js';
export type { HeadSurface, HeadTapePosition } from './surfaces/heads.js';
export type { HeadType, HeadSpec, ResolvedHeadSpec, NozzleDirection, NozzleSpec, ResolvedNozzleSpec, NozzleGeometry } from './nozzle/types.js';
export {
  resolveHeadSpec,
  headSurface,
  DEFAULT_HEAD_RATIO,
  FD_CROWN_SHARE_OF_OD,
  FD_KNUCKLE_SHARE_OF_OD,
  HEAD_80_10_CROWN_SHARE_OF_OD,
  HEAD_80_10_KNUCKLE_SHARE_OF_OD,
} from './nozzle/head-spec.js';
export { solveNozzle } from './nozzle/solve-nozzle.js';
export type { NozzleWarningCode } from './nozzle/solve-nozzle.js';
