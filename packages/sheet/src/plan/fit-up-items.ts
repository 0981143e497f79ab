/**
 * Everything the fit-up adds to a sheet, planned in one call so the sheet
 * plan stays one list: the square lines and their labels, each station's
 * ordinate along its line, and the fit-up block under the drawing.
 */
import type { Template } from '@girth/unroll';
import { MAX_STROKE_MM } from '../style.js';
import { growBox, partBox, unionBox, type Box } from '../internal/box.js';
import type { CentredText } from '../internal/text-box.js';
import type { SheetItem, SheetText, SheetTextRole } from '../types.js';
import { planFitUpBlock } from './fit-up-block.js';
import { planReferenceLines } from './reference-lines.js';
import { planStationOrdinates } from './station-ordinates.js';

/** The fit-up's items and the drawing grown to hold them. */
export interface FitUpItems {
  /** Lines, then texts, in drawing order. */
  readonly items: readonly SheetItem[];
  readonly drawing: Box;
}

/**
 * Plans the fit-up of a template (nothing for one without `ordinates` or
 * `fitUpLines`). Ordinates keep clear of `obstacles` (station numbers,
 * labels) and of the reference labels; the block goes under everything.
 *
 * @param centred - makes a sheet text of a centred block (the sheet's own).
 * @example planFitUpItems(template, drawing, [], 1, centred).items.length
 */
export function planFitUpItems(
  template: Template,
  drawing: Box,
  obstacles: readonly Box[],
  textScale: number,
  centred: (t: CentredText, role: SheetTextRole, bold: boolean) => SheetText,
): FitUpItems {
  const refs = planReferenceLines(template);
  const ordinates = planStationOrdinates(template, [...obstacles, ...refs.labels.map((l) => l.box)]);
  let grown = drawing;
  for (const p of [...refs.paths, ...ordinates.paths]) grown = unionBox(grown, growBox(partBox(p.part), MAX_STROKE_MM / 2));
  for (const l of refs.labels) grown = unionBox(grown, l.box);
  if (ordinates.texts.length > 0) grown = unionBox(grown, ordinates.box);
  const block = planFitUpBlock(template, grown, textScale);
  if (block.texts.length > 0) grown = unionBox(grown, block.box);
  return {
    items: [...refs.paths, ...ordinates.paths, ...refs.labels.map((l) => centred(l, 'reference-label', true)), ...ordinates.texts, ...block.texts],
    drawing: grown,
  };
}
