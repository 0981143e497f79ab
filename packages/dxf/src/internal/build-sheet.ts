/**
 * Sheet plan -> DXF sheet: what goes on which DXF layer, cut and mark lines
 * joined into polylines, text made ASCII-safe, and the conversion to the output
 * unit. Positions and sizes are the plan's: a station number, label or title
 * line sits where the SVG puts it, its height the plan's cap height. Items on
 * the plan's `paper` layer (glue tab, calibration bar, the rule over the title
 * block) belong to a printed sheet and are left out.
 */
import { MM_PER_INCH } from '@girth/pipes';
import type { SheetPath, SheetPlan, SheetText } from '@girth/sheet';
import type { PathPart } from '@girth/unroll';
import { dxfSafeText } from '../dxf-text.js';
import { joinParts } from './join-parts.js';
import { scaleEntity } from './scale.js';
import { clipMarksOnCut } from './clip-marks.js';
import { strokeText } from './stroke-text.js';
import { orientContours } from './winding.js';
import type { Sheet, SheetEntity } from './sheet.js';
import type { DxfTextMode, DxfUnits } from '../types.js';

/** How the DXF writer treats a plan. */
export interface PlanToSheetOptions {
  /** Output unit; lengths are divided by 25.4 for `'in'`. */
  readonly units: DxfUnits;
  /** Path ends closer than this (mm) are joined; station lines no longer than this are left out. */
  readonly joinEpsMm: number;
  /** Text as TEXT entities on TEXT (`text`), left out (`none`), or single strokes on MARK (`stroke`); default `text`. */
  readonly text?: DxfTextMode;
}

function textEntities(t: SheetText, mode: DxfTextMode): SheetEntity[] {
  const out: SheetEntity[] = [];
  if (mode === 'none') return out;
  const turned = t.rotateDeg === 90;
  // Turned 90° counter-clockwise about the pivot.
  const turn = (p: readonly [number, number]): [number, number] => [t.pivot[0] - (p[1] - t.pivot[1]), t.pivot[1] + (p[0] - t.pivot[0])];
  t.lines.forEach((line, i) => {
    const safe = dxfSafeText(line);
    if (safe.length === 0) return;
    // Line i sits i line-heights below the first before turning.
    const at: [number, number] = [t.at[0], t.at[1] - i * t.lineMm];
    if (mode === 'stroke') {
      const strokes = strokeText(safe, at, t.capHeightMm, t.anchor === 'middle' ? 'center' : 'left', 'mark');
      out.push(...(turned ? strokes.map((e) => (e.kind === 'polyline' ? { ...e, vertices: e.vertices.map((v) => [...turn([v[0], v[1]]), v[2]] as const) } : e)) : strokes));
      return;
    }
    out.push({
      kind: 'text',
      layer: 'text',
      at: turned ? turn(at) : at,
      height: t.capHeightMm,
      text: safe,
      align: t.anchor === 'middle' ? 'center' : 'left',
      ...(turned ? { rotationDeg: 90 } : {}),
    });
  });
  return out;
}

function markEntity(p: SheetPath, eps: number): SheetEntity[] {
  if (p.part.kind !== 'segment') return [];
  const { from, to } = p.part;
  // A station with no cutback has a line of no length: its number is still written.
  if (p.role === 'station-line' && Math.hypot(to[0] - from[0], to[1] - from[1]) <= eps) return [];
  return [{ kind: 'line', layer: 'mark', from, to }];
}

/**
 * Everything a plan draws, on the DXF layers, in the output unit.
 *
 * @example planToSheet(planSheet(template), { units: 'mm', joinEpsMm: 1e-4 }).entities.length
 */
export function planToSheet(plan: SheetPlan, o: PlanToSheetOptions): Sheet {
  const cutParts: PathPart[] = [];
  const markParts: PathPart[] = [];
  const squareLines: SheetEntity[] = [];
  const lines: SheetEntity[] = [];
  const texts: SheetEntity[] = [];
  for (const item of plan.items) {
    if (item.layer === 'paper') continue;
    if (item.kind === 'path') {
      if (item.role === 'cut') cutParts.push(item.part);
      else if (item.role === 'mark') markParts.push(item.part);
      else if (item.role === 'square-line') squareLines.push(...markEntity(item, o.joinEpsMm));
      else lines.push(...markEntity(item, o.joinEpsMm));
    } else if (item.kind === 'text') {
      texts.push(...textEntities(item, o.text ?? 'text'));
    }
  }
  // CAM conventions: outer contours counter-clockwise, inner (scrap) clockwise; a hole template's contour is a hole.
  const cut = orientContours(joinParts(cutParts, 'cut', 'template.cut', o.joinEpsMm), plan.template.kind === 'hole' ? 1 : 0);
  const drawn = [
    ...cut,
    ...squareLines,
    ...lines,
    ...joinParts(markParts, 'mark', 'template.marks', o.joinEpsMm),
  ];
  // No mark along a cut edge: the table would scribe where it cuts. Text (stroked or not) sits off the lines.
  const entities = [...clipMarksOnCut(drawn, o.joinEpsMm), ...texts];
  const k = o.units === 'in' ? 1 / MM_PER_INCH : 1;
  return { kind: 'sheet', units: o.units, entities: entities.map((e) => scaleEntity(e, k)) };
}
