/**
 * The page as a fitter uses it, in Debian's chromium with the network blocked:
 * every joint filled in by its labels, the table shown checked against the
 * library's table for the same inputs, every download parsed and checked
 * (SVG and CSV equal to the library's, DXF read back, JSON equal to
 * `girth ... --json`), printing at the sheet's true size, bad input, the
 * 360 px layout, the link, the recent jobs and job files. Screenshots are
 * saved to test/screenshots/ for review.
 */
import { mkdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import DxfParser from 'dxf-parser';
import { parse as parseSvg } from 'svgson';
import type { Download, Page } from 'playwright-core';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { templateToSvg } from '@girth/svg';
import { formatStationTable, stationTableCsv } from '@girth/table';
import type { LayoutResult } from '@girth/unroll';
import { runCli } from 'girth';
import { layoutJoint, parseJob, type JointContext, type JointInput } from 'girth/joints';
import { launchBrowser, PAGE_URL, SCREENSHOTS, type TestBrowser } from './browser.js';

/** One joint as a fitter fills it in, and the same joint on the command line. */
interface JointCase {
  readonly name: string;
  readonly joint: string;
  /** Label -> typed text (inputs) or option value (selects) or true (checkbox), in order. */
  readonly fill: ReadonlyArray<readonly [string, string | boolean]>;
  readonly input: JointInput;
  readonly units: 'in' | 'mm';
  readonly format: 'ft-in' | 'in' | 'mm';
  readonly fraction: 8 | 16 | 32;
  readonly cli: readonly string[];
  readonly piece: string;
}

const CASES: readonly JointCase[] = [
  {
    name: 'a 60° lateral, NPS 8 on NPS 16, offset 1 1/2", 1/16" gap (feet-inch)',
    joint: 'branch',
    fill: [['Header pipe', '16 std'], ['Branch pipe', '8 std'], ['Angle between axes (deg)', '60'], ['Offset of the branch axis', '1 1/2'], ['Root gap', '1/16'], ['Piece (on every sheet)', 'SP-21 lateral']],
    input: { joint: 'branch', header: '16 std', branch: '8 std', angle: 60, offset: '1 1/2', gap: '1/16' },
    units: 'in',
    format: 'ft-in',
    fraction: 16,
    cli: ['branch', '--header', '16 std', '--branch', '8 std', '--angle', '60', '--offset', '1 1/2', '--gap', '1/16', '--piece', 'SP-21 lateral', '--json'],
    piece: 'SP-21 lateral',
  },
  {
    name: 'a 90° miter on NPS 10, 3 welds, long radius, 2" tangents (decimal inches)',
    joint: 'miter',
    fill: [['Pipe', '10 std'], ['Bend, total change of direction (deg)', '90'], ['Welds', '3'], ['Radius x NPS', '1.5'], ['Tangent added to each end piece', '2'], ['Inch lengths as', 'decimal']],
    input: { joint: 'miter', pipe: '10 std', bend: 90, welds: 3, radiusNps: 1.5, tangent: '2' },
    units: 'in',
    format: 'in',
    fraction: 16,
    cli: ['miter', '--pipe', '10 std', '--bend', '90', '--welds', '3', '--radius-nps', '1.5', '--tangent', '2', '--decimal', '--json'],
    piece: '',
  },
  {
    name: 'a DN 150 x 7.1 end cut at 35° to a plate, 3 mm gap, bore laid on it (mm)',
    joint: 'cutback',
    fill: [['Units', 'mm'], ['Pipe', 'DN 150 x 7.1'], ['Angle between pipe and plane (deg)', '35'], ['Root gap', '3'], ['Surface laid on the plane', 'id']],
    input: { joint: 'cutback', pipe: 'DN 150 x 7.1', angle: 35, gap: '3', surface: 'id' },
    units: 'mm',
    format: 'mm',
    fraction: 16,
    cli: ['cutback', '--units', 'mm', '--pipe', 'DN 150 x 7.1', '--angle', '35', '--gap', '3', '--surface', 'id', '--json'],
    piece: '',
  },
  {
    name: 'an eccentric NPS 12 x NPS 8 reducer, 7" long, 3/8" plate, in 2 pieces (1/32")',
    joint: 'reducer',
    fill: [['Large end (pipe or diameter)', '12 std'], ['Small end (pipe or diameter)', '8 std'], ['Length along the axis', '7'], ['Plate thickness', '3/8'], ['Eccentric (one side flat)', true], ['Pieces of plate', '2'], ['Round to', '32']],
    input: { joint: 'reducer', large: '12 std', small: '8 std', length: '7', plate: '3/8', eccentric: true, segments: 2 },
    units: 'in',
    format: 'ft-in',
    fraction: 32,
    cli: ['reducer', '--large', '12 std', '--small', '8 std', '--length', '7', '--plate', '3/8', '--eccentric', '--segments', '2', '--fraction', '32', '--json'],
    piece: '',
  },
];

function contextOf(c: Pick<JointCase, 'units' | 'format' | 'fraction'>): JointContext {
  return {
    units: c.units,
    stations: 16,
    fieldPrefix: '--',
    fieldName: (n) => `--${n}`,
    describe: { units: c.units, lengthFormat: c.format, fraction: c.fraction },
  };
}

/** The library's layout for a case: the command line's own joint code. */
function libraryLayout(c: JointCase): LayoutResult {
  return layoutJoint(c.input, contextOf(c));
}

/** `girth ... --json`, run in-process. */
async function cliJson(args: readonly string[]): Promise<unknown> {
  let out = '';
  const code = await runCli(args, { out: (t) => (out += t), err: () => undefined });
  expect(code).toBe(0);
  return JSON.parse(out);
}

/** The station table as formatStationTable prints it, split into cells (columns are two or more spaces apart). */
function libraryTableRows(text: string): string[][] {
  const lines = text.split('\n');
  const rule = lines.findIndex((l) => /^-+(\s+-+)+$/.test(l.trim()));
  const heading = lines[rule - 1]!;
  const body = lines.slice(rule + 1, lines.indexOf('', rule + 1));
  return [heading, ...body].map((l) => l.trim().split(/\s{2,}/));
}

async function shownTables(page: Page): Promise<string[][][]> {
  return page.$$eval('table.ordinates', (tables) =>
    tables.map((t) => [...(t as HTMLTableElement).rows].map((r) => [...r.cells].map((c) => (c.textContent ?? '').trim()))),
  );
}

/** Waits until the page has made a layout after `before` layouts. */
async function waitForCompute(page: Page, before: number): Promise<void> {
  await page.waitForFunction((n) => Number(document.body.dataset.computes ?? '0') > n, before, { timeout: 60_000 });
}

async function computes(page: Page): Promise<number> {
  return page.evaluate(() => Number(document.body.dataset.computes ?? '0'));
}

async function fillCase(page: Page, c: JointCase): Promise<void> {
  await page.getByLabel('Joint', { exact: true }).selectOption(c.joint);
  for (const [label, value] of c.fill) {
    const field = page.getByLabel(label, { exact: true });
    if (value === true) await field.check();
    else if ((await field.evaluate((e) => e.tagName)) === 'SELECT') await field.selectOption(String(value));
    else await field.fill(String(value));
  }
}

async function openPage(b: TestBrowser, width = 390, height = 844, hash = ''): Promise<Page> {
  const page = await b.newPage(width, height);
  await page.goto(`${PAGE_URL}${hash}`);
  await page.waitForSelector('table.ordinates', { timeout: 60_000 });
  return page;
}

/** Clicks an export button and collects the `count` files it downloads, by name. */
async function downloadsOf(page: Page, exportId: string, count: number): Promise<Map<string, string>> {
  const files = new Map<string, string>();
  const got: Download[] = [];
  const onDownload = (d: Download): void => {
    got.push(d);
  };
  page.on('download', onDownload);
  await page.click(`button[data-export="${exportId}"]`);
  const deadline = Date.now() + 60_000;
  while (got.length < count && Date.now() < deadline) await page.waitForTimeout(100);
  page.off('download', onDownload);
  expect(got.length).toBe(count);
  for (const d of got) files.set(d.suggestedFilename(), readFileSync(await d.path(), 'utf8'));
  return files;
}

let browser: TestBrowser;

beforeAll(async () => {
  mkdirSync(SCREENSHOTS, { recursive: true });
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

afterEach(() => {
  // Nothing on the console, nothing thrown, nothing tried to reach the network.
  expect(browser.errors).toEqual([]);
  expect(browser.blocked).toEqual([]);
});

describe.each(CASES)('$joint: $name', (c) => {
  it('shows the library table, draws the sheet, and downloads SVG, DXF, CSV and JSON equal to the library and girth --json', async () => {
    const page = await openPage(browser);
    await fillCase(page, c);
    const expected = libraryLayout(c);
    await page.waitForFunction((n) => document.querySelectorAll('table.ordinates').length === n, expected.templates.length);

    // The table: the same cells formatStationTable prints for the same inputs.
    const shown = await shownTables(page);
    expect(shown.length).toBe(expected.templates.length);
    expected.templates.forEach((t, i) => {
      expect(shown[i]).toEqual(libraryTableRows(formatStationTable(t, { format: c.format, fraction: c.fraction })));
    });
    await expect(page.locator('.caution').textContent()).resolves.toMatch(/^CAUTION: verify against the actual pipe/);

    // The sheet shown is the SVG writer's drawing of each template.
    const images = await page.$$eval('.sheet img', (imgs) => imgs.map((i) => decodeURIComponent((i as HTMLImageElement).src.replace(/^data:image\/svg\+xml;charset=utf-8,/, ''))));
    const labels = c.piece === '' ? {} : { piece: c.piece };
    expect(images).toEqual(expected.templates.map((t) => templateToSvg(t, { sheetUnits: c.units, ...labels })));

    await page.screenshot({ path: join(SCREENSHOTS, `${c.joint}-390x844.png`), fullPage: true });
    await page.setViewportSize({ width: 1366, height: 768 });
    await page.screenshot({ path: join(SCREENSHOTS, `${c.joint}-1366x768.png`) });

    const n = expected.templates.length;
    const stem = c.piece === '' ? c.joint : c.piece.replace(/ /g, '-');
    const name = (t: { id: string }, ext: string): string => (n === 1 ? `${stem}.${ext}` : `${stem}.${t.id}.${ext}`);

    const svgs = await downloadsOf(page, 'svg', n);
    for (const t of expected.templates) {
      const text = svgs.get(name(t, 'svg'))!;
      expect(text).toBe(templateToSvg(t, { sheetUnits: c.units, ...labels }));
      const root = await parseSvg(text);
      expect(root.name).toBe('svg');
      expect(root.attributes.width).toMatch(c.units === 'in' ? /^[0-9.]+in$/ : /^[0-9.]+mm$/);
    }

    const dxfs = await downloadsOf(page, 'dxf', n);
    for (const t of expected.templates) {
      const dxf = new DxfParser().parseSync(dxfs.get(name(t, 'dxf'))!);
      expect(dxf?.header?.$INSUNITS).toBe(c.units === 'in' ? 1 : 4);
      expect(dxf?.entities.length ?? 0).toBeGreaterThan(0);
      // The cut contour is on the drawing (a closed polyline on the cut layer).
      expect(dxf?.entities.some((e) => e.type === 'LWPOLYLINE' && /cut/i.test(e.layer))).toBe(true);
    }

    const csvs = await downloadsOf(page, 'csv', n);
    for (const t of expected.templates) expect(csvs.get(name(t, 'csv'))).toBe(stationTableCsv(t, { format: c.format, fraction: c.fraction }));

    const json = await downloadsOf(page, 'json', 1);
    expect(JSON.parse(json.get(`${stem}.json`)!)).toEqual(await cliJson(c.cli));
    await page.close();
  });
});

describe('3D view', () => {
  it.each(CASES.map((c) => c.joint))('%s: drawn when scrolled into sight, HEEL/BACK/SEAM words on it, redrawn after a change', async (joint) => {
    const c = CASES.find((k) => k.joint === joint)!;
    const page = await openPage(browser, 390, 844);
    await fillCase(page, c);
    await page.locator('#view3d').scrollIntoViewIfNeeded();
    await page.waitForFunction(() => Number(document.body.dataset.drawn3d ?? '0') > 0, undefined, { timeout: 60_000 });
    await expect(page.locator('#view3d canvas').count()).resolves.toBe(1);
    await page.waitForTimeout(300);
    await page.locator('#view3d').screenshot({ path: join(SCREENSHOTS, `${joint}-3d.png`) });
    // The canvas is not blank: many distinct colours (lit pipes, the red cut line, the words).
    const colours = await page.$eval('#view3d canvas', (canvas) => {
      const copy = document.createElement('canvas');
      copy.width = (canvas as HTMLCanvasElement).width;
      copy.height = (canvas as HTMLCanvasElement).height;
      const g = copy.getContext('2d')!;
      g.drawImage(canvas as HTMLCanvasElement, 0, 0);
      const data = g.getImageData(0, 0, copy.width, copy.height).data;
      const seen = new Set<number>();
      for (let i = 0; i < data.length; i += 4 * 7) seen.add((data[i]! << 16) | (data[i + 1]! << 8) | data[i + 2]!);
      return seen.size;
    });
    expect(colours).toBeGreaterThan(50);
    await page.close();
  });
});

describe('printing', () => {
  it('prints each sheet on a page of its own size (true scale, CSS named pages)', async () => {
    const page = await openPage(browser);
    const sizes = await page.$$eval('.sheet img', (imgs) =>
      imgs.map((i) => {
        const svg = decodeURIComponent((i as HTMLImageElement).src.split(',')[1]!);
        const m = /<svg[^>]*\swidth="([0-9.]+)(mm|in)"[^>]*\sheight="([0-9.]+)(mm|in)"/.exec(svg)!;
        return [Number(m[1]) * (m[2] === 'in' ? 25.4 : 1), Number(m[3]) * (m[4] === 'in' ? 25.4 : 1)];
      }),
    );
    const pdf = (await page.pdf({ preferCSSPageSize: true, printBackground: true })).toString('latin1');
    const boxes = [...pdf.matchAll(/\/MediaBox\s*\[\s*0 0 ([0-9.]+) ([0-9.]+)\s*\]/g)].map((m) => [Number(m[1]), Number(m[2])]);
    expect(boxes.length).toBe(sizes.length);
    // PDF points are 1/72 in (ISO 32000-1, 8.3.2.3 user space): size in mm x 72 / 25.4, within half a point.
    boxes.forEach((box, i) => {
      expect(Math.abs(box[0]! - (sizes[i]![0]! * 72) / 25.4)).toBeLessThan(0.5);
      expect(Math.abs(box[1]! - (sizes[i]![1]! * 72) / 25.4)).toBeLessThan(0.5);
    });
    // On paper each sheet image is drawn at the sheet's size: CSS px are 1/96 in (CSS Values 4, absolute lengths).
    await page.emulateMedia({ media: 'print' });
    const drawn = await page.$$eval('.print-sheet', (imgs) => imgs.map((i) => [i.getBoundingClientRect().width, i.getBoundingClientRect().height]));
    drawn.forEach((d, i) => {
      expect(Math.abs(d[0]! - (sizes[i]![0]! * 96) / 25.4)).toBeLessThan(0.5);
      expect(Math.abs(d[1]! - (sizes[i]![1]! * 96) / 25.4)).toBeLessThan(0.5);
    });
    await page.close();
  });
});

describe('bad input', () => {
  const cases: ReadonlyArray<readonly [string, string, string, RegExp]> = [
    ['an angle that is not a number', 'Angle between axes (deg)', '4x', /expected a number, got "4x"/],
    ['an angle past the limit', 'Angle between axes (deg)', '200', /90/],
    ['a pipe size that does not exist', 'Header pipe', 'NPS 13 STD', /13/],
    ['a length that cannot be read', 'Offset of the branch axis', '2 1/', /./],
    ['too few stations', 'Stations', '2', /4 to 360|at least 4|4/],
  ];
  it.each(cases)('%s: a message beside the field, no result, nothing on the console', async (_what, label, text, message) => {
    const page = await openPage(browser);
    const before = await computes(page);
    const field = page.getByLabel(label, { exact: true });
    await field.fill(text);
    await waitForCompute(page, before);
    const id = await field.getAttribute('id');
    const msg = page.locator(`#${id}-msg`);
    await expect(msg.isVisible()).resolves.toBe(true);
    const said = (await msg.textContent()) ?? '';
    expect(said).toMatch(message);
    expect(said).not.toMatch(/[a-z]Mm\b|@|undefined|NaN/);
    await expect(field.getAttribute('aria-invalid')).resolves.toBe('true');
    await expect(page.locator('table.ordinates').count()).resolves.toBe(0);
    await expect(page.locator('.sheet img').count()).resolves.toBe(0);
    await page.close();
  });
});

describe('phone layout', () => {
  it.each(CASES.map((c) => c.joint))('%s at 360 px: every input and button inside the viewport, at least 44 px tall, no sideways scroll', async (joint) => {
    const page = await openPage(browser, 360, 740);
    await page.getByLabel('Joint', { exact: true }).selectOption(joint);
    await page.waitForSelector('table.ordinates');
    const outside = await page.$$eval('input, select, button', (els) =>
      els
        .filter((e) => (e as HTMLElement).offsetParent !== null)
        .map((e) => {
          const r = e.getBoundingClientRect();
          return { id: e.id || e.textContent, left: r.left, right: r.right, height: r.height, type: (e as HTMLInputElement).type };
        })
        .filter((b) => b.left < 0 || b.right > 360 || (b.type !== 'checkbox' && b.height < 44)),
    );
    expect(outside).toEqual([]);
    await expect(page.evaluate(() => document.documentElement.scrollWidth)).resolves.toBeLessThanOrEqual(360);
    // Every control has a label a screen reader reads.
    const unlabelled = await page.$$eval('input, select', (els) => els.filter((e) => (e as HTMLInputElement).labels?.length === 0).map((e) => e.id));
    expect(unlabelled).toEqual([]);
    await page.close();
  });
});

describe('link, recent jobs and job files', () => {
  it('the link carries the inputs: opened in a new page it shows the same table', async () => {
    const page = await openPage(browser);
    await fillCase(page, CASES[2]!);
    await page.waitForFunction(() => document.querySelectorAll('table.ordinates').length === 1);
    const link = await page.inputValue('#link');
    const tables = await shownTables(page);
    await page.close();
    const other = await openPage(browser, 390, 844, link.slice(link.indexOf('#')));
    await expect(other.inputValue('#f-pipe')).resolves.toBe('DN 150 x 7.1');
    expect(await shownTables(other)).toEqual(tables);
    await other.close();
  });

  it('remembers recent jobs on the device and opens one again', async () => {
    const page = await openPage(browser);
    await fillCase(page, CASES[0]!);
    await page.waitForFunction(() => (localStorage.getItem('girth.recent.v1') ?? '').includes('SP-21'), undefined, { timeout: 30_000 });
    const tables = await shownTables(page);
    await page.close();
    const fresh = await openPage(browser);
    const option = await fresh.$$eval('#recent option', (os) => os.map((o) => [(o as HTMLOptionElement).value, o.textContent ?? '']).find(([, t]) => (t ?? '').includes('SP-21')));
    expect(option).toBeDefined();
    await fresh.getByLabel('Recent jobs on this device').selectOption(option![0]!);
    await expect(fresh.inputValue('#f-header')).resolves.toBe('16 std');
    expect(await shownTables(fresh)).toEqual(tables);
    await fresh.close();
  });

  it('saves a job file girth run reads, and opens the fixtures\' job files with their golden results', async () => {
    const page = await openPage(browser);
    await fillCase(page, CASES[3]!);
    await page.waitForFunction(() => document.querySelectorAll('table.ordinates').length === 2);
    const saved = page.waitForEvent('download');
    await page.click('#save-job');
    const file = await saved;
    const job = parseJob(JSON.parse(readFileSync(await file.path(), 'utf8')));
    expect(job.pieces[0]).toMatchObject({ joint: 'reducer', large: '12 std', small: '8 std', eccentric: true, segments: 2 });
    expect(job.fraction).toBe(32);

    // Each fixture job (invented scenarios) opened in the page gives its golden JSON.
    const fixtures = ['branch/lateral-offset-set-in-mm', 'miter/sixty-bore-decimal-inch', 'cutback/fifty-degrees-inch', 'reducer/eccentric-seam-opposite-mm'];
    for (const f of fixtures) {
      const path = join(__dirname, '..', '..', '..', 'fixtures', `${f}.job.json`);
      await page.setInputFiles('#job-file', path);
      const golden = JSON.parse(readFileSync(path.replace('.job.json', '.result.json'), 'utf8')) as { pieces: Array<{ piece: string; result: unknown }> };
      await page.waitForFunction((piece) => (document.getElementById('piece') as HTMLInputElement).value === piece, golden.pieces[0]!.piece);
      const stem = golden.pieces[0]!.piece.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '');
      const json = await downloadsOf(page, 'json', 1);
      expect(JSON.parse(json.get(`${stem}.json`)!)).toEqual(golden.pieces[0]!.result);
    }
    await page.close();
  });

  it('a job file girth run refuses is refused with its message beside the file field', async () => {
    const page = await openPage(browser);
    await page.setInputFiles('#job-file', { name: 'bad.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify({ job: 'Job 1', units: 'in', pieces: [{ piece: 'A', joint: 'branch', header: 'NPS 12 STD' }] })) });
    const msg = page.locator('#job-file-msg');
    await msg.waitFor({ state: 'visible' });
    await expect(msg.textContent()).resolves.toMatch(/pieces\[0\]\.branch: required/);
    await page.close();
  });
});
