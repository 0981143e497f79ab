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
 * An aligned table: piece, joint, pipes, figures, templates.
 * @example summaryTable([{ piece: 'SP-03', result }], style)
 */
export function summaryTable(rows: readonly { readonly piece: string; readonly result: LayoutResult }[], style: ReportStyle): string {
  const cells = [
    ['Piece', 'Joint', 'Pipes', 'Figures', 'Templates'],
    ...rows.map(({ piece, result }) => [
      piece,
      result.kind,
      result.pipes.map((p) => p.label).join(' / '),
      describe(result, style),
      result.templates.map((t) => t.id).join(', '),
    ]),
  ];
  const widths = cells[0]!.map((_, c) => Math.max(...cells.map((row) => row[c]!.length)));
  const line = (row: readonly string[]): string => row.map((cell, c) => cell.padEnd(widths[c]!)).join('  ').trimEnd();
  return [line(cells[0]!), widths.map((w) => '-'.repeat(w)).join('  '), ...cells.slice(1).map(line)].join('\n');
}
