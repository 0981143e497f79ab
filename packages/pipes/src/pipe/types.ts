/**
 * The pipe every later layer works with: outside diameter and wall in
 * millimetres, where the size came from, and a canonical label.
 */

/** The standard a pipe's dimensions come from; `'custom'` for an OD and wall given directly. */
export type PipeStandard = 'ASME B36.10M' | 'ASME B36.19M' | 'EN 10220' | 'custom';

/**
 * A pipe: its dimensions in millimetres and where they came from.
 * `idMm = odMm - 2 wallMm` always; `0 < wallMm < odMm / 2`.
 */
export interface Pipe {
  readonly kind: 'pipe';
  /** Canonical name: `NPS 16 STD`, `NPS 6 Sch 80`, `NPS 4 Sch 10S`, `DN 150 x 7.1`, `406.4 x 9.53 mm`, `24.000 OD x 0.375 in`. */
  readonly label: string;
  /** Outside diameter, mm, > 0. */
  readonly odMm: number;
  /** Wall thickness, mm, > 0 and < odMm / 2. */
  readonly wallMm: number;
  /** Inside diameter, mm: odMm - 2 x wallMm. */
  readonly idMm: number;
  /** Where the dimensions come from. */
  readonly standard: PipeStandard;
  /** Nominal pipe size as written (`'1-1/2'`), for ASME pipes. */
  readonly nps?: string;
  /** Nominal pipe size as a number of inches (1.5 for NPS 1-1/2), e.g. for 1.5 x NPS elbow radii. */
  readonly npsIn?: number;
  /** Nominal size DN (EN 10220 pipes; ASME pipes carry the DN listed beside their NPS). */
  readonly dn?: number;
  /** Schedule or weight class as written in the label: `'Sch 40'`, `'STD'`, `'XS'`, `'Sch 10S'`. */
  readonly schedule?: string;
}
