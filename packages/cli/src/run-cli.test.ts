/**
 * The `girth` command run in-process: printed tables, the JSON contract
 * against the library, each joint's figures against published formulas, bad
 * input, refusing to overwrite, and the help examples.
 */
import { readFileSync, writeFileSync, mkdirSync, existsSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { MM_PER_INCH, resolvePipe } from '@girth/pipes';
import { toResultJson } from '@girth/table';
import { CAUTION } from '@girth/unroll';
import { describeResult } from '@girth/unroll';

/** How an inch job words its templates: feet-inch-sixteenths first (the CLI's default style). */
const INCH_WORDS = { units: 'in', lengthFormat: 'ft-in', fraction: 16 } as const;
import { GIRTH_VERSION } from './run-cli.js';
import { JOINTS } from './joints/registry.js';
import { runCaptured, runJson } from './test-support/capture.js';
import { expectClose } from './test-support/close.js';
import { exampleArgv, helpExampleLines } from './test-support/help-examples.js';
import { branchAsCli } from './test-support/as-cli.js';
import { leftoverTempFiles, listFiles, makeTempDir, removeTempDir } from './test-support/temp-dir.js';

const TEE = ['branch', '--header', 'NPS 12 STD', '--branch', 'NPS 6 STD'] as const;

// Pipe sizes, ASME B36.10M (recalled; REFERENCES.md): NPS 12 OD 12.750 in, STD
// wall .375; NPS 6 OD 6.625 in, STD wall .280; NPS 10 OD 10.750 in, STD .365.
const NPS12_OD_IN = 12.75;
const NPS6_OD_IN = 6.625;
const NPS6_STD_WALL_IN = 0.28;
const NPS10_OD_IN = 10.75;

/** JSON numbers are rounded to 1e-6 of their unit (RESULT_DECIMALS); a check against a closed form allows that. */
const JSON_TOL = 1e-6;

type Json = Record<string, unknown>;
interface StationRow {
  readonly n: number;
  readonly angleDeg: number;
  readonly [column: string]: number;
}

/** A station's value in one column; fails when the column is missing. */
function col(s: StationRow, key: string): number {
  const v = s[key];
  if (typeof v !== 'number') throw new Error(`station ${s.n} has no ${key}`);
  return v;
}
interface TemplateRow {
  readonly id: string;
  readonly title: string;
  readonly stretchOut?: number;
  readonly stations: readonly StationRow[];
}

function templates(json: Json): TemplateRow[] {
  return json.templates as TemplateRow[];
}

function template(json: Json, id: string): TemplateRow {
  const found = templates(json).find((t) => t.id === id);
  if (found === undefined) throw new Error(`no template ${id} in ${templates(json).map((t) => t.id).join(', ')}`);
  return found;
}

/** Every value in a JSON tree: no null (NaN and Infinity stringify to null) and every number finite. */
function expectAllFinite(value: unknown, path = '$'): void {
  expect(value, `${path} is null`).not.toBeNull();
  if (typeof value === 'number') expect(Number.isFinite(value), `${path} = ${value}`).toBe(true);
  else if (Array.isArray(value)) value.forEach((v, i) => expectAllFinite(v, `${path}[${i}]`));
  else if (typeof value === 'object' && value !== null) for (const [k, v] of Object.entries(value)) expectAllFinite(v, `${path}.${k}`);
}

let tmp = '';
beforeEach(() => {
  tmp = makeTempDir('run');
});
afterEach(() => {
  removeTempDir(tmp);
});

describe('a branch without outputs', () => {
  it('prints both ordinate tables and the caution, and exits 0', async () => {
    const run = await runCaptured([...TEE]);
    expect(run.code, run.err).toBe(0);
    expect(run.out).toContain('Branch cut: NPS 6 STD on NPS 12 STD');
    expect(run.out).toContain('Header hole: NPS 6 STD on NPS 12 STD');
    expect(run.out).toContain(CAUTION);
    // Two tables of 16 stations (16 equal stations of 22.5°: common practice).
    const rows = run.out.split('\n').filter((l) => /^\s+\d+\s+\d+\.\d\s/.test(l));
    expect(rows).toHaveLength(32);
    // The heel cutback of a set-on tee is the saddle depth R - sqrt(R² - r²),
    // r = branch ID / 2 (MathWorld, "Cylinder-Cylinder Intersection") = 0.767 in;
    // the field reads it to the nearest 1/16 in (common practice): 3/4".
    const first = rows[0]!.trim().split(/\s{2,}/);
    expect(first).toEqual(['1', '0.0', '0"', '3/4"']);
    expect(listFiles(tmp)).toEqual([]);
  });

  it('--decimal prints decimal inches and --units mm prints millimetres', async () => {
    const inches = await runCaptured([...TEE, '--decimal']);
    expect(inches.code, inches.err).toBe(0);
    expect(inches.out).toMatch(/^\s+1\s+0\.0\s+0\.000"?\s+0\.767"?\s*$/m);
    const mm = await runCaptured([...TEE, '--units', 'mm']);
    expect(mm.code, mm.err).toBe(0);
    // 0.767454 in × 25.4 = 19.49 mm
    expect(mm.out).toMatch(/^\s+1\s+0\.0\s+0(\.0+)?( ?mm)?\s+19\.[45]\d*( ?mm)?\s*$/m);
    expect(mm.out).toContain(CAUTION);
  });

  it('--version prints the version', async () => {
    const run = await runCaptured(['--version']);
    expect(run).toEqual({ code: 0, out: `${GIRTH_VERSION}\n`, err: '' });
  });
});

describe('--json is the library result contract', () => {
  it('a tee equals toResultJson(layoutBranch(spec)) from the same pipes, with the contract keys', async () => {
    const json = await runJson([...TEE]);
    const header = resolvePipe('NPS 12 STD', { unit: 'in' });
    const branch = resolvePipe('NPS 6 STD', { unit: 'in' });
    const library = toResultJson(branchAsCli({ header, branch, angleDeg: 90, offsetMm: 0, fit: 'set-on', gapMm: 0 }, 16, 'in'), { units: 'in' });
    expect(json).toEqual(JSON.parse(JSON.stringify(library)));
    expectAllFinite(json);

    // DESIGN.md contract keys.
    expect(json.kind).toBe('branch');
    expect(json.units).toBe('in');
    expect(Array.isArray(json.warnings)).toBe(true);
    expect(templates(json).map((t) => t.id)).toEqual(['branch-cut', 'header-hole']);
    const cut = template(json, 'branch-cut');
    expect(typeof cut.stretchOut).toBe('number');
    expect(cut.stations).toHaveLength(16);
    cut.stations.forEach((s, i) => {
      expect(s.n).toBe(i + 1);
      // Station n at phi = 360 (n - 1) / N (DESIGN.md).
      expectClose(s.angleDeg, (360 * i) / 16, 1e-9, `branch-cut station ${s.n} angleDeg`);
      expect(Object.keys(s)).toEqual(expect.arrayContaining(['n', 'angleDeg', 'girth', 'cutback']));
      // Girth is the arc on the branch OD: phi × OD / 2.
      expectClose(s.girth, ((s.angleDeg * Math.PI) / 180) * (NPS6_OD_IN / 2), JSON_TOL, `station ${s.n} girth`);
      expect(col(s, 'cutback')).toBeGreaterThanOrEqual(0);
    });
    const hole = template(json, 'header-hole');
    hole.stations.forEach((s) => expect(Object.keys(s)).toEqual(expect.arrayContaining(['n', 'angleDeg', 'girth', 'axial'])));

    // Stretch-out = pi × branch OD, NPS 6 OD 6.625 in (ASME B36.10M, recalled).
    expectClose(cut.stretchOut, Math.PI * NPS6_OD_IN, JSON_TOL, 'branch-cut stretchOut');

    // Saddle depth of a set-on tee: R - sqrt(R² - r²), R = header OD / 2, r = branch
    // ID / 2 (MathWorld, "Cylinder-Cylinder Intersection"); 16 stations include the
    // deepest (phi = 0) and the long point (phi = 90).
    const R = NPS12_OD_IN / 2;
    const r = (NPS6_OD_IN - 2 * NPS6_STD_WALL_IN) / 2;
    const cutbacks = cut.stations.map((s) => col(s, 'cutback'));
    expectClose(Math.max(...cutbacks) - Math.min(...cutbacks), R - Math.sqrt(R * R - r * r), JSON_TOL, 'saddle depth');

    // The hole (branch ID on header OD) reaches r either side along the header and
    // R asin(r / R) around it from the top line (same source, arc on the header OD).
    const axial = hole.stations.map((s) => col(s, 'axial'));
    expectClose(Math.max(...axial), r, JSON_TOL, 'hole half-length along the header');
    expectClose(Math.min(...axial), -r, JSON_TOL, 'hole half-length along the header (other side)');
    const girths = hole.stations.map((s) => col(s, 'girth'));
    expectClose(Math.max(...girths), R * Math.asin(r / R), JSON_TOL, 'hole half-width around the header');
  });

  it('an offset lateral with a gap, set-in, 24 stations equals the library for the same spec', async () => {
    const json = await runJson([...TEE, '--angle', '60', '--offset', '1', '--gap', '1/16', '--fit', 'set-in', '--stations', '24']);
    const header = resolvePipe('NPS 12 STD', { unit: 'in' });
    const branch = resolvePipe('NPS 6 STD', { unit: 'in' });
    const spec = { header, branch, angleDeg: 60, offsetMm: MM_PER_INCH, fit: 'set-in' as const, gapMm: MM_PER_INCH / 16 };
    expect(json).toEqual(JSON.parse(JSON.stringify(toResultJson(describeResult(branchAsCli(spec, 24, 'in'), INCH_WORDS), { units: 'in' }))));
    expect(template(json, 'branch-cut').stations).toHaveLength(24);
    // An offset branch falls outside B31.3 304.3.1(b): the library warns, and the JSON carries it.
    expect((json.warnings as { code: string }[]).length).toBeGreaterThan(0);
  });

  it('a negative offset may be written as the next word or joined with =', async () => {
    const spaced = await runJson([...TEE, '--offset', '-1']);
    const joined = await runJson([...TEE, '--offset=-1']);
    expect(spaced).toEqual(joined);
    const header = resolvePipe('NPS 12 STD', { unit: 'in' });
    const branch = resolvePipe('NPS 6 STD', { unit: 'in' });
    const library = toResultJson(describeResult(branchAsCli({ header, branch, offsetMm: -MM_PER_INCH }, 16, 'in'), INCH_WORDS), { units: 'in' });
    expect(joined).toEqual(JSON.parse(JSON.stringify(library)));
  });

  it('words titles and notes in the job unit: inch jobs inch first, mm jobs mm first', async () => {
    // 1 in = 25.4 mm exactly; the title states the offset (common practice: the job's unit first).
    const inch = await runJson([...TEE, '--offset', '1']);
    expect(template(inch, 'header-hole').title).toBe('Header hole: NPS 6 STD on NPS 12 STD, 90°, set-on, offset 1" (25.4 mm)');
    const decimal = await runJson([...TEE, '--offset', '1', '--decimal']);
    expect(template(decimal, 'header-hole').title).toBe('Header hole: NPS 6 STD on NPS 12 STD, 90°, set-on, offset 1.000" (25.4 mm)');
    const mm = await runJson([...TEE, '--offset', '25.4', '--units', 'mm']);
    expect(template(mm, 'header-hole').title).toBe('Header hole: NPS 6 STD on NPS 12 STD, 90°, set-on, offset 25.4 mm (1.000 in)');
  });

  it('a metric tee: stretch-out pi × DN 150 OD in mm', async () => {
    const json = await runJson(['branch', '--units', 'mm', '--header', 'DN 300 x 8', '--branch', 'DN 150 x 7.1']);
    expect(json.units).toBe('mm');
    // EN 10220 series 1: DN 150 OD 168.3 mm (recalled; REFERENCES.md).
    expectClose(template(json, 'branch-cut').stretchOut, Math.PI * 168.3, JSON_TOL, 'DN 150 stretch-out');
    const header = resolvePipe('DN 300 x 8', { unit: 'mm' });
    const branch = resolvePipe('DN 150 x 7.1', { unit: 'mm' });
    expect(json).toEqual(JSON.parse(JSON.stringify(toResultJson(branchAsCli({ header, branch }, 16, 'mm'), { units: 'mm' }))));
  });

  it('prints the caution on stderr, keeping stdout pure JSON', async () => {
    const run = await runCaptured([...TEE, '--json']);
    expect(run.code).toBe(0);
    expect(() => JSON.parse(run.out) as unknown).not.toThrow();
    expect(run.err).toContain(CAUTION);
  });
});

describe('miter --json', () => {
  /** Miter segment lengths (REFERENCES.md, miter formulas): middle piece 2 R tan c on the centreline, back 2 (R + D/2) tan c, throat 2 (R - D/2) tan c; end pieces half. */
  function expectPieces(json: Json, radius: number, od: number, cutDeg: number, label: string): void {
    const t = Math.tan((cutDeg * Math.PI) / 180);
    const pieces = json.pieces as { label: string; count: number; center: number; back: number; throat: number }[];
    const end = pieces.find((p) => /end/i.test(p.label));
    const middle = pieces.find((p) => /middle/i.test(p.label));
    if (end === undefined || middle === undefined) throw new Error(`${label}: pieces ${JSON.stringify(pieces)}`);
    expectClose(middle.center, 2 * radius * t, JSON_TOL, `${label} middle centre`);
    expectClose(middle.back, 2 * (radius + od / 2) * t, JSON_TOL, `${label} middle back`);
    expectClose(middle.throat, 2 * (radius - od / 2) * t, JSON_TOL, `${label} middle throat`);
    expectClose(end.center, radius * t, JSON_TOL, `${label} end centre`);
    expectClose(end.back, (radius + od / 2) * t, JSON_TOL, `${label} end back`);
    expectClose(end.throat, (radius - od / 2) * t, JSON_TOL, `${label} end throat`);
  }

  it('a 90° long-radius elbow in 3 welds: cut angle, pieces and ordinates in inches', async () => {
    const json = await runJson(['miter', '--pipe', 'NPS 10 STD', '--bend', '90', '--welds', '3', '--radius-nps', '1.5']);
    expectAllFinite(json);
    expect(json.kind).toBe('miter');
    // Cut angle = change of direction at a joint / 2 = bend / (2 × welds)
    // (ASME B31.3 para. 304.2.3, recalled; REFERENCES.md).
    expect(json.cutAngleDeg).toBeCloseTo(90 / (2 * 3), 12);
    // Long radius = 1.5 × NPS (ASME B16.9 centre-to-end, recalled): 15 in.
    expectClose(json.radius, 15, JSON_TOL, 'radius');
    expectPieces(json, 15, NPS10_OD_IN, 15, 'NPS 10');
    expect((json.pieces as { count: number }[]).map((p) => p.count).reduce((a, b) => a + b)).toBe(4);
    // Every wrap spans pi × OD; the ordinate of a plane cut is (D/2) tan c (1 - cos phi')
    // with phi' from the long point (REFERENCES.md) — phi' = phi - 180° here.
    const t = Math.tan(Math.PI / 12);
    for (const tpl of templates(json)) {
      expectClose(tpl.stretchOut, Math.PI * NPS10_OD_IN, JSON_TOL, `${tpl.id} stretch-out`);
      for (const s of tpl.stations) {
        const phi = ((s.angleDeg - 180) * Math.PI) / 180;
        expectClose(s.cutback, (NPS10_OD_IN / 2) * t * (1 - Math.cos(phi)), JSON_TOL, `${tpl.id} station ${s.n} cutback`);
      }
    }
  });

  it('the same elbow in millimetres, given as 4 pieces, has the same figures × 25.4', async () => {
    const json = await runJson(['miter', '--units', 'mm', '--pipe', 'NPS 10 STD', '--bend', '90', '--pieces', '4', '--radius-nps', '1.5']);
    expect(json.units).toBe('mm');
    expect(json.welds).toBe(3);
    expectPieces(json, 15 * MM_PER_INCH, NPS10_OD_IN * MM_PER_INCH, 15, 'NPS 10 mm');
  });

  it('the 45° three-piece elbow of the help, radius 36 in', async () => {
    const json = await runJson(['miter', '--pipe', 'NPS 24 STD', '--bend', '45', '--pieces', '3', '--radius', '36in']);
    expect(json.cutAngleDeg).toBeCloseTo(45 / (2 * 2), 12);
    // NPS 24 OD 24.000 in (ASME B36.10M, recalled).
    expectPieces(json, 36, 24, 11.25, 'NPS 24');
  });
});

describe('cutback --json', () => {
  it('the ordinates of a plane cut at 60° to the plane: (D/2) tan(30°) (1 - cos phi\')', async () => {
    const json = await runJson(['cutback', '--pipe', 'NPS 6 STD', '--angle', '60']);
    const t = Math.tan(Math.PI / 6);
    const [tpl] = templates(json);
    expectClose(tpl!.stretchOut, Math.PI * NPS6_OD_IN, JSON_TOL, 'stretch-out');
    for (const s of tpl!.stations) {
      const phi = ((s.angleDeg - 180) * Math.PI) / 180;
      // REFERENCES.md: ordinate of a plane cut, phi' from the long point.
      expectClose(s.cutback, (NPS6_OD_IN / 2) * t * (1 - Math.cos(phi)), JSON_TOL, `station ${s.n}`);
    }
  });
});

describe('reducer --json', () => {
  it('the published worked example: 8 in to 5 in, 4 in long, pattern radii 11.39 and 7.12 in, sweep 126.4°', async () => {
    // ceemrr.com, "Drawing Nets" (Geometry2/DrawingsNets6), via REFERENCES.md; the
    // example gives radii to 0.01 in and the sweep to 0.1°.
    const json = await runJson(['reducer', '--large', '8in', '--small', '5in', '--length', '4in', '--plate', '0']);
    expectAllFinite(json);
    expect(json.kind).toBe('reducer');
    const pattern = json.pattern as Record<string, number>;
    expectClose(pattern.outerRadius, 11.39, 0.005, 'outer radius');
    expectClose(pattern.innerRadius, 7.12, 0.005, 'inner radius');
    expectClose(pattern.sweepDeg, 126.4, 0.05, 'sweep');
    // The closed forms behind it (L. Longfield, Sheet Metal Drafting, 1921, via
    // REFERENCES.md): s = sqrt(L² + ((D - d)/2)²), radii D s/(D - d), d s/(D - d).
    const s = Math.hypot(4, 1.5);
    expectClose(pattern.slantHeight, s, JSON_TOL, 'slant height');
    expectClose(pattern.outerRadius, (8 * s) / 3, JSON_TOL, 'outer radius, closed form');
    expectClose(pattern.innerRadius, (5 * s) / 3, JSON_TOL, 'inner radius, closed form');
    expect(templates(json).map((t) => t.id)).toEqual(['cone-pattern']);
  });
});

describe('bad input: exit 2, the option named on stderr, nothing written', () => {
  const cases: readonly { readonly name: string; readonly argv: readonly string[]; readonly option: string }[] = [
    { name: 'an angle that is not a number', argv: [...TEE, '--angle', 'abc'], option: '--angle' },
    { name: 'an angle over 90°', argv: [...TEE, '--angle', '120'], option: '--angle' },
    { name: 'an offset past the side of the header', argv: [...TEE, '--offset', '5'], option: '--offset' },
    { name: 'an offset that divides by zero', argv: [...TEE, '--offset', '1/0'], option: '--offset' },
    { name: 'an unknown schedule', argv: ['branch', '--header', 'NPS 12 FOO', '--branch', 'NPS 6 STD'], option: '--header' },
    { name: 'a branch larger than the header', argv: ['branch', '--header', 'NPS 6 STD', '--branch', 'NPS 12 STD'], option: '--branch' },
    { name: 'zero welds', argv: ['miter', '--pipe', 'NPS 10 STD', '--bend', '90', '--welds', '0', '--radius-nps', '1.5'], option: '--welds' },
    { name: 'a fraction of a weld', argv: ['miter', '--pipe', 'NPS 10 STD', '--bend', '90', '--welds', '2.5', '--radius-nps', '1.5'], option: '--welds' },
    { name: 'one piece', argv: ['miter', '--pipe', 'NPS 10 STD', '--bend', '90', '--pieces', '1', '--radius-nps', '1.5'], option: '--pieces' },
    { name: 'a radius multiple too small', argv: ['miter', '--pipe', 'NPS 10 STD', '--bend', '90', '--welds', '2', '--radius-nps', '0.2'], option: '--radius-nps' },
    { name: 'a bend over 180°', argv: ['miter', '--pipe', 'NPS 10 STD', '--bend', '200', '--welds', '2', '--radius', '20'], option: '--bend' },
    { name: 'a cone that does not reduce', argv: ['reducer', '--large', '8in', '--small', '8in', '--length', '4', '--plate', '0'], option: '--small' },
    { name: 'segments that do not divide the stations', argv: ['reducer', '--large', '8in', '--small', '5in', '--length', '4', '--plate', '0', '--segments', '3'], option: '--segments' },
    { name: 'too few stations', argv: ['cutback', '--pipe', 'NPS 6 STD', '--angle', '60', '--stations', '3'], option: '--stations' },
    { name: 'an unknown unit', argv: ['cutback', '--pipe', 'NPS 6 STD', '--angle', '60', '--units', 'ft'], option: '--units' },
    { name: 'an unknown option', argv: [...TEE, '--bogus', '1'], option: '--bogus' },
    { name: 'a missing required option', argv: ['branch', '--header', 'NPS 12 STD'], option: '--branch' },
    { name: 'only one surface override', argv: [...TEE, '--branch-surface', 'inside'], option: '--header-surface' },
    { name: 'a label that starts with a dash, not joined', argv: [...TEE, '--job', '-x'], option: '--job' },
    { name: 'a lateral shallower than 1°', argv: [...TEE, '--angle', '1e-300'], option: '--angle' },
    { name: 'an option given twice', argv: [...TEE, '--angle', '45', '--angle', '90'], option: '--angle' },
    { name: 'a number written in hexadecimal', argv: [...TEE, '--stations', '0x10'], option: '--stations' },
    { name: 'a cut-back shallower than 1°', argv: ['cutback', '--pipe', 'NPS 6 STD', '--angle', '1e-300'], option: '--angle' },
    { name: 'an overflowing miter radius', argv: ['miter', '--pipe', 'NPS 10 STD', '--bend', '90', '--welds', '3', '--radius-nps', '1e308'], option: '--radius-nps' },
    { name: 'a miter radius beyond a kilometre', argv: ['miter', '--pipe', 'NPS 10 STD', '--bend', '90', '--welds', '3', '--radius', '2000000mm'], option: '--radius' },
  ];

  for (const c of cases) {
    it(c.name, async () => {
      const out = join(tmp, 'out');
      mkdirSync(out);
      const run = await runCaptured([...c.argv, '--svg', join(out, 't.svg'), '--dxf', join(out, 't.dxf'), '--csv', join(out, 't.csv')]);
      expect(run.code, run.err).toBe(2);
      expect(run.out).toBe('');
      expect(run.err.startsWith(`girth: ${c.option}`), run.err).toBe(true);
      expect(run.err).not.toMatch(/NaN|undefined/);
      expect(run.err.trimEnd().split('\n'), 'one line').toHaveLength(1);
      expect(listFiles(out)).toEqual([]);
    });
  }

  it('an unknown command names the commands', async () => {
    const run = await runCaptured(['wye']);
    expect(run.code).toBe(2);
    expect(run.err).toContain('unknown command "wye"');
  });

  it('a missing option value names the option', async () => {
    const run = await runCaptured([...TEE, '--svg']);
    expect(run.code).toBe(2);
    expect(run.err.startsWith('girth: --svg'), run.err).toBe(true);
  });
});

describe('pipe', () => {
  it('prints OD, wall and ID of a catalogue pipe with a caution', async () => {
    const run = await runCaptured(['pipe', 'NPS 6 STD']);
    expect(run.code, run.err).toBe(0);
    // ASME B36.10M (recalled): NPS 6 OD 6.625 in, STD wall 0.280 in, ID = OD - 2 wall = 6.065 in.
    expect(run.out).toMatch(/OD\s+168\.28 mm\s+6\.625 in/);
    expect(run.out).toMatch(/wall\s+7\.11 mm\s+0\.280 in/);
    expect(run.out).toMatch(/ID\s+154\.05 mm\s+6\.065 in/);
    expect(run.out).toContain('CAUTION');
  });

  it('refuses an unknown unit instead of falling back to mm', async () => {
    const run = await runCaptured(['pipe', '24 od x .375', '--units', 'ft']);
    expect(run.code).toBe(2);
    expect(run.err.startsWith('girth: --units'), run.err).toBe(true);
  });
});

describe('existing output files', () => {
  const CUT = ['cutback', '--pipe', 'NPS 6 STD', '--angle', '60'] as const;

  it('are kept without --force (exit 2, the file named) and replaced with it', async () => {
    const path = join(tmp, 'vent.svg');
    writeFileSync(path, 'keep me');
    const refused = await runCaptured([...CUT, '--svg', path]);
    expect(refused.code).toBe(2);
    expect(refused.err).toContain(path);
    expect(refused.err).toContain('--force');
    expect(readFileSync(path, 'utf8')).toBe('keep me');
    expect(leftoverTempFiles(tmp)).toEqual([]);

    const forced = await runCaptured([...CUT, '--svg', path, '--force']);
    expect(forced.code, forced.err).toBe(0);
    expect(readFileSync(path, 'utf8')).toMatch(/^<\?xml[\s\S]*<svg /);
    expect(forced.err).toContain(`wrote ${path}`);
    expect(forced.err).toContain(CAUTION);
    expect(listFiles(tmp)).toEqual(['vent.svg']);
  });

  it('one existing file stops every other output of the run', async () => {
    writeFileSync(join(tmp, 'tee.header-hole.dxf'), 'keep me');
    const run = await runCaptured([...TEE, '--svg', join(tmp, 'tee.svg'), '--dxf', join(tmp, 'tee.dxf'), '--csv', join(tmp, 'tee.csv')]);
    expect(run.code).toBe(2);
    expect(run.err).toContain(join(tmp, 'tee.header-hole.dxf'));
    expect(listFiles(tmp)).toEqual(['tee.header-hole.dxf']);
    expect(readFileSync(join(tmp, 'tee.header-hole.dxf'), 'utf8')).toBe('keep me');
  });

  it('two templates of a joint get their id before the extension', async () => {
    const run = await runCaptured([...TEE, '--svg', join(tmp, 'tee.svg'), '--csv', join(tmp, 'tee.csv')]);
    expect(run.code, run.err).toBe(0);
    expect(listFiles(tmp)).toEqual(['tee.branch-cut.csv', 'tee.branch-cut.svg', 'tee.header-hole.csv', 'tee.header-hole.svg']);
    expect(run.out).toBe('');
  });
});

describe('help', () => {
  const helps: readonly (readonly string[])[] = [['--help'], ...JOINTS.map((c) => [c.name, '--help']), ['run', '--help'], ['pipe', '--help']];

  for (const argv of helps) {
    it(`girth ${argv.join(' ')} exits 0 and every example line it shows runs`, async () => {
      const help = await runCaptured(argv);
      expect(help.code).toBe(0);
      expect(help.err).toBe('');
      const lines = helpExampleLines(help.out);
      expect(lines.length, `no example lines in:\n${help.out}`).toBeGreaterThan(0);
      expect(help.out).toContain('CAUTION');

      // Run in a temporary working folder so a path the rewrite missed still lands there.
      const cwd = process.cwd();
      const out = join(tmp, 'out');
      process.chdir(tmp);
      try {
        for (const line of lines) {
          const run = await runCaptured(exampleArgv(line, out));
          expect(run.code, `${line}\n${run.err}`).toBe(0);
        }
      } finally {
        process.chdir(cwd);
      }
      expect(listFiles(tmp).every((f) => f.startsWith('out/')), listFiles(tmp).join(', ')).toBe(true);
      expect(leftoverTempFiles(tmp)).toEqual([]);
    });
  }

  it('the examples that name an output file write it', async () => {
    const main = await runCaptured(['--help']);
    const lines = helpExampleLines(main.out);
    const withRun = lines.find((l) => l.startsWith('girth run '));
    expect(withRun).toBeDefined();
    const out = join(tmp, 'out');
    const run = await runCaptured(exampleArgv(withRun!, out));
    expect(run.code, run.err).toBe(0);
    expect(existsSync(out)).toBe(true);
    expect(listFiles(out)).toContain(join('demo-out', 'summary.txt'));
  });
});
