/**
 * The top-level help text.
 */
import { PRINT_OPTIONS_HELP } from './print-options.js';
import { CAUTION as REPORT_CAUTION } from '@girth/pipes';
import { JOINTS } from './joints/registry.js';

/** `girth --help`. */
export function mainHelp(version: string): string {
  const joints = JOINTS.map((c) => `  ${c.name.padEnd(9)} ${c.summary}`).join('\n');
  return `girth ${version}: exact, full-size cutting templates for pipe

Usage: girth <command> [options]      girth <command> --help for its options

Joints:
${joints}
Other:
  run JOB.json --out DIR   lay out every piece of a job file (a spool's cut list)
  pipe NAME                show what a pipe name resolves to (OD, wall, ID)

Examples:
  girth branch --header "NPS 12 STD" --branch "NPS 6 STD" --angle 45
  girth miter --pipe "NPS 10 STD" --bend 90 --welds 3 --radius-nps 1.5 --svg ell.svg
  girth run fixtures/demo/job.json --out demo-out
  girth pipe "NPS 1-1/2 XS"

${REPORT_CAUTION}
`;
}

/** `girth run --help`. */
export const RUN_HELP = `girth run: lay out every piece of a job file

Usage: girth run JOB.json --out DIR [--force] [--packet [--paper NAME ...]]

Example:
  girth run fixtures/demo/job.json --out demo-out

Writes, for each piece, its templates as SVG and DXF and its station tables as
CSV (the job's "outputs" list may narrow that), named after the piece label,
and one summary.txt with the summary table and every ordinate table. With
--packet, DIR also holds job-packet.pdf, ready to print and take to the pipe:
a cover with the job, the cut list and the caution, then every piece's sheets
at true size and its ordinate tables. Nothing is written if any piece is in error. DIR is the job's own folder: it appears
complete at once (built beside it, then moved in). An existing DIR that holds
files is kept unless --force, which replaces the whole set; a folder holding
files Girth did not write is never replaced. A run that was killed is repaired
by the next run into DIR, which says what it did.

A job file:
  { "job": "Job 4471 - filter gallery", "units": "in", "stations": 16,
    "pieces": [
      { "piece": "SP-03 tee", "joint": "branch", "header": "NPS 12 STD", "branch": "NPS 6 STD" },
      { "piece": "SP-02 ell", "joint": "miter", "pipe": "NPS 10 STD", "bend": 90, "welds": 3, "radiusNps": 1.5 },
      { "piece": "SP-01 vent", "joint": "cutback", "pipe": "NPS 6 STD", "angle": 60 },
      { "piece": "R-007", "joint": "reducer", "large": "NPS 12 STD", "small": "NPS 8 STD", "length": "7", "plate": "3/8" } ] }
Keys of a piece are those of its command's options in camelCase (radiusNps,
includedAngle, branchSurface); lengths are text ("2 1/2\\"", "63.5mm") or numbers
in the job's unit. Optional job keys: decimal, fraction (8|16|32),
dxfVersion ("2007"|"r12"), dxfCurves ("lines"|"arcs"), outputs (["svg","dxf","csv"]).

Printing the packet (with --packet; lengths in the job's unit):
${PRINT_OPTIONS_HELP}

${REPORT_CAUTION}
`;
