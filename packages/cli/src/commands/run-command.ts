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
import { printFile } from '../job/print-file.js';
import { jobFileSource } from '../job/stream-job.js';
import { writeJobFolder } from '../job/write-job-folder.js';

/** The name of the job packet in the job's folder. */
export const PACKET_FILE = 'job-packet.pdf';

/**
 * Reads and checks a job file, then lays out and writes its pieces one at a
 * time into the job's folder, which appears whole or not at all (staged
 * beside `outDir`, moved in; swapped with `force`); prints the summary. With
 * `--packet` (in `args`) the folder also holds {@link PACKET_FILE}: the cover
 * with the cut list and caution, then every piece's sheets and ordinate
 * tables, on the paper the printing options name (a packet holds the whole
 * job in memory to build one PDF).
 * @throws GirthError `CANNOT_READ` / `BAD_JOB` for a file that cannot be read or is not JSON; the job's own errors; the printing options' errors naming the option; `CANNOT_WRITE` naming the folder.
 */
export async function runJobFile(jobPath: string, outDir: string, force: boolean, io: CliIo, args?: ParsedArgs): Promise<void> {
  const job = parseJob(await readJobFile(jobPath));
  const packet = args?.values.packet === true;
  const print = args === undefined ? undefined : readPrintOptions(args, job.units, packet, '--packet');
  if (print === undefined) {
    const written = await writeJobFolder(outDir, jobFileSource(job, outDir), { force, onNote: io.err, label: job.job });
    await printFile(join(written.dir, 'summary.txt'), io.out);
    io.err(`wrote ${written.count} files to ${outDir}\n`);
    return;
  }
  const plan = planJob(job, outDir);
  const pieces = plan.results.map((r, i) => ({ piece: r.piece, result: r.result, report: plan.reports[i] ?? '' }));
  const files: PlannedFile[] = [
    ...plan.files,
    { option: '--packet', path: join(outDir, PACKET_FILE), content: await jobPacket(job.job, job.units, plan.cutList, pieces, REPORT_CAUTION, print) },
  ];
  const written = await writeJobFolder(outDir, files, { force, onNote: io.err, label: job.job });
  io.out(plan.summary);
  io.err(`wrote ${written.count} files to ${outDir}\n`);
}
