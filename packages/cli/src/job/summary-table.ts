/**
 * The job's summary table: one line a piece, what it is and its key figures.
 */
import type { LayoutResult } from '@girth/unroll';
import { jointNamed } from '../joints/registry.js';
import type { ReportStyle } from '../report-style.js';

function describe(result: LayoutResult, style: ReportStyle): string {
  return jointNamed(result.kind === 'plane-cut' ? 'cutback' : result.kind)?.describe(result, style) ?? '';
}

/**
 * One piece's row of the summary table: piece, joint, pipes, figures, templates.
 * @example summaryRow('SP-03', result, style)[1] // 'branch'
 */
export function summaryRow(piece: string, result: LayoutResult, style: ReportStyle): readonly string[] {
  return [piece, result.kind, result.pipes.map((p) => p.label).join(' / '), describe(result, style), result.templates.map((t) => t.id).join(', ')];
}

/** The summary table's heading row. */
const HEAD = ['Piece', 'Joint', 'Pipes', 'Figures', 'Templates'] as const;

/**
 * Column widths of the summary table, widened to hold `row` (start from
 * {@link summaryWidths} with no row).
 * @example const w = summaryWidths(); for (const r of rows) summaryWidths(r, w);
 */
export function summaryWidths(row?: readonly string[], widths: number[] = HEAD.map((h) => h.length)): number[] {
  if (row !== undefined) for (let c = 0; c < widths.length; c++) widths[c] = Math.max(widths[c]!, row[c]!.length);
  return widths;
}

/**
 * One line of the summary table: the cells padded to `widths`, two spaces between.
 * @example summaryLine(['SP-03', 'branch', ...], widths)
 */
export function summaryLine(row: readonly string[], widths: readonly number[]): string {
  return row.map((cell, c) => cell.padEnd(widths[c]!)).join('  ').trimEnd();
}

/**
 * The summary table's heading and the rule under it, for `widths`.
 * @example summaryHeading(summaryWidths())
 */
export function summaryHeading(widths: readonly number[]): string {
  return `${summaryLine(HEAD, widths)}\n${widths.map((w) => '-'.repeat(w)).join('  ')}`;
}

/**
 * The rows of {@link summaryRow} as an aligned table under its heading.
 * @example alignSummary([summaryRow('SP-03', result, style)])
 */
export function alignSummary(rows: readonly (readonly string[])[]): string {
  const widths = summaryWidths();
  for (const row of rows) summaryWidths(row, widths);
  return [summaryHeading(widths), ...rows.map((row) => summaryLine(row, widths))].join('\n');
}
