/**
 * The drawn lines of a template: cut line, square line, station lines with
 * their numbers, and layout marks, each its own group.
 */
import type { INode } from 'svgson';
import type { Template } from '@girth/unroll';
import { DASH_MM, FONT_FAMILY, INK, LINE_EM, STROKE_MM } from '../style.js';
import { el, textElement, type Attrs } from '../internal/nodes.js';
import type { Frame } from '../internal/frame.js';
import type { NumberWriter } from '../internal/numbers.js';
import { partData, paperLinesData } from '../internal/path-data.js';
import type { CentredText } from '../internal/text-box.js';
import type { StationNumber } from './station-numbers.js';

function strokeAttrs(w: NumberWriter, color: string, widthMm: number, dashMm?: readonly number[]) {
  return {
    fill: 'none',
    stroke: color,
    'stroke-width': w.len(widthMm),
    'stroke-linecap': 'round',
    'stroke-linejoin': 'round',
    'stroke-dasharray': dashMm ? dashMm.map((d) => w.len(d)).join(' ') : undefined,
  };
}

/**
 * The cut line(s): heavy black, one `<path>` per part.
 *
 * @example cutGroup(template, frame, numberWriter('mm')).attributes.id // 'cut'
 */
export function cutGroup(template: Template, frame: Frame, w: NumberWriter): INode {
  return el(
    'g',
    { id: 'cut', class: 'cut', ...strokeAttrs(w, INK.black, STROKE_MM.cut) },
    template.cut.map((part) => el('path', { class: `cut-${part.kind}`, d: partData(part, frame, w) })),
  );
}

/** The square line, when the template has one. */
export function squareLineGroup(template: Template, frame: Frame, w: NumberWriter): INode {
  const line = template.kind === 'wrap' ? template.squareLine : undefined;
  return el(
    'g',
    { id: 'square-line', class: 'square-line', ...strokeAttrs(w, INK.black, STROKE_MM.squareLine) },
    line ? [el('path', { d: partData(line, frame, w) })] : [],
  );
}

/** Layout marks (centre lines, top line, seam): light, dash-dot. */
export function marksGroup(template: Template, frame: Frame, w: NumberWriter): INode {
  return el(
    'g',
    { id: 'marks', class: 'marks', ...strokeAttrs(w, INK.mid, STROKE_MM.marks, DASH_MM.marks) },
    template.marks.map((part) => el('path', { class: `mark-${part.kind}`, d: partData(part, frame, w) })),
  );
}

/** A centred text placement written as a `<text>` on the paper. */
export function centredTextNode(t: CentredText, frame: Frame, w: NumberWriter, attrs: Attrs = {}): INode {
  const x = w.len(frame.x(t.baseline[0]));
  return textElement(
    t.lines.join('\n'),
    { x, y: w.len(frame.y(t.baseline[1])), 'font-size': w.len(t.fontMm), ...attrs },
    w.len(LINE_EM * t.fontMm),
  );
}

/** Station lines in one path, and their numbers. */
export function stationsGroup(
  template: Template,
  numbers: readonly StationNumber[],
  frame: Frame,
  w: NumberWriter,
): INode {
  const lines = template.stationLines.map(
    (s) =>
      [
        [frame.x(s.from[0]), frame.y(s.from[1])],
        [frame.x(s.to[0]), frame.y(s.to[1])],
      ] as const,
  );
  return el('g', { id: 'stations', class: 'stations' }, [
    el('path', { class: 'station-lines', d: paperLinesData(lines, w), ...strokeAttrs(w, INK.dark, STROKE_MM.stations) }),
    el(
      'g',
      { class: 'station-numbers', fill: INK.black, stroke: 'none', 'font-family': FONT_FAMILY, 'text-anchor': 'middle' },
      numbers.map((t) => centredTextNode(t, frame, w, { 'data-station': t.stations.join(' ') })),
    ),
  ]);
}

/** The template's own labels. */
export function labelsGroup(labels: readonly CentredText[], frame: Frame, w: NumberWriter): INode {
  return el(
    'g',
    { id: 'labels', class: 'labels', fill: INK.black, stroke: 'none', 'font-family': FONT_FAMILY, 'text-anchor': 'middle', 'font-weight': 'bold' },
    labels.map((t) => centredTextNode(t, frame, w)),
  );
}
