/**
 * What a layout becomes on disk: SVG and DXF per template, CSV of the station
 * tables, all planned in memory before anything is written.
 */
import { basename, dirname, extname, join } from 'node:path';
import { templateToDxf, type DxfCurveMode, type DxfTextMode, type DxfVersion } from '@girth/dxf';
import type { LengthUnit } from '@girth/pipes';
import { templateToSvg } from '@girth/svg';
import { stationTableCsv, type TableLengthFormat } from '@girth/table';
import type { LayoutResult, Template } from '@girth/unroll';
import { checkOutputPath } from './output-paths.js';
import type { PlannedFile, PlannedTextFile } from './write-files.js';
import type { PdfOptions } from '@girth/pdf';
import { jointPdf } from './pdf-outputs.js';

/** Where to write each kind of output; absent kinds are not written. */
export interface OutputRequest {
  readonly svg?: string;
  readonly dxf?: string;
  readonly csv?: string;
  /** One PDF of every template's sheet (written by `planPdfOutput`). */
  readonly pdf?: string;
}

/** How outputs look: unit, table style, DXF version, labels. */
export interface OutputStyle {
  readonly units: LengthUnit;
  readonly tableFormat: TableLengthFormat;
  readonly fraction: 8 | 16 | 32;
  readonly dxfVersion: DxfVersion;
  /** DXF text as TEXT, left out or single strokes on MARK; default TEXT. */
  readonly dxfText?: DxfTextMode;
  /** DXF cut lines as chords (default) or fitted arcs. */
  readonly dxfCurves?: DxfCurveMode;
  readonly job?: string;
  readonly piece?: string;
}

/**
 * The path of one template's file. A layout with one template writes exactly
 * the path given; with several, the template id goes before the extension
 * (`tee.svg` → `tee.branch-cut.svg`, `tee.header-hole.svg`).
 */
export function templatePath(path: string, template: Template, templateCount: number): string {
  if (templateCount <= 1) return path;
  const ext = extname(path);
  return join(dirname(path), `${basename(path, ext)}.${template.id}${ext}`);
}

/**
 * Every file a layout produces for the request, content included, each
 * tagged with the option that named it.
 * @throws GirthError `BAD_OPTION` when a requested path is empty, a folder,
 *   or ends in another format's extension (see {@link checkOutputPath}).
 * @example planOutputs(result, { svg: 'tee.svg' }, style).map((f) => f.path)
 */
export function planOutputs(result: LayoutResult, request: OutputRequest, style: OutputStyle): readonly PlannedTextFile[] {
  if (request.svg !== undefined) checkOutputPath('--svg', '.svg', request.svg);
  if (request.dxf !== undefined) checkOutputPath('--dxf', '.dxf', request.dxf);
  if (request.csv !== undefined) checkOutputPath('--csv', '.csv', request.csv);
  if (request.pdf !== undefined) checkOutputPath('--pdf', '.pdf', request.pdf);
  const files: PlannedTextFile[] = [];
  const count = result.templates.length;
  const labels = { ...(style.job !== undefined ? { job: style.job } : {}), ...(style.piece !== undefined ? { piece: style.piece } : {}) };
  for (const template of result.templates) {
    if (request.svg !== undefined) {
      files.push({ option: '--svg', path: templatePath(request.svg, template, count), content: templateToSvg(template, { sheetUnits: style.units, ...labels }) });
    }
    if (request.dxf !== undefined) {
      files.push({
        option: '--dxf',
        path: templatePath(request.dxf, template, count),
        content: templateToDxf(template, { units: style.units, version: style.dxfVersion, ...(style.dxfText === undefined ? {} : { text: style.dxfText }), ...(style.dxfCurves === undefined ? {} : { curves: style.dxfCurves }), ...labels }),
      });
    }
  }
  if (request.csv !== undefined) {
    for (const template of result.templates) {
      files.push({ option: '--csv', path: templatePath(request.csv, template, count), content: stationTableCsv(template, { format: style.tableFormat, fraction: style.fraction }) });
    }
  }
  return files;
}

/**
 * The `--pdf` file of a layout: every template's sheet in one PDF (the path
 * as given, whatever the number of templates), or none when not asked for.
 * @throws GirthError from `@girth/pdf`, named by the option typed (`--paper`,
 *   `--page-overlap`, `--page-margin`).
 * @example await planPdfOutput(result, { pdf: 'tee.pdf' }, style, { paper: 'a4' })
 */
export async function planPdfOutput(result: LayoutResult, request: OutputRequest, style: OutputStyle, print: PdfOptions = {}): Promise<readonly PlannedFile[]> {
  if (request.pdf === undefined) return [];
  const content = await jointPdf(result, { units: style.units, ...(style.job !== undefined ? { job: style.job } : {}), ...(style.piece !== undefined ? { piece: style.piece } : {}) }, print);
  return [{ option: '--pdf', path: request.pdf, content }];
}
