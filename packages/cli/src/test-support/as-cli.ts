/**
 * Test helper: a branch laid out by the library with the fit-up the command
 * line applies by default (angle check over a foot, or 300 mm, an inch or
 * 10 mm of arc per degree; lengths worded in the job's unit), for comparing
 * `--json` with the library.
 */
import type { FormatLengthOptions } from '@girth/pipes';
import { branchFitUp, layoutBranch, withFitUp, type BranchLayout, type WithFitUpOptions } from '@girth/unroll';

/** The command line's default angle-check lengths for each unit, mm. */
export const CLI_CHECK = {
  in: { runMm: 304.8, chordRadiusMm: 304.8, arcUnitMm: 25.4 },
  mm: { runMm: 300, chordRadiusMm: 300, arcUnitMm: 10 },
} as const;

/** The command line's default wording of lengths: feet-inch-sixteenths for inch jobs, mm for mm jobs. */
export const cliFormat = (units: 'in' | 'mm'): FormatLengthOptions => (units === 'mm' ? { format: 'mm' } : { format: 'ft-in', fraction: 16 });

/** `layoutBranch` with the command line's default fit-up applied. */
export function branchAsCli(
  spec: Parameters<typeof layoutBranch>[0],
  stations: number,
  units: 'in' | 'mm',
  options: Omit<WithFitUpOptions, 'format'> & { readonly format?: FormatLengthOptions } = {},
): BranchLayout {
  return withFitUp(layoutBranch(spec, { stations }), branchFitUp(spec, CLI_CHECK[units]), { format: cliFormat(units), ...options });
}
