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

/**
 * The rows of {@link summaryRow} as an aligned table under its heading.
 * @example alignSummary([summaryRow('SP-03', result, style)])
 */
export function alignSummary(rows: readonly (readonly string[])[]): string {
  const head = ['Piece', 'Joint', 'Pipes', 'Figures', 'Templates'];
  const widths = head.map((h) => h.length);
  for (const row of rows) for (let c = 0; c < widths.length; c++) widths[c] = Math.max(widths[c]!, row[c]!.length);
  const line = (row: readonly string[]): string => row.map((cell, c) => cell.padEnd(widths[c]!)).join('  ').trimEnd();
  const out = [line(head), widths.map((w) => '-'.repeat(w)).join('  ')];
  for (const row of rows) out.push(line(row));
  return out.join('\n');
}
