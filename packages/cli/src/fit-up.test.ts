/**
 * The fit-up through the command line's outputs (JSON and the printed table),
 * checked against outside values: the two ordinate references add up to the
 * full depth on every joint kind, the 90° tee's saddle depth, header marks
 * against the hole template, the angle checks, and the miter's weld lines.
 * JSON numbers are rounded to 1e-6 of their unit (RESULT_DECIMALS), so checks
 * allow 2e-6 in; the library's own tests hold the same checks to 1e-9.
 */
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { runCaptured, runJson } from './test-support/capture.js';
import { makeTempDir, removeTempDir } from './test-support/temp-dir.js';

const TOL = 2e-6;
const TEE = ['branch', '--header', 'NPS 12 STD', '--branch', 'NPS 6 STD'];
// ASME B36.10M (recalled; REFERENCES.md): NPS 12 OD 12.750 in; NPS 6 OD 6.625 in, STD wall 0.280 in.
const R_IN = 12.75 / 2;
const r_IN = (6.625 - 2 * 0.28) / 2;

type Row = Record<string, number>;
interface Column { key: string; cutbackKey: string; fullDepth: number; stockPastShortPoint: number }
interface TemplateJson { id: string; stations: Row[]; ordinates?: { reference: string; columns: Column[] } }
type Json = { templates: TemplateJson[]; ordinatesFrom?: string; fitUp?: Record<string, any>; [k: string]: unknown };

const json = async (argv: readonly string[]): Promise<Json> => (await runJson(argv)) as Json;
const near = (a: number, b: number, tol = TOL): void => expect(Math.abs(a - b), `${a} vs ${b}`).toBeLessThanOrEqual(tol);

/** Every station of every cut column: long-point reading + short-point reading = the column's full depth. */
async function expectReferencesAddUp(argv: readonly string[]): Promise<void> {
  const long = await json([...argv, '--ordinates-from', 'long-point']);
  const short = await json([...argv, '--ordinates-from', 'short-point']);
  expect(long.ordinatesFrom).toBe('long-point');
  expect(short.ordinatesFrom).toBe('short-point');
  let columns = 0;
  short.templates.forEach((t, i) => {
    for (const c of t.ordinates?.columns ?? []) {
      columns++;
      expect(t.ordinates!.reference).toBe('short-point');
      // From the short point, the stock to leave past its line is the full depth.
      near(c.stockPastShortPoint, c.fullDepth);
      t.stations.forEach((row, k) => near(row[c.key]! + long.templates[i]!.stations[k]![c.cutbackKey]!, c.fullDepth, 2 * TOL));
    }
  });
  expect(columns).toBeGreaterThan(0);
}

describe('ordinates from either square line, through --json', () => {
  it('add up to the full depth at every station, on every joint kind (property over random joints)', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.oneof(
          fc.record({ angle: fc.integer({ min: 30, max: 90 }), offset: fc.constantFrom('0', '1', '-2') }).map((j) => [...TEE, '--angle', String(j.angle), '--offset', j.offset]),
          fc.record({ bend: fc.integer({ min: 20, max: 170 }), welds: fc.integer({ min: 1, max: 5 }) }).map((m) => ['miter', '--pipe', 'NPS 10 STD', '--bend', String(m.bend), '--welds', String(m.welds), '--radius-nps', '1.5']),
          fc.integer({ min: 10, max: 89 }).map((a) => ['cutback', '--pipe', 'NPS 6 STD', '--angle', String(a)]),
        ),
        async (argv) => expectReferencesAddUp(argv),
      ),
      { numRuns: 18, seed: 18 },
    );
  });

  it('a 90° tee: short-point ordinate at the sides and long-point cutback at the crown are the saddle depth R − sqrt(R² − r²)', async () => {
    // MathWorld, "Cylinder-Cylinder Intersection": saddle depth R − sqrt(R² − r²); set-on, r = branch ID / 2 (common practice).
    const saddle = R_IN - Math.sqrt(R_IN * R_IN - r_IN * r_IN);
    const short = (await json([...TEE, '--ordinates-from', 'short-point'])).templates[0]!;
    const long = (await json(TEE)).templates[0]!;
    // 16 stations: 5 and 13 are the sides (90°, 270°), 1 and 9 the crown (0°, 180°).
    for (const n of [5, 13]) near(short.stations[n - 1]!.ordinate!, saddle);
    for (const n of [1, 9]) near(long.stations[n - 1]!.cutback!, saddle);
    near(short.ordinates!.columns[0]!.fullDepth, saddle);
  });
});

describe('fit-up dimensions, through --json', () => {
  it('header marks are the hole template\'s axial extents at its heel and toe stations, measured from the crossing', async () => {
    for (const extra of [[], ['--angle', '45'], ['--angle', '60', '--offset', '1 1/2']]) {
      const out = await json([...TEE, ...extra]);
      const hole = out.templates.find((t) => t.id === 'header-hole')!;
      const fit = out.fitUp!;
      expect(fit.kind).toBe('branch-fit-up');
      expect(fit.markLine).toBe(extra.includes('--offset') ? 'offset-line' : 'top-line');
      // Station 1 is the heel, station 9 (180°) the toe of 16.
      near(fit.hole.heel.axial, hole.stations[0]!.axial!);
      near(fit.hole.toe.axial, hole.stations[8]!.axial!);
      near(fit.hole.heel.fromCentre, fit.centre.axial - fit.hole.heel.axial);
      near(fit.hole.toe.fromCentre, fit.hole.toe.axial - fit.centre.axial);
      // The weld (branch OD) lies outside the hole (branch ID): farther from the crossing at both ends.
      expect(fit.weld.heel.fromCentre).toBeGreaterThan(fit.hole.heel.fromCentre);
      expect(fit.weld.toe.fromCentre).toBeGreaterThan(fit.hole.toe.fromCentre);
      if (extra.includes('--offset')) {
        near(fit.offset.offset, 1.5);
        // The offset line lies R asin(e / R) round the header OD from the top line (arc on a circle, common practice).
        near(fit.offset.girthFromTopLine, R_IN * Math.asin(1.5 / R_IN));
      }
    }
  });

  it('angle checks: rise = run tan A, chord = 2 L sin(A/2), and 57.3 in of radius give 1 in of arc per degree', async () => {
    const check = (await json([...TEE, '--angle', '50', '--check-run', '24', '--check-radius', '18'])).fitUp!.angleCheck;
    const a = (50 * Math.PI) / 180;
    near(check.run, 24);
    near(check.rise, 24 * Math.tan(a));
    near(check.chord, 2 * 18 * Math.sin(a / 2));
    // 180/π ≈ 57.3 units of radius: one unit of arc per degree (common practice).
    near(check.arcRadius, 180 / Math.PI);
    near(check.arcLength, 50);
    const mm = (await json(['cutback', '--units', 'mm', '--pipe', 'DN 150 x 7.1', '--angle', '30'])).fitUp!.angleCheck;
    // Metric jobs: a 573 mm radius, 10 mm of arc per degree; run and radius 300 mm.
    near(mm.arcRadius, 1800 / Math.PI);
    near(mm.arcLength, 300);
    near(mm.rise, 300 * Math.tan(Math.PI / 6));
  });

  it('miter: the weld lines fall where the pieces end, and the pieces sum to the stock length; centre to face R tan(B/2) + tangent', async () => {
    for (const [bend, welds, tangent] of [[90, 3, 0], [45, 2, 4], [60, 1, 2]] as const) {
      const out = await json(['miter', '--pipe', 'NPS 10 STD', '--bend', String(bend), '--welds', String(welds), '--radius-nps', '1.5', '--tangent', String(tangent)]);
      const fit = out.fitUp!;
      const stock = out.stockLength as number;
      near(fit.stockLength, stock);
      // Pieces in elbow order: end, (welds − 1) middles, end; each weld at the running sum of their centreline lengths.
      const pieces = out.pieces as { count: number; center: number; templateId: string }[];
      const end = pieces.find((p) => p.templateId === 'miter-end')!.center;
      const middle = pieces.find((p) => p.templateId === 'miter-middle')?.center ?? 0;
      const lengths = [end, ...Array.from({ length: welds - 1 }, () => middle), end];
      near(lengths.reduce((s, l) => s + l, 0), stock, 1e-5);
      fit.weldLines.forEach((w: { fromStart: number; fromEnd: number }, k: number) => {
        near(w.fromStart, lengths.slice(0, k + 1).reduce((s, l) => s + l, 0), 1e-5);
        near(w.fromStart + w.fromEnd, stock);
      });
      // Centre to face of a bend B on radius R: R tan(B/2), plus the tangent (common practice; from the bend geometry).
      near(fit.centreToFace, 15 * Math.tan((bend * Math.PI) / 360) + tangent, 1e-5);
      for (const j of fit.joints) near(j.deflectionDeg, bend / welds);
    }
  });
});

describe('the printed table', () => {
  it('names the square line in the heading, states the depth and the stock past the short point, and prints the fit-up', async () => {
    const run = await runCaptured([...TEE, '--ordinates-from', 'short-point']);
    expect(run.code).toBe(0);
    expect(run.out).toContain('Ordinate, from the square line through the short point');
    expect(run.out).toMatch(/Ordinates measured from the square line through the short point; full depth of the cut 3\/4" .*leave at least 3\/4" of pipe past the short-point line/);
    expect(run.out).toContain('Fit-up:');
    // Branch ID / 2 = 3.0325 in to the hole's heel and toe of a 90° tee, to the nearest 1/16 (ASME B36.10M sizes, recalled).
    expect(run.out).toContain('hole heel 3 1/16" toward the heel end, hole toe 3 1/16" toward the toe end');
    const long = await runCaptured(TEE);
    expect(long.out).toContain('Cutback, from the square line through the long point');
  });

  it('a metric job prints its fit-up in millimetres', async () => {
    const run = await runCaptured(['miter', '--units', 'mm', '--pipe', 'DN 250 x 9.3', '--bend', '90', '--welds', '3', '--radius', '381']);
    expect(run.out).toMatch(/Elbow: 90° bend on a 381\.0 mm radius, centre to face 381\.0 mm\./);
  });
});

describe('a bad fit-up option writes nothing', () => {
  let tmp = '';
  beforeEach(() => {
    tmp = makeTempDir('fitup');
  });
  afterEach(() => removeTempDir(tmp));

  it('an unknown reference with --svg and --csv: exit 2, no file', async () => {
    const svg = join(tmp, 'tee.svg');
    const csv = join(tmp, 'tee.csv');
    const run = await runCaptured([...TEE, '--ordinates-from', 'middle', '--svg', svg, '--csv', csv]);
    expect(run.code).toBe(2);
    expect(run.err).toContain('--ordinates-from');
    for (const f of [svg, csv, join(tmp, 'tee.branch-cut.svg'), join(tmp, 'tee.branch-cut.csv')]) expect(existsSync(f)).toBe(false);
  });

  it('the CSV header names the square line', async () => {
    const csv = join(tmp, 'cut.csv');
    const run = await runCaptured(['cutback', '--pipe', 'NPS 6 STD', '--angle', '45', '--ordinates-from', 'short-point', '--csv', csv]);
    expect(run.code).toBe(0);
    const { readFileSync } = await import('node:fs');
    expect(readFileSync(csv, 'utf8').split('\r\n')[0]).toBe('Station,Angle (deg),Girth,"Ordinate, from the square line through the short point"');
  });
});
