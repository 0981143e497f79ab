/**
 * Options that print a PDF: the paper, which way it is turned, how much
 * neighbouring pages overlap and the margin a printer leaves blank. The
 * joint commands (with `--pdf FILE`) and `girth run --packet` take them.
 */
import { GirthError, parseLength, type LengthUnit } from '@girth/pipes';
import type { Orientation, PaperName, PdfOptions } from '@girth/pdf';
import { choiceOption, stringOption, type OptionSpec, type ParsedArgs } from './args.js';

/**
 * The papers `--paper` takes: `PAPER_NAMES` of `@girth/pdf`, listed here so
 * that starting the command does not load the PDF writer (a test checks the
 * two lists agree).
 */
export const PRINT_PAPERS: readonly PaperName[] = ['letter', 'legal', 'tabloid', 'a4', 'a3', 'roll-24in', 'roll-36in', 'roll-610mm', 'roll-914mm'];

/** The option definitions of printing. */
export const PRINT_OPTIONS: OptionSpec = {
  paper: { type: 'string' },
  orientation: { type: 'string' },
  'page-overlap': { type: 'string' },
  'page-margin': { type: 'string' },
};

/** Help lines for the printing options. */
export const PRINT_OPTIONS_HELP = `  --paper NAME           ${PRINT_PAPERS.join('|')} (default letter);
                         office paper is tiled, a roll gives one page per roll width
  --orientation auto|portrait|landscape  default auto: the fewest pages
  --page-overlap LEN     drawing printed on both neighbouring pages (default 1/2 in, 12.7 mm)
  --page-margin LEN      edge a printer leaves blank (default 1/4 in, 6.35 mm)`;

/** Library field -> the option a user typed. */
const OPTION_OF: Readonly<Record<string, string>> = {
  paper: '--paper',
  pages: '--paper',
  orientation: '--orientation',
  overlapMm: '--page-overlap',
  marginMm: '--page-margin',
};

/**
 * An error of `@girth/pdf` named by the option the user typed (`overlapMm`
 * becomes `--page-overlap`); other errors unchanged.
 */
export function asPrintOptionError(error: unknown): unknown {
  if (!(error instanceof GirthError)) return error;
  const option = OPTION_OF[error.field];
  return option === undefined ? error : error.withField(option);
}

/**
 * Reads the printing options, or `undefined` when `wanted` is false (then
 * none may be given).
 * @param wanted - a PDF is written (`--pdf` or `--packet` given).
 * @param needs - the option that makes them take effect, for messages.
 * @throws GirthError `BAD_OPTION` for a printing option without `needs`;
 *   `BAD_CHOICE` for an unknown paper or orientation; the length errors of
 *   `parseLength`, naming the option. Limits that depend on the sheet (a
 *   margin or overlap too large for the page, too many pages) are checked
 *   by the PDF writer, before anything is written.
 * @example readPrintOptions(args, 'in', true, '--pdf')
 */
export function readPrintOptions(args: ParsedArgs, units: LengthUnit, wanted: boolean, needs: string): PdfOptions | undefined {
  if (!wanted) {
    for (const name of Object.keys(PRINT_OPTIONS)) {
      if (stringOption(args, name) !== undefined) throw new GirthError('BAD_OPTION', `--${name}`, `--${name}: no PDF is written; give ${needs} too, or leave --${name} out`);
    }
    return undefined;
  }
  const paper = stringOption(args, 'paper') === undefined ? undefined : choiceOption(args, 'paper', PRINT_PAPERS, 'letter');
  const orientation = choiceOption<Orientation>(args, 'orientation', ['auto', 'portrait', 'landscape'], 'auto');
  const length = (name: string): number | undefined => {
    const text = stringOption(args, name);
    return text === undefined ? undefined : parseLength(text, { unit: units, field: `--${name}` });
  };
  const overlapMm = length('page-overlap');
  const marginMm = length('page-margin');
  return {
    ...(paper !== undefined ? { paper } : {}),
    orientation,
    units,
    ...(overlapMm !== undefined ? { overlapMm } : {}),
    ...(marginMm !== undefined ? { marginMm } : {}),
  };
}
