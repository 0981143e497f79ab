/**
 * SVG and DXF are two writers of one sheet plan, so they must put every station
 * number, label, title line and station line at the same point, at the same
 * size (invariant). Each file is read back with an independent reader
 * (svgson for the SVG, dxf-parser for the DXF) and the positions compared in
 * template millimetres: the SVG's paper coordinates mapped back through the
 * plan's page (x = left + paper x, y = top − paper y), the DXF's as written
 * (times 25.4 for inches, the definition of the inch). Every template kind is
 * covered: wraps (branch cut, plane cut, miter pieces), the header hole, and
 * flat patterns (concentric and eccentric cones).
 *
 * Tolerance 0.002 mm: SVG numbers are written to 0.001 mm (0.00001 in), DXF
 * coordinates to 0.000001 of the unit.
 */
import { describe, expect, it } from 'vitest';
import { parseSync, type INode } from 'svgson';
import DxfParser from 'dxf-parser';
import { planSheet, CAP_HEIGHT_EM } from '@girth/sheet';
import { templateToSvg } from '@girth/svg';
import { templateToDxf } from '@girth/dxf';
import {
  layoutBranch,
  layoutConcentricCone,
  layoutEccentricCone,
  layoutMiter,
  layoutPlaneCut,
  type Template,
} from '@girth/unroll';

const IN = 25.4;
const TOL_MM = 0.002;
// ASME B36.10M, recalled (REFERENCES.md): NPS 12 OD 12.75 in, wall 0.375 in; NPS 6 OD 6.625 in, wall 0.28 in.
const NPS12 = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' };
const NPS6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };

function templates(): Template[] {
  return [
    ...layoutBranch({ header: NPS12, branch: NPS6, angleDeg: 60 }).templates,
    ...layoutPlaneCut({ pipe: NPS6, angleDeg: 30 }).templates,
    ...layoutMiter({ pipe: { ...NPS12, npsIn: 12 }, bendDeg: 90, welds: 3, radiusMm: 457.2 }).templates,
    ...layoutConcentricCone({ largeDiameterMm: 8 * IN, smallDiameterMm: 5 * IN, lengthMm: 4 * IN, thicknessMm: 0 }).templates,
    ...layoutEccentricCone({ largeDiameterMm: 219.1, smallDiameterMm: 114.3, lengthMm: 178, thicknessMm: 0 }).templates,
  ];
}

interface PlacedText {
  readonly text: string;
  readonly x: number;
  readonly y: number;
  /** Cap height, mm. */
  readonly capMm: number;
}

type Seg = readonly [number, number, number, number];

function walk(n: INode, visit: (n: INode, parents: readonly INode[]) => void, parents: INode[] = []): void {
  visit(n, parents);
  for (const c of n.children) walk(c, visit, [...parents, n]);
}

function textContent(n: INode): string {
  return n.children.map((c) => (c.type === 'text' ? c.value : textContent(c))).join('');
}

/** What the SVG says, in template mm. */
function readSvg(svg: string, page: { left: number; top: number }, perUnit: number) {
  const root = parseSync(svg);
  const X = (v: string | undefined) => page.left + Number(v) * perUnit;
  const Y = (v: string | undefined) => page.top - Number(v) * perUnit;
  const centred: PlacedText[] = [];
  const left: PlacedText[] = [];
  const lines: Seg[] = [];
  walk(root, (n, parents) => {
    const groupIds = parents.map((p) => p.attributes.id ?? p.attributes.class);
    if (n.name === 'text') {
      const size = Number(n.attributes['font-size']) * perUnit;
      const tspans = n.children.filter((c) => c.name === 'tspan');
      const rows = tspans.length === 0 ? [{ text: textContent(n), dy: 0 }] : tspans.map((t, i) => ({ text: textContent(t), dy: i }));
      const lineMm = 1.35 * size; // LINE_EM of the plan, checked below through the DXF's own positions
      for (const r of rows) {
        const p = { text: r.text, x: X(n.attributes.x), y: Y(n.attributes.y) - r.dy * lineMm, capMm: CAP_HEIGHT_EM * size };
        if (['station-numbers', 'line-names', 'labels', 'sides'].some((g) => groupIds.includes(g))) centred.push(p);
        else if (groupIds.includes('title-block')) left.push(p);
      }
    }
    if (n.name === 'path' && (n.attributes.class === 'station-lines' || groupIds.includes('square-line'))) {
      const nums = (n.attributes.d ?? '').match(/-?\d+(\.\d+)?/g)?.map(Number) ?? [];
      for (let i = 0; i + 3 < nums.length; i += 4) {
        const s: Seg = [X(String(nums[i])), Y(String(nums[i + 1])), X(String(nums[i + 2])), Y(String(nums[i + 3]))];
        if (Math.hypot(s[2] - s[0], s[3] - s[1]) > 1e-3) lines.push(s);
      }
    }
  });
  return { centred, left, lines };
}

interface DxfText {
  type: string;
  layer: string;
  text: string;
  startPoint: { x: number; y: number };
  endPoint?: { x: number; y: number };
  halign?: number;
  textHeight: number;
}

/** What the DXF says, in template mm. */
function readDxf(dxf: string, perUnit: number) {
  const parsed = new DxfParser().parseSync(dxf);
  if (!parsed) throw new Error('dxf-parser read nothing');
  const centred: PlacedText[] = [];
  const left: PlacedText[] = [];
  const lines: Seg[] = [];
  const cuts: Seg[] = [];
  for (const e of parsed.entities) {
    if ((e.type === 'LWPOLYLINE' || e.type === 'POLYLINE') && e.layer === 'CUT') {
      const v = (e as unknown as { vertices: { x: number; y: number }[]; shape?: boolean }).vertices;
      const n = v.length;
      const closed = (e as unknown as { shape?: boolean }).shape === true;
      for (let i = 0; i + 1 < n + (closed ? 1 : 0); i++) {
        const a = v[i]!;
        const b = v[(i + 1) % n]!;
        cuts.push([a.x * perUnit, a.y * perUnit, b.x * perUnit, b.y * perUnit]);
      }
    }
    if (e.type === 'TEXT') {
      const t = e as unknown as DxfText;
      const at = (t.halign ?? 0) > 0 && t.endPoint ? t.endPoint : t.startPoint;
      const p = { text: t.text, x: at.x * perUnit, y: at.y * perUnit, capMm: t.textHeight * perUnit };
      ((t.halign ?? 0) > 0 ? centred : left).push(p);
    }
    if (e.type === 'LINE' && e.layer === 'MARK') {
      const v = (e as unknown as { vertices: { x: number; y: number }[] }).vertices;
      lines.push([v[0]!.x * perUnit, v[0]!.y * perUnit, v[1]!.x * perUnit, v[1]!.y * perUnit]);
    }
  }
  return { centred, left, lines, cuts };
}

const byPlace = (a: PlacedText, b: PlacedText) => a.x - b.x || a.y - b.y;

function expectSameTexts(svg: readonly PlacedText[], dxf: readonly PlacedText[], what: string, sameText: boolean): void {
  expect(dxf.length, `${what}: count`).toBe(svg.length);
  const s = [...svg].sort(byPlace);
  const d = [...dxf].sort(byPlace);
  s.forEach((a, i) => {
    const b = d[i]!;
    // The DXF writes non-ASCII (°, ·) in its own ASCII-safe form: words are compared where both are plain ASCII.
    if (sameText && /^[\x20-\x7e]*$/.test(a.text)) expect(b.text, `${what} ${i}`).toBe(a.text);
    expect(Math.abs(a.x - b.x), `${what} '${a.text}' x`).toBeLessThanOrEqual(TOL_MM);
    expect(Math.abs(a.y - b.y), `${what} '${a.text}' y`).toBeLessThanOrEqual(TOL_MM);
    expect(Math.abs(a.capMm - b.capMm), `${what} '${a.text}' cap height`).toBeLessThanOrEqual(TOL_MM);
  });
}

/** Distance (mm) from point (x, y) to segment t. */
function toSegment(t: Seg, x: number, y: number): number {
  const dx = t[2] - t[0];
  const dy = t[3] - t[1];
  const len2 = dx * dx + dy * dy;
  const u = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((x - t[0]) * dx + (y - t[1]) * dy) / len2));
  return Math.hypot(t[0] + u * dx - x, t[1] + u * dy - y);
}

/** A mark line lying along one CUT segment: the DXF leaves it to CUT (a cutting table would cut or etch it twice). */
function onCut(cuts: readonly Seg[], s: Seg): boolean {
  return cuts.some((t) => toSegment(t, s[0], s[1]) <= TOL_MM && toSegment(t, s[2], s[3]) <= TOL_MM);
}

function hasSegment(list: readonly Seg[], s: Seg): boolean {
  return list.some(
    (t) =>
      (Math.abs(t[0] - s[0]) <= TOL_MM && Math.abs(t[1] - s[1]) <= TOL_MM && Math.abs(t[2] - s[2]) <= TOL_MM && Math.abs(t[3] - s[3]) <= TOL_MM) ||
      (Math.abs(t[0] - s[2]) <= TOL_MM && Math.abs(t[1] - s[3]) <= TOL_MM && Math.abs(t[2] - s[0]) <= TOL_MM && Math.abs(t[3] - s[1]) <= TOL_MM),
  );
}

describe('SVG and DXF of one template agree (both written from one sheet plan)', () => {
  const all = templates();

  it('covers every template kind', () => {
    expect(new Set(all.map((t) => t.kind))).toEqual(new Set(['wrap', 'hole', 'flat']));
  });

  for (const units of ['mm', 'in'] as const) {
    it(`station numbers, labels, title lines and station lines sit at the same points (${units})`, () => {
      const perUnit = units === 'in' ? IN : 1;
      for (const t of all) {
        const options = { job: 'J-5120 Fenmoor boiler house', piece: 'Spool 3-C' };
        const plan = planSheet(t, { ...options, sheetUnits: units });
        const svg = readSvg(templateToSvg(t, { ...options, sheetUnits: units }), plan.page, perUnit);
        const dxf = readDxf(templateToDxf(t, { ...options, units }), perUnit);
        expect(svg.centred.length, `${t.id}: something to compare`).toBeGreaterThan(0);
        expectSameTexts(svg.centred, dxf.centred, `${t.id} ${units} numbers and labels`, true);
        expectSameTexts(svg.left, dxf.left, `${t.id} ${units} title block`, false);
        for (const s of svg.lines) expect(hasSegment(dxf.lines, s) || onCut(dxf.cuts, s), `${t.id} ${units} line ${s.map((v) => v.toFixed(3)).join(' ')}`).toBe(true);
      }
    });
  }

  it('numbers stations past the square-line end on a wrap, on both (the end chosen once, in the plan)', () => {
    const [cut] = layoutBranch({ header: NPS12, branch: NPS6 }).templates;
    if (cut?.kind !== 'wrap') throw new Error('expected a wrap');
    const dxf = readDxf(templateToDxf(cut), 1);
    const one = dxf.centred.find((p) => p.text === '1' || p.text.startsWith('1/'));
    // Station lines run from the square line (y = 0) toward the cut (y > 0): the number lies below y = 0.
    expect(one?.y).toBeLessThan(0);
  });
});
