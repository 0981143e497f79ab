/**
 * The `girth` command as a function: arguments in, text and files out, an exit
 * code back. `main.ts` only wires it to the process.
 */
import { GirthError, resolvePipe, type LengthUnit } from '@girth/pipes';
import { choiceOption, parseOptions, stringOption } from './args.js';
import { COMMON_OPTIONS, COMMON_OPTIONS_HELP, readCommonOptions } from './commands/common-options.js';
import { JOINT_COMMANDS, type JointCommand } from './commands/joint-commands.js';
import { mainHelp, RUN_HELP } from './help.js';
import type { CliIo } from './io.js';
import { layoutJoint } from './joints/layout-joint.js';
import { parseJob } from './job/schema.js';
import { planJob } from './job/run-job.js';
import { readJobFile } from './job/read-job-file.js';
import { writeJobFolder } from './job/write-job-folder.js';
import { planOutputs } from './outputs.js';
import { layoutJson, layoutReportText, REPORT_CAUTION } from './report.js';
import { writeFilesAtomically } from './write-files.js';

/** The version printed by `--version`. */
export const GIRTH_VERSION = '0.1.0';

/** Printed under pipe dimensions: they are nominal, the pipe on the rack is not. */
export const PIPE_CAUTION =
  'CAUTION: nominal dimensions from the standard; measure the actual pipe (OD, wall, out-of-round) before laying out or cutting.';

/** Exit codes: 0 done, 2 bad input (nothing written), 1 an unexpected failure. */
export const EXIT = { ok: 0, failure: 1, badInput: 2 } as const;

/**
 * Runs `girth` with the given arguments (without `node` and the script).
 * @returns the exit code.
 * @example await runCli(['branch', '--header', 'NPS 12 STD', '--branch', 'NPS 6 STD'], io)
 */
export async function runCli(argv: readonly string[], io: CliIo): Promise<number> {
  try {
    await dispatch(argv, io);
    return EXIT.ok;
  } catch (error) {
    if (error instanceof GirthError) {
      io.err(`girth: ${error.message}\n`);
      return EXIT.badInput;
    }
    const message = error instanceof Error ? error.message : String(error);
    io.err(`girth: unexpected failure: ${message}\n`);
    return EXIT.failure;
  }
}

async function dispatch(argv: readonly string[], io: CliIo): Promise<void> {
  const [command, ...rest] = argv;
  if (command === undefined || command === '--help' || command === '-h' || command === 'help') {
    io.out(mainHelp(GIRTH_VERSION));
    return;
  }
  if (command === '--version' || command === '-v') {
    io.out(`${GIRTH_VERSION}\n`);
    return;
  }
  if (command === 'run') return runJobCommand(rest, io);
  if (command === 'pipe') return pipeCommand(rest, io);
  const joint = JOINT_COMMANDS.find((c) => c.name === command);
  if (joint === undefined) {
    const known = [...JOINT_COMMANDS.map((c) => c.name), 'run', 'pipe'].join(', ');
    throw new GirthError('BAD_OPTION', 'command', `unknown command "${command}"; commands are ${known} (girth --help)`, command);
  }
  return jointCommand(joint, rest, io);
}

async function jointCommand(command: JointCommand, argv: readonly string[], io: CliIo): Promise<void> {
  const args = parseOptions(argv, { ...COMMON_OPTIONS, ...command.options });
  if (args.values.help === true) {
    io.out(`${command.help}\n\n${COMMON_OPTIONS_HELP}\n\n${REPORT_CAUTION}\n`);
    return;
  }
  const settings = readCommonOptions(args);
  const result = layoutJoint(command.toInput(args), settings.ctx);
  const files = planOutputs(result, settings.request, settings.style);
  const written = await writeFilesAtomically(files, { force: settings.force, onNote: io.err });
  if (settings.json) {
    io.out(`${JSON.stringify(layoutJson(result, settings.ctx.units), null, 2)}\n`);
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

async function runJobCommand(argv: readonly string[], io: CliIo): Promise<void> {
  const args = parseOptions(argv, { out: { type: 'string', short: 'o' }, force: { type: 'boolean' }, help: { type: 'boolean', short: 'h' } }, true);
  if (args.values.help === true) {
    io.out(RUN_HELP);
    return;
  }
  const [jobPath, ...extra] = args.positionals;
  if (jobPath === undefined) throw new GirthError('BAD_OPTION', 'job', 'run: give the job file, e.g. girth run job.json --out out/');
  if (extra.length > 0) throw new GirthError('BAD_OPTION', 'job', `run: one job file at a time; unexpected "${extra[0]}"`);
  const outDir = stringOption(args, 'out');
  if (outDir === undefined) throw new GirthError('BAD_OPTION', '--out', '--out: required, the folder for the templates, e.g. --out out/');
  const job = parseJob(await readJobFile(jobPath));
  const plan = planJob(job, outDir);
  const written = await writeJobFolder(outDir, plan.files, { force: args.values.force === true, onNote: io.err, label: job.job });
  io.out(plan.summary);
  io.err(`wrote ${written.count} files to ${outDir}\n`);
}

async function pipeCommand(argv: readonly string[], io: CliIo): Promise<void> {
  const args = parseOptions(argv, { units: { type: 'string' }, help: { type: 'boolean', short: 'h' } }, true);
  if (args.values.help === true || args.positionals.length === 0) {
    io.out(
      'girth pipe NAME [--units in|mm]: what a pipe name resolves to\n\nExamples:\n  girth pipe "NPS 16 STD"\n  girth pipe "DN 150 x 7.1"\n  girth pipe "24 od x .375" --units in\n\n' +
        `${PIPE_CAUTION}\n`,
    );
    return;
  }
  const unit = choiceOption<LengthUnit>(args, 'units', ['in', 'mm'], 'mm');
  const pipe = resolvePipe(args.positionals.join(' '), { unit, field: 'pipe' });
  const inch = (mm: number): string => `${(mm / 25.4).toFixed(3)} in`;
  io.out(
    `${pipe.label} (${pipe.standard})\n  OD   ${pipe.odMm.toFixed(2)} mm  ${inch(pipe.odMm)}\n  wall ${pipe.wallMm.toFixed(2)} mm  ${inch(pipe.wallMm)}\n  ID   ${pipe.idMm.toFixed(2)} mm  ${inch(pipe.idMm)}\n${PIPE_CAUTION}\n`,
  );
}
