/**
 * The files the page offers for download, one entry per format. Each entry
 * makes its file in memory from the layout, exactly as the command line
 * writes it. A new format (the tiled PDF, when its writer lands) is one more
 * entry in {@link EXPORTERS}; the page lists every entry as a button.
 */
import { templateToDxf } from '@girth/dxf';
import { templateToSvg } from '@girth/svg';
import { stationTableCsv, toResultJson, type TableLengthFormat } from '@girth/table';
import type { LayoutResult, Template } from '@girth/unroll';

/** How the files are worded and labelled. */
export interface ExportStyle {
  readonly units: 'in' | 'mm';
  readonly tableFormat: TableLengthFormat;
  readonly fraction: 8 | 16 | 32;
  readonly job?: string;
  readonly piece?: string;
}

/** One file to download. */
export interface ExportFile {
  readonly name: string;
  readonly mime: string;
  readonly content: string | Uint8Array;
}

/** One download format. */
export interface Exporter {
  /** Short id, also the file extension: `svg`. */
  readonly id: string;
  /** Button words. */
  readonly label: string;
  /** Makes the files of a layout; `stem` is the file name without extension. */
  readonly files: (result: LayoutResult, style: ExportStyle, stem: string) => readonly ExportFile[];
}

/** The command line's naming: one template writes `stem.ext`; several put the template id before the extension. */
export function exportName(stem: string, template: Template, count: number, ext: string): string {
  return count <= 1 ? `${stem}.${ext}` : `${stem}.${template.id}.${ext}`;
}

function labels(style: ExportStyle): { job?: string; piece?: string } {
  return { ...(style.job !== undefined ? { job: style.job } : {}), ...(style.piece !== undefined ? { piece: style.piece } : {}) };
}

function perTemplate(ext: string, mime: string, make: (t: Template, style: ExportStyle) => string): Exporter['files'] {
  return (result, style, stem) =>
    result.templates.map((t) => ({ name: exportName(stem, t, result.templates.length, ext), mime, content: make(t, style) }));
}

/** The download formats, in button order. */
export const EXPORTERS: readonly Exporter[] = [
  { id: 'svg', label: 'SVG (true size)', files: perTemplate('svg', 'image/svg+xml', (t, s) => templateToSvg(t, { sheetUnits: s.units, ...labels(s) })) },
  { id: 'dxf', label: 'DXF (cutting table)', files: perTemplate('dxf', 'application/dxf', (t, s) => templateToDxf(t, { units: s.units, ...labels(s) })) },
  { id: 'csv', label: 'CSV (table)', files: perTemplate('csv', 'text/csv', (t, s) => stationTableCsv(t, { format: s.tableFormat, fraction: s.fraction })) },
  {
    id: 'json',
    label: 'JSON (result)',
    files: (result, style, stem) => [{ name: `${stem}.json`, mime: 'application/json', content: `${JSON.stringify(toResultJson(result, { units: style.units }), null, 2)}\n` }],
  },
];
