/**
 * `girth run JOB.json --out DIR`: every piece of a job file. Loaded only for
 * `run`; it brings in the job validator (zod) and the layout code.
 */
import { join } from 'node:path';
import type { CliIo } from '../io.js';
import type { ParsedArgs } from '../args.js';
import { jobPacket } from '../pdf-outputs.js';
import { readPrintOptions } from '../print-options.js';
import { REPORT_CAUTION } from '../report.js';
import type { PlannedFile } from '../write-files.js';
import { parseJob } from '../job/schema.js';
import { planJob } from '../job/run-job.js';
import { readJobFile } from '../job/read-job-file.js';
import { writeJobFolder } from '../job/write-job-folder.js';

/** The name of the job packet in the job's folder. */
export const PACKET_FILE = 'job-packet.pdf';

/**
 * Reads, checks and lays out a job file, then writes the job's folder whole or
 * not at all (staged beside `outDir`, moved in; swapped with `force`). With
 * `--packet` (in `args`) the folder also holds {@link PACKET_FILE}: the cover
 * with the cut list and caution, then every piece's sheets and ordinate
 * tables, on the paper the printing options name.
 * @throws GirthError `CANNOT_READ` / `BAD_JOB` for a file that cannot be read or is not JSON; the job's own errors; the printing options' errors naming the option; `CANNOT_WRITE` naming the folder.
 */
export async function runJobFile(jobPath: string, outDir: string, force: boolean, io: CliIo, args?: ParsedArgs): Promise<void> {
  const job = parseJob(await readJobFile(jobPath));
  const packet = args?.values.packet === true;
  const print = args === undefined ? undefined : readPrintOptions(args, job.units, packet, '--packet');
  const plan = planJob(job, outDir);
  const files: PlannedFile[] = [...plan.files];
  if (print !== undefined) {
    const pieces = plan.results.map((r, i) => ({ piece: r.piece, result: r.result, report: plan.reports[i] ?? '' }));
    files.push({ option: '--packet', path: join(outDir, PACKET_FILE), content: await jobPacket(job.job, job.units, plan.cutList, pieces, REPORT_CAUTION, print) });
  }
  const written = await writeJobFolder(outDir, files, { force, onNote: io.err, label: job.job });
  io.out(plan.summary);
  io.err(`wrote ${written.count} files to ${outDir}\n`);
}
