/**
 * `girth run JOB.json --out DIR`: every piece of a job file. Loaded only for
 * `run`; it brings in the job validator (zod) and the layout code.
 */
import { readFile } from 'node:fs/promises';
import { GirthError } from '@girth/pipes';
import type { CliIo } from '../io.js';
import { parseJob } from '../job/schema.js';
import { planJob } from '../job/run-job.js';
import { writeFilesAtomically } from '../write-files.js';

/**
 * Reads, checks and lays out a job file, then writes every file or none.
 * @throws GirthError `BAD_JOB` for a file that cannot be read or is not JSON; the job's own errors.
 */
export async function runJobFile(jobPath: string, outDir: string, force: boolean, io: CliIo): Promise<void> {
  let text: string;
  try {
    text = await readFile(jobPath, 'utf8');
  } catch {
    throw new GirthError('BAD_JOB', 'job', `${jobPath}: cannot read the job file`, jobPath);
  }
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (error) {
    throw new GirthError('BAD_JOB', 'job', `${jobPath}: not valid JSON (${error instanceof Error ? error.message : String(error)})`, jobPath);
  }
  const plan = planJob(parseJob(data), outDir);
  const written = await writeFilesAtomically(plan.files, { force });
  io.out(plan.summary);
  io.err(`wrote ${written.length} files to ${outDir}\n`);
}
