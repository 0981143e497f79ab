/**
 * A whole job: every piece laid out, every file planned, one summary table.
 * Nothing is written until every piece has been laid out without error.
 */
import { join } from 'node:path';
import { GirthError } from '@girth/pipes';
import type { LayoutResult } from '@girth/unroll';
import type { TableLengthFormat } from '@girth/table';
import { layoutJoint } from '../joints/layout-joint.js';
import type { JointContext } from '../joints/types.js';
import { planOutputs, type OutputStyle } from '../outputs.js';
import { layoutReportText, REPORT_CAUTION, type ReportStyle } from '../report.js';
import type { PlannedTextFile } from '../write-files.js';
import { summaryTable } from './summary-table.js';
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
  if (job.dxfVersion !== undefined && job.outputs !== undefined && !job.outputs.includes('dxf')) idle('dxfVersion', 'no DXF is written ("outputs" leaves out "dxf"); add "dxf" to outputs or leave dxfVersion out');
}

/**
 * Lays out every piece of a job and plans its files in `outDir`.
 * @throws GirthError naming the piece and field at fault (`pieces[2].header`).
 */
export function planJob(job: Job, outDir: string): JobPlan {
  refuseIdleJobKeys(job);
  const tableFormat: TableLengthFormat = job.units === 'mm' ? 'mm' : job.decimal === true ? 'in' : 'ft-in';
  const fraction = job.fraction ?? 16;
  const report: ReportStyle = { units: job.units, tableFormat, fraction };
  const outputs = new Set(job.outputs ?? ['svg', 'dxf', 'csv']);
  const stems = new Map<string, number>();
  const results: { piece: string; result: LayoutResult }[] = [];
  const files: PlannedTextFile[] = [];
  const texts: string[] = [];
  job.pieces.forEach((piece, i) => {
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
    const result = layoutJoint(piece, ctx);
    results.push({ piece: piece.piece, result });
    const style: OutputStyle = { units: job.units, tableFormat, fraction, dxfVersion: job.dxfVersion === 'r12' ? 'R12' : 'AC1021', job: job.job, piece: piece.piece };
    const base = join(outDir, stem);
    files.push(
      ...planOutputs(
        result,
        {
          ...(outputs.has('svg') ? { svg: `${base}.svg` } : {}),
          ...(outputs.has('dxf') ? { dxf: `${base}.dxf` } : {}),
          ...(outputs.has('csv') ? { csv: `${base}.csv` } : {}),
        },
        style,
      ),
    );
    texts.push(layoutReportText(result, report, piece.piece));
  });
  const cutList = summaryTable(results, report);
  const summary = [
    job.job,
    '',
    cutList,
    '',
    ...texts,
    REPORT_CAUTION,
    '',
  ].join('\n');
  files.push({ path: join(outDir, 'summary.txt'), content: summary });
  return { results, files, summary, cutList, reports: texts };
}
