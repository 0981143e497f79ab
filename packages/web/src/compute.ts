/**
 * One layout for the page: the form's reading laid out by the command line's
 * own joint code (`layoutJoint` of `girth/joints`), and what the page shows of
 * it: each template's sheet (the SVG writer's output), its station table (the
 * CSV writer's cells), the warnings and the joint's own figures.
 */
import { GirthError } from '@girth/pipes';
import { templateToSvg } from '@girth/svg';
import { stationTableCsv, type TableLengthFormat } from '@girth/table';
import type { LayoutResult } from '@girth/unroll';
import { jointNamed, layoutJoint } from 'girth/joints';
import { parseCsv } from './csv.js';
import type { ExportStyle } from './exporters.js';
import type { PageState } from './page-state.js';
import { problemOf, readForm, type FieldProblem } from './read-form.js';

/** What the page shows of one template. */
export interface TemplateView {
  readonly id: string;
  readonly title: string;
  /** The table's heading row and body rows, as the CSV writes them. */
  readonly headings: readonly string[];
  readonly rows: ReadonlyArray<readonly string[]>;
  /** The sheet as the SVG writer draws it (true size in mm). */
  readonly svg: string;
  /** The sheet's size, mm, from the SVG's width and height. */
  readonly widthMm: number;
  readonly heightMm: number;
}

/** A layout and its views, or the problems that stop it. */
export type PageResult =
  | { readonly ok: true; readonly result: LayoutResult; readonly style: ExportStyle; readonly templates: readonly TemplateView[]; readonly figures: readonly string[]; readonly warnings: readonly string[] }
  | { readonly ok: false; readonly problems: readonly FieldProblem[] };

/** The sheet's width or height in mm, from the SVG's `width="…mm"` or `width="…in"`. */
export function sheetSizeMm(svg: string, attr: 'width' | 'height'): number {
  const m = new RegExp(`<svg[^>]*\\s${attr}="([0-9.]+)(mm|in)"`).exec(svg);
  if (m === null) return 0;
  return Number(m[1]) * (m[2] === 'in' ? 25.4 : 1);
}

/**
 * Lays out the form's joint.
 * @example computePage(initialState('cutback')).ok // true
 */
export function computePage(state: PageState): PageResult {
  const reading = readForm(state);
  if (!reading.ok) return reading;
  const style: ExportStyle = {
    units: reading.ctx.units,
    tableFormat: reading.tableFormat,
    fraction: reading.fraction,
    ...(state.job.trim() !== '' ? { job: state.job.trim() } : {}),
    ...(state.piece.trim() !== '' ? { piece: state.piece.trim() } : {}),
  };
  let result: LayoutResult;
  let templates: TemplateView[];
  try {
    result = layoutJoint(reading.input, reading.ctx);
    templates = result.templates.map((t) => {
      const [headings = [], ...rows] = parseCsv(stationTableCsv(t, { format: reading.tableFormat, fraction: reading.fraction }));
      const svg = templateToSvg(t, { sheetUnits: style.units, ...(style.job !== undefined ? { job: style.job } : {}), ...(style.piece !== undefined ? { piece: style.piece } : {}) });
      return { id: t.id, title: String(t.title ?? t.id), headings, rows, svg, widthMm: sheetSizeMm(svg, 'width'), heightMm: sheetSizeMm(svg, 'height') };
    });
  } catch (error) {
    if (error instanceof GirthError) return { ok: false, problems: [problemOf(error, state.joint)] };
    throw error;
  }
  const joint = jointNamed(state.joint);
  const reportStyle = { units: style.units, tableFormat: style.tableFormat as TableLengthFormat, fraction: style.fraction };
  const figures = (joint?.reportLines?.(result, reportStyle) ?? []).filter((line) => line.trim() !== '');
  const warnings = result.warnings.map((w) => w.message);
  return { ok: true, result, style, templates, figures, warnings };
}

/**
 * The file name stem of the downloads: the piece label made safe for a file
 * name, else the joint.
 * @example fileStem({ ...initialState('miter'), piece: 'SP-04 ell' }) // 'SP-04-ell'
 */
export function fileStem(state: PageState): string {
  const safe = state.piece.trim().replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '');
  return safe === '' ? state.joint : safe;
}
