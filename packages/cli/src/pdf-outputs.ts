/**
 * PDF outputs of the command line: one joint's sheets in one PDF (`--pdf`),
 * and a job's packet (`girth run --packet`): a cover with the cut list and
 * the caution, then every piece's sheets and its ordinate tables.
 */
import type { PdfOptions, PdfPart } from '@girth/pdf';
import { planSheet } from '@girth/sheet';
import type { LayoutResult } from '@girth/unroll';
import { asPrintOptionError } from './print-options.js';

/** What labels and units the sheets carry. */
export interface SheetLabels {
  readonly units: 'in' | 'mm';
  readonly job?: string;
  readonly piece?: string;
}

/** The sheet parts of one layout: each template planned as the SVG plans it. */
export function layoutSheets(result: LayoutResult, labels: SheetLabels): PdfPart[] {
  return result.templates.map((t) => ({
    kind: 'sheet',
    plan: planSheet(t, { sheetUnits: labels.units, ...(labels.job !== undefined ? { job: labels.job } : {}), ...(labels.piece !== undefined ? { piece: labels.piece } : {}) }),
  }));
}

/**
 * The PDF of one joint: every template's sheet, tiled on the paper asked for.
 * @throws GirthError from `@girth/pdf`, named by the option typed (`--paper`, `--page-overlap`, `--page-margin`).
 * @example await jointPdf(result, { units: 'in', job: 'J-2291' }, { paper: 'letter' })
 */
export async function jointPdf(result: LayoutResult, labels: SheetLabels, print: PdfOptions): Promise<Uint8Array> {
  return printParts(layoutSheets(result, labels), print, { title: [labels.job, labels.piece].filter((s) => s !== undefined).join(' - ') || 'Girth templates' });
}

/** Lines of at most `width` characters, broken at spaces. */
export function wrapWords(text: string, width: number): string[] {
  const out: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/).filter((w) => w !== '')) {
    if (line !== '' && line.length + 1 + word.length > width) {
      out.push(line);
      line = word;
    } else {
      line = line === '' ? word : `${line} ${word}`;
    }
  }
  if (line !== '') out.push(line);
  return out;
}

/** One piece of a job packet: its label, layout and printed report (with its ordinate tables). */
export interface PacketPiece {
  readonly piece: string;
  readonly result: LayoutResult;
  readonly report: string;
}

/**
 * A job packet: the cover (job, cut list, caution), then for each piece its
 * sheets and its ordinate tables.
 * @param summary - the cut list as `summaryTable` writes it.
 * @throws GirthError from `@girth/pdf`, named by the option typed.
 * @example await jobPacket('J-2291', 'in', summary, pieces, caution, { paper: 'a4' })
 */
export async function jobPacket(
  job: string,
  units: 'in' | 'mm',
  summary: string,
  pieces: readonly PacketPiece[],
  caution: string,
  print: PdfOptions,
): Promise<Uint8Array> {
  const width = Math.max(60, ...summary.split('\n').map((l) => l.length));
  const cover: string[] = [
    `Job: ${job}`,
    `${pieces.length} piece${pieces.length === 1 ? '' : 's'}; lengths in ${units === 'in' ? 'inches' : 'millimetres'}.`,
    '',
    'Cut list',
    '',
    ...summary.split('\n'),
    '',
    ...wrapWords('Then, for each piece in this order: its sheets (an assembly map, then pages A1, A2 ... when a sheet takes several pages) and its ordinate tables.', width),
    '',
    ...wrapWords(caution, width),
  ];
  const parts: PdfPart[] = [{ kind: 'text', title: `Job packet: ${job}`, lines: cover }];
  for (const p of pieces) {
    parts.push(...layoutSheets(p.result, { units, job, piece: p.piece }));
    const lines = p.report.trimEnd().split('\n');
    parts.push({ kind: 'text', title: `${p.piece}: ordinate tables`, lines: [...lines, '', ...wrapWords(caution, Math.max(60, ...lines.map((l) => l.length)))] });
  }
  return printParts(parts, print, { title: `Job packet: ${job}` });
}

async function printParts(parts: readonly PdfPart[], print: PdfOptions, info: { title: string }): Promise<Uint8Array> {
  try {
    // Loaded only when a PDF is written: the writer brings in pdf-lib.
    const { writePdf } = await import('@girth/pdf');
    return await writePdf(parts, print, info);
  } catch (error) {
    throw asPrintOptionError(error);
  }
}
