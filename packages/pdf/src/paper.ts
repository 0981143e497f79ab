/**
 * The papers Girth prints on: office sheets (cut to size) and plotter rolls
 * (a fixed width, any length).
 */

/** A paper's name as a user types it (lower case). */
export type PaperName = 'letter' | 'legal' | 'tabloid' | 'a4' | 'a3' | 'roll-24in' | 'roll-36in' | 'roll-610mm' | 'roll-914mm';

/** A cut sheet (both sides fixed) or a roll (a fixed width, any length). */
export type Paper =
  | { readonly kind: 'sheet'; readonly name: PaperName; readonly label: string; readonly widthMm: number; readonly heightMm: number }
  | { readonly kind: 'roll'; readonly name: PaperName; readonly label: string; readonly widthMm: number };

/**
 * Every paper by name, portrait sizes in mm. US sizes are exact inches
 * (ANSI/ASME Y14.1: Letter 8.5 x 11 in, Legal 8.5 x 14 in, Tabloid 11 x 17 in);
 * A sizes from ISO 216 (A4 210 x 297 mm, A3 297 x 420 mm); roll widths as
 * plotter rolls are sold (24 in, 36 in, 610 mm, 914 mm; common practice).
 *
 * @example PAPERS.letter.widthMm // 215.9
 */
export const PAPERS: Readonly<Record<PaperName, Paper>> = {
  letter: { kind: 'sheet', name: 'letter', label: 'Letter', widthMm: 215.9, heightMm: 279.4 },
  legal: { kind: 'sheet', name: 'legal', label: 'Legal', widthMm: 215.9, heightMm: 355.6 },
  tabloid: { kind: 'sheet', name: 'tabloid', label: 'Tabloid', widthMm: 279.4, heightMm: 431.8 },
  a4: { kind: 'sheet', name: 'a4', label: 'A4', widthMm: 210, heightMm: 297 },
  a3: { kind: 'sheet', name: 'a3', label: 'A3', widthMm: 297, heightMm: 420 },
  'roll-24in': { kind: 'roll', name: 'roll-24in', label: '24 in roll', widthMm: 609.6 },
  'roll-36in': { kind: 'roll', name: 'roll-36in', label: '36 in roll', widthMm: 914.4 },
  'roll-610mm': { kind: 'roll', name: 'roll-610mm', label: '610 mm roll', widthMm: 610 },
  'roll-914mm': { kind: 'roll', name: 'roll-914mm', label: '914 mm roll', widthMm: 914 },
};

/** Every paper name, in the order help texts list them. */
export const PAPER_NAMES: readonly PaperName[] = Object.keys(PAPERS) as PaperName[];
