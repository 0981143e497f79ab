/**
 * A whole job: the demo job planned in memory, the same layouts as the
 * library gives for the same pieces, file names, the summary, and `girth run`
 * refusing bad jobs without writing anything.
 */
import { mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { GirthError, MM_PER_INCH, resolvePipe } from '@girth/pipes';
import { toResultJson } from '@girth/table';
import { CAUTION } from '@girth/unroll';
import { branchAsCli } from '../test-support/as-cli.js';
import { parseJob } from './schema.js';
import { pieceStem, planJob } from './run-job.js';
import { runCaptured } from '../test-support/capture.js';
import { DEMO_JOB } from '../test-support/paths.js';
import { readDxf } from '../test-support/read-back.js';
import { leftoverTempFiles, listFiles, makeTempDir, removeTempDir, snapshotDir } from '../test-support/temp-dir.js';

type JobData = Record<string, unknown> & { pieces: Record<string, unknown>[] };

function demo(): JobData {
  return JSON.parse(readFileSync(DEMO_JOB, 'utf8')) as JobData;
}

/** The demo job with one field of one piece replaced. */
function withPiece(i: number, change: Record<string, unknown>): JobData {
  const j = demo();
  return { ...j, pieces: j.pieces.map((p, k) => (k === i ? { ...p, ...change } : p)) };
}

function planError(data: unknown): GirthError {
  try {
    planJob(parseJob(data), '/nowhere');
  } catch (error) {
    expect(error).toBeInstanceOf(GirthError);
    return error as GirthError;
  }
  throw new Error('planJob accepted it');
}

let tmp = '';
beforeEach(() => {
  tmp = makeTempDir('job');
});
afterEach(() => {
  removeTempDir(tmp);
});

describe('planJob on the demo job', () => {
  const plan = planJob(parseJob(demo()), 'out');

  it('plans SVG, DXF and CSV for every template of every piece, and one summary', () => {
    const expected: string[] = ['summary.txt'];
    for (const { piece, result } of plan.results) {
      const stem = pieceStem(piece);
      const ids = result.templates.map((t) => t.id);
      for (const ext of ['svg', 'dxf', 'csv']) {
        for (const id of ids) expected.push(ids.length === 1 ? `${stem}.${ext}` : `${stem}.${id}.${ext}`);
      }
    }
    expect(plan.files.map((f) => f.path).sort()).toEqual(expected.map((f) => join('out', f)).sort());
    // 3 branches × 2 templates, a miter with end and middle wraps, a cut-back, a cone: 10 templates × 3 + summary.
    expect(plan.files).toHaveLength(31);
    for (const f of plan.files) expect(f.content.length, f.path).toBeGreaterThan(0);
  });

  it('lays out the tee exactly as the library does for the same pipes', () => {
    const header = resolvePipe('NPS 12 STD', { unit: 'in' });
    const branch = resolvePipe('NPS 6 STD', { unit: 'in' });
    const library = branchAsCli({ header, branch, angleDeg: 90, fit: 'set-on' }, 16, 'in');
    expect(toResultJson(plan.results[0]!.result, { units: 'in' })).toEqual(toResultJson(library, { units: 'in' }));
  });

  it('reads the lateral\'s gap "1/16\\"" as 1/16 in', () => {
    const lateral = plan.results[1]!.result as unknown as { gapMm: number };
    expect(lateral.gapMm).toBeCloseTo(MM_PER_INCH / 16, 12);
  });

  it('the summary lists every piece, its joint and templates, every table, and the caution', () => {
    const lines = plan.summary.split('\n');
    expect(lines[0]).toBe(demo().job);
    for (const { piece, result } of plan.results) {
      expect(lines.some((l) => l.startsWith(piece) && l.includes(result.kind) && l.includes(result.templates.map((t) => t.id).join(', '))), piece).toBe(true);
      expect(plan.summary).toContain(`== ${piece} ==`);
    }
    expect(plan.summary.trimEnd().endsWith(CAUTION)).toBe(true);
    const summaryFile = plan.files.find((f) => f.path === join('out', 'summary.txt'));
    expect(summaryFile?.content).toBe(plan.summary);
  });
});

describe('planJob options', () => {
  it('outputs narrows the files', () => {
    const plan = planJob(parseJob({ ...demo(), outputs: ['dxf'] }), 'o');
    expect(plan.files.filter((f) => !f.path.endsWith('.dxf')).map((f) => f.path)).toEqual([join('o', 'summary.txt')]);
    expect(plan.files).toHaveLength(11);
  });

  it('a piece\'s stations override the job\'s', () => {
    const plan = planJob(parseJob(withPiece(4, { stations: 24 })), 'o');
    expect(plan.results[4]!.result.templates[0]!.stations).toHaveLength(24);
    expect(plan.results[0]!.result.templates[0]!.stations).toHaveLength(16);
  });

  it('a job in mm writes DXF in millimetres ($INSUNITS 4) and one in inches in inches ($INSUNITS 1)', () => {
    // DXF reference, header variable $INSUNITS: 1 = inches, 4 = millimetres (recalled).
    const inch = planJob(parseJob({ ...demo(), outputs: ['dxf'] }), 'o');
    const mm = planJob(parseJob({ ...demo(), units: 'mm', outputs: ['dxf'] }), 'o');
    const insunits = (content: string): unknown => (readDxf(content).header as Record<string, unknown>)['$INSUNITS'];
    expect(insunits(inch.files[0]!.content)).toBe(1);
    expect(insunits(mm.files[0]!.content)).toBe(4);
  });

  it('decimal inches in the summary', () => {
    const plan = planJob(parseJob({ ...demo(), decimal: true }), 'o');
    expect(plan.summary).toMatch(/OD 12\.750"/);
  });
});

describe('planJob errors name the piece and field', () => {
  const cases: readonly { readonly name: string; readonly data: () => unknown; readonly field: string }[] = [
    { name: 'an unknown schedule', data: () => withPiece(1, { header: 'NPS 12 FOO' }), field: 'pieces[1].header' },
    { name: 'zero welds', data: () => withPiece(3, { welds: 0 }), field: 'pieces[3].welds' },
    { name: 'a radius multiple too small', data: () => withPiece(3, { radiusNps: 0.2 }), field: 'pieces[3].radiusNps' },
    { name: 'an offset that divides by zero', data: () => withPiece(2, { offset: '2 1/0' }), field: 'pieces[2].offset' },
    { name: 'an offset past the header', data: () => withPiece(2, { offset: 10 }), field: 'pieces[2].offset' },
    { name: 'an angle of 120°', data: () => withPiece(0, { angle: 120 }), field: 'pieces[0].angle' },
    { name: 'a plate too thick', data: () => withPiece(5, { plate: 5 }), field: 'pieces[5].plate' },
    { name: 'two labels giving one file name', data: () => withPiece(2, { piece: 'fg-12-w-104 sp-03 TEE!' }), field: 'pieces[2].piece' },
  ];
  for (const c of cases) {
    it(`${c.name}: ${c.field}`, () => {
      const error = planError(c.data());
      expect(error.field).toBe(c.field);
      expect(error.message.startsWith(`${c.field}: `), error.message).toBe(true);
    });
  }
});

describe('girth run', () => {
  /** Writes `data` as a job file in the temp dir. */
  function jobFile(data: unknown, name = 'job.json'): string {
    const path = join(tmp, name);
    writeFileSync(path, typeof data === 'string' ? data : JSON.stringify(data, null, 2));
    return path;
  }

  const bad: readonly { readonly name: string; readonly text: () => unknown; readonly names: string }[] = [
    { name: 'an unknown schedule', text: () => withPiece(1, { header: 'NPS 12 FOO' }), names: 'pieces[1].header' },
    { name: 'a missing units', text: () => ({ ...demo(), units: undefined }), names: 'units' },
    { name: 'an unknown key', text: () => withPiece(2, { colour: 'red' }), names: 'pieces[2].colour' },
    { name: 'zero welds', text: () => withPiece(3, { welds: 0 }), names: 'pieces[3].welds' },
    { name: 'invalid JSON', text: () => '{"job": "x", ', names: 'job.json: not valid JSON' },
  ];
  for (const c of bad) {
    it(`a job with ${c.name} exits 2 naming ${c.names} and writes nothing`, async () => {
      const out = join(tmp, 'out');
      const run = await runCaptured(['run', jobFile(c.text()), '--out', out]);
      expect(run.code).toBe(2);
      expect(run.out).toBe('');
      expect(run.err).toContain(c.names);
      expect(listFiles(tmp)).toEqual(['job.json']);
    });
  }

  it('a missing job file or --out exits 2', async () => {
    const missing = await runCaptured(['run', join(tmp, 'none.json'), '--out', join(tmp, 'out')]);
    expect(missing.code).toBe(2);
    expect(missing.err).toContain(`job: cannot read ${join(tmp, 'none.json')}: no such file or folder`);
    const noOut = await runCaptured(['run', DEMO_JOB]);
    expect(noOut.code).toBe(2);
    expect(noOut.err).toContain('--out');
    expect(listFiles(tmp)).toEqual([]);
  });

  it('writes the demo job, then keeps it without --force and replaces it with --force', async () => {
    const out = join(tmp, 'out');
    const first = await runCaptured(['run', DEMO_JOB, '--out', out]);
    expect(first.code, first.err).toBe(0);
    expect(first.err).toContain(`wrote 31 files to ${out}`);
    // The 31 planned files and the marker that makes the folder one set.
    expect(listFiles(out)).toHaveLength(32);
    expect(listFiles(out)).toContain('.girth-set');
    expect(readFileSync(join(out, 'summary.txt'), 'utf8')).toBe(first.out);
    const before = snapshotDir(out);

    const again = await runCaptured(['run', DEMO_JOB, '--out', out]);
    expect(again.code).toBe(2);
    expect(again.err).toContain('already holds files; use --force');
    expect(snapshotDir(out)).toEqual(before);

    // One file removed: still nothing written while any other exists.
    const gone = listFiles(out)[0]!;
    rmSync(join(out, gone));
    const partial = await runCaptured(['run', DEMO_JOB, '--out', out]);
    expect(partial.code).toBe(2);
    expect(listFiles(out)).not.toContain(gone);

    const forced = await runCaptured(['run', DEMO_JOB, '--out', out, '--force']);
    expect(forced.code, forced.err).toBe(0);
    expect(listFiles(out)).toHaveLength(32);
    expect(listFiles(out)).toContain(gone);
    expect(leftoverTempFiles(tmp)).toEqual([]);
  });

  it('an --out that is a file exits 2 and writes nothing', async () => {
    const out = join(tmp, 'out');
    writeFileSync(out, 'a file');
    const run = await runCaptured(['run', DEMO_JOB, '--out', out]);
    expect(run.code).toBe(2);
    expect(listFiles(tmp)).toEqual(['out']);
  });

  it('takes one job file at a time', async () => {
    mkdirSync(join(tmp, 'out'));
    const run = await runCaptured(['run', DEMO_JOB, DEMO_JOB, '--out', join(tmp, 'out')]);
    expect(run.code).toBe(2);
    expect(listFiles(tmp)).toEqual([]);
  });
});

describe('pieceStem', () => {
  it('makes a plain lower-case file name from a label', () => {
    expect(pieceStem('FG-12-W-104 SP-03 tee')).toBe('fg-12-w-104-sp-03-tee');
    expect(pieceStem('  R-007 / 12"x8" reducer ')).toBe('r-007-12-x8-reducer');
    expect(pieceStem('Düse')).toBe('duse');
    expect(pieceStem('***')).toBe('piece');
    expect(pieceStem('a'.repeat(300))).toHaveLength(80);
  });
});
