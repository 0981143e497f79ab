/**
 * Planning the sheet of a template once: where every line, station number,
 * label, title line and mark goes, in mm, on which layer. The SVG and DXF
 * writers only write this plan out.
 */
import { CAUTION, type Point2, type Template } from '@girth/unroll';
import type { Box, ResolvedSheetOptions, SheetItem, SheetOptions, SheetPlan, SheetText, SheetTextRole } from './types.js';
import { resolveSheetOptions } from './options.js';
import { checkTemplate } from './check-template.js';
import { checkPlan } from './check-plan.js';
import { ASCENT_EM, CAP_HEIGHT_EM, DESCENT_EM, HATCH_SPACING_MM, LINE_EM, MAX_STROKE_MM, MIN_SHEET_WIDTH_MM, TEXT_INSET_EM, TITLE_GAP_MM } from './style.js';
import { EMPTY_BOX, growBox, partBox, pointsBox, unionBox } from './internal/box.js';
import type { CentredText } from './internal/text-box.js';
import { textWidthMm } from './internal/text-metrics.js';
import { planStationNumbers } from './plan/station-numbers.js';
import { planLabels } from './plan/labels.js';
import { planOverlap, type OverlapPlan } from './plan/overlap.js';
import { hatchLines } from './plan/hatch.js';
import { planTitleLines } from './plan/title-lines.js';
import { planTitleBlock, RULE_MM, titleTextWidthMm } from './plan/title-block.js';
import { addBox, addPart, newObstacles } from './plan/obstacles.js';
import { quarterLineNames } from './plan/quarter-lines.js';
import { planSides } from './plan/sides.js';
import { planBevelBands } from './plan/bevel-band.js';
import { planFitUpItems } from './plan/fit-up-items.js';

/** Box of the lines of a template (cut, square line, stations, marks), template mm. */
function geometryBox(template: Template): Box {
  let box = EMPTY_BOX;
  for (const part of template.cut) box = unionBox(box, partBox(part));
  for (const part of template.marks) box = unionBox(box, partBox(part));
  if (template.kind === 'wrap') box = unionBox(box, partBox(template.squareLine));
  for (const s of template.stationLines) box = unionBox(box, pointsBox([s.from, s.to]));
  return box;
}

function centred(t: CentredText, role: SheetTextRole, bold: boolean, extra: Partial<SheetText> = {}): SheetText {
  return {
    kind: 'text',
    role,
    layer: 'text',
    lines: t.lines,
    at: t.baseline,
    anchor: 'middle',
    fontMm: t.fontMm,
    capHeightMm: CAP_HEIGHT_EM * t.fontMm,
    lineMm: LINE_EM * t.fontMm,
    bold,
    rotateDeg: 0,
    pivot: t.baseline,
    box: t.box,
    ...extra,
  };
}

/** Text of one line starting at `x`, its baseline at `y` (template mm). */
function leftText(text: string, x: number, y: number, fontMm: number, bold: boolean, role: SheetTextRole, layer: SheetText['layer']): SheetText {
  const at: Point2 = [x, y];
  return {
    kind: 'text',
    role,
    layer,
    lines: [text],
    at,
    anchor: 'start',
    fontMm,
    capHeightMm: CAP_HEIGHT_EM * fontMm,
    lineMm: LINE_EM * fontMm,
    bold,
    rotateDeg: 0,
    pivot: at,
    box: { minX: x, maxX: x + textWidthMm(text, fontMm, bold), minY: y - DESCENT_EM * fontMm, maxY: y + ASCENT_EM * fontMm },
  };
}

/** The tab's hatching: lines laid out down the page from its top left corner, turned into template mm. */
function hatchItems(tab: Box): SheetItem[] {
  const at = (p: Point2): Point2 => [tab.minX + p[0], tab.maxY - p[1]];
  return hatchLines(0, 0, tab.maxX - tab.minX, tab.maxY - tab.minY, HATCH_SPACING_MM).map(([a, b]) => ({
    kind: 'path',
    role: 'overlap-hatch',
    layer: 'paper',
    part: { kind: 'segment', from: at(a), to: at(b) },
  }));
}

function overlapItems(o: OverlapPlan): SheetItem[] {
  const tab = o.tab;
  const pivot: Point2 = [(tab.minX + tab.maxX) / 2, (tab.minY + tab.maxY) / 2];
  return [
    ...hatchItems(tab),
    { kind: 'rect', role: 'overlap-tab', layer: 'paper', box: tab, filled: false },
    { kind: 'path', role: 'overlap-align', layer: 'paper', part: { kind: 'segment', from: [tab.minX, tab.maxY], to: [tab.minX, tab.minY] } },
    { ...centred(o.text, 'overlap', false, o.text.vertical ? { rotateDeg: 90, pivot } : {}), layer: 'paper' },
  ];
}

function titleItems(template: Template, opts: ResolvedSheetOptions, drawing: Box): { items: SheetItem[]; widthMm: number; heightMm: number } {
  // The drawing sets the width; a small drawing gets the least width a title block needs.
  const widthMm = Math.max(drawing.maxX - drawing.minX, MIN_SHEET_WIDTH_MM * opts.textScale);
  const title = planTitleBlock(planTitleLines(template, opts, titleTextWidthMm(widthMm)), opts.sheetUnits, opts.textScale, widthMm);
  const left = drawing.minX;
  const top = drawing.minY - TITLE_GAP_MM;
  const contentW = title.widthMm;
  const items: SheetItem[] = [
    ...(opts.paper ? [titleRule(left, top, contentW)] : []),
    ...title.lines.map((l) => leftText(l.text, left + l.xMm, top - l.baselineMm, l.fontMm, l.bold, `title-${l.role}`, 'text')),
    ...title.caution.lines.map((text, i) =>
      leftText(text, left + TEXT_INSET_EM * title.caution.fontMm, top - title.caution.baselineMm - i * LINE_EM * title.caution.fontMm, title.caution.fontMm, true, 'caution', 'text'),
    ),
  ];
  if (opts.paper) items.push(...paperBarItems(left, top, title));
  return { items, widthMm: contentW, heightMm: title.heightMm };
}

type TitleBlockPlan = ReturnType<typeof planTitleBlock>;

/** The rule over the title block: a `paper` item. */
function titleRule(left: number, top: number, contentW: number): SheetItem {
  // Inset by half its weight so even a renderer that pads every stroke on all sides stays inside.
  return { kind: 'path', role: 'title-rule', layer: 'paper', part: { kind: 'segment', from: [left + RULE_MM / 2, top], to: [left + contentW - RULE_MM / 2, top] } };
}

/** The calibration L (its arm across, then its arm up) and its caption, in the title block: `paper` items. */
function paperBarItems(left: number, top: number, title: TitleBlockPlan): SheetItem[] {
  const c = title.barCaption;
  return [
    ...title.bars.map(
      (b): SheetItem => ({
        kind: 'rect',
        role: 'calibration-bar',
        layer: 'paper',
        box: { minX: left + b.xMm, maxX: left + b.xMm + b.widthMm, maxY: top - b.topMm, minY: top - b.topMm - b.heightMm },
        filled: true,
      }),
    ),
    ...c.lines.map((text, i) => leftText(text, left + c.xMm, top - c.baselineMm - i * LINE_EM * c.fontMm, c.fontMm, false, 'calibration-caption', 'paper')),
  ];
}

/**
 * Plans the sheet of a template: every line, station number, label, title line,
 * glue tab and calibration mark, once, in template mm (y up), each with its role
 * and layer. Checks the options and the template first, and the plan last, so
 * writers need check nothing.
 *
 * Layout: the drawing (lines grown by half the widest stroke, station numbers,
 * labels, the glue tab of a wrap) with `marginMm` of paper around it; the title
 * block `TITLE_GAP_MM` under it, flush left with it. Station numbers sit just
 * past the `from` end of each station line (the square line end of a wrap, the
 * girth line end of a hole), along the line. A wrap with weld preparation
 * gets its bevel band (torch and dihedral angle under each station) below all
 * of that, never across the cut line (`plan/bevel-band.ts`).
 *
 * @param template - the template (mm, y-up) from `@girth/unroll`.
 * @param options - sheet units ('mm' | 'in'), margin (mm, 0–100, default 10), glue tab
 *   (mm, 0–200, default 25; wraps only), job and piece (text, ≤ 200 characters), title
 *   text scale (0.01–50, default 1), station numbers on or off (default on), the `paper`
 *   layer's items in or left out (default in; left out, nothing else moves).
 * @returns the plan: plain readonly data.
 * @throws GirthError for bad options (see `resolveSheetOptions`) and for a template that
 *   cannot be drawn (see `checkTemplate`: e.g. `NOT_A_NUMBER` on `template.cut[0].points[14][1]`).
 * @example
 * ```ts
 * const plan = planSheet(template, { job: 'J-2291', piece: 'Spool 14 / B' });
 * plan.items.filter((i) => i.role === 'station-number').length; // one per station start point
 * ```
 */
export function planSheet(template: Template, options?: SheetOptions): SheetPlan {
  const opts = resolveSheetOptions(options);
  checkTemplate(template);

  const geometry = geometryBox(template);
  const overlap = template.kind === 'wrap' && opts.overlapMm > 0 ? planOverlap(geometry, template.stretchOutMm, opts.overlapMm) : undefined;
  // Text keeps clear of the cut, the square line, the glue tab and of text placed before it.
  const obstacles = newObstacles(geometry);
  for (const part of template.cut) addPart(obstacles, part);
  if (template.kind === 'wrap') addPart(obstacles, template.squareLine);
  if (overlap) addBox(obstacles, overlap.box);
  const stationTexts = opts.stationNumbers
    ? planStationNumbers(template.stationLines, template.kind, geometry, obstacles, quarterLineNames(template, template.labels))
    : { numbers: [], names: [] };
  const numbers = stationTexts.numbers;
  const lineNames = stationTexts.names;
  const labels = planLabels(template.labels, obstacles);
  const sides = planSides(template, geometry, obstacles, opts.piece);
  const sideTexts = [...sides.sides, ...(sides.piece ? [sides.piece] : [])];
  let drawing = growBox(geometry, MAX_STROKE_MM / 2);
  for (const t of numbers) drawing = unionBox(drawing, t.box);
  for (const t of labels) drawing = unionBox(drawing, t.box);
  for (const t of lineNames) drawing = unionBox(drawing, t.box);
  for (const t of sideTexts) drawing = unionBox(drawing, t.box);
  if (overlap) drawing = unionBox(drawing, growBox(overlap.box, MAX_STROKE_MM / 2));
  // The bevel band (weld prep), under everything else drawn: it never crosses the cut line.
  const band = template.kind === 'wrap' && (template.bands?.length ?? 0) > 0 ? planBevelBands(template.bands ?? [], template.stationLines, drawing.minY) : undefined;
  if (band) drawing = unionBox(drawing, band.box);
  const fitUp = planFitUpItems(template, drawing, [...numbers, ...labels, ...lineNames, ...sideTexts].map((t) => t.box), opts.textScale, centred);
  drawing = fitUp.drawing;

  const title = titleItems(template, opts, drawing);
  const m = opts.marginMm;
  const items: SheetItem[] = [
    ...(overlap && opts.paper ? overlapItems(overlap) : []),
    ...template.marks.map((part): SheetItem => ({ kind: 'path', role: 'mark', layer: 'mark', part })),
    ...template.stationLines.map(
      (s): SheetItem => ({ kind: 'path', role: 'station-line', layer: 'mark', part: { kind: 'segment', from: s.from, to: s.to }, station: s.n }),
    ),
    ...numbers.map((t) => centred(t, 'station-number', false, { stations: t.stations })),
    ...lineNames.map((t) => centred(t, 'line-name', true)),
    ...(template.kind === 'wrap' ? [{ kind: 'path', role: 'square-line', layer: 'mark', part: template.squareLine } as const] : []),
    ...template.cut.map((part): SheetItem => ({ kind: 'path', role: 'cut', layer: 'cut', part })),
    ...labels.map((t) => centred(t, 'label', true)),
    ...sides.sides.map((t) => centred(t, 'side', true)),
    ...(sides.piece ? [centred(sides.piece, 'piece-mark', true)] : []),
    ...(band?.items ?? []),
    ...fitUp.items,
    ...title.items,
  ];
  const plan: SheetPlan = {
    kind: 'sheet-plan',
    template: {
      id: template.id,
      kind: template.kind,
      title: template.title,
      notes: template.notes,
      ...(template.kind === 'wrap' ? { stretchOutMm: template.stretchOutMm } : {}),
      ...(template.kind === 'flat' ? {} : { wrapOdMm: template.wrapOdMm }),
    },
    units: opts.sheetUnits,
    job: opts.job,
    piece: opts.piece,
    overlapMm: template.kind === 'wrap' ? opts.overlapMm : 0,
    page: {
      left: drawing.minX - m,
      top: drawing.maxY + m,
      widthMm: 2 * m + title.widthMm,
      heightMm: m + (drawing.maxY - drawing.minY) + TITLE_GAP_MM + title.heightMm + m,
    },
    drawing,
    items,
  };
  checkPlan(plan);
  return plan;
}
