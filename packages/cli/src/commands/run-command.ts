/**
 * `girth run JOB.json --out DIR`: every piece of a job file. Loaded only for
 * `run`; it brings in the job validator (zod) and the layout code.
 */
import { join } from 'node:path';
import type { CliIo } from '../io.js';
import { parseJob } from '../job/schema.js';
import { readJobFile } from '../job/read-job-file.js';
import { printFile } from '../job/print-file.js';
import { jobFileSource } from '../job/stream-job.js';
import { writeJobFolder } from '../job/write-job-folder.js';

/**
 * Reads and checks a job file, then lays out and writes its pieces one at a
 * time into the job's folder, which appears whole or not at all (staged
 * beside `outDir`, moved in; swapped with `force`); prints the summary.
 * @throws GirthError `CANNOT_READ` / `BAD_JOB` for a file that cannot be read or is not JSON; the job's own errors; `CANNOT_WRITE` naming the folder.
 */
export async function runJobFile(jobPath: string, outDir: string, force: boolean, io: CliIo): Promise<void> {
  const job = parseJob(await readJobFile(jobPath));
  const written = await writeJobFolder(outDir, jobFileSource(job, outDir), { force, onNote: io.err, label: job.job });
  await printFile(join(written.dir, 'summary.txt'), io.out);
  io.err(`wrote ${written.count} files to ${outDir}\n`);
}
