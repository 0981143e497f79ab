/**
 * The SVG writer of a sheet plan: every item of the plan written as it was
 * placed, y flipped onto the paper, in groups by role. The string is built
 * directly (no document tree).
 */
import { DASH_MM, FONT_FAMILY, INK, STROKE_MM, type SheetItem, type SheetPath, type SheetPlan, type SheetText } from '@girth/sheet';
import type { Point2 } from '@girth/unroll';
import { describeSheet } from './sheet-document.js';
import { frameAt, type Frame } from './internal/frame.js';
import { numberWriter, type NumberWriter } from './internal/numbers.js';
import { partData, paperLinesData } from './internal/path-data.js';
import { el, textElement, type Attrs } from './internal/xml.js';

/** Weight of the rule over the title block, mm. */
const RULE_MM = 0.25;

function strokeAttrs(w: NumberWriter, color: string, widthMm: number, dashMm?: readonly number[]): Attrs {
  return {
    fill: 'none',
    stroke: color,
    'stroke-width': w.len(widthMm),
    'stroke-linecap': 'round',
    'stroke-linejoin': 'round',
    'stroke-dasharray': dashMm ? dashMm.map((d) => w.len(d)).join(' ') : undefined,
  };
}

/** A text item on the paper; `extra` attributes follow x, y and font-size. */
function textNode(t: SheetText, frame: Frame, w: NumberWriter, extra: Attrs = {}): string {
  return textElement(
    t.lines.join('\n'),
    { x: w.len(frame.x(t.at[0])), y: w.len(frame.y(t.at[1])), 'font-size': w.len(t.fontMm), ...extra },
    w.len(t.lineMm),
  );
}

/** Straight segments of path items, on the paper, as one path's data. */
function segmentsData(items: readonly SheetPath[], frame: Frame, w: NumberWriter): string {
  const lines: [Point2, Point2][] = [];
  for (const i of items) {
    if (i.part.kind !== 'segment') continue;
    lines.push([
      [frame.x(i.part.from[0]), frame.y(i.part.from[1])],
      [frame.x(i.part.to[0]), frame.y(i.part.to[1])],
    ]);
  }
  return paperLinesData(lines, w);
}

interface ByRole {
  readonly paths: Map<string, SheetPath[]>;
  readonly texts: Map<string, SheetText[]>;
  readonly rects: Map<string, Extract<SheetItem, { kind: 'rect' }>[]>;
}

function byRole(items: readonly SheetItem[]): ByRole {
  const paths = new Map<string, SheetPath[]>();
  const texts = new Map<string, SheetText[]>();
  const rects = new Map<string, Extract<SheetItem, { kind: 'rect' }>[]>();
  const add = <T>(m: Map<string, T[]>, k: string, v: T) => {
    const list = m.get(k);
    if (list) list.push(v);
    else m.set(k, [v]);
  };
  for (const i of items) {
    if (i.kind === 'path') add(paths, i.role, i);
    else if (i.kind === 'text') add(texts, i.role, i);
    else add(rects, i.role, i);
  }
  return { paths, texts, rects };
}

function overlapGroup(r: ByRole, frame: Frame, w: NumberWriter): string {
  const tab = r.rects.get('overlap-tab')?.[0];
  if (!tab) return el('g', { id: 'overlap', class: 'overlap' });
  const x0 = frame.x(tab.box.minX);
  const x1 = frame.x(tab.box.maxX);
  const y0 = frame.y(tab.box.maxY);
  const y1 = frame.y(tab.box.minY);
  const stroke = (color: string, mm: number): Attrs => ({ fill: 'none', stroke: color, 'stroke-width': w.len(mm), 'stroke-linecap': 'butt' });
  const words = (r.texts.get('overlap') ?? []).map((t) => textNode(t, frame, w, { class: 'overlap-text', transform: turn(t, frame, w) }));
  return el('g', { id: 'overlap', class: 'overlap' }, [
    el('path', { class: 'overlap-hatch', d: segmentsData(r.paths.get('overlap-hatch') ?? [], frame, w), ...stroke(INK.light, STROKE_MM.overlapHatch) }),
    el('rect', { class: 'overlap-tab', x: w.len(x0), y: w.len(y0), width: w.len(x1 - x0), height: w.len(y1 - y0), ...stroke(INK.mid, STROKE_MM.overlapOutline) }),
    el('path', {
      class: 'overlap-align',
      d: segmentsData(r.paths.get('overlap-align') ?? [], frame, w),
      ...stroke(INK.black, STROKE_MM.overlapAlign),
      'stroke-dasharray': DASH_MM.overlapAlign.map((d) => w.len(d)).join(' '),
    }),
    el(
      'g',
      { fill: INK.black, stroke: '#ffffff', 'stroke-width': w.len(0.6), 'paint-order': 'stroke', 'font-family': FONT_FAMILY, 'text-anchor': 'middle' },
      words,
    ),
  ]);
}

function partsGroup(id: string, items: readonly SheetPath[] | undefined, classPrefix: string | undefined, attrs: Attrs, frame: Frame, w: NumberWriter): string {
  return el(
    'g',
    { id, class: id, ...attrs },
    (items ?? []).map((i) => el('path', { class: classPrefix === undefined ? undefined : `${classPrefix}-${i.part.kind}`, d: partData(i.part, frame, w) })),
  );
}

function stationsGroup(r: ByRole, frame: Frame, w: NumberWriter): string {
  return el('g', { id: 'stations', class: 'stations' }, [
    el('path', { class: 'station-lines', d: segmentsData(r.paths.get('station-line') ?? [], frame, w), ...strokeAttrs(w, INK.dark, STROKE_MM.stations) }),
    el(
      'g',
      { class: 'station-numbers', fill: INK.black, stroke: 'none', 'font-family': FONT_FAMILY, 'text-anchor': 'middle' },
      (r.texts.get('station-number') ?? []).map((t) => textNode(t, frame, w, { 'data-station': (t.stations ?? []).join(' ') })),
    ),
    el(
      'g',
      { class: 'line-names', fill: INK.black, stroke: 'none', 'font-family': FONT_FAMILY, 'text-anchor': 'middle', 'font-weight': 'bold' },
      (r.texts.get('line-name') ?? []).map((t) => textNode(t, frame, w)),
    ),
  ]);
}

/** The bevel band (weld prep): its headings bold, its cells centred under the stations; nothing when the plan has none. */
function bevelBandGroup(r: ByRole, frame: Frame, w: NumberWriter): string[] {
  if (!r.texts.has('bevel-band') && !r.texts.has('bevel-band-heading')) return [];
  return [el('g', { id: 'bevel-band', class: 'bevel-band', fill: INK.black, stroke: 'none', 'font-family': FONT_FAMILY }, [
    ...(r.texts.get('bevel-band-heading') ?? []).map((t) => textNode(t, frame, w, { class: 'bevel-band-heading', 'font-weight': 'bold' })),
    ...(r.texts.get('bevel-band') ?? []).map((t) => textNode(t, frame, w, { class: 'bevel-band-cell', 'text-anchor': 'middle', 'data-station': (t.stations ?? []).join(' ') })),
  ])];
}

/** Turns a text item the plan turned (90° counter-clockwise, y-up) about its pivot on the paper. */
function turn(t: SheetText, frame: Frame, w: NumberWriter): string | undefined {
  return t.rotateDeg === 90 ? `rotate(-90 ${w.len(frame.x(t.pivot[0]))} ${w.len(frame.y(t.pivot[1]))})` : undefined;
}

/** Roles of the fit-up's items (`withFitUp`): a sheet without any has no `fit-up` group. */
const FIT_UP_ROLES = ['reference-line', 'ordinate-line', 'reference-label', 'station-ordinate', 'fit-up'] as const;

/** The fit-up: square lines through the long and short points, the stretches measured from the short point, their labels, each station's ordinate along its line, and the fit-up block. */
function fitUpGroup(r: ByRole, frame: Frame, w: NumberWriter): string {
  if (!FIT_UP_ROLES.some((role) => r.paths.has(role) || r.texts.has(role))) return '';
  const text = (role: string, attrs: Attrs): string[] => (r.texts.get(role) ?? []).map((t) => textNode(t, frame, w, { ...attrs, transform: turn(t, frame, w) }));
  return el('g', { id: 'fit-up', class: 'fit-up', 'font-family': FONT_FAMILY }, [
    el('path', { class: 'reference-lines', d: segmentsData(r.paths.get('reference-line') ?? [], frame, w), ...strokeAttrs(w, INK.black, STROKE_MM.squareLine, DASH_MM.marks) }),
    el('path', { class: 'ordinate-lines', d: segmentsData(r.paths.get('ordinate-line') ?? [], frame, w), ...strokeAttrs(w, INK.dark, STROKE_MM.stations) }),
    el('g', { class: 'reference-labels', fill: INK.black, stroke: 'none', 'text-anchor': 'middle', 'font-weight': 'bold' }, text('reference-label', {})),
    el('g', { class: 'station-ordinates', fill: INK.black, stroke: 'none', 'text-anchor': 'middle' }, text('station-ordinate', {})),
    el('g', { class: 'fit-up-block', fill: INK.black, stroke: 'none' }, (r.texts.get('fit-up') ?? []).map((t) => textNode(t, frame, w, { 'font-weight': t.bold ? 'bold' : undefined }))),
  ]);
}

const TITLE_ROLES = ['title-job', 'title-title', 'title-note', 'title-placement', 'title-print'] as const;

function titleBlockGroup(plan: SheetPlan, r: ByRole, frame: Frame, w: NumberWriter): string {
  const rule = r.paths.get('title-rule') ?? [];
  const lines = plan.items.filter((i): i is SheetText => i.kind === 'text' && (TITLE_ROLES as readonly string[]).includes(i.role));
  return el('g', { id: 'title-block', class: 'title-block', fill: INK.black, stroke: 'none', 'font-family': FONT_FAMILY }, [
    el('path', { class: 'title-rule', d: segmentsData(rule, frame, w), fill: 'none', stroke: INK.mid, 'stroke-width': w.len(RULE_MM) }),
    ...lines.map((t) => textNode(t, frame, w, { class: t.role, 'font-weight': t.bold ? 'bold' : undefined })),
    ...(r.texts.get('caution') ?? []).map((t) => textNode(t, frame, w, { class: 'caution', 'font-weight': 'bold' })),
  ]);
}

function calibrationGroup(r: ByRole, frame: Frame, w: NumberWriter): string {
  return el('g', { id: 'calibration', class: 'calibration' }, [
    ...(r.rects.get('calibration-bar') ?? []).map((b) =>
      el('rect', {
        class: 'calibration-bar',
        x: w.len(frame.x(b.box.minX)),
        y: w.len(frame.y(b.box.maxY)),
        width: w.len(b.box.maxX - b.box.minX),
        height: w.len(b.box.maxY - b.box.minY),
        fill: INK.black,
        stroke: 'none',
      }),
    ),
    ...(r.texts.get('calibration-caption') ?? []).map((c) =>
      textElement(
        c.lines.join('\n'),
        { class: 'calibration-caption', x: w.len(frame.x(c.at[0])), y: w.len(frame.y(c.at[1])), 'font-size': w.len(c.fontMm), 'font-family': FONT_FAMILY, fill: INK.black },
        w.len(c.lineMm),
      ),
    ),
  ]);
}

/**
 * Writes a sheet plan as an SVG document at true physical size.
 *
 * The sheet's `width` and `height` are in the plan's units (mm or in) and its
 * `viewBox` matches them, so one user unit is one mm (or one inch). Template
 * coordinates (mm, y-up) are flipped onto the paper (y-down) about the plan's
 * page. Groups with stable ids: `overlap`, `marks`, `stations`, `square-line`,
 * `cut`, `labels`, `sides` (WASTE and the kept side, the piece in large print),
 * `title-block`, `calibration` (always present, empty when there is nothing to
 * draw), `bevel-band` after `sides` only when the plan has one, and `fit-up` on
 * a sheet whose template carries its fit-up (square lines, station ordinates,
 * the fit-up block). Numbers are rounded to 0.001 mm (0.00001 in).
 *
 * @param plan - a plan from `planSheet` of `@girth/sheet` (already checked).
 * @returns the SVG document as a string (UTF-8, with an XML declaration).
 * @throws GirthError `NOT_FINITE` (field `svg`) only if the plan holds a non-finite
 *   number, which `planSheet` never makes.
 * @example
 * ```ts
 * const svg = planToSvg(planSheet(template, { job: 'J-2291' }));
 * ```
 */
export function planToSvg(plan: SheetPlan): string {
  const w = numberWriter(plan.units);
  const frame = frameAt(plan.page.left, plan.page.top, 0, 0);
  const r = byRole(plan.items);
  const svg = el(
    'svg',
    {
      xmlns: 'http://www.w3.org/2000/svg',
      version: '1.1',
      width: `${w.len(plan.page.widthMm)}${plan.units}`,
      height: `${w.len(plan.page.heightMm)}${plan.units}`,
      viewBox: `0 0 ${w.len(plan.page.widthMm)} ${w.len(plan.page.heightMm)}`,
      class: `girth-sheet girth-${plan.template.kind}`,
    },
    [
      ...describeSheet(plan),
      overlapGroup(r, frame, w),
      partsGroup('marks', r.paths.get('mark'), 'mark', strokeAttrs(w, INK.mid, STROKE_MM.marks, DASH_MM.marks), frame, w),
      stationsGroup(r, frame, w),
      partsGroup('square-line', r.paths.get('square-line'), undefined, strokeAttrs(w, INK.black, STROKE_MM.squareLine), frame, w),
      partsGroup('cut', r.paths.get('cut'), 'cut', strokeAttrs(w, INK.black, STROKE_MM.cut), frame, w),
      el(
        'g',
        { id: 'labels', class: 'labels', fill: INK.black, stroke: 'none', 'font-family': FONT_FAMILY, 'text-anchor': 'middle', 'font-weight': 'bold' },
        (r.texts.get('label') ?? []).map((t) => textNode(t, frame, w)),
      ),
      el(
        'g',
        { id: 'sides', class: 'sides', fill: INK.black, stroke: 'none', 'font-family': FONT_FAMILY, 'text-anchor': 'middle', 'font-weight': 'bold' },
        [...(r.texts.get('side') ?? []), ...(r.texts.get('piece-mark') ?? [])].map((t) => textNode(t, frame, w, { class: t.role })),
      ),
      ...bevelBandGroup(r, frame, w),
      fitUpGroup(r, frame, w),
      titleBlockGroup(plan, r, frame, w),
      calibrationGroup(r, frame, w),
    ],
  );
  return `<?xml version="1.0" encoding="UTF-8"?>\n${svg}\n`;
}
