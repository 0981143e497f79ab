/**
 * `girth pipe NAME`: what a pipe name resolves to. Needs only the pipe catalog.
 */
import { resolvePipe, type LengthUnit } from '@girth/pipes';
import type { CliIo } from '../io.js';
import { choiceOption, parseOptions } from '../args.js';

/** Printed under pipe dimensions: they are nominal, the pipe on the rack is not. */
export const PIPE_CAUTION =
  'CAUTION: nominal dimensions from the standard; measure the actual pipe (OD, wall, out-of-round) before laying out or cutting.';

/**
 * Runs `girth pipe`.
 * @throws GirthError for a name that is not a pipe.
 */
export function pipeCommand(argv: readonly string[], io: CliIo): void {
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
