/**
 * PDFs from the command line, read back with poppler-utils (pdftotext,
 * pdfinfo's page count through pdf-lib) and qpdf: a joint's sheets in one
 * PDF, the job packet's cover holding the cut list the summary prints and
 * every piece's sheets and ordinate tables following in job order, and bad
 * printing options refused with nothing written.
 */
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { PDFDocument } from 'pdf-lib';
import { PAPER_NAMES, planTiles } from '@girth/pdf';
import { pageTexts, qpdfCheck } from '@girth/pdf/test-support';
import { planSheet } from '@girth/sheet';
import { parseJob } from './job/schema.js';
import { planJob } from './job/run-job.js';
import { PRINT_PAPERS } from './print-options.js';
import { runCaptured } from './test-support/capture.js';
import { DEMO_JOB } from './test-support/paths.js';
import { makeTempDir, removeTempDir } from './test-support/temp-dir.js';

const squash = (s: string): string => s.replace(/\s+/g, ' ').trim();

let tmp = '';
beforeEach(() => {
  tmp = makeTempDir('pdf');
});
afterEach(() => {
  removeTempDir(tmp);
});

async function pageCount(pdf: Uint8Array): Promise<number> {
  return (await PDFDocument.load(pdf)).getPageCount();
}

describe('--pdf on a joint command', () => {
  it('--paper lists the papers of @girth/pdf', () => {
    expect(PRINT_PAPERS).toEqual(PAPER_NAMES);
  });

  it('writes every template of a tee in one PDF, each tiled as planTiles says, and qpdf passes', async () => {
    const file = join(tmp, 'tee.pdf');
    const run = await runCaptured(['branch', '--header', 'NPS 12 STD', '--branch', 'NPS 6 STD', '--pdf', file, '--paper', 'a4', '--job', 'J-5120', '--piece', 'SP-2']);
    expect(run.code, run.err).toBe(0);
    const pdf = new Uint8Array(readFileSync(file));
    expect(qpdfCheck(pdf)).toMatch(/No syntax or stream encoding errors found/);
    const json = await runCaptured(['branch', '--header', 'NPS 12 STD', '--branch', 'NPS 6 STD', '--json']);
    expect(json.code).toBe(0);
    // Two templates (branch-cut, header-hole), each as many pages as its tile plan.
    const { layoutBranch } = await import('@girth/unroll');
    const { resolvePipe } = await import('@girth/pipes');
    const layout = layoutBranch({ header: resolvePipe('NPS 12 STD'), branch: resolvePipe('NPS 6 STD') });
    const expected = layout.templates
      .map((t) => planSheet(t, { sheetUnits: 'in', job: 'J-5120', piece: 'SP-2' }).page)
      .reduce((n, p) => n + planTiles(p.widthMm, p.heightMm, { paper: 'a4' }).pageCount, 0);
    expect(await pageCount(pdf)).toBe(expected);
  }, 60_000);
});

describe('girth run --packet', () => {
  it('the cover holds the cut list as the summary prints it, then every piece its sheets and ordinate tables, in job order', async () => {
    const out = join(tmp, 'out');
    const run = await runCaptured(['run', DEMO_JOB, '--out', out, '--packet', '--paper', 'letter']);
    expect(run.code, run.err).toBe(0);
    const pdf = new Uint8Array(readFileSync(join(out, 'job-packet.pdf')));
    expect(qpdfCheck(pdf)).toMatch(/No syntax or stream encoding errors found/);
    const plan = planJob(parseJob(JSON.parse(readFileSync(DEMO_JOB, 'utf8'))), out);
    // The summary printed on standard output holds the same cut list.
    expect(run.out).toContain(plan.cutList);
    const texts = pageTexts(pdf).map(squash);
    expect(texts.length).toBe(await pageCount(pdf));
    const cover = texts[0]!;
    for (const line of plan.cutList.split('\n')) expect(cover).toContain(squash(line));
    expect(cover).toContain('CAUTION: verify against the actual pipe');
    let at = 1;
    plan.results.forEach(({ piece, result }, i) => {
      // Its sheets: each template's first page names the template's title and the piece.
      for (const t of result.templates) {
        const first = texts.findIndex((x, k) => k >= at && x.includes(squash(t.title)) && x.includes(piece));
        expect(first, `${piece} ${t.id}`).toBeGreaterThanOrEqual(at);
        at = first + 1;
      }
      const table = texts.findIndex((x, k) => k >= at && x.includes(`${piece}: ordinate tables`));
      expect(table, `${piece} ordinate tables`).toBeGreaterThanOrEqual(at);
      // The ordinate rows of the piece's report are on its table pages (station 1's row of each table).
      const rows = plan.reports[i]!.split('\n').filter((l) => /^\s*1\s+0\.0\s/.test(l));
      expect(rows.length, piece).toBeGreaterThan(0);
      const tablePages = texts.slice(table).join(' ');
      for (const row of rows) expect(tablePages).toContain(squash(row));
      at = table + 1;
    });
  }, 120_000);

  it('refuses printing options without --packet, and a packet overlap too large for the page, writing nothing', async () => {
    const out = join(tmp, 'out');
    const a = await runCaptured(['run', DEMO_JOB, '--out', out, '--paper', 'a4']);
    expect(a.code).toBe(2);
    expect(a.err).toContain('--paper: no PDF is written; give --packet too');
    const b = await runCaptured(['run', DEMO_JOB, '--out', out, '--packet', '--page-overlap', '5']);
    expect(b.code).toBe(2);
    expect(b.err).toMatch(/^girth: --page-overlap: /);
    expect(existsSync(out)).toBe(false);
  }, 60_000);
});
