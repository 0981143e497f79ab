/**
 * Closed parts for a cutting table, every kind, version and unit: audited by
 * ezdxf, read back by dxf-parser, and checked for the CAM conventions.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { MM_PER_INCH } from '@girth/pipes';
import { expectGirthError } from '@girth/pipes/test-support';
import { layoutBranch, layoutConcentricCone, layoutMiter, layoutPlaneCut, type Template } from '@girth/unroll';
import { templateToDxf } from './template-to-dxf.js';
import { countByLayer, polylinesOf, type ReadPolyline } from './test-support/contours.js';
import { auditWithEzdxf, parseDxf } from './test-support/read-back.js';
import type { DxfOptions } from './types.js';

const IN = 25.4;
// ASME B36.10M (recalled, REFERENCES.md): NPS 12 STD 12.750 x 0.375 in, NPS 6 STD 6.625 x 0.280 in.
const NPS12 = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' };
const NPS6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };

const lateral = layoutBranch({ header: NPS12, branch: NPS6, angleDeg: 45 });
const miter = layoutMiter({ pipe: NPS12, bendDeg: 90, pieces: 4, radiusMm: 1.5 * 12 * IN });
const KINDS: Readonly<Record<string, Template>> = {
  'branch-cut': lateral.templates[0],
  'header-hole': lateral.templates[1],
  'miter-end': miter.templates.find((t) => t.id === 'miter-end')!,
  'miter-middle': miter.templates.find((t) => t.id === 'miter-middle')!,
  'plane-cut': layoutPlaneCut({ pipe: NPS6, angleDeg: 60 }).templates[0]!,
  cone: layoutConcentricCone({ largeDiameterMm: 8 * IN, smallDiameterMm: 5 * IN, lengthMm: 4 * IN, thicknessMm: 0 }).templates[0]!,
};
const VERSIONS = ['AC1021', 'R12'] as const;
const UNITS = ['mm', 'in'] as const;
const closed = (o: DxfOptions = {}): DxfOptions => ({ closedParts: true, job: 'J-7730', piece: 'SP-21 45°', ...o });

/** Signed area of a read-back polyline's chord polygon plus its bulged segments (positive counter-clockwise). */
function signedArea(p: ReadPolyline): number {
  let a = 0;
  const v = p.vertices;
  v.forEach(([x0, y0, b], i) => {
    const [x1, y1] = v[(i + 1) % v.length]!;
    a += (x0 * y1 - x1 * y0) / 2;
    if (b !== 0) {
      const t = 4 * Math.atan(b);
      const r = Math.hypot(x1 - x0, y1 - y0) / (2 * Math.sin(Math.abs(t) / 2));
      a += Math.sign(t) * ((r * r) / 2) * (Math.abs(t) - Math.sin(Math.abs(t)));
    }
  });
  return a;
}

type Seg = readonly [readonly [number, number], readonly [number, number]];

/** Length of the stretch two segments share when collinear (0 otherwise). */
function sharedLength([a, b]: Seg, [p, q]: Seg): number {
  const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
  if (len === 0) return 0;
  const ux = (b[0] - a[0]) / len;
  const uy = (b[1] - a[1]) / len;
  const off = (c: readonly [number, number]): number => Math.abs((c[0] - a[0]) * uy - (c[1] - a[1]) * ux);
  if (off(p) > 1e-6 || off(q) > 1e-6) return 0;
  const t = (c: readonly [number, number]): number => (c[0] - a[0]) * ux + (c[1] - a[1]) * uy;
  return Math.max(0, Math.min(len, Math.max(t(p), t(q))) - Math.max(0, Math.min(t(p), t(q))));
}

describe('closed parts for a cutting table', () => {
  const files: Record<string, string> = {};
  for (const [kind, t] of Object.entries(KINDS)) {
    for (const version of VERSIONS) for (const units of UNITS) files[`${kind}-${version}-${units}`] = templateToDxf(t, closed({ version, units }));
  }

  it('audits clean with ezdxf for every kind, version and unit, each part ONE closed contour on CUT', () => {
    const reports = auditWithEzdxf(files);
    for (const [key, report] of Object.entries(reports)) {
      expect(report.hasErrors, `${key}: ${report.errors.join('; ')}`).toBe(false);
      expect(report.closedByLayer['CUT'], key).toBe(1);
      const onCut = Object.entries(countByLayer(parseDxf(files[key]!))).filter(([k]) => k.startsWith('CUT:'));
      expect(onCut, key).toEqual([[key.includes('R12') ? 'CUT:POLYLINE' : 'CUT:LWPOLYLINE', 1]]);
    }
  });

  it('winds parts counter-clockwise and a header hole (scrap inside) clockwise', () => {
    for (const [key, text] of Object.entries(files)) {
      const [cut] = polylinesOf(parseDxf(text)).filter((p) => p.layer === 'CUT');
      const area = signedArea(cut!);
      if (key.startsWith('header-hole')) expect(area, key).toBeLessThan(0);
      else expect(area, key).toBeGreaterThan(0);
    }
  });

  it('puts no MARK segment on a CUT segment', () => {
    for (const [key, text] of Object.entries(files)) {
      const dxf = parseDxf(text);
      const cutSegs: Seg[] = [];
      for (const p of polylinesOf(dxf).filter((x) => x.layer === 'CUT')) {
        p.vertices.forEach((v, i) => {
          const w = p.vertices[(i + 1) % p.vertices.length]!;
          if (v[2] === 0) cutSegs.push([[v[0], v[1]], [w[0], w[1]]]);
        });
      }
      const markSegs: Seg[] = dxf.entities
        .filter((e) => e.layer === 'MARK' && e.type === 'LINE')
        .map((e) => {
          const v = (e as unknown as { vertices: { x: number; y: number }[] }).vertices;
          return [[v[0]!.x, v[0]!.y], [v[1]!.x, v[1]!.y]] as Seg;
        });
      let worst = 0;
      for (const m of markSegs) for (const c of cutSegs) worst = Math.max(worst, sharedLength(m, c));
      expect(worst, key).toBeLessThan(1e-3);
    }
  });

  it('reads back the same size in both units with dxf-parser (a second, independent reader)', () => {
    for (const kind of Object.keys(KINDS)) {
      for (const version of VERSIONS) {
        const box = (units: 'mm' | 'in'): number[] => {
          const [cut] = polylinesOf(parseDxf(files[`${kind}-${version}-${units}`]!)).filter((p) => p.layer === 'CUT');
          const xs = cut!.vertices.map((v) => v[0]);
          const ys = cut!.vertices.map((v) => v[1]);
          return [Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys)];
        };
        const [wMm, hMm] = box('mm');
        const [wIn, hIn] = box('in');
        expect(wIn! * MM_PER_INCH).toBeCloseTo(wMm!, 3);
        expect(hIn! * MM_PER_INCH).toBeCloseTo(hMm!, 3);
      }
    }
  });

  it('writes the stub length asked for, and refuses one shorter than the cut', () => {
    const t = KINDS['branch-cut']!;
    const [cut] = polylinesOf(parseDxf(templateToDxf(t, closed({ stubMm: 400 })))).filter((p) => p.layer === 'CUT');
    expect(Math.max(...cut!.vertices.map((v) => v[1]))).toBeCloseTo(400, 6);
    expectGirthError(() => templateToDxf(t, closed({ stubMm: 10 })), 'OUT_OF_RANGE', 'options.stubMm');
  });

  it('develops on the mid-thickness of the plate: flat width pi x (OD - t) (common practice: neutral surface at mid-thickness)', () => {
    const t = KINDS['branch-cut']!;
    const [cut] = polylinesOf(parseDxf(templateToDxf(t, closed({ surface: 'mid', plateThicknessMm: NPS6.wallMm })))).filter((p) => p.layer === 'CUT');
    const xs = cut!.vertices.map((v) => v[0]);
    expect(Math.max(...xs) - Math.min(...xs)).toBeCloseTo(Math.PI * (NPS6.odMm - NPS6.wallMm), 4);
    expectGirthError(() => templateToDxf(t, closed({ surface: 'mid', plateThicknessMm: NPS6.odMm })), 'WALL_TOO_THICK', 'options.plateThicknessMm');
  });

  it('leaves text out, or writes it as single strokes on MARK', () => {
    const t = KINDS['branch-cut']!;
    const none = countByLayer(parseDxf(templateToDxf(t, closed({ text: 'none' }))));
    expect(Object.keys(none).filter((k) => k.startsWith('TEXT:') || k.endsWith(':TEXT'))).toEqual([]);
    const stroke = parseDxf(templateToDxf(t, closed({ text: 'stroke' })));
    expect(stroke.entities.filter((e) => e.type === 'TEXT')).toEqual([]);
    expect(polylinesOf(stroke).filter((p) => p.layer === 'MARK').length).toBeGreaterThan(100);
    expect(auditWithEzdxf({ stroke: templateToDxf(t, closed({ text: 'stroke', version: 'R12' })) })['stroke']!.hasErrors).toBe(false);
  });

  it('writes a degree sign ezdxf prints as the sign', () => {
    // ezdxf's TEXT.plain_text() turns the DXF code %%d into the degree sign, as AutoCAD does (DXF Reference, control codes; recalled).
    const dir = mkdtempSync(join(tmpdir(), 'girth-deg-'));
    try {
      const path = join(dir, 'deg.dxf');
      writeFileSync(path, templateToDxf(KINDS['branch-cut']!, closed({ version: 'R12' })));
      const script = "import sys, ezdxf\nd = ezdxf.readfile(sys.argv[1])\nprint('\\n'.join(e.plain_text() for e in d.modelspace().query('TEXT')))";
      const run = spawnSync('/usr/bin/python3', ['-c', script, path], { encoding: 'utf8' });
      expect(run.status, run.stderr).toBe(0);
      expect(run.stdout).toContain('45°');
      expect(run.stdout).toContain('SP-21 45°');
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
