/**
 * The `girth` command as a function: arguments in, text and files out, an exit
 * code back. `main.ts` only wires it to the process.
 *
 * Start-up: this file loads only the option parser, the help and the joint
 * definitions. Laying out a joint loads the layout code and exporters
 * (`commands/joint-command.ts`); only `girth run` loads the job validator
 * (`commands/run-command.ts`). `bench/startup.mjs` measures it.
 */
import { CAUTION, GirthError } from '@girth/pipes';
import { parseOptions, stringOption } from './args.js';
import { COMMON_OPTIONS, COMMON_OPTIONS_HELP } from './commands/common-options.js';
import { mainHelp, RUN_HELP } from './help.js';
import { PRINT_OPTIONS } from './print-options.js';
import type { CliIo } from './io.js';
import { JOINTS, jointNamed } from './joints/registry.js';
import { printable } from './labels.js';

export { PIPE_CAUTION } from './commands/pipe-command.js';

/** The version printed by `--version`. */
export const GIRTH_VERSION = '0.1.0';

/** Exit codes: 0 done, 2 bad input (nothing written), 1 an unexpected failure. */
export const EXIT = { ok: 0, failure: 1, badInput: 2 } as const;

/**
 * Runs `girth` with the given arguments (without `node` and the script).
 * Messages are printed with control characters escaped, whatever the input held.
 * @returns the exit code.
 * @example await runCli(['branch', '--header', 'NPS 12 STD', '--branch', 'NPS 6 STD'], io)
 */
export async function runCli(argv: readonly string[], io: CliIo): Promise<number> {
  try {
    await runCommand(argv, io);
    return EXIT.ok;
  } catch (error) {
    if (error instanceof GirthError) {
      io.err(`girth: ${printable(error.message)}\n`);
      return EXIT.badInput;
    }
    const message = error instanceof Error ? error.message : String(error);
    io.err(`girth: unexpected failure: ${printable(message)}\n`);
    return EXIT.failure;
  }
}

/**
 * Runs `girth` and lets a GirthError through (for tests and programs that
 * want the code and field rather than the printed message).
 * @throws GirthError for bad input; nothing is written then.
 * @example await runCommand(['pipe', 'NPS 6 STD'], io)
 */
export async function runCommand(argv: readonly string[], io: CliIo): Promise<void> {
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
  if (command === 'pipe') return (await import('./commands/pipe-command.js')).pipeCommand(rest, io);
  const joint = jointNamed(command);
  if (joint === undefined) {
    const known = [...JOINTS.map((c) => c.name), 'run', 'pipe'].join(', ');
    throw new GirthError('BAD_OPTION', 'command', `unknown command "${command}"; commands are ${known} (girth --help)`, command);
  }
  const args = parseOptions(rest, { ...COMMON_OPTIONS, ...joint.options });
  if (args.values.help === true) {
    io.out(`${joint.help}\n\n${COMMON_OPTIONS_HELP}\n\n${CAUTION}\n`);
    return;
  }
  return (await import('./commands/joint-command.js')).runJointCommand(joint, args, io);
}

async function runJobCommand(argv: readonly string[], io: CliIo): Promise<void> {
  const args = parseOptions(argv, { out: { type: 'string', short: 'o' }, force: { type: 'boolean' }, packet: { type: 'boolean' }, ...PRINT_OPTIONS, help: { type: 'boolean', short: 'h' } }, true);
  if (args.values.help === true) {
    io.out(RUN_HELP);
    return;
  }
  const [jobPath, ...extra] = args.positionals;
  if (jobPath === undefined) throw new GirthError('MISSING_INPUT', 'job', 'run: give the job file, e.g. girth run job.json --out out/');
  if (extra.length > 0) throw new GirthError('BAD_OPTION', 'job', `run: one job file at a time; unexpected "${extra[0]}"`);
  const outDir = stringOption(args, 'out');
  if (outDir === undefined) throw new GirthError('MISSING_INPUT', '--out', '--out: required, the folder for the templates, e.g. --out out/');
  await (await import('./commands/run-command.js')).runJobFile(jobPath, outDir, args.values.force === true, io, args);
}
