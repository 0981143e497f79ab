/**
 * A job streamed to its folder: each piece laid out, exported and handed to
 * the writer before the next is laid out, so memory holds a few pieces'
 * files and the summary table's rows, whatever the job's size.
 */
import { join } from 'node:path';
import { planPieces, SUMMARY_TAIL, summaryHead, type JobTiming } from './run-job.js';
import type { Job } from './schema.js';
import type { JobFileSource, ScratchText } from './write-job-folder.js';

/**
 * The {@link JobFileSource} of a job: every piece's files in order, then
 * `summary.txt` (the pieces' reports kept in scratch text until the table
 * above them is complete). `timing`, when given, is added to.
 * @throws GirthError from a piece (see {@link planPieces}); the writer then
 *   removes what was staged.
 * @example await writeJobFolder('out', jobFileSource(job, 'out'), { force: false })
 */
export function jobFileSource(job: Job, outDir: string, timing?: JobTiming): JobFileSource {
  return async (sink) => {
    const rows: (readonly string[])[] = [];
    const reports = sink.scratch();
    for (const piece of planPieces(job, outDir, timing)) {
      for (const file of piece.files) await sink.write(file);
      rows.push(piece.row);
      await reports.append(`${piece.report}\n`);
    }
    await sink.writeParts(join(outDir, 'summary.txt'), summaryText(summaryHead(job, rows), reports));
  };
}

async function* summaryText(head: string, reports: ScratchText): AsyncGenerator<string, void, undefined> {
  yield head;
  yield* reports.read();
  yield SUMMARY_TAIL;
}
