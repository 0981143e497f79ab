/**
 * girth: the command line (`runCli` runs it in-process with your own
 * `CliIo`), and the pieces it is built from: job files (`parseJob`,
 * `planJob`, `planPieces` one piece at a time), joint inputs (`layoutJoint`), output planning and atomic file
 * writing. Node only (it reads and writes files); the library packages
 * (@girth/pipes ... @girth/table) are the browser-safe surface.
 *
 * The public surface is this list, by name: modules inside may move or split
 * without changing it. Anything not named here is internal.
 *
 * @packageDocumentation
 * @module girth
 */

export { runCli, runCommand, GIRTH_VERSION, PIPE_CAUTION, EXIT } from './run-cli.js';
export { JOINTS, jointNamed } from './joints/registry.js';
export { defineJoint } from './joints/definition.js';
export type { JointDefinition } from './joints/definition.js';
export type { CliIo } from './io.js';
export { writeFilesAtomically } from './write-files.js';
export type { PlannedFile } from './write-files.js';
export { templatePath, planOutputs } from './outputs.js';
export type { OutputRequest, OutputStyle } from './outputs.js';
export { reportLength, reportLengthAtLeast, layoutReportText, REPORT_CAUTION } from './report.js';
export type { ReportStyle } from './report.js';
export type {
  WrittenLength,
  BranchInput,
  MiterInput,
  CutbackInput,
  ReducerInput,
  JointInput,
  JointContext,
} from './joints/types.js';
export { layoutJoint } from './joints/layout-joint.js';
export { fieldPath, parseJob } from './job/schema.js';
export type { JobPiece, Job } from './job/schema.js';
export { pieceStem, planJob, planPieces } from './job/run-job.js';
export type { JobPlan, JobTiming, PiecePlan } from './job/run-job.js';
export { checkOutputPath } from './output-paths.js';
