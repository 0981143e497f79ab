/**
 * A catalog of bad inputs a fitter might give, on the command line and in a
 * job file, each with the error code (codes.ts in @girth/pipes) and the field
 * as the user wrote it. `../bad-inputs.test.ts` asserts every one. Pipe sizes are
 * ASME B36.10M designations; the bounds are those of limits.ts.
 */

/** One bad command line. */
export interface BadOptionCase {
  readonly name: string;
  readonly argv: readonly string[];
  readonly code: string;
  readonly field: string;
}

/** One bad job file: a change to a good job. */
export interface BadJobCase {
  readonly name: string;
  /** The job as given, made from a good one (see `GOOD_JOB`). */
  readonly job: (good: GoodJob) => unknown;
  readonly code: string;
  readonly field: string;
}

/** A good one-piece job: an invented tee on plant 7, spool 118. */
export type GoodJob = { readonly job: string; readonly units: string; readonly pieces: readonly Record<string, unknown>[] } & Record<string, unknown>;

/** The good job the job cases change. */
export const GOOD_JOB: GoodJob = {
  job: 'Plant 7 - spool 118',
  units: 'in',
  pieces: [{ piece: 'S118-01 tee', joint: 'branch', header: 'NPS 12 STD', branch: 'NPS 6 STD' }],
};

const TEE = ['branch', '--header', 'NPS 12 STD', '--branch', 'NPS 6 STD'];
const ELL = ['miter', '--pipe', 'NPS 10 STD', '--bend', '90', '--welds', '3', '--radius-nps', '1.5'];
const CUT = ['cutback', '--pipe', 'NPS 6 STD', '--angle', '60'];
const TRUNNION = ['trunnion', '--elbow', 'NPS 12 STD', '--trunnion', 'NPS 8 STD', '--along', '45'];
const CONE = ['reducer', '--large', 'NPS 12 STD', '--small', 'NPS 8 STD', '--length', '7', '--plate', '3/8'];
const PAD = ['pad', '--header', 'NPS 12 STD', '--branch', 'NPS 6 STD', '--thickness', '3/8'];
const SHELL = ['shell-plate', '--header', 'NPS 24 STD', '--length', '96', '--holes', 'N1, NPS 6 STD, 30, 12'];
const without = (argv: readonly string[], option: string): string[] => {
  const i = argv.indexOf(option);
  return [...argv.slice(0, i), ...argv.slice(i + 2)];
};

/** Bad command lines. */
export const BAD_OPTIONS: readonly BadOptionCase[] = [
  // The command and option syntax.
  { name: 'an unknown command', argv: ['wye'], code: 'BAD_OPTION', field: 'command' },
  { name: 'an unknown option', argv: [...TEE, '--colour', 'red'], code: 'BAD_OPTION', field: '--colour' },
  { name: 'an option without its value', argv: [...TEE, '--angle'], code: 'BAD_OPTION', field: '--angle' },
  { name: 'an option given twice', argv: [...TEE, '--angle', '45', '--angle', '90'], code: 'BAD_OPTION', field: '--angle' },
  { name: 'a stray word', argv: [...TEE, 'extra'], code: 'BAD_OPTION', field: 'arguments' },
  { name: 'a label that starts with a dash, not joined', argv: [...TEE, '--job', '-x'], code: 'BAD_OPTION', field: '--job' },
  // Printing a PDF: paper, overlap and margin against the page, pages per sheet.
  { name: 'an unknown paper', argv: [...TEE, '--pdf', 'tee.pdf', '--paper', 'a5'], code: 'BAD_CHOICE', field: '--paper' },
  { name: 'a paper without --pdf', argv: [...TEE, '--paper', 'a4'], code: 'BAD_OPTION', field: '--paper' },
  { name: 'a page overlap without --pdf', argv: [...TEE, '--page-overlap', '1'], code: 'BAD_OPTION', field: '--page-overlap' },
  { name: 'an unknown orientation', argv: [...TEE, '--pdf', 'tee.pdf', '--orientation', 'sideways'], code: 'BAD_CHOICE', field: '--orientation' },
  { name: 'a page overlap of half the Letter drawing window or more', argv: [...TEE, '--pdf', 'tee.pdf', '--page-overlap', '5'], code: 'OUT_OF_RANGE', field: '--page-overlap' },
  { name: 'a page margin over a quarter of the Letter short side', argv: [...TEE, '--pdf', 'tee.pdf', '--page-margin', '3'], code: 'OUT_OF_RANGE', field: '--page-margin' },
  { name: 'a negative page margin', argv: [...TEE, '--pdf', 'tee.pdf', '--page-margin=-1'], code: 'NEGATIVE', field: '--page-margin' },
  { name: 'a PDF named as an SVG', argv: [...TEE, '--pdf', 'tee.svg'], code: 'BAD_OPTION', field: '--pdf' },
  // A 2000 mm pipe cut back 60°: a 6343 x 1264 mm sheet, 216 Letter pages.
  { name: 'a sheet that needs more than 200 pages', argv: ['cutback', '--pipe', '2000 mm x 20 mm', '--angle', '60', '--pdf', 'huge.pdf'], code: 'OUT_OF_RANGE', field: '--paper' },
  // Required options.
  { name: 'a branch without its header', argv: without(TEE, '--header'), code: 'MISSING_INPUT', field: '--header' },
  { name: 'a branch without its branch pipe', argv: without(TEE, '--branch'), code: 'MISSING_INPUT', field: '--branch' },
  { name: 'a blank header', argv: ['branch', '--header', ' ', '--branch', 'NPS 6 STD'], code: 'MISSING_INPUT', field: '--header' },
  { name: 'a miter without its pipe', argv: without(ELL, '--pipe'), code: 'MISSING_INPUT', field: '--pipe' },
  { name: 'a miter without its bend', argv: without(ELL, '--bend'), code: 'MISSING_INPUT', field: '--bend' },
  { name: 'a miter without welds or pieces', argv: without(ELL, '--welds'), code: 'MISSING_INPUT', field: '--welds' },
  { name: 'a miter without a radius', argv: without(ELL, '--radius-nps'), code: 'MISSING_INPUT', field: '--radius' },
  { name: 'a cutback without its angle', argv: without(CUT, '--angle'), code: 'MISSING_INPUT', field: '--angle' },
  { name: 'a cutback without its pipe', argv: without(CUT, '--pipe'), code: 'MISSING_INPUT', field: '--pipe' },
  { name: 'a reducer without its plate', argv: without(CONE, '--plate'), code: 'MISSING_INPUT', field: '--plate' },
  { name: 'a reducer without length or angle', argv: without(CONE, '--length'), code: 'MISSING_INPUT', field: '--length' },
  { name: 'a reducer without its small end', argv: without(CONE, '--small'), code: 'MISSING_INPUT', field: '--small' },
  { name: 'one surface override without the other', argv: [...TEE, '--branch-surface', 'inside'], code: 'MISSING_INPUT', field: '--header-surface' },
  // Numbers.
  { name: 'an angle written as a word', argv: [...TEE, '--angle', 'steep'], code: 'NOT_A_NUMBER', field: '--angle' },
  { name: 'an angle in hexadecimal', argv: [...TEE, '--angle', '0x2d'], code: 'NOT_A_NUMBER', field: '--angle' },
  { name: 'stations as Infinity', argv: [...TEE, '--stations', 'Infinity'], code: 'NOT_A_NUMBER', field: '--stations' },
  { name: 'a bend with a unit', argv: [...without(ELL, '--bend'), '--bend', '90deg'], code: 'NOT_A_NUMBER', field: '--bend' },
  { name: 'welds written as a fraction', argv: [...without(ELL, '--welds'), '--welds', '3/1'], code: 'NOT_A_NUMBER', field: '--welds' },
  // Bounds of limits.ts, one code for all.
  { name: 'three stations', argv: [...TEE, '--stations', '3'], code: 'OUT_OF_RANGE', field: '--stations' },
  { name: '361 stations', argv: [...TEE, '--stations', '361'], code: 'OUT_OF_RANGE', field: '--stations' },
  { name: '16.5 stations', argv: [...TEE, '--stations', '16.5'], code: 'OUT_OF_RANGE', field: '--stations' },
  { name: 'a branch at 0°', argv: [...TEE, '--angle', '0'], code: 'OUT_OF_RANGE', field: '--angle' },
  { name: 'a branch at 95°', argv: [...TEE, '--angle', '95'], code: 'OUT_OF_RANGE', field: '--angle' },
  { name: 'a branch at -45°', argv: [...TEE, '--angle', '-45'], code: 'OUT_OF_RANGE', field: '--angle' },
  { name: 'a lateral shallower than 1°', argv: [...TEE, '--angle', '0.999'], code: 'OUT_OF_RANGE', field: '--angle' },
  { name: 'a cutback at 0°', argv: [...without(CUT, '--angle'), '--angle', '0'], code: 'OUT_OF_RANGE', field: '--angle' },
  { name: 'a cutback at 91°', argv: [...without(CUT, '--angle'), '--angle', '91'], code: 'OUT_OF_RANGE', field: '--angle' },
  { name: 'a bend of 0°', argv: [...without(ELL, '--bend'), '--bend', '0'], code: 'OUT_OF_RANGE', field: '--bend' },
  { name: 'a bend of 181°', argv: [...without(ELL, '--bend'), '--bend', '181'], code: 'OUT_OF_RANGE', field: '--bend' },
  { name: 'zero welds', argv: [...without(ELL, '--welds'), '--welds', '0'], code: 'OUT_OF_RANGE', field: '--welds' },
  { name: '91 welds', argv: [...without(ELL, '--welds'), '--welds', '91'], code: 'OUT_OF_RANGE', field: '--welds' },
  { name: '2.5 welds', argv: [...without(ELL, '--welds'), '--welds', '2.5'], code: 'OUT_OF_RANGE', field: '--welds' },
  { name: 'one piece', argv: [...without(ELL, '--welds'), '--pieces', '1'], code: 'OUT_OF_RANGE', field: '--pieces' },
  { name: 'a miter radius under half the OD', argv: [...without(ELL, '--radius-nps'), '--radius', '4'], code: 'OUT_OF_RANGE', field: '--radius' },
  { name: 'a miter radius beyond a kilometre', argv: [...without(ELL, '--radius-nps'), '--radius', '2000000mm'], code: 'OUT_OF_RANGE', field: '--radius' },
  { name: 'an included angle of 0.2°', argv: [...without(CONE, '--length'), '--included-angle', '0.2'], code: 'OUT_OF_RANGE', field: '--included-angle' },
  { name: 'an included angle of 180°', argv: [...without(CONE, '--length'), '--included-angle', '180'], code: 'OUT_OF_RANGE', field: '--included-angle' },
  { name: 'a trunnion larger than its elbow', argv: ['trunnion', '--elbow', 'NPS 8 STD', '--trunnion', 'NPS 10 STD'], code: 'BRANCH_TOO_LARGE', field: '--trunnion' },
  { name: 'a trunnion running off the bend end', argv: [...without(TRUNNION, '--along'), '--along', '4'], code: 'TRUNNION_OFF_ELBOW', field: '--along' },
  { name: 'a trunnion past the bend', argv: [...without(TRUNNION, '--along'), '--along', '95'], code: 'OUT_OF_RANGE', field: '--along' },
  { name: 'a trunnion without its elbow', argv: without(TRUNNION, '--elbow'), code: 'MISSING_INPUT', field: '--elbow' },
  { name: 'a short radius NPS 1/2 elbow', argv: ['trunnion', '--elbow', 'NPS 1/2 STD', '--radius', 'short', '--trunnion', 'NPS 1/4 STD'], code: 'OUT_OF_RANGE', field: '--radius' },
  { name: 'an elbow radius inside the pipe', argv: [...TRUNNION, '--radius', '5'], code: 'OUT_OF_RANGE', field: '--radius' },
  { name: 'an unknown trunnion direction', argv: [...TRUNNION, '--direction', 'up'], code: 'BAD_CHOICE', field: '--direction' },
  { name: 'a reducer 12.75 in to 12.7499 in', argv: ['reducer', '--large', '12.75', '--small', '12.7499', '--length', '8', '--plate', '0'], code: 'OUT_OF_RANGE', field: '--small' },
  { name: 'a reducer longer than its ends allow (0.1° cone)', argv: ['reducer', '--large', '12', '--small', '11.9', '--length', '100', '--plate', '0'], code: 'OUT_OF_RANGE', field: '--length' },
  { name: 'a reducer whose small end is the larger', argv: ['reducer', '--large', 'NPS 8 STD', '--small', 'NPS 12 STD', '--length', '7', '--plate', '3/8'], code: 'OUT_OF_RANGE', field: '--small' },
  { name: 'a reducer 1000 ft across', argv: ['reducer', '--large', "1000'", '--small', "900'", '--length', "50'", '--plate', '1'], code: 'OUT_OF_RANGE', field: '--large' },
  { name: 'a reducer end of 0.05 in', argv: ['reducer', '--large', '4', '--small', '0.05', '--length', '4', '--plate', '0'], code: 'OUT_OF_RANGE', field: '--small' },
  { name: 'a plate of 30 in', argv: ['reducer', '--large', '200', '--small', '150', '--length', '40', '--plate', '30'], code: 'OUT_OF_RANGE', field: '--plate' },
  { name: 'segments that do not divide the stations', argv: [...CONE, '--segments', '3'], code: 'BAD_OPTION', field: '--segments' },
  { name: 'zero segments', argv: [...CONE, '--segments', '0'], code: 'OUT_OF_RANGE', field: '--segments' },
  // Pipes and lengths.
  { name: 'a pipe of OD 0.000001 mm', argv: ['cutback', '--units', 'mm', '--pipe', '0.000001 od x 0.0000001', '--angle', '60'], code: 'OUT_OF_RANGE', field: '--pipe' },
  { name: 'a pipe with a foil wall', argv: ['cutback', '--units', 'mm', '--pipe', '100 od x 0.01', '--angle', '60'], code: 'OUT_OF_RANGE', field: '--pipe' },
  { name: 'a wall of half the OD', argv: ['cutback', '--pipe', '4 od x 2', '--angle', '60'], code: 'WALL_TOO_THICK', field: '--pipe' },
  { name: 'a pipe name that is no pipe', argv: ['cutback', '--pipe', 'twelve inch', '--angle', '60'], code: 'BAD_PIPE_NAME', field: '--pipe' },
  { name: 'a size not in B36.10M', argv: ['cutback', '--pipe', 'NPS 7 STD', '--angle', '60'], code: 'UNKNOWN_SIZE', field: '--pipe' },
  { name: 'a schedule not listed for the size', argv: ['cutback', '--pipe', 'NPS 2 Sch 100', '--angle', '60'], code: 'UNKNOWN_SCHEDULE', field: '--pipe' },
  { name: 'a size without its schedule', argv: ['cutback', '--pipe', 'NPS 6', '--angle', '60'], code: 'MISSING_SCHEDULE', field: '--pipe' },
  { name: 'a branch larger than its header', argv: ['branch', '--header', 'NPS 6 STD', '--branch', 'NPS 12 STD'], code: 'BRANCH_TOO_LARGE', field: '--branch' },
  { name: 'an offset off the header', argv: [...TEE, '--offset', '6'], code: 'OFFSET_MISSES', field: '--offset' },
  { name: 'a negative gap', argv: [...TEE, '--gap=-1/16'], code: 'NEGATIVE', field: '--gap' },
  { name: 'a gap that is no length', argv: [...TEE, '--gap', 'a bit'], code: 'BAD_LENGTH', field: '--gap' },
  { name: 'a gap of 1/0', argv: [...TEE, '--gap', '1/0'], code: 'DIVIDE_BY_ZERO', field: '--gap' },
  { name: 'a gap in furlongs', argv: [...TEE, '--gap', '1 furlong'], code: 'UNKNOWN_UNIT', field: '--gap' },
  { name: 'a negative tangent', argv: [...ELL, '--tangent=-2'], code: 'NEGATIVE', field: '--tangent' },
  // Weld prep: groove angle in (0, 90), land thinner than the wall, gap not negative.
  { name: 'a groove angle of 0', argv: [...TEE, '--groove-angle', '0'], code: 'OUT_OF_RANGE', field: '--groove-angle' },
  { name: 'a groove angle of 90', argv: [...CUT, '--groove-angle', '90'], code: 'OUT_OF_RANGE', field: '--groove-angle' },
  { name: 'a groove angle of -30', argv: [...ELL, '--groove-angle=-30'], code: 'OUT_OF_RANGE', field: '--groove-angle' },
  { name: 'a groove angle that is no number', argv: [...TEE, '--groove-angle', 'steep'], code: 'NOT_A_NUMBER', field: '--groove-angle' },
  { name: 'a land as thick as the NPS 6 STD wall', argv: [...TEE, '--groove-angle', '45', '--land', '0.280'], code: 'OUT_OF_RANGE', field: '--land' },
  { name: 'a land thicker than the NPS 10 STD wall', argv: [...ELL, '--groove-angle', '75', '--land', '1/2'], code: 'OUT_OF_RANGE', field: '--land' },
  { name: 'a negative land', argv: [...CUT, '--groove-angle', '45', '--land=-1/16'], code: 'NEGATIVE', field: '--land' },
  { name: 'a land with no groove angle', argv: [...CUT, '--land', '1/16'], code: 'MISSING_INPUT', field: '--groove-angle' },
  { name: 'a negative root gap with a groove', argv: [...TEE, '--groove-angle', '45', '--gap=-1/8'], code: 'NEGATIVE', field: '--gap' },
  { name: 'a negative cut-back root gap with a groove', argv: [...CUT, '--groove-angle', '45', '--gap=-1/8'], code: 'NEGATIVE', field: '--gap' },
  { name: 'a negative miter root gap', argv: [...ELL, '--gap=-1/8'], code: 'NEGATIVE', field: '--gap' },
  { name: 'a miter root gap that leaves no throat', argv: [...ELL, '--gap', '6'], code: 'OUT_OF_RANGE', field: '--gap' },
  { name: 'an OD cut on a set-in branch', argv: [...TEE, '--fit', 'set-in', '--cut-on', 'od'], code: 'BAD_OPTION', field: '--cut-on' },
  { name: 'a cut-on that is not od or id', argv: [...TEE, '--cut-on', 'middle'], code: 'BAD_CHOICE', field: '--cut-on' },
  { name: 'a negative plate', argv: [...without(CONE, '--plate'), '--plate=-3/8'], code: 'NEGATIVE', field: '--plate' },
  // Words.
  { name: 'an unknown unit', argv: [...TEE, '--units', 'ft'], code: 'BAD_CHOICE', field: '--units' },
  { name: 'a fit that is not set-on or set-in', argv: [...TEE, '--fit', 'welded'], code: 'BAD_CHOICE', field: '--fit' },
  { name: 'a fraction of 1/4', argv: [...TEE, '--fraction', '4'], code: 'BAD_CHOICE', field: '--fraction' },
  { name: 'an unknown DXF version', argv: [...TEE, '--dxf', 'tee.dxf', '--dxf-version', 'r14'], code: 'BAD_CHOICE', field: '--dxf-version' },
  { name: 'a surface that is not od or id', argv: [...CUT, '--surface', 'mid'], code: 'BAD_CHOICE', field: '--surface' },
  { name: 'an unknown seam', argv: [...CONE, '--eccentric', '--seam', 'top'], code: 'BAD_CHOICE', field: '--seam' },
  { name: 'diameters on an unknown surface', argv: [...CONE, '--diameters', 'middle'], code: 'BAD_CHOICE', field: '--diameters' },
  // Options that would do nothing.
  { name: '--decimal with millimetres', argv: [...TEE, '--units', 'mm', '--decimal'], code: 'BAD_OPTION', field: '--decimal' },
  { name: '--fraction with millimetres', argv: [...TEE, '--units', 'mm', '--fraction', '8'], code: 'BAD_OPTION', field: '--fraction' },
  { name: '--fraction with --decimal', argv: [...TEE, '--decimal', '--fraction', '8'], code: 'BAD_OPTION', field: '--fraction' },
  { name: '--dxf-version without --dxf', argv: [...TEE, '--dxf-version', 'r12'], code: 'BAD_OPTION', field: '--dxf-version' },
  { name: 'a stub shorter than the cut', argv: [...TEE, '--angle', '45', '--closed-parts', '--stub', '1', '--dxf', 'tee.dxf'], code: 'OUT_OF_RANGE', field: '--stub' },
  { name: 'a stub that is not a length', argv: [...TEE, '--closed-parts', '--stub', 'long'], code: 'BAD_LENGTH', field: '--stub' },
  { name: '--stub without --closed-parts', argv: [...TEE, '--stub', '12'], code: 'BAD_OPTION', field: '--stub' },
  { name: 'a plate thicker than the pipe wall', argv: [...TEE, '--develop-on', 'mid', '--rolled-plate', '1'], code: 'OUT_OF_RANGE', field: '--rolled-plate' },
  { name: 'a plate of no thickness', argv: [...TEE, '--develop-on', 'mid', '--rolled-plate', '0'], code: 'NEGATIVE', field: '--rolled-plate' },
  { name: '--rolled-plate without --develop-on mid', argv: [...TEE, '--rolled-plate', '0.25'], code: 'BAD_OPTION', field: '--rolled-plate' },
  { name: 'an unknown development surface', argv: [...TEE, '--develop-on', 'id'], code: 'BAD_CHOICE', field: '--develop-on' },
  { name: 'an unknown DXF text form', argv: [...TEE, '--dxf', 'tee.dxf', '--dxf-text', 'bold'], code: 'BAD_CHOICE', field: '--dxf-text' },
  { name: '--dxf-text without --dxf', argv: [...TEE, '--dxf-text', 'none'], code: 'BAD_OPTION', field: '--dxf-text' },
  { name: 'an unknown DXF curve form', argv: [...TEE, '--dxf', 'tee.dxf', '--dxf-curves', 'splines'], code: 'BAD_CHOICE', field: '--dxf-curves' },
  { name: '--dxf-curves without --dxf', argv: [...TEE, '--dxf-curves', 'arcs'], code: 'BAD_OPTION', field: '--dxf-curves' },
  { name: '--seam without --eccentric', argv: [...CONE, '--seam', 'opposite'], code: 'BAD_OPTION', field: '--seam' },
  { name: 'both welds and pieces', argv: [...ELL, '--pieces', '4'], code: 'BAD_OPTION', field: '--pieces' },
  { name: 'both radius and radius-nps', argv: [...ELL, '--radius', '15'], code: 'BAD_OPTION', field: '--radius-nps' },
  { name: 'both length and included angle', argv: [...CONE, '--included-angle', '20'], code: 'BAD_OPTION', field: '--included-angle' },
  { name: 'a radius in NPS for a pipe given by OD', argv: ['miter', '--pipe', '10.75 od x .365', '--bend', '90', '--welds', '3', '--radius-nps', '1.5'], code: 'BAD_OPTION', field: '--radius-nps' },
  // Fit-up: the square line ordinates are measured from, and the lengths of the angle check.
  { name: 'an unknown ordinate reference', argv: [...TEE, '--ordinates-from', 'heel'], code: 'BAD_CHOICE', field: '--ordinates-from' },
  { name: 'an ordinate reference on a miter that is not a point', argv: [...ELL, '--ordinates-from', 'square-end'], code: 'BAD_CHOICE', field: '--ordinates-from' },
  { name: 'an ordinate reference on a cut-back left blank', argv: [...CUT, '--ordinates-from', ''], code: 'BAD_CHOICE', field: '--ordinates-from' },
  { name: 'an ordinate reference on a reducer (no wrap)', argv: [...CONE, '--ordinates-from', 'short-point'], code: 'BAD_OPTION', field: '--ordinates-from' },
  { name: 'a check run of zero', argv: [...TEE, '--check-run', '0'], code: 'NEGATIVE', field: '--check-run' },
  { name: 'a negative check run', argv: [...CUT, '--check-run=-12'], code: 'NEGATIVE', field: '--check-run' },
  { name: 'a check radius of zero', argv: [...ELL, '--check-radius', '0'], code: 'NEGATIVE', field: '--check-radius' },
  { name: 'a negative check radius', argv: [...TEE, '--check-radius=-1'], code: 'NEGATIVE', field: '--check-radius' },
  { name: 'a check run that is not a length', argv: [...TEE, '--check-run', 'a foot'], code: 'BAD_LENGTH', field: '--check-run' },
  // Labels.
  { name: 'a job label with an escape sequence', argv: [...TEE, '--job', 'Plant 7\u001b[31m'], code: 'BAD_TEXT', field: '--job' },
  { name: 'a piece label with a line break', argv: [...TEE, '--piece', 'S118\nS119'], code: 'BAD_TEXT', field: '--piece' },
  { name: 'a piece label 201 characters long', argv: [...TEE, '--piece', 'x'.repeat(201)], code: 'BAD_TEXT', field: '--piece' },
  // girth run and girth pipe.
  { name: 'run without a job file', argv: ['run', '--out', 'o'], code: 'MISSING_INPUT', field: 'job' },
  { name: 'run without --out', argv: ['run', 'job.json'], code: 'MISSING_INPUT', field: '--out' },
  { name: 'run with two job files', argv: ['run', 'a.json', 'b.json', '--out', 'o'], code: 'BAD_OPTION', field: 'job' },
  { name: 'pipe with an unknown size', argv: ['pipe', 'NPS 9 STD'], code: 'UNKNOWN_SIZE', field: 'pipe' },
  { name: 'pipe in an unknown unit', argv: ['pipe', 'NPS 6 STD', '--units', 'cm'], code: 'BAD_CHOICE', field: '--units' },
  // Reinforcing pads: the size is the user's, but it must clear the hole.
  { name: 'a pad without its thickness', argv: ['pad', '--header', 'NPS 12 STD', '--branch', 'NPS 6 STD', '--width', '3'], code: 'MISSING_INPUT', field: '--thickness' },
  { name: 'a pad of zero width', argv: [...PAD, '--width', '0'], code: 'NEGATIVE', field: '--width' },
  { name: 'a pad outside size within the hole', argv: [...PAD, '--outside', '6'], code: 'PAD_SIZE', field: '--outside' },
  { name: 'a pad wrapping right round its header', argv: [...PAD, '--width', '60'], code: 'PAD_SIZE', field: '--width' },
  { name: 'a pad given both width and outside size', argv: [...PAD, '--width', '3', '--outside', '14'], code: 'BAD_OPTION', field: '--width' },
  { name: 'shell plate without its length', argv: without(SHELL, '--length'), code: 'MISSING_INPUT', field: '--length' },
  { name: 'shell plate seam at 13 o\'clock', argv: [...SHELL, '--seam-clock', '13'], code: 'OUT_OF_RANGE', field: '--seam-clock' },
  { name: 'shell plate hole with three parts', argv: ['shell-plate', '--header', 'NPS 24 STD', '--length', '96', '--holes', 'N1, NPS 6 STD, 30'], code: 'BAD_OPTION', field: '--holes' },
  { name: 'shell plate holes overlapping', argv: ['shell-plate', '--header', 'NPS 24 STD', '--length', '96', '--holes', 'N1, NPS 6 STD, 30, 12; N2, NPS 6 STD, 33, 12'], code: 'HOLES_OVERLAP', field: '--holes' },
  { name: 'shell plate negative plate length', argv: [...SHELL, '--max-plate-length', '-4'], code: 'NEGATIVE', field: '--max-plate-length' },
];

const piece = (change: Record<string, unknown>) => (good: GoodJob) => ({ ...good, pieces: [{ ...good.pieces[0], ...change }] });
const ell = { piece: 'S118-02 ell', joint: 'miter', pipe: 'NPS 10 STD', bend: 90, welds: 3, radiusNps: 1.5 };
const cone = { piece: 'S118-03 cone', joint: 'reducer', large: 'NPS 12 STD', small: 'NPS 8 STD', length: 7, plate: '3/8' };
const shell = { piece: 'S118-04 shell', joint: 'shell-plate', header: 'NPS 24 STD', length: 96, branches: [{ name: 'N1', branch: 'NPS 6 STD', station: 30, clock: 12 }] };
const asPiece = (p: Record<string, unknown>, change: Record<string, unknown> = {}) => (good: GoodJob) => ({ ...good, pieces: [{ ...p, ...change }] });

/** Bad job files. */
const elbowTrunnion = { piece: 'S118-04 trunnion', joint: 'trunnion', elbow: 'NPS 12 STD', trunnion: 'NPS 8 STD', along: 45 };

export const BAD_JOBS: readonly BadJobCase[] = [
  { name: 'a trunnion off the bend end in a job', job: asPiece(elbowTrunnion, { along: 3 }), code: 'TRUNNION_OFF_ELBOW', field: 'pieces[0].along' },
  { name: 'a trunnion larger than its elbow in a job', job: asPiece(elbowTrunnion, { trunnion: 'NPS 14 STD' }), code: 'BRANCH_TOO_LARGE', field: 'pieces[0].trunnion' },
  { name: 'a job that is a list', job: () => [], code: 'BAD_JOB', field: 'job' },
  { name: 'a job that is text', job: () => 'tee', code: 'BAD_JOB', field: 'job' },
  { name: 'an unknown key on the job', job: (g) => ({ ...g, colour: 'red' }), code: 'BAD_JOB', field: 'colour' },
  { name: 'an unknown key on a piece', job: piece({ colour: 'red' }), code: 'BAD_JOB', field: 'pieces[0].colour' },
  { name: "another joint's key on a piece", job: piece({ bend: 90 }), code: 'BAD_JOB', field: 'pieces[0].bend' },
  { name: 'a piece that is text', job: (g) => ({ ...g, pieces: ['tee'] }), code: 'BAD_JOB', field: 'pieces[0]' },
  { name: 'a header given as a number', job: piece({ header: 12 }), code: 'BAD_JOB', field: 'pieces[0].header' },
  { name: 'eccentric given as text', job: asPiece(cone, { eccentric: 'yes' }), code: 'BAD_JOB', field: 'pieces[0].eccentric' },
  { name: 'a missing units', job: (g) => ({ ...g, units: undefined }), code: 'MISSING_INPUT', field: 'units' },
  { name: 'a missing job title', job: (g) => ({ ...g, job: undefined }), code: 'MISSING_INPUT', field: 'job' },
  { name: 'a missing piece list', job: (g) => ({ ...g, pieces: undefined }), code: 'MISSING_INPUT', field: 'pieces' },
  { name: 'an empty piece list', job: (g) => ({ ...g, pieces: [] }), code: 'MISSING_INPUT', field: 'pieces' },
  { name: 'a missing piece label', job: piece({ piece: undefined }), code: 'MISSING_INPUT', field: 'pieces[0].piece' },
  { name: 'a missing joint', job: piece({ joint: undefined }), code: 'MISSING_INPUT', field: 'pieces[0].joint' },
  { name: 'a missing header', job: piece({ header: undefined }), code: 'MISSING_INPUT', field: 'pieces[0].header' },
  { name: 'a missing bend', job: asPiece(ell, { bend: undefined }), code: 'MISSING_INPUT', field: 'pieces[0].bend' },
  { name: 'a missing plate', job: asPiece(cone, { plate: undefined }), code: 'MISSING_INPUT', field: 'pieces[0].plate' },
  { name: 'an empty header', job: piece({ header: '' }), code: 'EMPTY_INPUT', field: 'pieces[0].header' },
  { name: 'a blank job title', job: (g) => ({ ...g, job: '   ' }), code: 'EMPTY_INPUT', field: 'job' },
  { name: 'an unknown joint', job: piece({ joint: 'wye' }), code: 'BAD_CHOICE', field: 'pieces[0].joint' },
  { name: 'an unknown unit', job: (g) => ({ ...g, units: 'ft' }), code: 'BAD_CHOICE', field: 'units' },
  { name: 'a fit that is not set-on or set-in', job: piece({ fit: 'welded' }), code: 'BAD_CHOICE', field: 'pieces[0].fit' },
  { name: 'an unknown ordinate reference', job: piece({ ordinatesFrom: 'toe' }), code: 'BAD_CHOICE', field: 'pieces[0].ordinatesFrom' },
  { name: 'an ordinate reference on a reducer', job: asPiece(cone, { ordinatesFrom: 'short-point' }), code: 'BAD_JOB', field: 'pieces[0].ordinatesFrom' },
  { name: 'reference lines given as text', job: piece({ referenceLines: 'yes' }), code: 'BAD_JOB', field: 'pieces[0].referenceLines' },
  { name: 'a check run of zero', job: piece({ checkRun: 0 }), code: 'NEGATIVE', field: 'pieces[0].checkRun' },
  { name: 'a negative check radius', job: asPiece(ell, { checkRadius: '-6' }), code: 'NEGATIVE', field: 'pieces[0].checkRadius' },
  { name: 'a fraction of 1/4 in', job: (g) => ({ ...g, fraction: 4 }), code: 'BAD_CHOICE', field: 'fraction' },
  { name: 'an unknown output kind', job: (g) => ({ ...g, outputs: ['svg', 'pdf'] }), code: 'BAD_CHOICE', field: 'outputs[1]' },
  { name: 'an unknown DXF version', job: (g) => ({ ...g, dxfVersion: 'r14' }), code: 'BAD_CHOICE', field: 'dxfVersion' },
  { name: 'a seam that is neither side', job: asPiece(cone, { eccentric: true, seam: 'top' }), code: 'BAD_CHOICE', field: 'pieces[0].seam' },
  { name: 'a bend written as text', job: asPiece(ell, { bend: '90' }), code: 'NOT_A_NUMBER', field: 'pieces[0].bend' },
  { name: 'an angle written as text', job: piece({ angle: '45' }), code: 'NOT_A_NUMBER', field: 'pieces[0].angle' },
  { name: 'stations written as text', job: (g) => ({ ...g, stations: '16' }), code: 'NOT_A_NUMBER', field: 'stations' },
  { name: 'too few stations on the job', job: (g) => ({ ...g, stations: 3 }), code: 'OUT_OF_RANGE', field: 'stations' },
  { name: 'too many stations on a piece', job: piece({ stations: 400 }), code: 'OUT_OF_RANGE', field: 'pieces[0].stations' },
  { name: 'a branch at 0°', job: piece({ angle: 0 }), code: 'OUT_OF_RANGE', field: 'pieces[0].angle' },
  { name: 'a branch at 120°', job: piece({ angle: 120 }), code: 'OUT_OF_RANGE', field: 'pieces[0].angle' },
  { name: 'a bend of 200°', job: asPiece(ell, { bend: 200 }), code: 'OUT_OF_RANGE', field: 'pieces[0].bend' },
  { name: '100 welds', job: asPiece(ell, { welds: 100 }), code: 'OUT_OF_RANGE', field: 'pieces[0].welds' },
  { name: 'an included angle of 0.1°', job: asPiece(cone, { length: undefined, includedAngle: 0.1 }), code: 'OUT_OF_RANGE', field: 'pieces[0].includedAngle' },
  { name: 'a reducer whose ends are 0.0001 in apart', job: asPiece(cone, { large: '12.75', small: '12.7499' }), code: 'OUT_OF_RANGE', field: 'pieces[0].small' },
  { name: 'a pipe of OD 0.000001 mm', job: (g) => ({ ...g, units: 'mm', pieces: [{ piece: 'P1', joint: 'cutback', pipe: '0.000001 od x 0.0000001', angle: 60 }] }), code: 'OUT_OF_RANGE', field: 'pieces[0].pipe' },
  { name: 'a branch larger than its header', job: piece({ header: 'NPS 4 STD' }), code: 'BRANCH_TOO_LARGE', field: 'pieces[0].branch' },
  { name: 'a header name that is no pipe', job: piece({ header: 'big pipe' }), code: 'BAD_PIPE_NAME', field: 'pieces[0].header' },
  { name: 'a negative gap', job: piece({ gap: -1 }), code: 'NEGATIVE', field: 'pieces[0].gap' },
  { name: 'a groove angle of 95°', job: piece({ grooveAngle: 95 }), code: 'OUT_OF_RANGE', field: 'pieces[0].grooveAngle' },
  { name: 'a land thicker than the branch wall', job: piece({ grooveAngle: 45, land: 1 }), code: 'OUT_OF_RANGE', field: 'pieces[0].land' },
  { name: 'a land with no groove angle', job: piece({ land: 0.0625 }), code: 'MISSING_INPUT', field: 'pieces[0].grooveAngle' },
  { name: 'an offset off the header', job: piece({ offset: 8 }), code: 'OFFSET_MISSES', field: 'pieces[0].offset' },
  { name: 'decimal with millimetres', job: (g) => ({ ...g, units: 'mm', decimal: true }), code: 'BAD_OPTION', field: 'decimal' },
  { name: 'fraction with millimetres', job: (g) => ({ ...g, units: 'mm', fraction: 8 }), code: 'BAD_OPTION', field: 'fraction' },
  { name: 'fraction with decimal', job: (g) => ({ ...g, decimal: true, fraction: 8 }), code: 'BAD_OPTION', field: 'fraction' },
  { name: 'a DXF version with no DXF written', job: (g) => ({ ...g, outputs: ['svg'], dxfVersion: 'r12' }), code: 'BAD_OPTION', field: 'dxfVersion' },
  { name: 'a stub shorter than the cut', job: (g) => ({ ...g, closedParts: true, stub: '1in', pieces: [{ ...g.pieces[0], angle: 45 }] }), code: 'OUT_OF_RANGE', field: 'stub' },
  { name: 'a stub without closed parts', job: (g) => ({ ...g, stub: '12in' }), code: 'BAD_OPTION', field: 'stub' },
  { name: 'a plate thicker than the pipe wall', job: (g) => ({ ...g, developOn: 'mid', rolledPlate: '1in' }), code: 'OUT_OF_RANGE', field: 'rolledPlate' },
  { name: 'a plate without developOn mid', job: (g) => ({ ...g, rolledPlate: '0.25in' }), code: 'BAD_OPTION', field: 'rolledPlate' },
  { name: 'an unknown development surface', job: (g) => ({ ...g, developOn: 'id' }), code: 'BAD_CHOICE', field: 'developOn' },
  { name: 'an unknown DXF text form', job: (g) => ({ ...g, dxfText: 'bold' }), code: 'BAD_CHOICE', field: 'dxfText' },
  { name: 'an unknown DXF curve form', job: (g) => ({ ...g, dxfCurves: 'splines' }), code: 'BAD_CHOICE', field: 'dxfCurves' },
  {
    name: 'shell plate holes overlapping',
    job: asPiece(shell, { branches: [...shell.branches, { name: 'N2', branch: 'NPS 6 STD', station: 33, clock: 12 }] }),
    code: 'HOLES_OVERLAP',
    field: 'pieces[0].branches[1]',
  },
  { name: 'shell plate hole off the shell end', job: asPiece(shell, { branches: [{ ...shell.branches[0], station: 1 }] }), code: 'OUT_OF_RANGE', field: 'pieces[0].branches[0].station' },
  { name: 'shell plate branch at 0 degrees', job: asPiece(shell, { branches: [{ ...shell.branches[0], angle: 0 }] }), code: 'OUT_OF_RANGE', field: 'pieces[0].branches[0].angle' },
  { name: 'shell plate branch clock at 14', job: asPiece(shell, { branches: [{ ...shell.branches[0], clock: 14 }] }), code: 'OUT_OF_RANGE', field: 'pieces[0].branches[0].clock' },
  { name: 'shell plate branch without a name', job: asPiece(shell, { branches: [{ ...shell.branches[0], name: '' }] }), code: 'EMPTY_INPUT', field: 'pieces[0].branches[0].name' },
  { name: 'shell plate seam clock as text', job: asPiece(shell, { seamClock: 'three' }), code: 'NOT_A_NUMBER', field: 'pieces[0].seamClock' },
  { name: 'shell plate negative weld zone', job: asPiece(shell, { weldZone: -1 }), code: 'NEGATIVE', field: 'pieces[0].weldZone' },
  { name: 'a seam on a concentric cone', job: asPiece(cone, { seam: 'opposite' }), code: 'BAD_OPTION', field: 'pieces[0].seam' },
  { name: 'both welds and pieces', job: asPiece(ell, { pieces: 4 }), code: 'BAD_OPTION', field: 'pieces[0].pieces' },
  { name: 'one surface override', job: piece({ headerSurface: 'inside' }), code: 'MISSING_INPUT', field: 'pieces[0].branchSurface' },
  { name: 'a job title with an escape sequence', job: (g) => ({ ...g, job: 'Plant 7\u001b[2J' }), code: 'BAD_TEXT', field: 'job' },
  { name: 'a piece label with a tab', job: piece({ piece: 'S118\t01' }), code: 'BAD_TEXT', field: 'pieces[0].piece' },
  { name: 'a piece label 300 characters long', job: piece({ piece: 'y'.repeat(300) }), code: 'BAD_TEXT', field: 'pieces[0].piece' },
  {
    name: 'two labels giving the same file names',
    job: (g) => ({ ...g, pieces: [g.pieces[0], { ...g.pieces[0], piece: 'S118 01 TEE' }] }),
    code: 'BAD_JOB',
    field: 'pieces[1].piece',
  },
  {
    name: 'a pad narrower than nothing',
    job: asPiece({ piece: 'S118-04 pad', joint: 'pad', header: 'NPS 12 STD', branch: 'NPS 6 STD', thickness: '3/8', width: -1 }),
    code: 'NEGATIVE',
    field: 'pieces[0].width',
  },
];
