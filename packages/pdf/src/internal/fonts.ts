/**
 * The three standard fonts every Girth PDF uses, and their resource names.
 */
import { StandardFonts, type PDFDocument, type PDFFont } from 'pdf-lib';

/** The fonts of one document. */
export interface Fonts {
  readonly regular: PDFFont;
  readonly bold: PDFFont;
  readonly mono: PDFFont;
}

/** Resource names of the fonts inside the sheet drawing (a form XObject). */
export const FONT_KEYS = { regular: 'GR', bold: 'GB', mono: 'GM' } as const;

/** Embeds Helvetica, Helvetica-Bold and Courier (standard fonts: nothing is stored in the file). */
export async function embedFonts(doc: PDFDocument): Promise<Fonts> {
  const [regular, bold, mono] = await Promise.all([
    doc.embedFont(StandardFonts.Helvetica),
    doc.embedFont(StandardFonts.HelveticaBold),
    doc.embedFont(StandardFonts.Courier),
  ]);
  return { regular, bold, mono };
}
