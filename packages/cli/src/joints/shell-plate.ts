/**
 * The shell-plate piece: a header rolled from plate, with every branch hole
 * cut flat before rolling.
 */
import { GirthError, JOINT_ANGLE_DEG, rangeText } from '@girth/pipes';
import type { ShellPlateLayout } from '@girth/unroll';
import { numberOption, requireOption, stringOption } from '../option-values.js';
import { reportLength } from '../report-style.js';
import { defineJoint, optional } from './definition.js';
import { readLength, readPipe, renameField } from './read-inputs.js';
import type { WrittenLength } from './types.js';

/** One branch on the shell, as a fitter writes it. */
export interface ShellBranchInput {
  readonly name: string;
  readonly branch: string;
  readonly station: WrittenLength;
  readonly clock: number;
  readonly angle?: number;
  readonly offset?: WrittenLength;
  readonly fit?: 'set-on' | 'set-in';
  readonly gap?: WrittenLength;
}

/** A shell plate with its branch holes, as a fitter writes it. */
export interface ShellPlateInput {
  readonly joint: 'shell-plate';
  readonly header: string;
  readonly length: WrittenLength;
  readonly seamClock?: number;
  readonly maxPlateLength?: WrittenLength;
  readonly weldZone?: WrittenLength;
  readonly branches: readonly ShellBranchInput[];
}

const FITS = ['set-on', 'set-in'] as const;

/** Library field of a branch and the job key the user wrote for it. */
const BRANCH_KEYS: Readonly<Record<string, string>> = {
  name: 'name',
  branch: 'branch',
  stationMm: 'station',
  clockHours: 'clock',
  angleDeg: 'angle',
  offsetMm: 'offset',
  fit: 'fit',
  gapMm: 'gap',
};

/**
 * The `--holes` text: holes split by `;`, each `name, pipe, station, clock`
 * and optionally `, angle` and `, offset`.
 * @throws GirthError `BAD_OPTION` (`--holes`) for a hole with too few or too many parts, `NOT_A_NUMBER` for a clock or angle that is not a number.
 */
function readHoles(text: string): ShellBranchInput[] {
  return text
    .split(';')
    .map((h) => h.trim())
    .filter((h) => h !== '')
    .map((h, i) => {
      const parts = h.split(',').map((p) => p.trim());
      if (parts.length < 4 || parts.length > 6) {
        throw new GirthError('BAD_OPTION', '--holes', `--holes: hole ${i + 1} "${h}" needs name, pipe, station, clock (and optionally angle, offset), split by commas`, h);
      }
      const num = (s: string, what: string): number => {
        const v = Number(s);
        if (s === '' || !Number.isFinite(v)) throw new GirthError('NOT_A_NUMBER', '--holes', `--holes: the ${what} of hole ${i + 1} must be a number, got "${s}"`, s);
        return v;
      };
      const [name, branch, station, clock, angle, offset] = parts as [string, string, string, string, string?, string?];
      return {
        name,
        branch,
        station,
        clock: num(clock, 'clock position'),
        ...optional('angle', angle === undefined ? undefined : num(angle, 'angle')),
        ...optional('offset', offset),
      };
    });
}

/** `girth shell-plate` and a job's `"joint": "shell-plate"`. */
export const shellPlateJoint = defineJoint<ShellPlateInput>({
  name: 'shell-plate',
  summary: 'header rolled from plate: the flat plate with every branch hole, cut before rolling',
  options: {
    header: { type: 'string' },
    length: { type: 'string' },
    'seam-clock': { type: 'string' },
    'max-plate-length': { type: 'string' },
    'weld-zone': { type: 'string' },
    holes: { type: 'string' },
  },
  help: `girth shell-plate: a header rolled from plate, with its branch holes cut flat first

  --header PIPE          the shell's OD and wall (the wall is the plate), e.g. "NPS 24 STD"
  --length LENGTH        length of the shell along its axis
  --seam-clock CLOCK     clock position of the long seam, 0 to 12 (default 3)
  --max-plate-length LENGTH
                         longest plate you can cut; a longer shell is split into
                         equal courses with circumferential seams
  --weld-zone LENGTH     clearance kept around each hole for its weld
                         (default the larger of 50 mm and twice the wall)
  --holes TEXT           the branches, split by ";": name, pipe, station, clock
                         and optionally angle (${rangeText(JOINT_ANGLE_DEG)}, default 90), offset
                         station: from the shell's start end to the branch axis;
                         clock: looking along the shell from its start end, 12 on top
  In a job file, "branches" lists them: { "name", "branch", "station", "clock",
  "angle", "offset", "fit", "gap" }.

The plate is measured on the mid-thickness: width pi x (OD - wall). Holes are drawn
as seen from the outside face, girth running clockwise from the seam.

Examples:
  girth shell-plate --header "NPS 24 STD" --length 96 --seam-clock 3 --holes "N1, NPS 6 STD, 20, 12; N2, NPS 4 STD, 60, 4.5, 45" --dxf shell.dxf
  girth shell-plate --units mm --header "610 od x 9.5" --length 6000 --max-plate-length 2400 --holes "A, DN 150 x 7.1, 1200, 12; B, DN 100 x 6, 4000, 9" --svg shell.svg`,
  fieldNames: { header: 'header', lengthMm: 'length', seamClockHours: 'seamClock', maxPlateLengthMm: 'maxPlateLength', weldZoneMm: 'weldZone', branches: 'branches' },
  fromOptions: (args) => {
    const holes = stringOption(args, 'holes');
    return {
      joint: 'shell-plate',
      header: requireOption(args, 'header', '"NPS 24 STD"'),
      length: requireOption(args, 'length', '96'),
      ...optional('seamClock', numberOption(args, 'seam-clock')),
      ...optional('maxPlateLength', stringOption(args, 'max-plate-length')),
      ...optional('weldZone', stringOption(args, 'weld-zone')),
      branches: holes === undefined ? [] : readHoles(holes),
    };
  },
  jobKeys: (k) => ({
    header: k.text(),
    length: k.length(),
    seamClock: k.number().optional(),
    maxPlateLength: k.length().optional(),
    weldZone: k.length().optional(),
    branches: k.z.array(
      k.z.strictObject({
        name: k.text(),
        branch: k.text(),
        station: k.length(),
        clock: k.number(),
        angle: k.within(JOINT_ANGLE_DEG).optional(),
        offset: k.length().optional(),
        fit: k.choice(FITS).optional(),
        gap: k.length().optional(),
      }),
    ),
  }),
  layout: (input, ctx, lib) => {
    const branchesKey = ctx.fieldPrefix === '--' ? 'holes' : 'branches';
    const branches = input.branches.map((b, i) => {
      const at = (key: string): string => (ctx.fieldPrefix === '--' ? 'holes' : `branches[${i}].${key}`);
      return {
        name: b.name,
        branch: readPipe(b.branch, at('branch'), ctx),
        stationMm: readLength(b.station, at('station'), ctx) ?? 0,
        clockHours: b.clock,
        ...optional('angleDeg', b.angle),
        ...optional('offsetMm', readLength(b.offset, at('offset'), ctx, { allowNegative: true })),
        ...optional('fit', b.fit),
        ...optional('gapMm', readLength(b.gap, at('gap'), ctx)),
      };
    });
    try {
      return lib.layoutShellPlate(
        {
          header: readPipe(input.header, 'header', ctx),
          lengthMm: readLength(input.length, 'length', ctx) ?? 0,
          ...optional('seamClockHours', input.seamClock),
          ...optional('maxPlateLengthMm', readLength(input.maxPlateLength, 'maxPlateLength', ctx)),
          ...optional('weldZoneMm', readLength(input.weldZone, 'weldZone', ctx)),
          branches,
        },
        { stations: ctx.stations },
      );
    } catch (error) {
      throw renameField(error, (field) => {
        const m = /^branches\[(\d+)\](?:\.([A-Za-z]+))?/.exec(field);
        if (m === null) return undefined;
        if (ctx.fieldPrefix === '--') return ctx.fieldName(branchesKey);
        const key = m[2] === undefined ? undefined : (BRANCH_KEYS[m[2]] ?? m[2]);
        return ctx.fieldName(key === undefined ? `branches[${m[1]}]` : `branches[${m[1]}].${key}`);
      });
    }
  },
  reportLines: (result, style) => {
    const r = result as ShellPlateLayout;
    return [
      '',
      `Plate: ${reportLength(r.lengthMm, style)} long x ${reportLength(r.plateWidthMm, style)} girth (mid-thickness), ${r.courses === 1 ? 'one plate' : `${r.courses} courses of ${reportLength(r.courseLengthMm, style)}`}`,
      ...r.holes.map((h) => `  ${h.name}: course ${h.course}, ${reportLength(h.girthMm, style)} from the seam, ${reportLength(h.axialMm, style)} up`),
    ];
  },
  describe: (result, style) => {
    const r = result as ShellPlateLayout;
    return `${r.holes.length} holes, seam at ${r.seamClockHours} o'clock, ${r.courses} plate${r.courses === 1 ? '' : 's'}, ${reportLength(r.plateWidthMm, style)} girth`;
  },
});
