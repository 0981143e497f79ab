/**
 * The Node-free part of the command line, for the browser page
 * (`girth/joints`): the joint definitions, laying out a joint as a fitter
 * writes it, the job file's schema and the report's figures. Nothing here
 * imports a Node built-in; the page's build fails if that changes.
 *
 * @module girth/joints
 */

export { JOINTS, jointNamed } from './joints/registry.js';
export type { JointDefinition } from './joints/definition.js';
export { layoutJoint } from './joints/layout-joint.js';
export type { WrittenLength, BranchInput, MiterInput, CutbackInput, ReducerInput, JointInput, JointContext } from './joints/types.js';
export { parseJob, fieldPath } from './job/schema.js';
export type { Job, JobPiece } from './job/schema.js';
export { checkLabel, MAX_LABEL_CHARS } from './labels.js';
export { layoutReportText, REPORT_CAUTION } from './report.js';
export type { ReportStyle } from './report-style.js';
