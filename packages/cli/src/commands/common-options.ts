/**
 * Options every joint command takes: units, stations, outputs, labels.
 */
import { GirthError, type LengthUnit } from '@girth/pipes';
import type { DxfVersion } from '@girth/dxf';
import type { TableLengthFormat } from '@girth/table';
import { choiceOption, numberOption, stringOption, type OptionSpec, type ParsedArgs } from '../args.js';
import type { JointContext } from '../joints/types.js';
import type { OutputRequest, OutputStyle } from '../outputs.js';

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
  json: { type: 'boolean' },
  job: { type: 'string' },
  piece: { type: 'string' },
  force: { type: 'boolean' },
  help: { type: 'boolean', short: 'h' },
};

/** Help lines for the shared options. */
export const COMMON_OPTIONS_HELP = `Units and stations:
  --units in|mm          unit of bare numbers and of every output (default in)
  --stations N           equal stations around the girth, 4 to 360 (default 16)
  --decimal              inches as decimals instead of feet-inch-fractions
  --fraction 8|16|32     round feet-inch output to 1/8, 1/16 or 1/32 in (default 16)
Outputs (without any, the ordinate table is printed):
  --svg FILE             true-size wrap/pattern for printing or plotting
  --dxf FILE             flat pattern for a cutting table
  --dxf-version 2007|r12 DXF flavour (default 2007; r12 for older tables)
  --csv FILE             station table as CSV
  --json                 print the result as JSON on standard output
  --job TEXT, --piece TEXT  labels printed on every sheet
  --force                overwrite existing files
  Several templates from one joint get their id before the extension:
  tee.svg -> tee.branch-cut.svg, tee.header-hole.svg`;

/** Everything the shared options decide. */
export interface CommonSettings {
  readonly ctx: JointContext;
  readonly style: OutputStyle;
  readonly request: OutputRequest;
  readonly json: boolean;
  readonly force: boolean;
}

/**
 * Reads the shared options.
 * @throws GirthError naming the option at fault.
 */
export function readCommonOptions(args: ParsedArgs): CommonSettings {
  const units = choiceOption<LengthUnit>(args, 'units', ['in', 'mm'], 'in');
  const stations = numberOption(args, 'stations', 16) ?? 16;
  if (!Number.isInteger(stations) || stations < 4 || stations > 360) {
    throw new GirthError('OUT_OF_RANGE', '--stations', `--stations: must be a whole number from 4 to 360, got ${stations}`, stations);
  }
  const fractionText = choiceOption(args, 'fraction', ['8', '16', '32'], '16');
  const fraction = Number(fractionText) as 8 | 16 | 32;
  const tableFormat: TableLengthFormat = units === 'mm' ? 'mm' : args.values.decimal === true ? 'in' : 'ft-in';
  const dxfVersion: DxfVersion = choiceOption(args, 'dxf-version', ['2007', 'r12'], '2007') === 'r12' ? 'R12' : 'AC1021';
  const job = stringOption(args, 'job');
  const piece = stringOption(args, 'piece');
  const request: OutputRequest = {
    ...(stringOption(args, 'svg') !== undefined ? { svg: stringOption(args, 'svg')! } : {}),
    ...(stringOption(args, 'dxf') !== undefined ? { dxf: stringOption(args, 'dxf')! } : {}),
    ...(stringOption(args, 'csv') !== undefined ? { csv: stringOption(args, 'csv')! } : {}),
  };
  return {
    ctx: {
      units,
      stations,
      fieldPrefix: '--',
      fieldName: (name) => `--${kebab(name)}`,
      describe: { units, lengthFormat: tableFormat, fraction },
    },
    style: { units, tableFormat, fraction, dxfVersion, ...(job !== undefined ? { job } : {}), ...(piece !== undefined ? { piece } : {}) },
    request,
    json: args.values.json === true,
    force: args.values.force === true,
  };
}

/** `radiusNps` → `radius-nps`, as the option is typed. */
export function kebab(name: string): string {
  return name.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`);
}
