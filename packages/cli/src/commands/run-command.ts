/**
 * `girth run JOB.json --out DIR`: every piece of a job file. Loaded only for
 * `run`; it brings in the job validator (zod) and the layout code.
 */
import type { CliIo } from '../io.js';
import { parseJob } from '../job/schema.js';
import { planJob } from '../job/run-job.js';
import { readJobFile } from '../job/read-job-file.js';
import { writeJobFolder } from '../job/write-job-folder.js';

/**
 * Reads, checks and lays out a job file, then writes the job's folder whole or
 * not at all (staged beside `outDir`, moved in; swapped with `force`).
 * @throws GirthError `CANNOT_READ` / `BAD_JOB` for a file that cannot be read or is not JSON; the job's own errors; `CANNOT_WRITE` naming the folder.
 */
export async function runJobFile(jobPath: string, outDir: string, force: boolean, io: CliIo): Promise<void> {
  const job = parseJob(await readJobFile(jobPath));
  const plan = planJob(job, outDir);
  const written = await writeJobFolder(outDir, plan.files, { force, onNote: io.err, label: job.job });
  io.out(plan.summary);
  io.err(`wrote ${written.count} files to ${outDir}\n`);
}
