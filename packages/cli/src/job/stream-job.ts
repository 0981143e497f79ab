/**
 * A job streamed to its folder: each piece laid out, exported and handed to
 * the writer before the next is laid out, so memory holds a few pieces' files
 * and the summary table's column widths, whatever the job's size.
 */
import { join } from 'node:path';
import { planPieces, SUMMARY_TAIL, type JobTiming } from './run-job.js';
import { summaryHeading, summaryLine, summaryWidths } from './summary-table.js';
import type { Job } from './schema.js';
import type { JobFileSource, ScratchText } from './write-job-folder.js';

/**
 * The {@link JobFileSource} of a job: every piece's files in order, then
 * `summary.txt`. Its table rows and the pieces' reports are kept in scratch
 * text until the table's column widths are known. `timing`, when given, is
 * added to.
 * @throws GirthError from a piece (see {@link planPieces}); the writer then
 *   removes what was staged.
 * @example await writeJobFolder('out', jobFileSource(job, 'out'), { force: false })
 */
export function jobFileSource(job: Job, outDir: string, timing?: JobTiming): JobFileSource {
  return async (sink) => {
    const widths = summaryWidths();
    const rows = sink.scratch();
    const reports = sink.scratch();
    for (const piece of planPieces(job, outDir, timing)) {
      for (const file of piece.files) await sink.write(file);
      summaryWidths(piece.row, widths);
      await rows.append(`${JSON.stringify(piece.row)}\n`);
      await reports.append(`${piece.report}\n`);
    }
    await sink.writeParts(join(outDir, 'summary.txt'), summaryText(job, widths, rows, reports));
  };
}

/**
 * The summary, as planJob words it, from the column widths and the scratch
 * texts of the rows (one JSON list a line) and the reports.
 * @example await writeParts(path, summaryText(job, widths, rows, reports))
 */
export async function* summaryText(job: Job, widths: readonly number[], rows: ScratchText, reports: ScratchText): AsyncGenerator<string, void, undefined> {
  yield `${job.job}\n\n${summaryHeading(widths)}`;
  let rest = '';
  for await (const chunk of rows.read()) {
    const lines = (rest + chunk).split('\n');
    rest = lines.pop()!;
    yield lines.map((line) => `\n${summaryLine(JSON.parse(line) as string[], widths)}`).join('');
  }
  yield '\n\n';
  yield* reports.read();
  yield SUMMARY_TAIL;
}
