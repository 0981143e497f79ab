/**
 * Options of the PDF writer: paper, orientation, the printer-safe margin and
 * the overlap between neighbouring pages, each checked against the paper.
 */
import { GirthError } from '@girth/pipes';
import { PAPER_NAMES, PAPERS, type Paper, type PaperName } from './paper.js';

/** Which way the paper is turned: chosen for the fewest pages (`auto`), or as the user picks. */
export type Orientation = 'auto' | 'portrait' | 'landscape';

/** Options of {@link planToPdf} and {@link writePdf}; every field optional, lengths in mm. */
export interface PdfOptions {
  /** The paper, by name (`letter`, `a4`, `roll-24in`, ...). Default `letter`. */
  readonly paper?: string;
  /** `auto` (default: the fewest pages, portrait on a tie), `portrait` or `landscape`. */
  readonly orientation?: Orientation;
  /** Blank border a printer cannot print on, mm, 0 up to a quarter of the paper's short side. Default 6.35 (1/4 in). */
  readonly marginMm?: number;
  /** Strip of the drawing printed on both neighbouring pages, mm, 0 up to half the printable drawing area. Default 12.7 (1/2 in). */
  readonly overlapMm?: number;
  /** Words of the sheet furniture (page labels, calibration caption) in the job's unit first: `in` (default) or `mm`. */
  readonly units?: 'in' | 'mm';
}

/** {@link PdfOptions} with defaults filled in and the paper looked up. */
export interface ResolvedPdfOptions {
  readonly paper: Paper;
  readonly orientation: Orientation;
  readonly marginMm: number;
  readonly overlapMm: number;
  readonly units: 'in' | 'mm';
}

/** Default printer-safe margin, mm (1/4 in: what most office printers leave blank; common practice). */
export const DEFAULT_PRINT_MARGIN_MM = 6.35;
/** Default overlap between neighbouring pages, mm (1/2 in). */
export const DEFAULT_PAGE_OVERLAP_MM = 12.7;
/** Most pages one sheet may be printed on; more is refused as a mistake (a roll or a larger paper serves better). */
export const MAX_PAGES = 200;

/**
 * Fills in defaults and checks the options that do not depend on the sheet.
 * The overlap is checked against the page in {@link planTiles}, where the
 * drawing area is known.
 *
 * @throws GirthError `BAD_CHOICE` (field `paper`, `orientation`, `units`) for a
 *   word not listed; `NOT_FINITE` / `NEGATIVE` / `OUT_OF_RANGE` (field
 *   `marginMm`, `overlapMm`) for a length that is not finite, below zero, or a
 *   margin wider than a quarter of the paper's short side.
 * @example resolvePdfOptions({ paper: 'A4' }).paper.widthMm // 210
 */
export function resolvePdfOptions(options: PdfOptions = {}): ResolvedPdfOptions {
  const name = (options.paper ?? 'letter').trim().toLowerCase();
  const paper = (PAPER_NAMES as readonly string[]).includes(name) ? PAPERS[name as PaperName] : undefined;
  if (paper === undefined) {
    throw new GirthError('BAD_CHOICE', 'paper', `paper: must be one of ${PAPER_NAMES.join(', ')}; got "${options.paper}"`, options.paper);
  }
  const orientation = options.orientation ?? 'auto';
  if (!['auto', 'portrait', 'landscape'].includes(orientation)) {
    throw new GirthError('BAD_CHOICE', 'orientation', `orientation: must be one of auto, portrait, landscape; got "${String(orientation)}"`, orientation);
  }
  const units = options.units ?? 'in';
  if (units !== 'in' && units !== 'mm') throw new GirthError('BAD_CHOICE', 'units', `units: must be in or mm; got "${String(units)}"`, units);
  const shortMm = paper.kind === 'sheet' ? Math.min(paper.widthMm, paper.heightMm) : paper.widthMm;
  const marginMm = checkLength(options.marginMm ?? DEFAULT_PRINT_MARGIN_MM, 'marginMm', shortMm / 4, `a quarter of the ${paper.label} paper's short side`);
  const overlapMm = checkLength(options.overlapMm ?? DEFAULT_PAGE_OVERLAP_MM, 'overlapMm', Number.MAX_VALUE, '');
  return { paper, orientation, marginMm, overlapMm, units };
}

function checkLength(value: number, field: string, maxMm: number, what: string): number {
  if (typeof value !== 'number' || Number.isNaN(value)) throw new GirthError('NOT_A_NUMBER', field, `${field}: expected a number of mm, got ${String(value)}`, value);
  if (!Number.isFinite(value)) throw new GirthError('NOT_FINITE', field, `${field}: must be finite, got ${value}`, value);
  if (value < 0) throw new GirthError('NEGATIVE', field, `${field}: must not be below zero, got ${value} mm`, value);
  if (value > maxMm) throw new GirthError('OUT_OF_RANGE', field, `${field}: ${round(value)} mm is larger than ${what} (${round(maxMm)} mm)`, value);
  return value + 0;
}

function round(mm: number): string {
  return String(Math.round(mm * 100) / 100);
}
