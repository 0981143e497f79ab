/**
 * Options every joint command takes: units, stations, outputs, labels.
 */
import { DEFAULT_STATIONS, GirthError, parseLength, rangeText, requireWithin, STATIONS, type LengthUnit } from '@girth/pipes';
import type { DxfCurveMode, DxfTextMode, DxfVersion } from '@girth/dxf';
import type { CuttingSettings } from '../cutting-parts.js';
import type { TableLengthFormat } from '@girth/table';
import { choiceOption, numberOption, optionalChoice, stringOption, type OptionSpec, type ParsedArgs } from '../args.js';
import { checkLabel } from '../labels.js';
import type { JointContext } from '../joints/types.js';
import type { OutputRequest, OutputStyle } from '../outputs.js';
import type { PdfOptions } from '@girth/pdf';
import { PRINT_OPTIONS, PRINT_OPTIONS_HELP, readPrintOptions } from '../print-options.js';

/** The option definitions shared by all joint commands. */
export const COMMON_OPTIONS: OptionSpec = {
  units: { type: 'string' },
  stations: { type: 'string' },
  decimal: { type: 'boolean' },
  fraction: { type: 'string' },
  svg: { type: 'string' },
  dxf: { type: 'string' },
  'dxf-version': { type: 'string' },
  csv: { type: 'string' },
  'closed-parts': { type: 'boolean' },
  stub: { type: 'string' },
  'develop-on': { type: 'string' },
  'rolled-plate': { type: 'string' },
  'dxf-text': { type: 'string' },
  'dxf-curves': { type: 'string' },
  pdf: { type: 'string' },
  ...PRINT_OPTIONS,
  json: { type: 'boolean' },
  job: { type: 'string' },
  piece: { type: 'string' },
  force: { type: 'boolean' },
  help: { type: 'boolean', short: 'h' },
};

/** Help lines for the shared options. */
export const COMMON_OPTIONS_HELP = `Units and stations:
  --units in|mm          unit of bare numbers and of every output (default in)
  --stations N           equal stations around the girth, ${rangeText(STATIONS)} (default ${DEFAULT_STATIONS})
  --decimal              inches as decimals instead of feet-inch-fractions (inches only)
  --fraction 8|16|32     round feet-inch output to 1/8, 1/16 or 1/32 in (default 16; feet-inch only)
Outputs (without any, the ordinate table is printed):
  --svg FILE             true-size wrap/pattern for printing or plotting
  --dxf FILE             flat pattern for a cutting table
  --dxf-version 2007|r12 DXF flavour (default 2007; r12 for older tables; with --dxf)
  --csv FILE             station table as CSV
For a cutting table (SVG, DXF, CSV and JSON all show the same part):
  --closed-parts         every part one closed contour: a wrap gets both seam
                         edges and a square end; a miter middle piece closes
  --stub LENGTH          with --closed-parts: branch or pipe end length from the
                         square line (long point) to the square end
                         (default: deepest cutback + 2 in / 50 mm)
  --develop-on od|mid    girth on the OD (wrap laid on the pipe, default) or on the
                         mid-thickness of plate cut flat and rolled (pi x (OD - t))
  --rolled-plate LENGTH  with --develop-on mid: thickness of the plate rolled into
                         the pipe (default each pipe's wall)
  --dxf-text text|none|stroke  DXF text as text, left out, or single-stroke
                         lines on MARK for a table that etches (with --dxf)
  --dxf-curves lines|arcs  DXF cut lines as short straight chords (default; every
                         table reads them) or fitted arcs within 0.05 mm of the
                         true cut (fewer, smoother moves; with --dxf)
  --pdf FILE             every sheet at true size in one PDF, tiled on office paper
                         with an assembly map, or one page per roll width
${PRINT_OPTIONS_HELP}
  --json                 print the result as JSON on standard output
  --job TEXT, --piece TEXT  labels printed on every sheet
  --force                overwrite existing files
  Several templates from one joint get their id before the extension:
  tee.svg -> tee.branch-cut.svg, tee.header-hole.svg`;

/** Everything the shared options decide. */
export interface CommonSettings {
  /** Closed parts and development surface, applied to the result before any output. */
  readonly cutting: CuttingSettings;
  readonly ctx: JointContext;
  readonly style: OutputStyle;
  readonly request: OutputRequest;
  /** How to print the PDF, when `--pdf` is given. */
  readonly print?: PdfOptions;
  readonly json: boolean;
  readonly force: boolean;
}

/**
 * Reads the shared options.
 * @throws GirthError naming the option at fault.
 */
export function readCommonOptions(args: ParsedArgs): CommonSettings {
  const units = choiceOption<LengthUnit>(args, 'units', ['in', 'mm'], 'in');
  const stations = requireWithin(numberOption(args, 'stations', DEFAULT_STATIONS), '--stations', STATIONS);
  refuseIdleOptions(args, units);
  const fractionText = choiceOption(args, 'fraction', ['8', '16', '32'], '16');
  const fraction = Number(fractionText) as 8 | 16 | 32;
  const tableFormat: TableLengthFormat = units === 'mm' ? 'mm' : args.values.decimal === true ? 'in' : 'ft-in';
  const dxfVersion: DxfVersion = choiceOption(args, 'dxf-version', ['2007', 'r12'], '2007') === 'r12' ? 'R12' : 'AC1021';
  const job = checkLabel(stringOption(args, 'job'), '--job');
  const piece = checkLabel(stringOption(args, 'piece'), '--piece');
  const request: OutputRequest = {
    ...(stringOption(args, 'svg') !== undefined ? { svg: stringOption(args, 'svg')! } : {}),
    ...(stringOption(args, 'dxf') !== undefined ? { dxf: stringOption(args, 'dxf')! } : {}),
    ...(stringOption(args, 'csv') !== undefined ? { csv: stringOption(args, 'csv')! } : {}),
    ...(stringOption(args, 'pdf') !== undefined ? { pdf: stringOption(args, 'pdf')! } : {}),
  };
  const cutting = readCuttingOptions(args, units);
  const dxfTextChoice = optionalChoice(args, 'dxf-text', ['text', 'none', 'stroke'] as const);
  if (dxfTextChoice !== undefined && stringOption(args, 'dxf') === undefined) {
    throw new GirthError('BAD_OPTION', '--dxf-text', '--dxf-text: no DXF is written; give --dxf FILE too, or leave --dxf-text out');
  }
  const dxfText: DxfTextMode = dxfTextChoice ?? 'text';
  const dxfCurvesChoice = optionalChoice(args, 'dxf-curves', ['lines', 'arcs'] as const);
  if (dxfCurvesChoice !== undefined && stringOption(args, 'dxf') === undefined) {
    throw new GirthError('BAD_OPTION', '--dxf-curves', '--dxf-curves: no DXF is written; give --dxf FILE too, or leave --dxf-curves out');
  }
  const dxfCurves: DxfCurveMode = dxfCurvesChoice ?? 'lines';
  const print = readPrintOptions(args, units, request.pdf !== undefined, '--pdf FILE');
  return {
    cutting,
    ctx: {
      units,
      stations,
      fieldPrefix: '--',
      fieldName: (name) => `--${kebab(name)}`,
      describe: { units, lengthFormat: tableFormat, fraction },
    },
    style: { units, tableFormat, fraction, dxfVersion, dxfText, dxfCurves, ...(job !== undefined ? { job } : {}), ...(piece !== undefined ? { piece } : {}) },
    request,
    ...(print !== undefined ? { print } : {}),
    json: args.values.json === true,
    force: args.values.force === true,
  };
}

/**
 * Refuses options that would do nothing with the others given, so a fitter
 * does not believe they took effect: `--decimal` or `--fraction` with mm,
 * `--fraction` with `--decimal`, `--dxf-version` without `--dxf`.
 * @throws GirthError `BAD_OPTION` naming the idle option and what it needs.
 */
export function refuseIdleOptions(args: ParsedArgs, units: LengthUnit): void {
  const idle = (option: string, why: string): never => {
    throw new GirthError('BAD_OPTION', option, `${option}: ${why}`);
  };
  if (units === 'mm' && args.values.decimal === true) idle('--decimal', 'millimetres are always decimal; --decimal is for inches (--units in)');
  if (units === 'mm' && stringOption(args, 'fraction') !== undefined) idle('--fraction', 'millimetres are not rounded to fractions; --fraction is for feet-inch output (--units in)');
  if (args.values.decimal === true && stringOption(args, 'fraction') !== undefined) idle('--fraction', 'decimal inches are not rounded to fractions; give --decimal or --fraction, not both');
  if (stringOption(args, 'dxf-version') !== undefined && stringOption(args, 'dxf') === undefined) idle('--dxf-version', 'no DXF is written; give --dxf FILE too, or leave --dxf-version out');
}

/** `radiusNps` → `radius-nps`, as the option is typed. */
export function kebab(name: string): string {
  return name.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`);
}

/**
 * Reads `--closed-parts`, `--stub`, `--develop-on` and `--rolled-plate`.
 * @throws GirthError naming the option: `BAD_OPTION` for `--stub` without
 *   `--closed-parts` or `--rolled-plate` without `--develop-on mid`; the length errors
 *   of a stub or plate that is not a length above zero.
 * @example readCuttingOptions(parseOptions(['--closed-parts'], COMMON_OPTIONS), 'in').closedParts // true
 */
export function readCuttingOptions(args: ParsedArgs, units: LengthUnit): CuttingSettings {
  const closedParts = args.values['closed-parts'] === true;
  const developOn = choiceOption(args, 'develop-on', ['od', 'mid'], 'od');
  const stubText = stringOption(args, 'stub');
  const plateText = stringOption(args, 'rolled-plate');
  if (stubText !== undefined && !closedParts) {
    throw new GirthError('BAD_OPTION', '--stub', '--stub: the stub length is for closed parts; give --closed-parts too, or leave --stub out');
  }
  if (plateText !== undefined && developOn !== 'mid') {
    throw new GirthError('BAD_OPTION', '--rolled-plate', '--rolled-plate: the plate thickness is for --develop-on mid; give it too, or leave --rolled-plate out');
  }
  const stubMm = stubText === undefined ? undefined : parseLength(stubText, { unit: units, field: '--stub' });
  const plateMm = plateText === undefined ? undefined : parseLength(plateText, { unit: units, field: '--rolled-plate' });
  return {
    closedParts,
    developOn,
    ...(stubMm === undefined ? {} : { stubMm }),
    ...(plateMm === undefined ? {} : { plateMm }),
    fields: { stub: '--stub', plate: '--rolled-plate' },
  };
}
