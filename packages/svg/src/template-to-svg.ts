/**
 * A template drawn as an SVG sheet at true physical size.
 */
import { stringify } from 'svgson';
import type { Template } from '@girth/unroll';
import type { SvgOptions } from './types.js';
import { resolveSvgOptions } from './options.js';
import { checkTemplate } from './check-template.js';
import { MAX_STROKE_MM, TITLE_GAP_MM } from './style.js';
import { describeSheet } from './sheet-document.js';
import { EMPTY_BOX, growBox, partBox, pointsBox, unionBox, type Box } from './internal/box.js';
import { frameAt } from './internal/frame.js';
import { el } from './internal/nodes.js';
import { numberWriter } from './internal/numbers.js';
import { planStationNumbers } from './layers/station-numbers.js';
import { planLabels } from './layers/labels.js';
import { planOverlap } from './layers/overlap-plan.js';
import { cutGroup, labelsGroup, marksGroup, squareLineGroup, stationsGroup } from './layers/geometry-groups.js';
import { overlapGroup } from './layers/overlap-group.js';
import { planTitleLines } from './layers/title-lines.js';
import { calibrationGroup, planTitleBlock, titleBlockGroup } from './layers/title-block.js';

/** Box of the lines of a template (cut, square line, stations, marks), template mm. */
function geometryBox(template: Template): Box {
  let box = EMPTY_BOX;
  for (const part of template.cut) box = unionBox(box, partBox(part));
  for (const part of template.marks) box = unionBox(box, partBox(part));
  if (template.kind === 'wrap' && template.squareLine) box = unionBox(box, partBox(template.squareLine));
  for (const s of template.stationLines) box = unionBox(box, pointsBox([s.from, s.to]));
  return box;
}

/**
 * Draws a template as an SVG sheet at true physical size.
 *
 * The sheet's `width` and `height` are in mm (or in, with `sheetUnits: 'in'`) and its
 * `viewBox` matches them, so one user unit is one mm (or one inch) and the sheet prints at
 * true size at 100 %. Template coordinates (mm, y-up) are flipped to SVG's y-down.
 * Groups with stable ids: `overlap`, `marks`, `stations`, `square-line`, `cut`, `labels`,
 * `title-block`, `calibration` (always present, empty when there is nothing to draw).
 * Every sheet carries the job and piece, the template's title and notes, how it goes on
 * the pipe, a calibration bar of 100 mm (4 in) and a caution. Wraps get a glue tab of
 * `overlapMm` past the stretch-out. All user text is escaped; numbers are rounded to
 * 0.001 mm (0.00001 in).
 *
 * @param template - the template to draw (mm, y-up), as made by `@girth/unroll`.
 * @param options - sheet units, margin (mm, 0–100, default 10), glue tab (mm, 0–200,
 *   default 25), job and piece labels (text, at most 200 characters).
 * @returns the SVG document as a string (UTF-8, with an XML declaration).
 * @throws GirthError for bad options (see `resolveSvgOptions`: `UNKNOWN_UNIT`, `OUT_OF_RANGE`,
 *   `NOT_A_NUMBER`, `NOT_FINITE`, `BAD_OPTION`) and for a template that cannot be drawn (see
 *   `checkTemplate`: a NaN or infinite coordinate gives `NOT_A_NUMBER` / `NOT_FINITE` with the
 *   field path, e.g. `template.cut[0].points[14][1]`).
 * @example
 * ```ts
 * const svg = templateToSvg(template, { job: 'J-2291', piece: 'Spool 14 / B', sheetUnits: 'mm' });
 * // '<?xml version="1.0" encoding="UTF-8"?>\n<svg ... width="608.658mm" ... viewBox="0 0 608.658 ...">'
 * ```
 */
export function templateToSvg(template: Template, options?: SvgOptions): string {
  const opts = resolveSvgOptions(options);
  checkTemplate(template);
  const w = numberWriter(opts.sheetUnits);

  // What the drawing covers, in template mm (y-up): lines, then text and tab.
  const geometry = geometryBox(template);
  const numbers = planStationNumbers(template.stationLines);
  const labels = planLabels(template.labels);
  const overlap =
    template.kind === 'wrap' && opts.overlapMm > 0
      ? planOverlap(geometry, template.stretchOutMm, opts.overlapMm)
      : undefined;
  let drawing = growBox(geometry, MAX_STROKE_MM / 2);
  for (const t of [...numbers, ...labels]) drawing = unionBox(drawing, t.box);
  if (overlap) drawing = unionBox(drawing, growBox(overlap.box, MAX_STROKE_MM / 2));

  // The paper, mm (y-down): drawing at the top left, title block under it.
  const drawingW = drawing.maxX - drawing.minX;
  const drawingH = drawing.maxY - drawing.minY;
  const m = opts.marginMm;
  const frame = frameAt(drawing.minX, drawing.maxY, m, m);
  const titleTop = m + drawingH + TITLE_GAP_MM;
  const title = planTitleBlock(planTitleLines(template, opts), opts.sheetUnits);
  const contentW = Math.max(drawingW, title.widthMm);
  const widthMm = 2 * m + contentW;
  const heightMm = titleTop + title.heightMm + m;

  const svg = el(
    'svg',
    {
      xmlns: 'http://www.w3.org/2000/svg',
      version: '1.1',
      width: `${w.len(widthMm)}${opts.sheetUnits}`,
      height: `${w.len(heightMm)}${opts.sheetUnits}`,
      viewBox: `0 0 ${w.len(widthMm)} ${w.len(heightMm)}`,
      class: `girth-sheet girth-${template.kind}`,
    },
    [
      ...describeSheet(template, opts),
      overlapGroup(overlap, frame, w),
      marksGroup(template, frame, w),
      stationsGroup(template, numbers, frame, w),
      squareLineGroup(template, frame, w),
      cutGroup(template, frame, w),
      labelsGroup(labels, frame, w),
      titleBlockGroup(title, m, titleTop, contentW, w),
      calibrationGroup(title, m, titleTop, w),
    ],
  );
  return `<?xml version="1.0" encoding="UTF-8"?>\n${stringify(svg)}\n`;
}
