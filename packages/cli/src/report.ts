/**
 * What the command prints: the ordinate tables and each joint's own figures
 * (miter cut list, cone pattern). The JSON result contract is `toResultJson`
 * of `@girth/table`.
 */
import { formatLength, MM_PER_INCH, type LengthUnit } from '@girth/pipes';
import { CAUTION, type ConeLayout, type LayoutResult, type MiterLayout } from '@girth/unroll';
import { formatStationTable, type TableLengthFormat } from '@girth/table';

/** How lengths are printed. */
export interface ReportStyle {
  readonly units: LengthUnit;
  readonly tableFormat: TableLengthFormat;
  readonly fraction: 8 | 16 | 32;
}

/** A length as the report prints it. */
export function reportLength(mm: number, style: ReportStyle): string {
  return formatLength(mm, { format: style.tableFormat, fraction: style.fraction });
}

/** The step the report rounds to, mm: 1/fraction in, 0.001 in, or 0.1 mm. */
function reportStepMm(style: ReportStyle): number {
  if (style.tableFormat === 'ft-in') return MM_PER_INCH / style.fraction;
  return style.tableFormat === 'in' ? MM_PER_INCH / 1000 : 0.1;
}

/**
 * A least size (stock to cut, plate to buy) as the report prints it: rounded
 * up to the report's step, never down, so what is bought or cut is not short.
 * @example reportLengthAtLeast(100.01, { units: 'mm', tableFormat: 'mm', fraction: 16 }) // "100.1 mm"
 */
export function reportLengthAtLeast(mm: number, style: ReportStyle): string {
  const step = reportStepMm(style);
  return reportLength(Math.ceil(mm / step - 1e-9) * step, style);
}

/** Pipe sizes as the report prints them: decimals, never rounded to a fraction (a 0.280 in wall is not 1/4 in). */
function pipeSize(mm: number, style: ReportStyle): string {
  return style.units === 'mm' ? formatLength(mm, { format: 'mm', decimals: 2 }) : formatLength(mm, { format: 'in', decimals: 3 });
}

function isMiter(result: LayoutResult): result is MiterLayout {
  return result.kind === 'miter';
}

function isCone(result: LayoutResult): result is ConeLayout {
  return result.kind === 'reducer';
}

/**
 * The printed report of one layout: pipes, warnings, every station table and
 * the joint's own figures. Ends without the caution (the caller prints it once).
 */
export function layoutReportText(result: LayoutResult, style: ReportStyle, heading?: string): string {
  const L = (mm: number): string => reportLength(mm, style);
  const out: string[] = [];
  if (heading !== undefined) out.push(`== ${heading} ==`, '');
  const P = (mm: number): string => pipeSize(mm, style);
  for (const p of result.pipes) out.push(`${p.role}: ${p.label}  (OD ${P(p.odMm)}, wall ${P(p.wallMm)}, ID ${P(p.idMm)})`);
  for (const w of result.warnings) out.push(`WARNING ${w.code}: ${w.message}`);
  if (isMiter(result)) out.push('', ...miterLines(result, L, style));
  if (isCone(result) && result.form === 'concentric') {
    const p = result.pattern;
    out.push(
      '',
      `Pattern: outer radius ${L(p.outerRadius)}, inner radius ${L(p.innerRadius)}, sweep ${p.sweepDeg.toFixed(2)} deg, slant height ${L(p.slantHeight)}`,
    );
  }
  if (isCone(result)) {
    for (const piece of result.pieces) out.push(`Plate for ${piece.templateId}: at least ${reportLengthAtLeast(piece.widthMm, style)} x ${reportLengthAtLeast(piece.heightMm, style)} (the pattern's bounding rectangle)`);
  }
  for (const template of result.templates) out.push('', formatStationTable(template, { format: style.tableFormat, fraction: style.fraction, caution: false }).trimEnd());
  return out.join('\n') + '\n';
}

function miterLines(result: MiterLayout, L: (mm: number) => string, style: ReportStyle): string[] {
  const lines = [
    `Miter: ${result.bendDeg} deg bend, ${result.welds} welds, ${result.pieceCount} pieces, cut angle ${result.cutAngleDeg.toFixed(3)} deg, centreline radius ${L(result.radiusMm)}`,
    '',
    'Piece            Count  Centre        Back          Throat',
  ];
  for (const p of result.pieces) {
    lines.push(`${p.label.padEnd(16)} ${String(p.count).padStart(5)}  ${L(p.center).padEnd(12)}  ${L(p.back).padEnd(12)}  ${L(p.throat)}`);
  }
  lines.push('', `Stock: at least ${reportLengthAtLeast(result.stockLengthMm, style)} of straight pipe, no allowance for kerf; cut in this order, turning the pipe 180 deg before each next cut:`);
  for (const c of result.stock.cuts) {
    lines.push(`  cut ${c.n}: centreline at ${L(c.centerAtMm)} from the stock end, long side at ${c.longSideDeg} deg`);
  }
  return lines;
}

/** The caution printed once at the end of every report. */
export const REPORT_CAUTION = CAUTION;
