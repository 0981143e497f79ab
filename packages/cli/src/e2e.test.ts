/**
 * End to end: the built `girth` launcher run as a separate Node process, as a
 * fitter runs it. Needs `pnpm run build` first (it runs packages/cli/dist).
 */
import { spawnSync } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CAUTION } from '@girth/unroll';
import { expectClose } from './test-support/close.js';
import { BIN_PATH, DEMO_JOB } from './test-support/paths.js';
import { closedPolylines, extents, readDxf, readSvgSheet, svgText } from './test-support/read-back.js';
import { leftoverTempFiles, listFiles, makeTempDir, removeTempDir, snapshotDir } from './test-support/temp-dir.js';
import { requireBuild } from './test-support/require-build.js';

interface Spawned {
  readonly code: number | null;
  readonly out: string;
  readonly err: string;
}

/** Runs the launcher with `args` in `cwd`. */
function girth(args: readonly string[], cwd: string): Spawned {
  const run = spawnSync(process.execPath, [BIN_PATH, ...args], { cwd, encoding: 'utf8', timeout: 60_000 });
  if (run.error !== undefined) throw run.error;
  return { code: run.status, out: run.stdout, err: run.stderr };
}


// What the demo job's templates must be, from its pieces (fixtures/demo/job.json)
// and the pipe ODs of ASME B36.10M (recalled): a wrap spans pi × the OD it wraps
// on; a hole and a cone pattern are one closed contour.
const OD_IN = { nps2: 2.375, nps6: 6.625, nps8: 8.625, nps10: 10.75 } as const;
// A middle miter piece is cut at both ends: two cut lines.
const DEMO_TEMPLATES: Readonly<Record<string, { readonly wrapOdIn?: number; readonly cutLines?: number }>> = {
  'fg-12-w-104-sp-03-tee.branch-cut': { wrapOdIn: OD_IN.nps6, cutLines: 1 },
  'fg-12-w-104-sp-03-tee.header-hole': {},
  'fg-12-w-104-sp-04-lateral.branch-cut': { wrapOdIn: OD_IN.nps8, cutLines: 1 },
  'fg-12-w-104-sp-04-lateral.header-hole': {},
  'fg-8-d-211-sp-01-offset-drain.branch-cut': { wrapOdIn: OD_IN.nps2, cutLines: 1 },
  'fg-8-d-211-sp-01-offset-drain.header-hole': {},
  'fg-10-w-118-sp-02-elbow.miter-end': { wrapOdIn: OD_IN.nps10, cutLines: 1 },
  'fg-10-w-118-sp-02-elbow.miter-middle': { wrapOdIn: OD_IN.nps10, cutLines: 2 },
  'fg-6-v-090-sp-01-vent-cut-back': { wrapOdIn: OD_IN.nps6, cutLines: 1 },
  'fg-12x8-r-007-reducer': {},
};
/** DXF lengths have 6 decimals of the unit (packages/dxf README). */
const DXF_TOL_IN = 2e-6;

let tmp = '';
let out = '';
let first: Spawned = { code: null, out: '', err: '' };

beforeAll(() => {
  requireBuild();
  tmp = makeTempDir('e2e');
  out = join(tmp, 'demo-out');
  first = girth(['run', DEMO_JOB, '--out', out], tmp);
});
afterAll(() => {
  if (tmp !== '') removeTempDir(tmp);
});

describe('girth run on the demo job', () => {
  it('exits 0, prints the summary and writes every template as SVG, DXF and CSV, plus summary.txt', () => {
    expect(first.code, first.err).toBe(0);
    expect(first.err).toContain(`wrote 31 files to ${out}`);
    const expected = Object.keys(DEMO_TEMPLATES).flatMap((stem) => ['csv', 'dxf', 'svg'].map((ext) => `${stem}.${ext}`));
    expect(listFiles(out)).toEqual([...expected, 'summary.txt', '.girth-set'].sort());
    expect(leftoverTempFiles(tmp)).toEqual([]);
    expect(listFiles(tmp).every((f) => f.startsWith('demo-out/'))).toBe(true);
  });

  it('summary.txt is what was printed, names every piece of the job, and ends with the caution', () => {
    const summary = readFileSync(join(out, 'summary.txt'), 'utf8');
    expect(summary).toBe(first.out);
    const job = JSON.parse(readFileSync(DEMO_JOB, 'utf8')) as { job: string; pieces: { piece: string }[] };
    expect(summary.startsWith(job.job)).toBe(true);
    for (const { piece } of job.pieces) {
      expect(summary.split('\n').some((l) => l.startsWith(piece)), `summary row for ${piece}`).toBe(true);
      expect(summary).toContain(`== ${piece} ==`);
    }
    expect(summary.trimEnd().endsWith(CAUTION)).toBe(true);
  });

  it('every SVG parses with svgson, sized in inches (the job\'s unit) equal to its viewBox, with a caution', () => {
    const svgs = listFiles(out).filter((f) => f.endsWith('.svg'));
    expect(svgs).toHaveLength(10);
    for (const f of svgs) {
      const sheet = readSvgSheet(readFileSync(join(out, f), 'utf8'));
      expect(sheet.unit, f).toBe('in');
      expect(sheet.viewBox, f).toEqual([0, 0, sheet.width, sheet.height]);
      expect(sheet.width, f).toBeGreaterThan(0);
      expect(svgText(sheet.root), f).toMatch(/CAUTION/i);
      const wrapOdIn = DEMO_TEMPLATES[f.replace(/\.svg$/, '')]?.wrapOdIn;
      if (wrapOdIn !== undefined) expect(sheet.width, `${f} holds the stretch-out`).toBeGreaterThan(Math.PI * wrapOdIn);
    }
  });

  it('every DXF parses with dxf-parser: CUT, MARK and TEXT layers, $INSUNITS inches, the cut closed or closing around the pipe', () => {
    const dxfs = listFiles(out).filter((f) => f.endsWith('.dxf'));
    expect(dxfs).toHaveLength(10);
    for (const f of dxfs) {
      const dxf = readDxf(readFileSync(join(out, f), 'utf8'));
      const layers = Object.keys((dxf.tables as { layer: { layers: Record<string, unknown> } }).layer.layers);
      expect(layers, f).toEqual(expect.arrayContaining(['CUT', 'MARK', 'TEXT']));
      // $INSUNITS 1 = inches (DXF reference, recalled).
      expect((dxf.header as Record<string, unknown>)['$INSUNITS'], f).toBe(1);
      const texts = dxf.entities.filter((e) => e.layer === 'TEXT').map((e) => (e as unknown as { text: string }).text);
      expect(texts.some((t) => /caution/i.test(t)), `${f} caution`).toBe(true);

      const expected = DEMO_TEMPLATES[f.replace(/\.dxf$/, '')];
      if (expected === undefined) throw new Error(`unexpected file ${f}`);
      const closed = closedPolylines(dxf).filter((p) => p.layer === 'CUT');
      if (expected.wrapOdIn === undefined) {
        expect(closed.length, `${f}: closed cut contour`).toBeGreaterThanOrEqual(1);
      } else {
        // A wrap's cut line runs once around the girth, pi × OD from end to end, its
        // two ends at one height so the line closes on itself when wrapped on the pipe.
        const cuts = dxf.entities.filter((e) => e.layer === 'CUT') as unknown as { vertices?: { x: number; y: number }[] }[];
        expect(cuts.length, `${f}: cut lines`).toBe(expected.cutLines);
        cuts.forEach((cut, i) => {
          const v = cut.vertices ?? [];
          expect(v.length, `${f} cut ${i} vertices`).toBeGreaterThan(2);
          const a = v[0]!;
          const b = v[v.length - 1]!;
          expectClose(extents(v).dx, Math.PI * expected.wrapOdIn!, DXF_TOL_IN, `${f} cut ${i} stretch-out`);
          expectClose(Math.abs(b.x - a.x), Math.PI * expected.wrapOdIn!, DXF_TOL_IN, `${f} cut ${i} ends one girth apart`);
          expectClose(b.y, a.y, DXF_TOL_IN, `${f} cut ${i} ends at one height`);
        });
      }
    }
  });

  it('a second run without --force exits 2 and changes nothing; with --force it exits 0 and writes the same files', () => {
    const before = snapshotDir(out);
    const again = girth(['run', DEMO_JOB, '--out', out], tmp);
    expect(again.code).toBe(2);
    expect(again.out).toBe('');
    expect(again.err).toContain('already holds files');
    expect(again.err).toContain('--force');
    expect(snapshotDir(out)).toEqual(before);

    const forced = girth(['run', DEMO_JOB, '--out', out, '--force'], tmp);
    expect(forced.code, forced.err).toBe(0);
    const after = snapshotDir(out);
    expect([...after.keys()]).toEqual([...before.keys()]);
    for (const [f, state] of after) expect(state.content, `${f} is the same layout again`).toBe(before.get(f)!.content);
    expect(leftoverTempFiles(tmp)).toEqual([]);
  });
});

describe('girth exit codes', () => {
  it('a bad job field exits 2, names it, and writes nothing', () => {
    const dir = makeTempDir('e2e-bad');
    try {
      const job = JSON.parse(readFileSync(DEMO_JOB, 'utf8')) as { pieces: Record<string, unknown>[] };
      job.pieces[1]!.header = 'NPS 12 FOO';
      writeFileSync(join(dir, 'job.json'), JSON.stringify(job));
      const run = girth(['run', 'job.json', '--out', 'out'], dir);
      expect(run.code).toBe(2);
      expect(run.err).toContain('pieces[1].header');
      expect(listFiles(dir)).toEqual(['job.json']);
    } finally {
      removeTempDir(dir);
    }
  });

  it('a bad option exits 2 naming it, a table exits 0 with the caution, --help exits 0', () => {
    const dir = makeTempDir('e2e-opt');
    try {
      const bad = girth(['branch', '--header', 'NPS 12 STD', '--branch', 'NPS 6 STD', '--angle', 'abc', '--svg', 't.svg'], dir);
      expect(bad.code).toBe(2);
      expect(bad.err).toContain('--angle');
      expect(bad.out).toBe('');
      const table = girth(['cutback', '--pipe', 'NPS 6 STD', '--angle', '60'], dir);
      expect(table.code, table.err).toBe(0);
      expect(table.out).toContain(CAUTION);
      const help = girth(['--help'], dir);
      expect(help.code).toBe(0);
      expect(help.out).toContain('Usage: girth');
      expect(listFiles(dir)).toEqual([]);
    } finally {
      removeTempDir(dir);
    }
  });
});
