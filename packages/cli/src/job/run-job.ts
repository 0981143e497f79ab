/**
 * A whole job: every piece laid out, every file planned, one summary table.
 * Pieces are laid out one at a time ({@link planPieces}) so a job of any size
 * streams; {@link planJob} holds a whole job in memory.
 */
import { join } from 'node:path';
import { GirthError, parseLength } from '@girth/pipes';
import type { LayoutResult } from '@girth/unroll';
import type { TableLengthFormat } from '@girth/table';
import { layoutJoint } from '../joints/layout-joint.js';
import type { JointContext } from '../joints/types.js';
import { planOutputs, type OutputStyle } from '../outputs.js';
import { prepareForCutting, type CuttingSettings } from '../cutting-parts.js';
import { layoutReportText, REPORT_CAUTION, type ReportStyle } from '../report.js';
import type { PlannedTextFile } from '../write-files.js';
import { alignSummary, summaryRow } from './summary-table.js';
import type { Job } from './schema.js';

/** A job laid out: each piece's result and every file to write. */
export interface JobPlan {
  readonly results: readonly { readonly piece: string; readonly result: LayoutResult }[];
  readonly files: readonly PlannedTextFile[];
  readonly summary: string;
  /** The summary table alone (the job's cut list). */
  readonly cutList: string;
  /** Each piece's printed report with its ordinate tables, in the order of `results`. */
  readonly reports: readonly string[];
}

/** A file-name stem from a piece label: `FG-12 SP-03 tee` → `fg-12-sp-03-tee`. */
export function pieceStem(label: string): string {
  const stem = label
    .normalize('NFKD')
    .replace(/[^\x20-\x7e]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 80);
  return stem === '' ? 'piece' : stem;
}

/**
 * Refuses job keys that would do nothing with the others given (as the command
 * line refuses the same options): `decimal` or `fraction` with mm, `fraction`
 * with `decimal`, `dxfVersion` when no DXF is written.
 * @throws GirthError `BAD_OPTION` naming the idle key.
 */
export function refuseIdleJobKeys(job: Job): void {
  const idle = (key: string, why: string): never => {
    throw new GirthError('BAD_OPTION', key, `${key}: ${why}`);
  };
  if (job.units === 'mm' && job.decimal !== undefined) idle('decimal', 'millimetres are always decimal; "decimal" is for inches ("units": "in")');
  if (job.units === 'mm' && job.fraction !== undefined) idle('fraction', 'millimetres are not rounded to fractions; "fraction" is for feet-inch output ("units": "in")');
  if (job.decimal === true && job.fraction !== undefined) idle('fraction', 'decimal inches are not rounded to fractions; give "decimal" or "fraction", not both');
  if (job.stub !== undefined && job.closedParts !== true) idle('stub', 'the stub length is for closed parts; add "closedParts": true or leave stub out');
  if (job.rolledPlate !== undefined && job.developOn !== 'mid') idle('rolledPlate', 'the plate thickness is for "developOn": "mid"; add it or leave rolledPlate out');
  if (job.dxfText !== undefined && job.outputs !== undefined && !job.outputs.includes('dxf')) idle('dxfText', 'no DXF is written ("outputs" leaves out "dxf"); add "dxf" to outputs or leave dxfText out');
  if (job.dxfCurves !== undefined && job.outputs !== undefined && !job.outputs.includes('dxf')) idle('dxfCurves', 'no DXF is written ("outputs" leaves out "dxf"); add "dxf" to outputs or leave dxfCurves out');
  if (job.dxfVersion !== undefined && job.outputs !== undefined && !job.outputs.includes('dxf')) idle('dxfVersion', 'no DXF is written ("outputs" leaves out "dxf"); add "dxf" to outputs or leave dxfVersion out');
}

/** One piece of a job laid out: its result, its files and its lines of the summary. */
export interface PiecePlan {
  readonly piece: string;
  readonly result: LayoutResult;
  readonly files: readonly PlannedTextFile[];
  /** The piece's row of the summary table (piece, joint, pipes, figures, templates). */
  readonly row: readonly string[];
  /** The piece's report in the summary (its station tables). */
  readonly report: string;
}

/** Time spent in each step of a job, milliseconds, added up over the pieces. */
export interface JobTiming {
  layoutMs: number;
  exportMs: number;
}

/** What every piece of a job shares: its report style, outputs and file-name stems so far. */
interface JobStyle {
  readonly tableFormat: TableLengthFormat;
  readonly fraction: 8 | 16 | 32;
  readonly report: ReportStyle;
  readonly outputs: ReadonlySet<string>;
  readonly cutting: CuttingSettings;
}

function jobStyle(job: Job): JobStyle {
  refuseIdleJobKeys(job);
  const tableFormat: TableLengthFormat = job.units === 'mm' ? 'mm' : job.decimal === true ? 'in' : 'ft-in';
  const stubMm = job.stub === undefined ? undefined : parseLength(String(job.stub), { unit: job.units, field: 'stub' });
  const plateMm = job.rolledPlate === undefined ? undefined : parseLength(String(job.rolledPlate), { unit: job.units, field: 'rolledPlate' });
  const cutting: CuttingSettings = {
    closedParts: job.closedParts === true,
    developOn: job.developOn ?? 'od',
    ...(stubMm === undefined ? {} : { stubMm }),
    ...(plateMm === undefined ? {} : { plateMm }),
    fields: { stub: 'stub', plate: 'rolledPlate' },
  };
  const fraction = job.fraction ?? 16;
  return { tableFormat, fraction, report: { units: job.units, tableFormat, fraction }, outputs: new Set(job.outputs ?? ['svg', 'dxf', 'csv']), cutting };
}

/**
 * Lays out the pieces of a job one at a time, in order, each with its files
 * planned in `outDir`: a caller that writes and drops each piece before
 * asking for the next holds one piece in memory, whatever the job's size.
 * `timing`, when given, is added to (layout, export).
 * @throws GirthError naming the piece and field at fault (`pieces[2].header`),
 *   when that piece is reached; the pieces before it have been yielded.
 * @example for (const p of planPieces(job, 'out')) await write(p.files)
 */
export function* planPieces(job: Job, outDir: string, timing?: JobTiming): Generator<PiecePlan, void, undefined> {
  const { tableFormat, fraction, report, outputs, cutting } = jobStyle(job);
  const stems = new Map<string, number>();
  const dxfVersion = job.dxfVersion === 'r12' ? 'R12' : 'AC1021';
  for (let i = 0; i < job.pieces.length; i++) {
    const piece = job.pieces[i]!;
    const stem = pieceStem(piece.piece);
    const clash = stems.get(stem);
    if (clash !== undefined) {
      throw new GirthError('BAD_JOB', `pieces[${i}].piece`, `pieces[${i}].piece: "${piece.piece}" gives the same file names as pieces[${clash}]; make the labels differ`, piece.piece);
    }
    stems.set(stem, i);
    const ctx: JointContext = {
      units: job.units,
      stations: piece.stations ?? job.stations ?? 16,
      fieldPrefix: `pieces[${i}].`,
      fieldName: (name) => `pieces[${i}].${name}`,
      describe: { units: job.units, lengthFormat: tableFormat, fraction },
    };
    const t0 = timing === undefined ? 0 : performance.now();
    const result = prepareForCutting(layoutJoint(piece, ctx), cutting, job.units, ctx.describe);
    const t1 = timing === undefined ? 0 : performance.now();
    const style: OutputStyle = { units: job.units, tableFormat, fraction, dxfVersion, ...(job.dxfText === undefined ? {} : { dxfText: job.dxfText }), ...(job.dxfCurves === undefined ? {} : { dxfCurves: job.dxfCurves }), job: job.job, piece: piece.piece };
    const base = join(outDir, stem);
    const files = planOutputs(
      result,
      {
        ...(outputs.has('svg') ? { svg: `${base}.svg` } : {}),
        ...(outputs.has('dxf') ? { dxf: `${base}.dxf` } : {}),
        ...(outputs.has('csv') ? { csv: `${base}.csv` } : {}),
      },
      style,
    );
    const text = layoutReportText(result, report, piece.piece);
    if (timing !== undefined) {
      timing.layoutMs += t1 - t0;
      timing.exportMs += performance.now() - t1;
    }
    yield { piece: piece.piece, result, files, row: summaryRow(piece.piece, result, report), report: text };
  }
}

/**
 * The head of a job's summary: its title and the table of its pieces. Each
 * piece's report follows with a newline after it, then {@link SUMMARY_TAIL}.
 * @example summaryHead(job, rows) + reports.map((r) => `${r}\n`).join('') + SUMMARY_TAIL
 */
export function summaryHead(job: Job, rows: readonly (readonly string[])[]): string {
  return `${job.job}\n\n${alignSummary(rows)}\n\n`;
}

/** The end of a job's summary: the caution. */
export const SUMMARY_TAIL = `${REPORT_CAUTION}\n`;

/**
 * Lays out every piece of a job and plans its files in `outDir`, all held in
 * memory (a job's stream is {@link planPieces}).
 * @throws GirthError naming the piece and field at fault (`pieces[2].header`).
 * @example planJob(parseJob(data), 'out').files.length
 */
export function planJob(job: Job, outDir: string): JobPlan {
  const results: { piece: string; result: LayoutResult }[] = [];
  const files: PlannedTextFile[] = [];
  const rows: (readonly string[])[] = [];
  const texts: string[] = [];
  for (const p of planPieces(job, outDir)) {
    results.push({ piece: p.piece, result: p.result });
    files.push(...p.files);
    rows.push(p.row);
    texts.push(p.report);
  }
  const summary = summaryHead(job, rows) + texts.map((t) => `${t}\n`).join('') + SUMMARY_TAIL;
  files.push({ path: join(outDir, 'summary.txt'), content: summary });
  return { results, files, summary, cutList: alignSummary(rows), reports: texts };
}
