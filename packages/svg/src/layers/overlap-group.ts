/**
 * The glue tab drawn: outline, light hatching, the line where station 1 goes,
 * and the words.
 */
import type { INode } from 'svgson';
import type { Point2 } from '@girth/unroll';
import { DASH_MM, FONT_FAMILY, HATCH_SPACING_MM, INK, STROKE_MM } from '../style.js';
import { el } from '../internal/nodes.js';
import type { Frame } from '../internal/frame.js';
import type { NumberWriter } from '../internal/numbers.js';
import { paperLinesData } from '../internal/path-data.js';
import type { OverlapPlan } from './overlap-plan.js';
import { centredTextNode } from './geometry-groups.js';

/**
 * 45° hatching of a paper rectangle (mm, y-down), clipped to it exactly.
 *
 * @example hatchLines(0, 0, 10, 10, 4).length // 4
 */
export function hatchLines(x0: number, y0: number, x1: number, y1: number, spacingMm: number): [Point2, Point2][] {
  const w = x1 - x0;
  const h = y1 - y0;
  const out: [Point2, Point2][] = [];
  for (let t = spacingMm; t < w + h; t += spacingMm) {
    // The line (x - x0) + (y - y0) = t, from its top end to its bottom end.
    const yTop = y0 + Math.max(0, t - w);
    const yBottom = y0 + Math.min(h, t);
    out.push([
      [x0 + t - (yTop - y0), yTop],
      [x0 + t - (yBottom - y0), yBottom],
    ]);
  }
  return out;
}

/**
 * The `overlap` group: empty when there is no tab.
 *
 * @example overlapGroup(undefined, frame, numberWriter('mm')).children // []
 */
export function overlapGroup(plan: OverlapPlan | undefined, frame: Frame, w: NumberWriter): INode {
  if (!plan) return el('g', { id: 'overlap', class: 'overlap' });
  const x0 = frame.x(plan.tab.minX);
  const x1 = frame.x(plan.tab.maxX);
  const y0 = frame.y(plan.tab.maxY);
  const y1 = frame.y(plan.tab.minY);
  const stroke = (color: string, mm: number) => ({
    fill: 'none',
    stroke: color,
    'stroke-width': w.len(mm),
    'stroke-linecap': 'butt',
  });
  const t = plan.text;
  // Vertical words were centred on the tab's middle: turn them about it.
  const words = centredTextNode(t, frame, w, {
    class: 'overlap-text',
    transform: t.vertical ? `rotate(-90 ${w.len((x0 + x1) / 2)} ${w.len((y0 + y1) / 2)})` : undefined,
  });
  return el('g', { id: 'overlap', class: 'overlap' }, [
    el('path', { class: 'overlap-hatch', d: paperLinesData(hatchLines(x0, y0, x1, y1, HATCH_SPACING_MM), w), ...stroke(INK.light, STROKE_MM.overlapHatch) }),
    el('rect', {
      class: 'overlap-tab',
      x: w.len(x0),
      y: w.len(y0),
      width: w.len(x1 - x0),
      height: w.len(y1 - y0),
      ...stroke(INK.mid, STROKE_MM.overlapOutline),
    }),
    el('path', {
      class: 'overlap-align',
      d: paperLinesData([[[x0, y0], [x0, y1]]], w),
      ...stroke(INK.black, STROKE_MM.overlapAlign),
      'stroke-dasharray': DASH_MM.overlapAlign.map((d) => w.len(d)).join(' '),
    }),
    el(
      'g',
      {
        fill: INK.black,
        stroke: '#ffffff',
        'stroke-width': w.len(0.6),
        'paint-order': 'stroke',
        'font-family': FONT_FAMILY,
        'text-anchor': 'middle',
      },
      [words],
    ),
  ]);
}
