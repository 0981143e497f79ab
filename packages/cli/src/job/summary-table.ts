/**
 * The job's summary table: one line a piece, what it is and its key figures.
 */
import type { LayoutResult } from '@girth/unroll';
import { reportLength, type ReportStyle } from '../report.js';

function describe(result: LayoutResult, style: ReportStyle): string {
  const L = (mm: number): string => reportLength(mm, style);
  const r = result as LayoutResult & Record<string, unknown>;
  switch (result.kind) {
    case 'branch':
      return `${String(r.angleDeg)} deg, ${String(r.fit)}, offset ${L(Number(r.offsetMm))}, gap ${L(Number(r.gapMm))}`;
    case 'miter':
      return `${String(r.bendDeg)} deg bend, ${String(r.pieceCount)} pieces, cut ${Number(r.cutAngleDeg).toFixed(2)} deg, stock ${L(Number(r.stockLengthMm))}`;
    case 'plane-cut':
      return `${String(r.angleDeg)} deg to the plane, gap ${L(Number(r.gapMm))}`;
    case 'reducer':
      return `${String(r.form)}, length ${L(Number(r.lengthMm))}, plate ${L(Number(r.thicknessMm))}`;
    default:
      return '';
  }
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
