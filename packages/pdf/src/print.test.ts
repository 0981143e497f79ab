/**
 * The printed pages checked as a fitter would check them, by the Debian
 * poppler-utils tools (pdftoppm renders, pdftotext reads) and qpdf: the
 * calibration square measured in pixels on every page, the tiles put back
 * together from their registration targets alone and the cut line compared
 * with the plan the SVG is written from, the file's structure, and the words
 * on the pages where they belong. Kept to two sheets: rendering is the
 * heaviest check in the repository.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { PDFDocument } from 'pdf-lib';
import type { SheetPlan, SheetText } from '@girth/sheet';
import { calibrationSquareAt } from './furniture.js';
import { planTiles, type TilePlan } from './tile-plan.js';
import { planToPdf } from './write-pdf.js';
import { nps12LateralWrapPlan, nps24LateralWrapPlan } from './test-support/lateral.js';
import { pageText, pageTexts, qpdfCheck, renderPages, runCentre, type Grey } from './test-support/raster.js';
import { darkAt, findTargets } from './test-support/targets.js';

const median = (xs: readonly number[]): number => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
};

/** The calibration square's side in pixels, both ways, measured stroke centre to stroke centre on a 600 dpi crop. */
function measureSquare(img: Grey, padPx: number, sidePx: number): { across: number; down: number } {
  const at = (row: number) => (i: number) => img.data[row * img.width + Math.max(0, Math.min(img.width - 1, i))]!;
  const atCol = (col: number) => (j: number) => img.data[Math.max(0, Math.min(img.height - 1, j)) * img.width + col]!;
  const across: number[] = [];
  const down: number[] = [];
  for (let f = 0.15; f <= 0.85; f += 0.01) {
    const row = Math.round(padPx + f * sidePx);
    const l = runCentre(at(row), 0, img.width - 1, 1);
    const r = runCentre(at(row), img.width - 1, 0, -1);
    if (l !== undefined && r !== undefined) across.push(r - l);
    const col = Math.round(padPx + f * sidePx);
    const t = runCentre(atCol(col), 0, img.height - 1, 1);
    const b = runCentre(atCol(col), img.height - 1, 0, -1);
    if (t !== undefined && b !== undefined) down.push(b - t);
  }
  return { across: median(across), down: median(down) };
}

async function pageSizesMm(pdf: Uint8Array): Promise<{ w: number; h: number }[]> {
  const doc = await PDFDocument.load(pdf);
  return doc.getPages().map((p) => ({ w: (p.getWidth() * 25.4) / 72, h: (p.getHeight() * 25.4) / 72 }));
}

/** Every page's square: within 0.25 % of 1 in both ways (the check the issue asks for). */
async function checkSquares(pdf: Uint8Array, tiles: TilePlan, dpi = 600, expectedDpi = dpi): Promise<number> {
  const k = dpi / 25.4;
  const sizes = await pageSizesMm(pdf);
  const sq = calibrationSquareAt(tiles.band);
  const padMm = 4;
  const crop = {
    x: Math.round((sq.x - padMm) * k),
    y: Math.round((tiles.pageHeightMm - (sq.y + sq.sideMm + padMm)) * k),
    width: Math.round((sq.sideMm + 2 * padMm) * k),
    height: Math.round((sq.sideMm + 2 * padMm) * k),
  };
  // Every page of one sheet is the same size, so one crop serves them all.
  for (const s of sizes) expect([s.w, s.h].map((v) => v.toFixed(3))).toEqual([tiles.pageWidthMm.toFixed(3), tiles.pageHeightMm.toFixed(3)]);
  const images = renderPages(pdf, dpi, crop);
  expect(images.length).toBe(sizes.length);
  const sidePx = (sq.sideMm * expectedDpi) / 25.4;
  let worst = 0;
  images.forEach((img, i) => {
    const m = measureSquare(img, padMm * k - (crop.x - (sq.x - padMm) * k), sq.sideMm * k);
    for (const v of [m.across, m.down]) {
      const err = Math.abs(v / sidePx - 1);
      worst = Math.max(worst, err);
      expect(err, `page ${i + 1}: ${v.toFixed(2)} px for ${sidePx.toFixed(2)} px at ${dpi} dpi`).toBeLessThan(0.0025);
    }
  });
  return worst;
}

function textItems(plan: SheetPlan, role: string): SheetText[] {
  return plan.items.filter((i): i is SheetText => i.kind === 'text' && i.role === role);
}

describe('an NPS 12 lateral wrap (40 in) tiled on Letter', () => {
  const plan = nps12LateralWrapPlan();
  const tiles = planTiles(plan.page.widthMm, plan.page.heightMm, { paper: 'letter' });
  let pdf: Uint8Array;
  beforeAll(async () => {
    pdf = await planToPdf(plan, { paper: 'letter' });
  });

  it('is a sound PDF (qpdf --check)', () => {
    expect(tiles.pageCount).toBeGreaterThan(4);
    expect(qpdfCheck(pdf)).toMatch(/No syntax or stream encoding errors found/);
  });

  it('every page carries a calibration square measuring 1 in within 0.25 % both ways (pdftoppm at 600 dpi)', async () => {
    const worst = await checkSquares(pdf, tiles);
    expect(worst).toBeLessThan(0.0025);
    // The measurement sees a scale error: the map page alone, rendered 1 % too large, is refused.
    const one = await PDFDocument.create();
    const [map] = await one.copyPages(await PDFDocument.load(pdf), [0]);
    one.addPage(map!);
    const mapOnly = await one.save();
    await expect(checkSquares(mapOnly, tiles, 606, 600)).rejects.toThrow(/page 1: 60[567]\.\d+ px for 600\.00 px at 606 dpi/);
  }, 120_000);

  it('pdftotext finds the map, each page label with its row and column, the caution and the labels on the pages that hold them', () => {
    const texts = pageTexts(pdf);
    expect(texts.length).toBe(tiles.pageCount);
    expect(pageText(pdf, 1)).toContain('Assembly map');
    tiles.tiles.forEach((t, i) => {
      const text = texts[i + 1]!;
      expect(text).toContain(`page ${t.label} (row ${t.label.replace(/\d+$/, '')}, column ${t.col + 1})`);
      expect(text).toContain(`Page ${i + 2} of ${tiles.pageCount}`);
    });
    // The caution and each label go on the page whose window holds their first letter (well inside, not in an overlap).
    // The first word's span (Helvetica is narrower than 0.7 em a letter) and the first line's middle.
    const pageOf = (t: SheetText): number | undefined => {
      const word = t.lines[0]!.split(' ')[0]!;
      const width = 0.7 * t.fontMm * word.length;
      const u0 = (t.anchor === 'middle' ? t.at[0] - width / 2 : t.at[0]) - plan.page.left;
      const u1 = u0 + width;
      const v = plan.page.top - t.at[1];
      const i = tiles.tiles.findIndex((w) => u0 > w.window.x + 1 && u1 < w.window.x + w.window.width - 1 && v > w.window.y + 5 && v < w.window.y + w.window.height - 5);
      return i < 0 ? undefined : i + 2;
    };
    const caution = textItems(plan, 'caution')[0]!;
    const cautionPage = pageOf(caution);
    expect(cautionPage).toBeDefined();
    expect(texts[cautionPage! - 1]).toContain('CAUTION');
    let checked = 0;
    for (const label of textItems(plan, 'label')) {
      const p = pageOf(label);
      if (p === undefined) continue;
      expect(texts[p - 1], label.lines[0]).toContain(label.lines[0]!.split(' ')[0]!);
      checked += 1;
    }
    expect(checked).toBeGreaterThan(0);
  }, 60_000);

  it('put back together from the registration targets alone, the cut line lies within 0.5 mm of the plan (the SVG\'s coordinates)', () => {
    const dpi = 100;
    const k = dpi / 25.4;
    const pages = renderPages(pdf, dpi).slice(1);
    const c = tiles.content;
    const H = tiles.pageHeightMm;
    const win = { x0: c.x * k, x1: (c.x + c.width) * k, y0: (H - c.y - c.height) * k, y1: (H - c.y) * k };
    const ov = tiles.options.overlapMm * k;
    const r = tiles.targetRadiusMm * k;
    const strip = (img: Grey, side: 'left' | 'right' | 'top' | 'bottom') => {
      const box =
        side === 'left' ? { x0: win.x0, x1: win.x0 + ov, y0: win.y0, y1: win.y1 }
        : side === 'right' ? { x0: win.x1 - ov, x1: win.x1, y0: win.y0, y1: win.y1 }
        : side === 'top' ? { x0: win.x0, x1: win.x1, y0: win.y0, y1: win.y0 + ov }
        : { x0: win.x0, x1: win.x1, y0: win.y1 - ov, y1: win.y1 };
      // A target sits on the middle line of its strip; a ring-like shape of the drawing elsewhere in the strip is not one.
      const across = (t: { x: number; y: number }) => (side === 'left' || side === 'right' ? Math.abs(t.x - (box.x0 + box.x1) / 2) : Math.abs(t.y - (box.y0 + box.y1) / 2));
      const found = findTargets(img, box, r).filter((t) => across(t) <= k);
      return found.sort((a, b) => (side === 'left' || side === 'right' ? a.y - b.y : a.x - b.x));
    };
    const offset = (a: Grey, aSide: 'right' | 'bottom', b: Grey, bSide: 'left' | 'top') => {
      const ta = strip(a, aSide);
      const tb = strip(b, bSide);
      expect(ta.length).toBe(tb.length);
      expect(ta.length).toBeGreaterThanOrEqual(2);
      return {
        x: ta.reduce((s, t, i) => s + t.x - tb[i]!.x, 0) / ta.length,
        y: ta.reduce((s, t, i) => s + t.y - tb[i]!.y, 0) / ta.length,
      };
    };
    // Where each page's pixel (0, 0) lands in page A1's pixels.
    const origin: { x: number; y: number }[] = [];
    const idx = (row: number, col: number) => row * tiles.cols + col;
    for (let row = 0; row < tiles.rows; row++) {
      for (let col = 0; col < tiles.cols; col++) {
        let o = { x: 0, y: 0 };
        if (col > 0) {
          const d = offset(pages[idx(row, col - 1)]!, 'right', pages[idx(row, col)]!, 'left');
          const prev = origin[idx(row, col - 1)]!;
          o = { x: prev.x + d.x, y: prev.y + d.y };
        } else if (row > 0) {
          const d = offset(pages[idx(row - 1, col)]!, 'bottom', pages[idx(row, col)]!, 'top');
          const prev = origin[idx(row - 1, col)]!;
          o = { x: prev.x + d.x, y: prev.y + d.y };
        }
        origin[idx(row, col)] = o;
      }
    }
    // The cut line from the plan, in A1's pixels, compared where the line runs no steeper than 1 in 1.
    const cut = plan.items.find((i) => i.kind === 'path' && i.role === 'cut' && i.part.kind === 'polyline');
    if (cut === undefined || cut.kind !== 'path' || cut.part.kind !== 'polyline') throw new Error('no cut polyline');
    const pts = cut.part.points;
    const errorsMm: number[] = [];
    let missing = 0;
    for (let i = 1; i < pts.length; i++) {
      const [x0, y0] = pts[i - 1]!;
      const [x1, y1] = pts[i]!;
      const slope = (y1 - y0) / (x1 - x0);
      if (!Number.isFinite(slope) || Math.abs(slope) > 1) continue;
      const xm = (x0 + x1) / 2;
      const ym = (y0 + y1) / 2;
      // Pixel i covers [i, i + 1): a point at x px falls at index x - 0.5 by centre.
      const X = (c.x + xm - plan.page.left) * k - 0.5;
      const Y = (H - c.y - c.height + plan.page.top - ym) * k - 0.5;
      for (let p = 0; p < pages.length; p++) {
        const o = origin[p]!;
        const lx = X - o.x;
        const ly = Y - o.y;
        const edge = 3 * k;
        if (lx < win.x0 + edge || lx > win.x1 - edge || ly < win.y0 + edge || ly > win.y1 - edge) continue;
        const col = Math.round(lx);
        const img = pages[p]!;
        // Dark runs in this column within 5 mm of where the line should be; the nearest is the cut line.
        let best: number | undefined;
        for (let j = Math.round(ly - 5 * k); j <= ly + 5 * k; j++) {
          if (darkAt(img, col, j) < 128 || darkAt(img, col, j - 1) >= 128) continue;
          const centre = runCentre((q) => img.data[q * img.width + col]!, j - 1, img.height - 1, 1);
          if (centre !== undefined && (best === undefined || Math.abs(centre - ly) < Math.abs(best - ly))) best = centre;
        }
        if (best === undefined) {
          missing += 1;
          continue;
        }
        // Distance square to the line, from the distance along the column.
        errorsMm.push((Math.abs(best - ly + (col - lx) * slope) / k) * Math.cos(Math.atan(slope)));
      }
    }

    expect(errorsMm.length).toBeGreaterThan(100);
    expect(missing).toBeLessThan(errorsMm.length * 0.02);
    expect(Math.max(...errorsMm)).toBeLessThan(0.5);
  }, 180_000);
});

describe('an NPS 24 lateral wrap (1975 x 768 mm sheet) on a 36 in roll', () => {
  it('is one page the roll wide, its square within 0.25 % both ways, and qpdf passes', async () => {
    const plan = nps24LateralWrapPlan();
    const tiles = planTiles(plan.page.widthMm, plan.page.heightMm, { paper: 'roll-36in' });
    const pdf = await planToPdf(plan, { paper: 'roll-36in' });
    expect(tiles.pageCount).toBe(1);
    const [size] = await pageSizesMm(pdf);
    expect(Math.min(size!.w, size!.h)).toBeCloseTo(914.4, 2);
    expect(qpdfCheck(pdf)).toMatch(/No syntax or stream encoding errors found/);
    await checkSquares(pdf, tiles);
  }, 120_000);
});
