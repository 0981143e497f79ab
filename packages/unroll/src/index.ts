/**
 * @girth/unroll: develops each joint's cut onto the flat. `layoutBranch`,
 * `layoutPlaneCut`, `layoutMiter`, `layoutConcentricCone` and
 * `layoutEccentricCone` return a `LayoutResult` of `Template`s (contours,
 * square line, station lines, labels, the station table) that the svg, dxf and
 * table packages draw and print. `sampleCut` and `developWrap` are the steps
 * every wrap is made with, for a developer adding a joint of their own.
 *
 * The public surface is this list, by name: modules inside may move or split
 * without changing it. Anything not named here is internal.
 *
 * @packageDocumentation
 * @module @girth/unroll
 */

export type {
  Point2,
  Polyline2,
  Arc2,
  Segment2,
  PathPart,
  StationLine,
  TemplateLabel,
  TemplateKind,
  StationColumn,
  StationRow,
  Template,
  PipeUsed,
  LayoutResult,
} from './types.js';
export { CAUTION } from './caution.js';
export { sampleCut, MAX_SAMPLE_STATIONS, MIN_CHORD_TOLERANCE_MM } from './wrap/sample-cut.js';
export type { CutSamples, SampleCutOptions } from './wrap/sample-cut.js';
export { developWrap } from './wrap/develop-wrap.js';
export type { WrapLabel, DevelopWrapInput } from './wrap/develop-wrap.js';
export {
  CONE_DEFAULT_STATIONS,
  CONE_MAX_STATIONS,
  CONE_MIN_STATIONS,
  CONE_DEFAULT_CHORD_TOLERANCE_MM,
  CONE_MAX_CHORD_TOLERANCE_MM,
  CONE_MIN_CHORD_TOLERANCE_MM,
} from './cone/internal/resolve-cone.js';
export { STEEP_CONE_WARN_DEG } from './cone/internal/cone-text.js';
export type {
  ConeSpec,
  EccentricConeSpec,
  ConeLayoutOptions,
  EccentricSeam,
  EccentricConeOptions,
  ConeEndInfo,
  ConePiece,
  ConcentricConePiece,
  ConePattern,
  ConeLayoutBase,
  ConcentricConeLayout,
  EccentricConeLayout,
  ConeLayout,
} from './cone/types.js';
export { layoutConcentricCone } from './cone/concentric.js';
export { layoutEccentricCone } from './cone/eccentric.js';
export type { LayoutBranchOptions, BranchLayout } from './branch/types.js';
export {
  layoutBranch,
  DEFAULT_BRANCH_STATIONS,
  MIN_BRANCH_STATIONS,
  MAX_BRANCH_STATIONS,
} from './branch/layout-branch.js';
export { CUT_LAYOUT_STATIONS } from './plane-cut/layout-options.js';
export type { CutLayoutOptions } from './plane-cut/layout-options.js';
export type { PlaneCutLayout } from './plane-cut/types.js';
export { layoutPlaneCut } from './plane-cut/layout-plane-cut.js';
export type { MiterLayout } from './miter/types.js';
export { layoutMiter } from './miter/layout-miter.js';

// Added in this wave: host surfaces, limits, weld preparation, fit-up, typed templates and their wording.
export type { FlatTemplate, HoleTemplate, LayoutKind, LayoutResultBase, StationBand, StationQuantity, TemplateBase, WrapTemplate } from './types.js';
export { angleFact, describeFacts, describeLength, describeLine, factLine, lengthFact, textLine, worded } from './facts.js';
export type { AngleFact, DescribeOptions, Fact, FactLine, LengthFact, TemplateFacts, TextFact } from './facts.js';
export { describeResult, describeTemplate } from './describe-result.js';
export type { BranchWeldPrep, HoleStationPrep, MiterWeldPrep, PlaneCutWeldPrep, StationWeldPrep, WeldPrep, WeldPrepOptions } from './weld/types.js';
export { CLOSED_GROOVE_MARK, HOLE_TORCH_COLUMN, WELD_ANGLE_DECIMALS, WELD_PREP_COLUMNS, weldEndLine, withBranchWeldPrep, withMiterWeldPrep, withPlaneCutWeldPrep } from './weld/with-weld-prep.js';
export { weldPrepForBranch } from './weld/weld-prep-branch.js';
export { ID_LINE_COLUMN, layoutBranchCutOnOd } from './weld/branch-od-cut.js';
export { weldPrepForMiter, weldPrepForPlaneCut } from './weld/weld-prep-cuts.js';
export { DEFAULT_ORDINATE_REFERENCE, ORDINATE_REFERENCES, ORDINATE_REFERENCE_WORDS, requireOrdinateReference } from './fit-up/ordinate-reference.js';
export type { OrdinateReference } from './fit-up/ordinate-reference.js';
export { locateCutExtremes, measureCutDepth } from './fit-up/cut-depth.js';
export type { CutDepth, CutDepthPlacement } from './fit-up/cut-depth.js';
export { SHORT_POINT_KEYS, ordinatesFrom } from './fit-up/ordinates-from.js';
export type { OrdinateColumn, ReferencedOrdinates } from './fit-up/ordinates-from.js';
export { REFERENCE_LINE_LABEL_HEIGHT_MM, referenceLines } from './fit-up/reference-lines.js';
export type { ReferenceLines } from './fit-up/reference-lines.js';
export { ARC_RADIUS_UNITS_PER_DEGREE, DEFAULT_CHECK_LENGTH_MM, MAX_CHECK_LENGTH_MM, angleCheck } from './fit-up/angle-check.js';
export type { AngleCheck, AngleCheckOptions } from './fit-up/angle-check.js';
export { branchFitUp } from './fit-up/branch-fit-up.js';
export type { BranchFitUp, BranchFitUpOptions, HeaderMark, HeaderOffset, HeelToeMarks } from './fit-up/branch-fit-up.js';
export { miterFitUp } from './fit-up/miter-fit-up.js';
export type { MiterFitUp, MiterFitUpOptions, MiterJointCheck, StockWeldLine } from './fit-up/miter-fit-up.js';
export { planeCutFitUp } from './fit-up/plane-cut-fit-up.js';
export type { PlaneCutFitUp, PlaneCutFitUpOptions } from './fit-up/plane-cut-fit-up.js';
export { jointFitUpLines, withFitUp } from './fit-up/with-fit-up.js';
export type { JointFitUp, WithFitUpOptions } from './fit-up/with-fit-up.js';
export type { StationOrdinate, TemplateOrdinates } from './fit-up/template-ordinates.js';
export { angleCheckLine, branchFitUpLines, miterFitUpLines, ordinateReferenceLine, planeCutFitUpLines } from './fit-up/fit-up-text.js';

// A trunnion on an elbow.
export type { LayoutTrunnionOptions, TrunnionLayout } from './trunnion/types.js';
export { layoutTrunnion } from './trunnion/layout-trunnion.js';
export { developElbowHole } from './trunnion/elbow-hole.js';
export type { ElbowHoleInput } from './trunnion/elbow-hole.js';

// A nozzle in a dished head.
export type { LayoutNozzleOptions, NozzleLayout } from './nozzle/types.js';
export { layoutNozzle } from './nozzle/layout-nozzle.js';
export { developHeadHole } from './nozzle/head-hole.js';
export type { HeadHoleInput } from './nozzle/head-hole.js';
// A reinforcing pad under a branch.
export type { LayoutPadOptions, PadLayout, PadSize, PadSpec } from './pad/types.js';
export { layoutPad, TELL_TALE_HOLE_MM } from './pad/layout-pad.js';
export { padEdges } from './pad/pad-outline.js';
export type { PadEdges } from './pad/pad-outline.js';
// Two branches on one header.
export { layoutWye } from './wye/layout-wye.js';
export type { WyeBranch, WyeLayout, WyeSpec } from './wye/layout-wye.js';
// Cutting-table parts: closed contours and the development surface.
export type { ClosedPart, Development, DevelopmentSurfaceKind } from './types.js';
export { closeTemplate, deepestCutbackMm, DEFAULT_STUB_MARGIN_MM } from './closed/close-template.js';
export type { CloseTemplateOptions } from './closed/close-template.js';
export { onDevelopmentSurface, developmentNote } from './plate/development-surface.js';
export type { DevelopmentSurfaceOptions } from './plate/development-surface.js';
export type { ShellPlateBranch, ShellPlateSpec, ShellPlateOptions, ShellPlateHole, ShellPlateLayout } from './shell-plate/types.js';
export { layoutShellPlate, defaultWeldZoneMm, DEFAULT_SEAM_CLOCK_HOURS, MAX_SHELL_COURSES } from './shell-plate/layout-shell-plate.js';
