/**
 * The PDF document: each sheet tiled onto pages (an assembly map first when
 * it takes more than one), and pages of plain text (a job's cover, ordinate
 * tables), every page with its band and calibration square.
 */
import { PDFDocument, PDFName, type PDFPage, type PDFRef } from 'pdf-lib';
import { CAUTION, GirthError } from '@girth/pipes';
import type { SheetPlan } from '@girth/sheet';
import { bandOps, calibrationSquareOps, neighbourOps, SQUARE_FORM_BOX, trimMarkOps } from './furniture.js';
import { embedFonts, FONT_KEYS, type Fonts } from './internal/fonts.js';
import { circleOps, fillRectOps, lineOps, placeForm, rectOps, textLineOps, textWidth } from './internal/draw.js';
import { cm, rect } from './internal/content.js';
import { sheetOps } from './internal/sheet-ops.js';
import { resolvePdfOptions, type PdfOptions, type ResolvedPdfOptions } from './options.js';
import { BAND_MM, GUTTER_MM, planTiles, type Rect, type TilePlan } from './tile-plan.js';

/** Points per millimetre. */
const PT_PER_MM = 72 / 25.4;
/** Grey of the overlap strips (under the drawing). */
const STRIP_GREY = 0.9;

/** One part of a document: a sheet to tile, or pages of monospaced text. */
export type PdfPart =
  | { readonly kind: 'sheet'; readonly plan: SheetPlan }
  | {
      readonly kind: 'text';
      /** Heading of each page. */
      readonly title: string;
      /** Lines printed in a monospaced font, so tables keep their columns. */
      readonly lines: readonly string[];
    };

/** What the document says about itself (PDF metadata). */
export interface PdfInfo {
  readonly title?: string;
  readonly subject?: string;
}

interface Ctx {
  readonly doc: PDFDocument;
  readonly fonts: Fonts;
  readonly options: ResolvedPdfOptions;
  readonly pages: { page: PDFPage; content: string; band: (pageNo: number, total: number) => string }[];
  /** The calibration square, one form placed on every page. */
  readonly square: PDFRef;
}

/** The calibration square's resource name on every page. */
const SQUARE = 'GCal';

function newPage(ctx: Ctx, widthMm: number, heightMm: number): PDFPage {
  const page = ctx.doc.addPage([widthMm * PT_PER_MM, heightMm * PT_PER_MM]);
  for (const [k, font] of [
    [FONT_KEYS.regular, ctx.fonts.regular],
    [FONT_KEYS.bold, ctx.fonts.bold],
    [FONT_KEYS.mono, ctx.fonts.mono],
  ] as const) {
    page.node.setFontDictionary(PDFName.of(k), font.ref);
  }
  page.node.setXObject(PDFName.of(SQUARE), ctx.square);
  return page;
}

function sheetForm(ctx: Ctx, plan: SheetPlan): PDFRef {
  const { left, top, widthMm, heightMm } = plan.page;
  const fontRefs = { [FONT_KEYS.regular]: ctx.fonts.regular.ref, [FONT_KEYS.bold]: ctx.fonts.bold.ref, [FONT_KEYS.mono]: ctx.fonts.mono.ref };
  const form = ctx.doc.context.flateStream(sheetOps(plan, ctx.fonts), {
    Type: 'XObject',
    Subtype: 'Form',
    BBox: [left, top - heightMm, left + widthMm, top],
    Resources: { Font: fontRefs },
  });
  return ctx.doc.context.register(form);
}

function sheetName(plan: SheetPlan): string {
  return [plan.template.title, plan.piece, plan.job].filter((s) => s !== undefined && s !== '').join(' - ');
}

function clipTo(r: Rect): string {
  return `${rect(r.x, r.y, r.width, r.height)}W n\n`;
}

const PRINT_LINE = 'Print at 100 % (actual size, no fit to page); measure the square both ways before use.';

function mapPage(ctx: Ctx, plan: SheetPlan, tiles: TilePlan, form: string): void {
  const page = newPage(ctx, tiles.pageWidthMm, tiles.pageHeightMm);
  const c = tiles.content;
  const { fonts } = ctx;
  let ops = '';
  const head = (text: string, y: number, size: number, bold = false) => {
    ops += textLineOps({ text, x: c.x, y, sizeMm: Math.min(size, fitSize(fonts, [text], c.width, size, bold)), font: bold ? fonts.bold : fonts.regular, fontKey: bold ? FONT_KEYS.bold : FONT_KEYS.regular });
  };
  const top = c.y + c.height;
  const title = `Assembly map: ${sheetName(plan)}`;
  head(title, top - 5, 4.2, true);
  head(`${tiles.rows * tiles.cols} pages of ${tiles.paper.label} (${tiles.orientation}), ${tiles.rows} row${tiles.rows > 1 ? 's' : ''} (A, B, ...) by ${tiles.cols} column${tiles.cols > 1 ? 's' : ''}; sheet ${sizeText(tiles, ctx.options.units)}`, top - 11, 3);
  const steps = [
    PRINT_LINE,
    'Trim each page on its trim marks along the left and top edges (not column 1 or row A).',
    "Lay the trimmed edge over the neighbour's shaded strip, match the round targets, and tape.",
    'Pages fit in the order of the grid below; the arrows at the edges of each page name its neighbours.',
  ];
  const textSize = fitSize(fonts, [...steps, CAUTION], c.width, 3);
  steps.forEach((s, i) => {
    ops += textLineOps({ text: `${i + 1}. ${s}`, x: c.x, y: c.y + 10 + (steps.length - i) * textSize * 1.5, sizeMm: textSize, font: fonts.regular, fontKey: FONT_KEYS.regular });
  });
  ops += textLineOps({ text: CAUTION, x: c.x, y: c.y + 4, sizeMm: Math.min(textSize, fitSize(fonts, [CAUTION], c.width, 3, true)), font: fonts.bold, fontKey: FONT_KEYS.bold });
  const box: Rect = { x: c.x, y: c.y + 14 + (steps.length + 1) * textSize * 1.5, width: c.width, height: top - 16 - (c.y + 14 + (steps.length + 1) * textSize * 1.5) };
  const last = tiles.tiles[tiles.tiles.length - 1]!;
  const coverW = last.window.x + last.window.width;
  const coverH = last.window.y + last.window.height;
  const s = Math.min(box.width / coverW, box.height / coverH);
  const mx = box.x + (box.width - s * coverW) / 2;
  const myTop = box.y + box.height;
  const { left, top: sheetTop } = plan.page;
  ops += rectOps(mx, myTop - s * plan.page.heightMm, s * plan.page.widthMm, s * plan.page.heightMm, 0.15, 0.6);
  ops += `q\n${cm(s, 0, 0, s, mx - s * left, myTop - s * sheetTop)}/${form} Do\nQ\n`;
  for (const t of tiles.tiles) {
    const w = t.window;
    const rx = mx + s * w.x;
    const ry = myTop - s * (w.y + w.height);
    ops += rectOps(rx, ry, s * w.width, s * w.height, 0.35);
    const size = Math.max(1.6, Math.min(4.5, (s * w.height) / 4, (s * w.width) / 4));
    ops += textLineOps({ text: t.label, x: rx + size * 0.3, y: ry + s * w.height - size * 1.05, sizeMm: size, font: fonts.bold, fontKey: FONT_KEYS.bold });
  }
  ctx.pages.push({ page, content: ops, band: (n, total) => bandOps(tiles.band, { label: 'MAP', lines: [`${plan.template.title}: assembly map`, bandLine2(plan), `Page ${n} of ${total}. ${PRINT_LINE}`] }, fonts, SQUARE) });
}

function bandLine2(plan: SheetPlan): string {
  return [plan.job, plan.piece].filter((s) => s !== undefined && s !== '').join(', ') || 'Girth template';
}

function sizeText(t: TilePlan, units: 'in' | 'mm'): string {
  const mm = `${Math.round(t.sheetWidthMm)} x ${Math.round(t.sheetHeightMm)} mm`;
  const inch = `${(t.sheetWidthMm / 25.4).toFixed(1)} x ${(t.sheetHeightMm / 25.4).toFixed(1)} in`;
  return units === 'in' ? `${inch} (${mm})` : `${mm} (${inch})`;
}

/** The largest size up to `maxMm` at which every line fits `width`. */
function fitSize(fonts: Fonts, lines: readonly string[], width: number, maxMm: number, bold = false): number {
  const widest = Math.max(...lines.map((l) => textWidth(bold ? fonts.bold : fonts.regular, l, 1)));
  return Math.max(1.4, Math.min(maxMm, width / Math.max(widest, 1e-9)));
}

function tilePages(ctx: Ctx, plan: SheetPlan, tiles: TilePlan, form: string): void {
  const c = tiles.content;
  const { left, top } = plan.page;
  for (const t of tiles.tiles) {
    const page = newPage(ctx, tiles.pageWidthMm, tiles.pageHeightMm);
    const w = t.window;
    const ux = (u: number) => c.x + (u - w.x);
    const vy = (v: number) => c.y + c.height - (v - w.y);
    let ops = `q\n${clipTo(c)}`;
    for (const s of tiles.strips) {
      if (s.x > w.x + w.width || s.x + s.width < w.x || s.y > w.y + w.height || s.y + s.height < w.y) continue;
      ops += fillRectOps(ux(s.x), vy(s.y + s.height), s.width, s.height, STRIP_GREY);
    }
    ops += placeForm(form, c.x - left - w.x, c.y + c.height - top + w.y);
    const r = tiles.targetRadiusMm;
    if (r > 0) {
      for (const [u, v] of tiles.targets) {
        const [x, y] = [ux(u), vy(v)];
        if (x < c.x - r || x > c.x + c.width + r || y < c.y - r || y > c.y + c.height + r) continue;
        const arm = tiles.options.overlapMm / 2;
        ops += circleOps(x, y, r, 0.25) + lineOps([[x - arm, y], [x + arm, y]], 0.15) + lineOps([[x, y - arm], [x, y + arm]], 0.15);
      }
    }
    ops += `Q\n${trimMarkOps(c)}${neighbourOps(c, t, ctx.fonts)}`;
    const where = `row ${t.label.replace(/\d+$/, '')}, column ${t.col + 1}`;
    ctx.pages.push({
      page,
      content: ops,
      band: (n, total) =>
        bandOps(tiles.band, { label: t.label, lines: [`${plan.template.title}: page ${t.label} (${where}) of ${tiles.rows} x ${tiles.cols}`, bandLine2(plan), `Page ${n} of ${total}. ${PRINT_LINE}`] }, ctx.fonts, SQUARE),
    });
  }
}

function sheetPages(ctx: Ctx, plan: SheetPlan): void {
  const tiles = planTiles(plan.page.widthMm, plan.page.heightMm, ctx.options);
  const ref = sheetForm(ctx, plan);
  const name = `GS${ref.objectNumber}`;
  const before = ctx.pages.length;
  if (tiles.map) mapPage(ctx, plan, tiles, name);
  tilePages(ctx, plan, tiles, name);
  for (const p of ctx.pages.slice(before)) p.page.node.setXObject(PDFName.of(name), ref);
}

/**
 * The page size of text pages: the paper turned whichever way prints the
 * longest line larger (portrait unless landscape gains more than 15 %); on a
 * roll, the roll's width by 1.414 times it.
 */
function textPageSize(o: ResolvedPdfOptions, longest: number): { widthMm: number; heightMm: number } {
  if (o.paper.kind === 'roll') return { widthMm: o.paper.widthMm, heightMm: o.paper.widthMm * Math.SQRT2 };
  const fits = (w: number) => Math.min(TEXT_MM, (w - 2 * o.marginMm - 2 * GUTTER_MM) / (MONO_EM * longest));
  const p = o.paper;
  return fits(p.heightMm) > 1.15 * fits(p.widthMm) ? { widthMm: p.heightMm, heightMm: p.widthMm } : { widthMm: p.widthMm, heightMm: p.heightMm };
}

/** Largest size of monospaced text, mm, and Courier's advance, em. */
const TEXT_MM = 3.2;
const MONO_EM = 0.6;

function textPages(ctx: Ctx, title: string, lines: readonly string[]): void {
  const longest = Math.max(1, ...lines.map((l) => l.length));
  const { widthMm, heightMm } = textPageSize(ctx.options, longest);
  const m = ctx.options.marginMm;
  const content: Rect = { x: m + GUTTER_MM, y: m + BAND_MM + GUTTER_MM, width: widthMm - 2 * m - 2 * GUTTER_MM, height: heightMm - 2 * m - 2 * GUTTER_MM - BAND_MM };
  const band: Rect = { x: m, y: m, width: widthMm - 2 * m, height: BAND_MM };
  const size = Math.max(1.5, Math.min(TEXT_MM, content.width / (MONO_EM * longest)));
  const step = size * 1.3;
  const perPage = Math.max(1, Math.floor((content.height - 10) / step));
  const chunks: (readonly string[])[] = [];
  for (let i = 0; i < Math.max(lines.length, 1); i += perPage) chunks.push(lines.slice(i, i + perPage));
  chunks.forEach((chunk, k) => {
    const page = newPage(ctx, widthMm, heightMm);
    const top = content.y + content.height;
    const heading = chunks.length > 1 ? `${title} (${k + 1} of ${chunks.length})` : title;
    let ops = textLineOps({ text: heading, x: content.x, y: top - 5, sizeMm: Math.min(4.2, fitSize(ctx.fonts, [heading], content.width, 4.2, true)), font: ctx.fonts.bold, fontKey: FONT_KEYS.bold });
    chunk.forEach((line, i) => {
      if (line.trim() === '') return;
      ops += textLineOps({ text: line, x: content.x, y: top - 10 - size - i * step, sizeMm: size, font: ctx.fonts.mono, fontKey: FONT_KEYS.mono });
    });
    ctx.pages.push({ page, content: ops, band: (n, total) => bandOps(band, { label: String(n), lines: [heading, `Page ${n} of ${total}`, PRINT_LINE] }, ctx.fonts, SQUARE) });
  });
}

/**
 * Writes a PDF of the given parts, in order: each sheet at true size on the
 * paper the options name (tiled with an assembly map, or one page per roll
 * width), each text part on pages of its own. Every page carries its label,
 * a line saying what it is, and a 1 in (25.4 mm) calibration square ticked in
 * inches and millimetres. Vector drawing throughout; the three standard
 * fonts (Helvetica, Helvetica-Bold, Courier), characters outside WinAnsi
 * written as a fitter would type them. The same input gives the same bytes
 * (no dates are written).
 *
 * @param parts - sheets (plans from `planSheet` of `@girth/sheet`) and text pages, at least one.
 * @param options - paper, orientation, margin and overlap (see {@link PdfOptions}).
 * @param info - the document's title and subject.
 * @returns the PDF file's bytes.
 * @throws GirthError from {@link resolvePdfOptions} and {@link planTiles}
 *   (unknown paper, a margin or overlap too large for the page, more than
 *   200 pages for one sheet); `MISSING_INPUT` (field `parts`) for no parts.
 * @example
 * ```ts
 * const bytes = await writePdf([{ kind: 'sheet', plan: planSheet(template, { job: 'J-2291' }) }], { paper: 'a4' });
 * ```
 */
export async function writePdf(parts: readonly PdfPart[], options: PdfOptions = {}, info: PdfInfo = {}): Promise<Uint8Array> {
  const resolved = resolvePdfOptions(options);
  if (parts.length === 0) {
    throw new GirthError('MISSING_INPUT', 'parts', 'parts: give at least one sheet or text part to print');
  }
  for (const p of parts) if (p.kind === 'sheet') planTiles(p.plan.page.widthMm, p.plan.page.heightMm, resolved);
  const doc = await PDFDocument.create({ updateMetadata: false });
  doc.setCreator('Girth');
  doc.setProducer('Girth (pdf-lib)');
  if (info.title !== undefined) doc.setTitle(info.title);
  if (info.subject !== undefined) doc.setSubject(info.subject);
  const fonts = await embedFonts(doc);
  const fontRefs = { [FONT_KEYS.regular]: fonts.regular.ref, [FONT_KEYS.bold]: fonts.bold.ref, [FONT_KEYS.mono]: fonts.mono.ref };
  const square = doc.context.register(
    doc.context.flateStream(calibrationSquareOps(fonts, resolved.units), { Type: 'XObject', Subtype: 'Form', BBox: [...SQUARE_FORM_BOX], Resources: { Font: fontRefs } }),
  );
  const ctx: Ctx = { doc, fonts, options: resolved, pages: [], square };
  for (const part of parts) {
    if (part.kind === 'sheet') sheetPages(ctx, part.plan);
    else textPages(ctx, part.title, part.lines);
  }
  const total = ctx.pages.length;
  ctx.pages.forEach((p, i) => {
    // Points to millimetres, then the page's drawing and its band.
    const stream = doc.context.flateStream(`q\n${cm(PT_PER_MM, 0, 0, PT_PER_MM, 0, 0)}${p.content}${p.band(i + 1, total)}Q\n`);
    p.page.node.addContentStream(doc.context.register(stream));
  });
  return doc.save({ useObjectStreams: true });
}

/**
 * Writes one sheet plan as a PDF at true size (see {@link writePdf}).
 *
 * @param plan - a plan from `planSheet` of `@girth/sheet`.
 * @param options - paper (default Letter), orientation, margin, overlap.
 * @returns the PDF file's bytes.
 * @throws GirthError as {@link writePdf}.
 * @example
 * ```ts
 * const bytes = await planToPdf(planSheet(template, { job: 'J-2291', piece: 'SP-4' }), { paper: 'letter' });
 * ```
 */
export async function planToPdf(plan: SheetPlan, options: PdfOptions = {}): Promise<Uint8Array> {
  return writePdf([{ kind: 'sheet', plan }], options, { title: sheetName(plan) });
}
