/**
 * Template -> sheet: what goes on which layer, where the text sits, and the
 * conversion to the output unit. Pure; every number is checked on the way.
 */
import { GirthError, MM_PER_INCH } from '@girth/pipes';
import { CAUTION, type Template } from '@girth/unroll';
import { dxfSafeText } from '../dxf-text.js';
import { checkLengthMm, checkPointMm } from './checks.js';
import { flattenControls } from './flatten-controls.js';
import { sheetExtents } from './extents.js';
import { joinParts } from './join-parts.js';
import type { ResolvedDxfOptions } from './options.js';
import { scaleEntity } from './scale.js';
import { wrapWords } from './wrap-words.js';
import type { Sheet, SheetEntity } from './sheet.js';

/** Station numbers are this fraction of the title height. */
const STATION_NUMBER_SCALE = 0.6;
/** Notes, job line and caution are this fraction of the title height. */
const SMALL_TEXT_SCALE = 0.7;
/** Title lines and notes longer than this many characters are broken into several lines. */
const TITLE_LINE_CHARS = 110;
/** Baseline-to-baseline spacing as a multiple of the text height. */
const LINE_SPACING = 1.6;

function requireList(value: unknown, field: string): readonly unknown[] {
  if (!Array.isArray(value)) throw new GirthError('BAD_JOB', field, `${field}: expected a list`, value);
  return value;
}

function text(layerText: string, at: readonly [number, number], height: number, align: 'left' | 'center'): SheetEntity[] {
  const safe = dxfSafeText(layerText);
  return safe.length === 0 ? [] : [{ kind: 'text', layer: 'text', at, height, text: safe, align }];
}

/** Square line, station lines (and their numbers) and other marks, in mm. */
function markEntities(template: Template, o: ResolvedDxfOptions): SheetEntity[] {
  const out: SheetEntity[] = [];
  if (template.kind === 'wrap' && template.squareLine !== undefined) {
    const from = checkPointMm(template.squareLine.from, 'template.squareLine.from');
    const to = checkPointMm(template.squareLine.to, 'template.squareLine.to');
    out.push({ kind: 'line', layer: 'mark', from, to });
  }
  const numberHeight = o.textHeightMm * STATION_NUMBER_SCALE;
  const lines = requireList(template.stationLines, 'template.stationLines').map((_, i) => {
    const line = template.stationLines[i]!;
    const field = `template.stationLines[${i}]`;
    const from = checkPointMm(line.from, `${field}.from`);
    const to = checkPointMm(line.to, `${field}.to`);
    return { n: line.n, from, to, length: Math.hypot(to[0] - from[0], to[1] - from[1]) };
  });
  // A zero-length station line (e.g. at the heel of a plane cut) takes its
  // number's direction from the others, so all numbers sit on the same side.
  const drawn = lines.filter((l) => l.length > o.joinEpsMm);
  const sx = drawn.reduce((acc, l) => acc + (l.to[0] - l.from[0]) / l.length, 0);
  const sy = drawn.reduce((acc, l) => acc + (l.to[1] - l.from[1]) / l.length, 0);
  const sLen = Math.hypot(sx, sy);
  const usual: readonly [number, number] = sLen > 1e-9 ? [sx / sLen, sy / sLen] : [0, 1];
  for (const l of lines) {
    if (l.length > o.joinEpsMm) out.push({ kind: 'line', layer: 'mark', from: l.from, to: l.to });
    if (o.stationNumbers) {
      // The number sits just past the line's `to` end, along the line.
      const [ux, uy] = l.length > o.joinEpsMm ? [(l.to[0] - l.from[0]) / l.length, (l.to[1] - l.from[1]) / l.length] : usual;
      const gap = numberHeight * 1.2;
      out.push(...text(String(l.n), [l.to[0] + ux * gap, l.to[1] + uy * gap], numberHeight, 'center'));
    }
  }
  out.push(...joinParts(requireList(template.marks, 'template.marks') as Template['marks'], 'mark', 'template.marks', o.joinEpsMm));
  return out;
}

/** Labels placed by the layout, centred on their point. */
function labelEntities(template: Template): SheetEntity[] {
  return requireList(template.labels, 'template.labels').flatMap((_, i) => {
    const label = template.labels[i]!;
    const at = checkPointMm(label.at, `template.labels[${i}].at`);
    const height = checkLengthMm(label.heightMm, `template.labels[${i}].heightMm`);
    return text(String(label.text ?? ''), at, height, 'center');
  });
}

/** Title, notes, job line, unit line and caution, left-aligned below the geometry and its labels. */
function titleEntities(template: Template, o: ResolvedDxfOptions, drawn: readonly SheetEntity[]): SheetEntity[] {
  const box = sheetExtents(drawn);
  const left = box === null ? 0 : box[0];
  let y = box === null ? 0 : box[1];
  // Centred texts reach half their height below their point; keep the title clear of them.
  for (const e of drawn) if (e.kind === 'text') y = Math.min(y, e.at[1] - e.height / 2);
  const h = o.textHeightMm;
  const small = h * SMALL_TEXT_SCALE;
  const lines: Array<[string, number]> = [];
  const add = (content: string, height: number): void => {
    // Break the plain text at spaces first, then make each line safe, so no DXF code is split.
    for (const part of wrapWords(flattenControls(content), TITLE_LINE_CHARS)) lines.push([part, height]);
  };
  add(String(template.title ?? ''), h);
  const jobLine = [o.job && `Job: ${o.job}`, o.piece && `Piece: ${o.piece}`].filter((s) => s).join('   ');
  if (jobLine) add(jobLine, small);
  requireList(template.notes ?? [], 'template.notes').forEach((note) => add(String(note), small));
  add(`Full size 1:1, units ${o.units === 'in' ? 'inch' : 'mm'}. Template ${String(template.id)}.`, small);
  lines.push([CAUTION, small]); // once, one line, as it is (printable ASCII)
  const out: SheetEntity[] = [];
  y -= h; // clear of the geometry
  for (const [content, height] of lines) {
    y -= height * LINE_SPACING;
    out.push(...text(content, [left, y], height, 'left'));
  }
  return out;
}

/**
 * Everything the template draws, on its layers, in the output unit.
 * @throws GirthError for any non-finite or out-of-range number, naming the field.
 */
export function buildSheet(template: Template, o: ResolvedDxfOptions): Sheet {
  if (template === null || typeof template !== 'object') {
    throw new GirthError('BAD_JOB', 'template', `template: expected a template object, got ${String(template)}`, template);
  }
  const cutParts = requireList(template.cut, 'template.cut');
  if (cutParts.length === 0) {
    throw new GirthError('EMPTY_INPUT', 'template.cut', `template.cut: template '${String(template.id)}' has no line to cut`, cutParts);
  }
  const cut = joinParts(template.cut, 'cut', 'template.cut', o.joinEpsMm);
  const marks = markEntities(template, o);
  const labels = labelEntities(template);
  const title = titleEntities(template, o, [...cut, ...marks, ...labels]);
  const k = o.units === 'in' ? 1 / MM_PER_INCH : 1;
  return { kind: 'sheet', units: o.units, entities: [...cut, ...marks, ...labels, ...title].map((e) => scaleEntity(e, k)) };
}
