/**
 * `girth <joint> ...`: lay out one joint from its flags, print its report or
 * write its files. Loaded only when a joint is laid out (it brings in the
 * layout code and the exporters).
 */
import type { CliIo } from '../io.js';
import type { ParsedArgs } from '../args.js';
import type { JointDefinition } from '../joints/definition.js';
import { layoutJoint } from '../joints/layout-joint.js';
import type { JointInput } from '../joints/registry.js';
import { planOutputs, planPdfOutput } from '../outputs.js';
import { prepareForCutting } from '../cutting-parts.js';
import { toResultJson } from '@girth/table';
import { layoutReportText, REPORT_CAUTION } from '../report.js';
import { writeFilesAtomically } from '../write-files.js';
import { readCommonOptions } from './common-options.js';

/**
 * Runs a joint command whose options are already parsed.
 * @throws GirthError for bad input (nothing written).
 */
export async function runJointCommand(joint: JointDefinition<JointInput>, args: ParsedArgs, io: CliIo): Promise<void> {
  const settings = readCommonOptions(args);
  const result = prepareForCutting(layoutJoint(joint.fromOptions(args), settings.ctx), settings.cutting, settings.ctx.units, settings.ctx.describe);
  const files = [...planOutputs(result, settings.request, settings.style), ...(await planPdfOutput(result, settings.request, settings.style, settings.print))];
  const written = await writeFilesAtomically(files, { force: settings.force, onNote: io.err });
  if (settings.json) {
    io.out(`${JSON.stringify(toResultJson(result, { units: settings.ctx.units }), null, 2)}\n`);
    io.err(`${REPORT_CAUTION}\n`);
  } else if (written.length === 0) {
    io.out(`${layoutReportText(result, settings.style)}\n${REPORT_CAUTION}\n`);
  }
  for (const path of written) io.err(`wrote ${path}\n`);
  if (written.length > 0 && !settings.json) {
    for (const w of result.warnings) io.err(`WARNING ${w.code}: ${w.message}\n`);
    io.err(`${REPORT_CAUTION}\n`);
  }
}
