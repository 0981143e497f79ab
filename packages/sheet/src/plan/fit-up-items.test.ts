import { describe, expect, test } from 'vitest';
import { branchFitUp, layoutBranch, layoutMiter, layoutPlaneCut, miterFitUp, planeCutFitUp, withFitUp, type Template } from '@girth/unroll';
import { planSheet } from '../plan-sheet.js';
import type { Box, SheetItem, SheetText } from '../types.js';

const IN = 25.4;
// ASME B36.10M (REFERENCES.md, recalled): NPS 12 STD 12.750 x 0.375 in, NPS 6 STD 6.625 x 0.280 in, NPS 10 STD 10.750 x 0.365 in.
const NPS12 = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' };
const NPS6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };
const NPS10 = { odMm: 10.75 * IN, wallMm: 0.365 * IN, label: 'NPS 10 STD' };
const FT_IN = { format: 'ft-in' } as const;

const tee = { header: NPS12, branch: NPS6 };
const teeShort = withFitUp(layoutBranch(tee, { stations: 16 }), branchFitUp(tee), { ordinatesFrom: 'short-point', referenceLines: true, format: FT_IN });
const cutSpec = { pipe: NPS6, angleDeg: 45 };
const cutLong = withFitUp(layoutPlaneCut(cutSpec, { stations: 16 }), planeCutFitUp(cutSpec), { format: FT_IN });
const ellSpec = { pipe: NPS10, bendDeg: 90, welds: 3, radiusMm: 1.5 * 10 * IN };
const ell = withFitUp(layoutMiter(ellSpec, { stations: 16 }), miterFitUp(ellSpec), { ordinatesFrom: 'short-point', referenceLines: true, format: { format: 'mm' } });

/** The box a text covers on the sheet, turned as drawn (90° counter-clockwise about its pivot). */
function drawnBox(t: SheetText): Box {
  if (t.rotateDeg === 0) return t.box;
  const [px, py] = t.pivot;
  const c = [
    [t.box.minX, t.box.minY],
    [t.box.maxX, t.box.maxY],
  ].map(([x, y]) => [px - (y! - py), py + (x! - px)] as const);
  return { minX: Math.min(c[0]![0], c[1]![0]), maxX: Math.max(c[0]![0], c[1]![0]), minY: Math.min(c[0]![1], c[1]![1]), maxY: Math.max(c[0]![1], c[1]![1]) };
}

const overlaps = (a: Box, b: Box): boolean => a.minX < b.maxX && b.minX < a.maxX && a.minY < b.maxY && b.minY < a.maxY;

/** Independent check: does any straight piece of the cut pass through the box (sampled every 0.05 mm along each piece)? */
function cutCrosses(template: Template, b: Box): boolean {
  for (const part of template.cut) {
    if (part.kind !== 'polyline') continue;
    for (let i = 1; i < part.points.length; i++) {
      const [x0, y0] = part.points[i - 1]!;
      const [x1, y1] = part.points[i]!;
      const n = Math.max(1, Math.ceil(Math.hypot(x1 - x0, y1 - y0) / 0.05));
      for (let k = 0; k <= n; k++) {
        const x = x0 + ((x1 - x0) * k) / n;
        const y = y0 + ((y1 - y0) * k) / n;
        if (x > b.minX && x < b.maxX && y > b.minY && y < b.maxY) return true;
      }
    }
  }
  return false;
}

const texts = (items: readonly SheetItem[], role: string): SheetText[] => items.filter((i): i is SheetText => i.kind === 'text' && i.role === role);

describe('the fit-up on the sheet', () => {
  const cases: [string, Template][] = [
    ['tee branch cut, from the short point', teeShort.templates[0]],
    ['45° cut-back, from the long point', cutLong.templates[0]],
    ...ell.templates.map((t): [string, Template] => [`miter ${t.id}, from the short point`, t]),
  ];
  test.each(cases)('%s: every station ordinate is written along its line, clear of the cut, the labels, the station numbers and each other', (_, template) => {
    const plan = planSheet(template, { sheetUnits: 'in' });
    const ordinates = texts(plan.items, 'station-ordinate');
    const o = template.ordinates!;
    expect(ordinates).toHaveLength(o.stations.length);
    const others = plan.items.filter((i): i is SheetText => i.kind === 'text' && ['label', 'station-number', 'reference-label'].includes(i.role)).map(drawnBox);
    const placed: Box[] = [];
    for (const t of ordinates) {
      const s = o.stations.find((q) => q.n === t.stations![0] && q.text === t.lines[0])!;
      expect(s, `station ${t.stations![0]}`).toBeDefined();
      expect(t.rotateDeg).toBe(90);
      const b = drawnBox(t);
      // Beside its own line: the turned text's near edge within a font size of the station's girth.
      expect(Math.min(Math.abs(b.minX - s.from[0]), Math.abs(b.maxX - s.from[0]))).toBeLessThan(t.fontMm);
      expect(cutCrosses(template, b), `station ${s.n} crosses the cut`).toBe(false);
      for (const other of [...others, ...placed]) expect(overlaps(b, other), `station ${s.n} covers another text`).toBe(false);
      // Inside the drawing, so the page holds it.
      expect(b.minX >= plan.drawing.minX && b.maxX <= plan.drawing.maxX && b.minY >= plan.drawing.minY && b.maxY <= plan.drawing.maxY).toBe(true);
      placed.push(b);
    }
  });

  test('both square lines are drawn and labelled when asked, and the stretch from the short point is drawn for each station', () => {
    const plan = planSheet(teeShort.templates[0], { sheetUnits: 'in' });
    const labels = texts(plan.items, 'reference-label').map((t) => t.lines[0]);
    expect(labels.sort()).toEqual(['SQUARE LINE, LONG POINT', 'SQUARE LINE, SHORT POINT']);
    // The long-point line is the template's own square line (drawn once); the short-point line lies the full depth up the wrap.
    const refs = plan.items.filter((i) => i.kind === 'path' && i.role === 'reference-line');
    expect(refs).toHaveLength(1);
    const depth = teeShort.templates[0].ordinates!.columns[0]!.fullDepthMm;
    // MathWorld, "Cylinder-Cylinder Intersection": saddle depth R − sqrt(R² − r²), r the branch ID / 2 (set-on).
    const R = NPS12.odMm / 2;
    const r = NPS6.odMm / 2 - NPS6.wallMm;
    expect(Math.abs(depth - (R - Math.sqrt(R * R - r * r)))).toBeLessThan(1e-9 * R);
    const line = refs[0]!.kind === 'path' ? refs[0]!.part : undefined;
    expect(line?.kind === 'segment' && line.from[1]).toBeCloseTo(depth, 9);
    // Stations on the crown have no stretch (their ordinate is 0): the other 14 are drawn.
    expect(plan.items.filter((i) => i.kind === 'path' && i.role === 'ordinate-line')).toHaveLength(14);
  });

  test('the fit-up block sits under the drawing, above the title block, with the reference line and the fit-up lines', () => {
    for (const t of [...teeShort.templates, cutLong.templates[0]]) {
      const plan = planSheet(t);
      const block = texts(plan.items, 'fit-up');
      expect(block[0]?.lines).toEqual(['FIT-UP']);
      const all = block.map((b) => b.lines[0]).join(' ');
      for (const l of [...(t.ordinates?.lines ?? []), ...(t.fitUpLines ?? [])]) expect(all.replace(/\s+/g, ' ')).toContain(l.slice(0, 40));
      const title = plan.items.find((i): i is SheetText => i.kind === 'text' && i.role === 'title-job')!;
      for (const b of block) expect(b.box.minY).toBeGreaterThan(title.box.maxY);
    }
  });

  test('a template without its fit-up plans nothing new', () => {
    const plain = planSheet(layoutPlaneCut(cutSpec, { stations: 16 }).templates[0]);
    expect(plain.items.some((i) => ['station-ordinate', 'fit-up', 'reference-label', 'reference-line', 'ordinate-line'].includes(i.role))).toBe(false);
  });
});
