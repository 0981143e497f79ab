/**
 * What the command prints: the ordinate tables and each joint's own figures
 * (miter cut list, cone pattern). The JSON result contract is `toResultJson`
 * of `@girth/table`.
 */
import { formatLength, MM_PER_INCH, type LengthUnit } from '@girth/pipes';
import { CAUTION, type ConeLayout, type LayoutResult, type MiterLayout } from '@girth/unroll';
import { formatStationTable, toResultJson, type ResultJson } from '@girth/table';
import { jointNamed } from './joints/registry.js';
import type { ReportStyle } from './report-style.js';

export { reportLength, reportLengthAtLeast, type ReportStyle } from './report-style.js';

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
  const out: string[] = [];
  if (heading !== undefined) out.push(`== ${heading} ==`, '');
  const P = (mm: number): string => pipeSize(mm, style);
  for (const p of result.pipes) out.push(`${p.role}: ${p.label}  (OD ${P(p.odMm)}, wall ${P(p.wallMm)}, ID ${P(p.idMm)})`);
  for (const w of result.warnings) out.push(`WARNING ${w.code}: ${w.message}`);
  const own = jointNamed(jointOf(result))?.reportLines?.(result, style) ?? [];
  out.push(...own);
  for (const template of result.templates) out.push('', formatStationTable(template, { format: style.tableFormat, fraction: style.fraction, caution: false }).trimEnd());
  // The joint's fit-up, worded in the job's unit (every template carries the same lines).
  const fitUp = result.templates[0]?.fitUpLines ?? [];
  if (fitUp.length > 0) out.push('', 'Fit-up:', ...fitUp.map((l) => `  ${l}`));
  return out.join('\n') + '\n';
}

/** The command-line joint whose layout this is (`plane-cut` results come from `cutback`). */
function jointOf(result: LayoutResult): string {
  return result.kind === 'plane-cut' ? 'cutback' : result.kind;
}

/** The caution printed once at the end of every report. */
export const REPORT_CAUTION = CAUTION;
