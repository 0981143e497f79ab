/**
 * The joint subcommands: their options, help with real examples, and how their
 * flags become a {@link JointInput}.
 */
import { numberOption, optionalChoice, requireNumberOption, requireOption, stringOption, type OptionSpec, type ParsedArgs } from '../args.js';
import type { JointInput } from '../joints/types.js';

/** One joint subcommand. */
export interface JointCommand {
  readonly name: 'branch' | 'miter' | 'cutback' | 'reducer';
  readonly summary: string;
  readonly options: OptionSpec;
  readonly help: string;
  readonly toInput: (args: ParsedArgs) => JointInput;
}

const optional = <K extends string, V>(key: K, value: V | undefined): { [P in K]?: V } =>
  (value === undefined ? {} : { [key]: value }) as { [P in K]?: V };

const branch: JointCommand = {
  name: 'branch',
  summary: 'tee or lateral: the branch cut and the hole in the header',
  options: {
    header: { type: 'string' },
    branch: { type: 'string' },
    angle: { type: 'string' },
    offset: { type: 'string' },
    fit: { type: 'string' },
    gap: { type: 'string' },
    'branch-surface': { type: 'string' },
    'header-surface': { type: 'string' },
  },
  help: `girth branch: a branch on a header (tee, lateral, centred or offset)

  --header PIPE          run pipe, e.g. "NPS 12 STD", "DN 300 x 8", "12.75 od x .375"
  --branch PIPE          branch pipe
  --angle DEG            angle between branch and header axes, 1 to 90 (default 90)
  --offset LENGTH        sideways offset of the branch axis (default 0); positive is to
                         your right looking down on the header from the heel end, toe away
  --fit set-on|set-in    set-on: branch ID on header OD; set-in: branch OD on header ID
                         (default set-on)
  --gap LENGTH           root gap normal to the header (default 0)
  --branch-surface inside|outside, --header-surface inside|outside
                         override which surfaces meet (give both)

Examples:
  girth branch --header "NPS 12 STD" --branch "NPS 6 STD"
  girth branch --header "NPS 12 STD" --branch "NPS 8 STD" --angle 45 --gap 1/16 --svg lat.svg
  girth branch --header "NPS 8 STD" --branch "NPS 2 XS" --offset "2 1/2" --fit set-in --dxf drain.dxf
  girth branch --units mm --header "DN 300 x 8" --branch "DN 150 x 7.1" --json`,
  toInput: (args) => ({
    joint: 'branch',
    header: requireOption(args, 'header', '"NPS 12 STD"'),
    branch: requireOption(args, 'branch', '"NPS 6 STD"'),
    ...optional('angle', numberOption(args, 'angle')),
    ...optional('offset', stringOption(args, 'offset')),
    ...optional('fit', optionalChoice(args, 'fit', ['set-on', 'set-in'])),
    ...optional('gap', stringOption(args, 'gap')),
    ...optional('branchSurface', optionalChoice(args, 'branch-surface', ['inside', 'outside'])),
    ...optional('headerSurface', optionalChoice(args, 'header-surface', ['inside', 'outside'])),
  }),
};

const miter: JointCommand = {
  name: 'miter',
  summary: 'segmented elbow: pieces, cut list and wraps',
  options: {
    pipe: { type: 'string' },
    bend: { type: 'string' },
    welds: { type: 'string' },
    pieces: { type: 'string' },
    radius: { type: 'string' },
    'radius-nps': { type: 'string' },
    tangent: { type: 'string' },
    surface: { type: 'string' },
  },
  help: `girth miter: a miter (segmented) elbow

  --pipe PIPE            the pipe, e.g. "NPS 10 STD"
  --bend DEG             total change of direction, (0, 180]
  --welds N | --pieces N number of welds, or of pieces (= welds + 1)
  --radius LENGTH        centreline radius, or
  --radius-nps X         centreline radius as X times the NPS (1.5 = long radius)
  --tangent LENGTH       straight length added to each end piece (default 0)
  --surface od|id        pipe surface laid on the weld planes (default od)

Examples:
  girth miter --pipe "NPS 10 STD" --bend 90 --welds 3 --radius-nps 1.5
  girth miter --pipe "NPS 24 STD" --bend 45 --pieces 3 --radius 36in --svg ell.svg --csv ell.csv`,
  toInput: (args) => ({
    joint: 'miter',
    pipe: requireOption(args, 'pipe', '"NPS 10 STD"'),
    bend: requireNumberOption(args, 'bend', '90'),
    ...optional('welds', numberOption(args, 'welds')),
    ...optional('pieces', numberOption(args, 'pieces')),
    ...optional('radius', stringOption(args, 'radius')),
    ...optional('radiusNps', numberOption(args, 'radius-nps')),
    ...optional('tangent', stringOption(args, 'tangent')),
    ...optional('surface', optionalChoice(args, 'surface', ['od', 'id'])),
  }),
};

const cutback: JointCommand = {
  name: 'cutback',
  summary: 'pipe end cut to meet a plane at an angle',
  options: {
    pipe: { type: 'string' },
    angle: { type: 'string' },
    gap: { type: 'string' },
    surface: { type: 'string' },
  },
  help: `girth cutback: a pipe end cut to meet a flat surface at an angle

  --pipe PIPE            the pipe, e.g. "NPS 6 STD"
  --angle DEG            angle between the pipe axis and the plane, 1 to 90; 90 is square
  --gap LENGTH           root gap square to the plane (default 0)
  --surface od|id        pipe surface laid on the plane (default od)

Examples:
  girth cutback --pipe "NPS 6 STD" --angle 60
  girth cutback --pipe "NPS 4 Sch 80" --angle 30 --gap 3mm --svg vent.svg`,
  toInput: (args) => ({
    joint: 'cutback',
    pipe: requireOption(args, 'pipe', '"NPS 6 STD"'),
    angle: requireNumberOption(args, 'angle', '60'),
    ...optional('gap', stringOption(args, 'gap')),
    ...optional('surface', optionalChoice(args, 'surface', ['od', 'id'])),
  }),
};

const reducer: JointCommand = {
  name: 'reducer',
  summary: 'concentric or eccentric cone rolled from plate',
  options: {
    large: { type: 'string' },
    small: { type: 'string' },
    length: { type: 'string' },
    'included-angle': { type: 'string' },
    plate: { type: 'string' },
    eccentric: { type: 'boolean' },
    seam: { type: 'string' },
    diameters: { type: 'string' },
    segments: { type: 'string' },
  },
  help: `girth reducer: a cone reducer's flat pattern

  --large PIPE|LENGTH    large end: a pipe (its OD) or a diameter
  --small PIPE|LENGTH    small end
  --length LENGTH        length along the axis, or
  --included-angle DEG   the cone's included (apex) angle
  --plate LENGTH         plate thickness (pattern developed on the mean surface)
  --diameters outside|inside|mean  which surface the end diameters are on (default outside)
  --eccentric            one side flat (pattern by triangulation)
  --seam flat-side|opposite        seam of an eccentric cone (default flat-side)
  --segments K           split into K equal pieces (K divides the stations)

Examples:
  girth reducer --large "NPS 12 STD" --small "NPS 8 STD" --length 7 --plate 3/8
  girth reducer --large 8in --small 5in --length 4in --plate 0 --dxf cone.dxf
  girth reducer --large 72in --small 48in --length 30in --plate 1/2 --eccentric --segments 2 --svg ecc.svg`,
  toInput: (args) => ({
    joint: 'reducer',
    large: requireOption(args, 'large', '"NPS 12 STD"'),
    small: requireOption(args, 'small', '"NPS 8 STD"'),
    ...optional('length', stringOption(args, 'length')),
    ...optional('includedAngle', numberOption(args, 'included-angle')),
    plate: requireOption(args, 'plate', '3/8'),
    eccentric: args.values.eccentric === true,
    ...optional('seam', optionalChoice(args, 'seam', ['flat-side', 'opposite'])),
    ...optional('diameters', optionalChoice(args, 'diameters', ['outside', 'inside', 'mean'])),
    ...optional('segments', numberOption(args, 'segments')),
  }),
};

/** Every joint subcommand, in the order help lists them. */
export const JOINT_COMMANDS: readonly JointCommand[] = [branch, miter, cutback, reducer];
