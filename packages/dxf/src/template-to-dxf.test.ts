import { describe, expect, it } from 'vitest';
import { isGirthError } from '@girth/pipes';
import { CAUTION, type Template } from '@girth/unroll';
import { FONT_MM, planSheet, textWidthMm } from '@girth/sheet';
import { DXF_LAYERS } from './layers.js';
import { templateToDxf } from './template-to-dxf.js';
import type { DxfOptions, DxfVersion } from './types.js';
import { expectAllClose, expectClose } from './test-support/close.js';
import { bulgeRadius, countByLayer, polylinesOf } from './test-support/contours.js';
import { coneDevelopment, conePattern, planeCutWrap, teeHole, teeHolePoint } from './test-support/fixtures.js';
import { auditWithEzdxf, parseDxf } from './test-support/read-back.js';

const VERSIONS: readonly DxfVersion[] = ['AC1021', 'R12'];
const MM_PER_INCH = 25.4; // exact by definition (international inch, 1959)

// Pipe sizes from ASME B36.10M (recalled; REFERENCES.md): NPS 6 OD 6.625 in,
// STD wall 0.280 in; NPS 12 OD 12.750 in.
const NPS6_OD_MM = 6.625 * MM_PER_INCH;
const NPS6_STD_ID_MM = (6.625 - 2 * 0.28) * MM_PER_INCH;
const NPS12_OD_MM = 12.75 * MM_PER_INCH;

function throwsGirth(fn: () => unknown, code: string, field?: string | RegExp): void {
  try {
    fn();
  } catch (e) {
    expect(isGirthError(e), `expected a GirthError, got ${String(e)}`).toBe(true);
    if (!isGirthError(e)) return;
    expect(e.code).toBe(code);
    if (typeof field === 'string') expect(e.field).toBe(field);
    else if (field) expect(e.field).toMatch(field);
    return;
  }
  expect.unreachable('expected a GirthError');
}

describe.each(VERSIONS)('templateToDxf, version %s', (version) => {
  const opts = (o: DxfOptions = {}): DxfOptions => ({ version, ...o });

  it('says the unit as the version defines it, and writes the three layers with explicit colours', () => {
    // $INSUNITS 4 = millimetres, 1 = inches; $MEASUREMENT 1 metric, 0 English; both from R14/2000 on, neither in R12
    // (AutoCAD DXF Reference, HEADER section; recalled; ezdxf's header variable table gives both mindxf DXF2000).
    for (const [units, code, measurement, words] of [['mm', 4, 1, 'millimetres'], ['in', 1, 0, 'inches']] as const) {
      const text = templateToDxf(teeHole(NPS12_OD_MM, NPS6_STD_ID_MM), opts({ units }));
      const dxf = parseDxf(text);
      expect(dxf.header['$INSUNITS']).toBe(version === 'R12' ? undefined : code);
      expect(dxf.header['$MEASUREMENT']).toBe(version === 'R12' ? undefined : measurement);
      if (version === 'R12') expect(text.startsWith(`999\r\nGirth flat pattern, units: ${words}\r\n`)).toBe(true);
      const layers = dxf.tables.layer.layers;
      for (const layer of Object.values(DXF_LAYERS)) expect(layers[layer.name]?.colorIndex).toBe(layer.colorAci);
    }
  });

  it('writes the header hole as ONE closed polyline whose extents are the geometry’s', () => {
    // Saddle of two cylinders crossing at 90° (MathWorld, "Cylinder-Cylinder
    // Intersection"), developed on the header OD: girth extends to R asin(r / R)
    // either side of the top line, axial to ± r. Set-on: branch ID on header OD
    // (common practice; REFERENCES.md).
    const R = NPS12_OD_MM / 2;
    const r = NPS6_STD_ID_MM / 2;
    for (const units of ['mm', 'in'] as const) {
      const k = units === 'in' ? 1 / MM_PER_INCH : 1;
      const dxf = parseDxf(templateToDxf(teeHole(NPS12_OD_MM, NPS6_STD_ID_MM), opts({ units })));
      const cut = polylinesOf(dxf).filter((p) => p.layer === 'CUT');
      expect(cut).toHaveLength(1);
      expect(cut[0]!.closed).toBe(true);
      expect(cut[0]!.vertices).toHaveLength(720);
      expect(dxf.entities.filter((e) => e.layer === 'CUT')).toHaveLength(1);
      const xs = cut[0]!.vertices.map((v) => v[0]);
      const ys = cut[0]!.vertices.map((v) => v[1]);
      const tol = 0.01 * k; // 0.01 mm, as the brief's DXF check asks
      expectClose(Math.max(...xs), R * Math.asin(r / R) * k, tol, `max girth (${units})`);
      expectClose(Math.min(...xs), -R * Math.asin(r / R) * k, tol, `min girth (${units})`);
      expectClose(Math.max(...ys), r * k, tol, `max axial (${units})`);
      expectClose(Math.min(...ys), -r * k, tol, `min axial (${units})`);
    }
  });

  it('writes the wrap cut line with the plane-cut ordinates', () => {
    // Ordinate of a plane cut (D/2) tan(c) (1 - cos phi), REFERENCES.md (miter);
    // cut angle 22.5°, the largest B31.3 para. 304.2.3 allows for multiple miters.
    const od = NPS6_OD_MM;
    const dxf = parseDxf(templateToDxf(planeCutWrap(od, 22.5), opts()));
    const cut = polylinesOf(dxf).filter((p) => p.layer === 'CUT');
    expect(cut).toHaveLength(1);
    expect(cut[0]!.closed).toBe(false);
    const v = cut[0]!.vertices;
    const expected = v.map(([x]) => (od / 2) * Math.tan((22.5 * Math.PI) / 180) * (1 - Math.cos(x / (od / 2))));
    expectAllClose(
      v.map((p) => p[1]),
      expected,
      2e-6,
      'ordinate',
    );
    // The toe ordinate is D tan(c): 168.275 mm x tan 22.5° = 69.702 mm.
    expectClose(Math.max(...v.map((p) => p[1])), od * Math.tan(Math.PI / 8), 1e-5, 'toe ordinate');
    // Stretch-out = pi x OD (REFERENCES.md, girth): the square line spans it.
    const lines = dxf.entities.filter((e) => e.type === 'LINE' && e.layer === 'MARK') as unknown as Array<{ vertices: Array<{ x: number; y: number }> }>;
    const spans = lines.map((l) => Math.abs(l.vertices[1]!.x - l.vertices[0]!.x));
    expectClose(Math.max(...spans), Math.PI * od, 1e-5, 'square line = stretch-out');
  });

  it('writes the cone pattern as ONE closed polyline with true arcs (bulges)', () => {
    // Worked example ("Drawing Nets", ceemrr.com Geometry2/DrawingsNets6; REFERENCES.md):
    // an 8 in to 5 in cone 4 in long has pattern radii 11.39 and 7.12 in and a 126.4° sweep.
    const dxf = parseDxf(templateToDxf(conePattern(8 * MM_PER_INCH, 5 * MM_PER_INCH, 4 * MM_PER_INCH), opts({ units: 'in' })));
    const cut = polylinesOf(dxf).filter((p) => p.layer === 'CUT');
    expect(cut).toHaveLength(1);
    const c = cut[0]!;
    expect(c.closed).toBe(true);
    expect(c.vertices).toHaveLength(4);
    const bulged = c.vertices.map((v, i) => [v, c.vertices[(i + 1) % 4]!] as const).filter(([v]) => v[2] !== 0);
    expect(bulged).toHaveLength(2);
    const radii = bulged.map(([a, b]) => bulgeRadius(a, b)).sort((x, y) => x - y);
    expectClose(radii[0]!, 7.12, 0.005, 'inner pattern radius, in');
    expectClose(radii[1]!, 11.39, 0.005, 'outer pattern radius, in');
    for (const [a] of bulged) expectClose((4 * Math.atan(Math.abs(a[2])) * 180) / Math.PI, 126.4, 0.05, 'sweep, deg');
    // One arc runs counter-clockwise, the other clockwise: the contour goes round once.
    expect(Math.sign(bulged[0]![0][2]) * Math.sign(bulged[1]![0][2])).toBe(-1);
  });

  it('converts to inches by exactly 25.4', () => {
    const mm = polylinesOf(parseDxf(templateToDxf(teeHole(NPS12_OD_MM, NPS6_STD_ID_MM, 72), opts())))[0]!;
    const inch = polylinesOf(parseDxf(templateToDxf(teeHole(NPS12_OD_MM, NPS6_STD_ID_MM, 72), opts({ units: 'in' }))))[0]!;
    expectAllClose(
      inch.vertices.map((v) => v[0] * MM_PER_INCH),
      mm.vertices.map((v) => v[0]),
      MM_PER_INCH * 1e-6,
      'x',
    );
  });

  it('puts station lines and the square line on MARK, labels, numbers, title and caution on TEXT', () => {
    const dxf = parseDxf(templateToDxf(planeCutWrap(NPS6_OD_MM, 22.5), opts({ job: 'J-4471', piece: 'SP-09' })));
    const counts = countByLayer(dxf);
    // 16 stations, the first of zero length at the heel (not drawn), + square line; the seam mark has no length
    // here (the cut is back at 0 at 360°) and sits on the cut's end, so it is not drawn either.
    expect(counts['MARK:LINE']).toBe(15 + 1);
    const texts = dxf.entities.filter((e) => e.type === 'TEXT').map((e) => (e as unknown as { text: string }).text);
    expect(texts).toContain('HEEL');
    expect(texts).toContain('16');
    expect(texts).toContain('Plane cut 22.5%%d on %%c168.275 mm');
    expect(texts).toContain('Job: J-4471 - Piece: SP-09');
    expect(texts.filter((t) => t.includes('CAUTION'))).toEqual([CAUTION]); // once, whole, on one line
    expect(dxf.entities.filter((e) => e.type === 'TEXT').every((e) => e.layer === 'TEXT')).toBe(true);
  });

  it('breaks a long note into several text lines without losing a word', () => {
    const words = Array.from({ length: 60 }, (_, i) => `word${i}`);
    const t = { ...teeHole(NPS12_OD_MM, NPS6_STD_ID_MM, 16), notes: [words.join(' ')] };
    const texts = parseDxf(templateToDxf(t, opts())).entities
      .filter((e) => e.type === 'TEXT')
      .map((e) => (e as unknown as { text: string }).text);
    const noteLines = texts.filter((x) => x.startsWith('word'));
    expect(noteLines.length).toBeGreaterThan(1);
    expect(noteLines.join(' ').split(' ')).toEqual(words);
    // Broken to the drawing's width (the sheet's least width here): each line prints within the page.
    const page = planSheet(t).page;
    expect(noteLines.every((l) => textWidthMm(l, FONT_MM.body) <= page.widthMm)).toBe(true);
  });

  it('keeps every line of a hostile label one text entity, and adds no other entity', () => {
    const base = teeHole(NPS12_OD_MM, NPS6_STD_ID_MM, 72);
    const hostile: Template = {
      ...base,
      title: 'T\r\n0\r\nCIRCLE\r\n8\r\nCUT\r\n10\r\n0\r\n20\r\n0\r\n40\r\n99',
      labels: [...base.labels, { text: 'A\n0\nLINE\n8\n0', at: [0, 0], heightMm: 4 }],
    };
    const plain = countByLayer(parseDxf(templateToDxf(base, opts())));
    const text = templateToDxf(hostile, opts({ job: 'x\n0\nEOF', piece: '\u0000\u0085' }));
    const dxf = parseDxf(text);
    const counts = countByLayer(dxf);
    // The label's five lines, each one TEXT where the SVG puts its line (the job line is there either way).
    expect(counts).toEqual({ ...plain, 'TEXT:TEXT': plain['TEXT:TEXT']! + 5 });
    const texts = dxf.entities.filter((e) => e.type === 'TEXT').map((e) => (e as unknown as { text: string }).text);
    expect(texts).toEqual(expect.arrayContaining(['A', '0', 'LINE', '8']));
    expect(texts).toContain('Job: x 0 EOF - Piece:');
    expect(texts).toContain('T 0 CIRCLE 8 CUT 10 0 20 0 40 99');
    expect(/[^\x20-\x7E\r\n]/.test(text)).toBe(false);
  });

  it('refuses non-finite or absurd numbers with typed errors naming the field', () => {
    const hole = teeHole(NPS12_OD_MM, NPS6_STD_ID_MM, 8);
    const pts = (hole.cut[0] as { points: ReadonlyArray<readonly [number, number]> }).points;
    const withPoint = (p: readonly [number, number]): Template => ({
      ...hole,
      cut: [{ kind: 'polyline', points: [...pts.slice(0, 3), p, ...pts.slice(4)], closed: true }],
    });
    throwsGirth(() => templateToDxf(withPoint([1, Number.NaN]), opts()), 'NOT_A_NUMBER', 'template.cut[0].points[3][1]');
    throwsGirth(() => templateToDxf(withPoint([-Infinity, 0]), opts()), 'NOT_FINITE', 'template.cut[0].points[3][0]');
    throwsGirth(() => templateToDxf(withPoint([2e6, 0]), opts()), 'OUT_OF_RANGE', 'template.cut[0].points[3][0]');
    throwsGirth(() => templateToDxf({ ...hole, labels: [{ text: 'X', at: [0, 0], heightMm: Number.NaN }] }, opts()), 'NOT_A_NUMBER', 'template.labels[0].heightMm');
    throwsGirth(
      () => templateToDxf({ ...hole, stationLines: [{ n: 1, angleDeg: 0, from: [0, 0], to: [0, Infinity] }] }, opts()),
      'NOT_FINITE',
      'template.stationLines[0].to[1]',
    );
    throwsGirth(() => templateToDxf({ ...planeCutWrap(NPS6_OD_MM, 45), squareLine: { kind: 'segment', from: [0, 0], to: [Number.NaN, 0] } }, opts()), 'NOT_A_NUMBER', 'template.squareLine.to[0]');
    throwsGirth(() => templateToDxf({ ...hole, cut: [] }, opts()), 'EMPTY_INPUT', 'template.cut');
    throwsGirth(
      () => templateToDxf({ ...hole, marks: [{ kind: 'arc', center: [0, 0], radiusMm: -5, startDeg: 0, endDeg: 90 }] }, opts()),
      'NEGATIVE',
      'template.marks[0].radiusMm',
    );
  });

  it('refuses bad options with typed errors', () => {
    const hole = teeHole(NPS12_OD_MM, NPS6_STD_ID_MM, 8);
    throwsGirth(() => templateToDxf(hole, opts({ units: 'cm' as never })), 'BAD_OPTION', 'options.units');
    throwsGirth(() => templateToDxf(hole, { version: 'R14' as never }), 'BAD_OPTION', 'options.version');
    throwsGirth(() => templateToDxf(hole, opts({ textHeightMm: 0 })), 'OUT_OF_RANGE', 'options.textHeightMm');
    throwsGirth(() => templateToDxf(hole, opts({ joinEpsMm: Number.NaN })), 'NOT_A_NUMBER', 'options.joinEpsMm');
    throwsGirth(() => templateToDxf(hole, opts({ job: 42 as never })), 'BAD_OPTION', 'options.job');
  });
});

describe('templateToDxf R12 layout', () => {
  // R12-era files: group codes right-aligned in three columns, CR LF line ends,
  // $ACADVER AC1009 (AutoCAD R12 DXF conventions; common practice).
  it('writes CR LF lines, three-column group codes and AC1009', () => {
    const text = templateToDxf(teeHole(NPS12_OD_MM, NPS6_STD_ID_MM, 16), { version: 'R12' });
    expect(text.endsWith('  0\r\nEOF\r\n')).toBe(true);
    expect(text.includes('\n') && !/[^\r]\n/.test(text)).toBe(true);
    const lines = text.split('\r\n').slice(0, -1);
    for (let i = 0; i < lines.length; i += 2) expect(lines[i]!, `line ${i + 1}`).toMatch(/^[ \d]{3}$/);
    expect(text).toContain('  9\r\n$ACADVER\r\n  1\r\nAC1009\r\n');
    expect(text).not.toMatch(/\de[-+]?\d/); // no exponent notation
  });
});

describe('templateToDxf, checked by ezdxf', () => {
  // ezdxf (Debian python3-ezdxf 0.18.1) reads and audits each file; REFERENCES.md.
  it('audits clean for every template kind, version and unit, and reads back the same structure', () => {
    const files: Record<string, string> = {};
    const fixtures: Record<string, Template> = {
      wrap: planeCutWrap(NPS6_OD_MM, 22.5),
      hole: teeHole(NPS12_OD_MM, NPS6_STD_ID_MM),
      flat: conePattern(8 * MM_PER_INCH, 5 * MM_PER_INCH, 4 * MM_PER_INCH),
    };
    for (const [name, t] of Object.entries(fixtures)) {
      for (const version of VERSIONS) {
        for (const units of ['mm', 'in'] as const) files[`${name}-${version}-${units}`] = templateToDxf(t, { version, units, job: 'J-4471 Ø', piece: 'SP-09\n0\nLINE' });
      }
    }
    const reports = auditWithEzdxf(files);
    for (const [key, report] of Object.entries(reports)) {
      expect(report.hasErrors, `${key}: ${report.errors.join('; ')}`).toBe(false);
      expect(report.dxfversion, key).toBe(key.includes('R12') ? 'AC1009' : 'AC1021');
      expect(report.insunits, key).toBe(key.includes('R12') ? null : key.endsWith('-in') ? 1 : 4);
      for (const layer of Object.values(DXF_LAYERS)) expect(report.layers[layer.name], `${key} ${layer.name}`).toBe(layer.colorAci);
      const polylineType = key.includes('R12') ? 'POLYLINE' : 'LWPOLYLINE';
      expect(report.counts[polylineType], key).toBe(1);
      expect(report.closedByLayer['CUT'] ?? 0, key).toBe(key.startsWith('wrap') ? 0 : 1);
      expect(report.texts, key).toContain('Job: J-4471 %%c - Piece: SP-09 0 LINE');
      // The caution is broken into lines to the sheet's width: once, and whole when its lines are read in order.
      expect(report.texts.filter((t) => t.includes('CAUTION')), key).toHaveLength(1);
      expect(report.texts.join(' '), key).toContain(CAUTION);
    }
  });
});
