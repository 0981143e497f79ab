/**
 * How a sheet is cut into pages: the paper turned the way that takes the
 * fewest pages, each page's window onto the sheet, the overlap strips shared
 * by neighbours and the registration targets in them. Plain data, planned
 * once; the PDF writer only draws it.
 */
import { GirthError } from '@girth/pipes';
import type { Paper } from './paper.js';
import { MAX_PAGES, resolvePdfOptions, type PdfOptions, type ResolvedPdfOptions } from './options.js';

/** Space between the printable edge and the drawing window on every side, for trim marks and neighbour arrows, mm. */
export const GUTTER_MM = 7;
/** Height of the band under the drawing window: page label, instructions, calibration square, mm. */
export const BAND_MM = 31;
/** Side of the calibration square, mm (1 in). */
export const CALIBRATION_SQUARE_MM = 25.4;
/** Longest page PDF readers accept (14,400 pt = 200 in), mm. */
export const MAX_PAGE_LENGTH_MM = 5080;

/** A rectangle, mm; in sheet coordinates (y down from the sheet's top-left) or page coordinates (y up from the page's bottom-left) as stated. */
export interface Rect {
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

/** One page of a tiled sheet. */
export interface Tile {
  /** 0-based row (top to bottom) and column (left to right). */
  readonly row: number;
  readonly col: number;
  /** Row letter and column number, `A1`, `A2`, `B1`. */
  readonly label: string;
  /** The part of the sheet this page shows, mm, sheet coordinates (y down). */
  readonly window: Rect;
  /** Labels of the neighbouring pages, when there are any. */
  readonly neighbours: { readonly up?: string; readonly down?: string; readonly left?: string; readonly right?: string };
}

/** The pages of one sheet. */
export interface TilePlan {
  readonly kind: 'tile-plan';
  readonly paper: Paper;
  readonly orientation: 'portrait' | 'landscape';
  readonly options: ResolvedPdfOptions;
  /** Every page's size, mm. */
  readonly pageWidthMm: number;
  readonly pageHeightMm: number;
  /** The sheet's size, mm. */
  readonly sheetWidthMm: number;
  readonly sheetHeightMm: number;
  readonly rows: number;
  readonly cols: number;
  /** Where each page shows its window, mm, page coordinates (y up). */
  readonly content: Rect;
  /** The band under the window (label, instructions, calibration square), mm, page coordinates. */
  readonly band: Rect;
  /** Row by row. */
  readonly tiles: readonly Tile[];
  /** A first page with the assembly map (when there is more than one tile). */
  readonly map: boolean;
  /** Pages in all: tiles, plus the map page. */
  readonly pageCount: number;
  /** Strips of the sheet printed on two (or four) pages, mm, sheet coordinates. */
  readonly strips: readonly Rect[];
  /** Centres of the registration targets, mm, sheet coordinates: each lies in a strip, so it prints on every page sharing it. */
  readonly targets: readonly (readonly [number, number])[];
  /** Radius of a target's circle, mm. */
  readonly targetRadiusMm: number;
}

/**
 * Pages needed along one side: the fewest `n` with `n` windows of `windowMm`,
 * neighbours overlapping by `overlapMm`, covering `lengthMm`
 * (`n * windowMm - (n - 1) * overlapMm >= lengthMm`).
 *
 * @param lengthMm - the sheet's side, mm, above zero.
 * @param windowMm - the drawing window on one page, mm, larger than `overlapMm`.
 * @example pagesAlong(500, 200, 10) // 3
 */
export function pagesAlong(lengthMm: number, windowMm: number, overlapMm: number): number {
  if (lengthMm <= windowMm) return 1;
  return 1 + Math.ceil((lengthMm - windowMm) / (windowMm - overlapMm) - 1e-9);
}

/** `A`, `B`, ... `Z`, `AA`, `AB` for rows 0, 1, ... */
export function rowLetters(row: number): string {
  let n = row + 1;
  let s = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    s = String.fromCharCode(65 + r) + s;
    n = Math.floor((n - 1) / 26);
  }
  return s;
}

interface Layout {
  readonly orientation: 'portrait' | 'landscape';
  readonly pageWidthMm: number;
  readonly pageHeightMm: number;
  readonly windowWidthMm: number;
  readonly windowHeightMm: number;
  readonly rows: number;
  readonly cols: number;
}

function layoutOn(paper: Paper, orientation: 'portrait' | 'landscape', o: ResolvedPdfOptions, sheetW: number, sheetH: number): Layout {
  const edgeW = 2 * o.marginMm + 2 * GUTTER_MM;
  const edgeH = edgeW + BAND_MM;
  let pageW: number;
  let pageH: number;
  if (paper.kind === 'sheet') {
    const turn = orientation === 'landscape';
    pageW = turn ? paper.heightMm : paper.widthMm;
    pageH = turn ? paper.widthMm : paper.heightMm;
  } else if (orientation === 'portrait') {
    // The roll's width across the page; the page as long as the sheet needs.
    pageW = paper.widthMm;
    pageH = Math.max(sheetH + edgeH, pageW / 4);
  } else {
    pageH = paper.widthMm;
    pageW = Math.max(sheetW + edgeW, pageH / 4);
  }
  const windowW = pageW - edgeW;
  const windowH = pageH - edgeH;
  const minWindow = Math.min(windowW, windowH);
  if (minWindow <= 2 * o.overlapMm) {
    const field = minWindow <= 0 ? 'marginMm' : 'overlapMm';
    const value = field === 'marginMm' ? o.marginMm : o.overlapMm;
    const what =
      minWindow <= 0
        ? `leaves no room for the drawing on a ${orientation} ${paper.label} page`
        : `is half or more of the ${Math.round(minWindow * 10) / 10} mm drawing window of a ${orientation} ${paper.label} page`;
    throw new GirthError('OUT_OF_RANGE', field, `${field}: ${Math.round(value * 100) / 100} mm ${what}; give a smaller ${field === 'marginMm' ? 'margin' : 'overlap'}`, value);
  }
  return {
    orientation,
    pageWidthMm: pageW,
    pageHeightMm: pageH,
    windowWidthMm: windowW,
    windowHeightMm: windowH,
    rows: pagesAlong(sheetH, windowH, o.overlapMm),
    cols: pagesAlong(sheetW, windowW, o.overlapMm),
  };
}

/**
 * Plans the pages of a sheet `sheetWidthMm` x `sheetHeightMm` on the paper
 * the options name. Office paper is tiled in rows and columns; a roll gives
 * one page per roll width, as long as the sheet. With `orientation: 'auto'`
 * the paper is turned whichever way takes fewer pages (portrait on a tie; on
 * a roll, the shorter page on a tie).
 *
 * @param sheetWidthMm - the sheet's width, mm, above zero (a plan's `page.widthMm`).
 * @param sheetHeightMm - the sheet's height, mm, above zero.
 * @throws GirthError from {@link resolvePdfOptions}; `OUT_OF_RANGE` (field
 *   `overlapMm` or `marginMm`) when the overlap is half the drawing window or
 *   more, or the margin leaves no room; `OUT_OF_RANGE` (field `pages`) when the
 *   sheet needs more than {@link MAX_PAGES} pages, or (field `paper`) a roll
 *   page longer than {@link MAX_PAGE_LENGTH_MM}.
 * @example planTiles(1915, 600, { paper: 'letter' }).pageCount
 */
export function planTiles(sheetWidthMm: number, sheetHeightMm: number, options: PdfOptions | ResolvedPdfOptions = {}): TilePlan {
  const o = isResolved(options) ? options : resolvePdfOptions(options);
  const { paper } = o;
  const choices: ('portrait' | 'landscape')[] = o.orientation === 'auto' ? ['portrait', 'landscape'] : [o.orientation];
  // Auto: a turn the overlap or margin does not fit is left out; refused only when neither fits.
  const tried = choices.map((c) => {
    try {
      return layoutOn(paper, c, o, sheetWidthMm, sheetHeightMm);
    } catch (error) {
      return error as GirthError;
    }
  });
  const layouts = tried.filter((t): t is Layout => !(t instanceof GirthError));
  if (layouts.length === 0) throw tried[0] as GirthError;
  const pages = (l: Layout) => l.rows * l.cols;
  const area = (l: Layout) => l.pageWidthMm * l.pageHeightMm;
  const best = layouts.reduce((a, b) => (pages(b) < pages(a) || (pages(b) === pages(a) && paper.kind === 'roll' && area(b) < area(a)) ? b : a));
  const tileCount = pages(best);
  if (tileCount > MAX_PAGES) {
    throw new GirthError(
      'OUT_OF_RANGE',
      'pages',
      `pages: this sheet (${Math.round(sheetWidthMm)} x ${Math.round(sheetHeightMm)} mm) needs ${tileCount} pages of ${paper.label} paper, more than ${MAX_PAGES}; print it on a larger paper or a roll`,
      tileCount,
    );
  }
  if (Math.max(best.pageWidthMm, best.pageHeightMm) > MAX_PAGE_LENGTH_MM) {
    throw new GirthError('OUT_OF_RANGE', 'paper', `paper: this sheet needs a ${Math.round(Math.max(best.pageWidthMm, best.pageHeightMm))} mm long page on the ${paper.label}, longer than PDF allows (${MAX_PAGE_LENGTH_MM} mm)`, paper.name);
  }
  const ov = o.overlapMm;
  const stepX = best.windowWidthMm - ov;
  const stepY = best.windowHeightMm - ov;
  const label = (r: number, c: number) => `${rowLetters(r)}${c + 1}`;
  const tiles: Tile[] = [];
  for (let r = 0; r < best.rows; r++) {
    for (let c = 0; c < best.cols; c++) {
      tiles.push({
        row: r,
        col: c,
        label: label(r, c),
        window: { x: c * stepX, y: r * stepY, width: best.windowWidthMm, height: best.windowHeightMm },
        neighbours: {
          ...(r > 0 ? { up: label(r - 1, c) } : {}),
          ...(r + 1 < best.rows ? { down: label(r + 1, c) } : {}),
          ...(c > 0 ? { left: label(r, c - 1) } : {}),
          ...(c + 1 < best.cols ? { right: label(r, c + 1) } : {}),
        },
      });
    }
  }
  const strips: Rect[] = [];
  const targets: [number, number][] = [];
  const coverW = (best.cols - 1) * stepX + best.windowWidthMm;
  const coverH = (best.rows - 1) * stepY + best.windowHeightMm;
  if (ov > 0) {
    for (let c = 1; c < best.cols; c++) {
      strips.push({ x: c * stepX, y: 0, width: ov, height: coverH });
      for (let r = 0; r < best.rows; r++) {
        for (const f of [0.3, 0.7]) targets.push([c * stepX + ov / 2, r * stepY + f * best.windowHeightMm]);
      }
    }
    for (let r = 1; r < best.rows; r++) {
      strips.push({ x: 0, y: r * stepY, width: coverW, height: ov });
      for (let c = 0; c < best.cols; c++) {
        for (const f of [0.3, 0.7]) targets.push([c * stepX + f * best.windowWidthMm, r * stepY + ov / 2]);
      }
    }
  }
  const edge = o.marginMm + GUTTER_MM;
  return {
    kind: 'tile-plan',
    paper,
    orientation: best.orientation,
    options: o,
    pageWidthMm: best.pageWidthMm,
    pageHeightMm: best.pageHeightMm,
    sheetWidthMm,
    sheetHeightMm,
    rows: best.rows,
    cols: best.cols,
    content: { x: edge, y: edge + BAND_MM, width: best.windowWidthMm, height: best.windowHeightMm },
    band: { x: o.marginMm, y: o.marginMm, width: best.pageWidthMm - 2 * o.marginMm, height: BAND_MM },
    tiles,
    map: tileCount > 1,
    pageCount: tileCount + (tileCount > 1 ? 1 : 0),
    strips,
    targets,
    targetRadiusMm: Math.min(4, ov / 2 - 0.5),
  };
}

function isResolved(o: PdfOptions | ResolvedPdfOptions): o is ResolvedPdfOptions {
  return typeof o.paper === 'object';
}
