/**
 * A streamed job writes exactly what the in-memory plan holds (same files,
 * same bytes, the same summary); a piece that fails part way through leaves the folder as it was and no
 * staging behind.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { parseJob } from './schema.js';
import { planJob, type JobTiming } from './run-job.js';
import { jobFileSource, summaryText } from './stream-job.js';
import { summaryWidths } from './summary-table.js';
import { planPieces } from './run-job.js';
import { SET_MARKER, writeJobFolder } from './write-job-folder.js';
import { DEMO_JOB } from '../test-support/paths.js';
import { listFiles, makeTempDir, removeTempDir } from '../test-support/temp-dir.js';
import { girthError } from '../test-support/rejected-girth-error.js';

type JobData = Record<string, unknown> & { pieces: Record<string, unknown>[] };

const demo = (): JobData => JSON.parse(readFileSync(DEMO_JOB, 'utf8')) as JobData;

/** The demo's pieces repeated to `count`, each with its own label. */
function manyPieces(count: number): JobData {
  const d = demo();
  return { ...d, pieces: Array.from({ length: count }, (_, i) => ({ ...d.pieces[i % d.pieces.length]!, piece: `SP-${i + 1} ${String(d.pieces[i % d.pieces.length]!.piece)}` })) };
}

/**
 * A DXF with its handle values (group codes 5, 330 and 340-369, the AC1021
 * writer's process-wide counter) blanked; other text as it is.
 */
function withoutHandles(text: string): string {
  return text.replace(/^( *(?:5|330|3[4-6]\d))\n[0-9A-F]+$/gm, '$1\n<h>');
}

let tmp = '';
beforeEach(() => {
  tmp = makeTempDir('stream');
});
afterEach(() => {
  removeTempDir(tmp);
});

describe('a job streamed to its folder', () => {
  it('writes the same files, byte for byte, as the plan held in memory, summary included', async () => {
    const job = parseJob(manyPieces(14));
    const out = join(tmp, 'out');
    const timing: JobTiming = { layoutMs: 0, exportMs: 0 };
    const written = await writeJobFolder(out, jobFileSource(job, out, timing), { force: false, concurrency: 3 });
    const plan = planJob(job, out);
    expect(written.count).toBe(plan.files.length);
    expect(listFiles(out).filter((f) => f !== SET_MARKER).sort()).toEqual(plan.files.map((f) => relative(out, f.path)).sort());
    for (const f of plan.files) expect(withoutHandles(readFileSync(f.path, 'utf8')), f.path).toBe(withoutHandles(f.content));
    expect(timing.layoutMs).toBeGreaterThan(0);
    expect(timing.exportMs).toBeGreaterThan(0);
  });

  it('a bad piece part way through: the old set stays, nothing staged is left', async () => {
    const out = join(tmp, 'out');
    const good = parseJob(manyPieces(3));
    await writeJobFolder(out, jobFileSource(good, out), { force: false });
    const before = listFiles(out).map((f) => [f, readFileSync(join(out, f), 'utf8')]);
    const data = manyPieces(40);
    data.pieces[37] = { ...data.pieces[0]!, piece: 'SP-38 bad', branch: 'NPS 16 STD' };
    const error = await girthError(writeJobFolder(out, jobFileSource(parseJob(data), out), { force: true, concurrency: 2 }));
    expect(error.field).toBe('pieces[37].branch');
    expect(listFiles(out).map((f) => [f, readFileSync(join(out, f), 'utf8')])).toEqual(before);
    expect(readdirSync(tmp)).toEqual(['out']);
  });


  it('the summary is the same whatever pieces the scratch texts are read back in', async () => {
    const job = parseJob(manyPieces(8));
    const widths = summaryWidths();
    let rowsText = '';
    let reportsText = '';
    for (const p of planPieces(job, 'o')) {
      summaryWidths(p.row, widths);
      rowsText += `${JSON.stringify(p.row)}\n`;
      reportsText += `${p.report}\n`;
    }
    // Read back 7 characters at a time: rows are cut mid-line, as a 1 MB read can cut them.
    const inPieces = (text: string) => ({
      append: async () => undefined,
      async *read() {
        for (let i = 0; i < text.length; i += 7) yield text.slice(i, i + 7);
      },
    });
    let summary = '';
    for await (const part of summaryText(job, widths, inPieces(rowsText), inPieces(reportsText))) summary += part;
    expect(summary).toBe(planJob(job, 'o').summary);
  });
});
