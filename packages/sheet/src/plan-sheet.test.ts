import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { girthErrorOf } from '@girth/pipes/test-support';
import type { HoleTemplate, StationLine, WrapTemplate } from '@girth/unroll';
import { planSheet } from './plan-sheet.js';
import type { Box, SheetText } from './types.js';

const DEG = Math.PI / 180;

/**
 * A plane cut-back wrap on `odMm` at `cutDeg`: ordinate (D/2) tan(c) (1 − cos phi)
 * (REFERENCES.md, miter), station lines from the square line (y = 0) to the cut.
 */
function wrap(odMm = 168.275, cutDeg = 30, stations = 16, startLine = 'heel'): WrapTemplate {
  const r = odMm / 2;
  const ord = (phi: number) => r * Math.tan(cutDeg * DEG) * (1 - Math.cos(phi));
  const points = Array.from({ length: 129 }, (_, i) => {
    const phi = (2 * Math.PI * i) / 128;
    return [r * phi, ord(phi)] as const;
  });
  const stationLines: StationLine[] = Array.from({ length: stations }, (_, k) => {
    const phi = (2 * Math.PI * k) / stations;
    return { n: k + 1, angleDeg: (360 * k) / stations, from: [r * phi, 0], to: [r * phi, ord(phi)] };
  });
  return {
    id: 'plane-cut',
    kind: 'wrap',
    title: 'Plane cut',
    notes: ['A note'],
    stretchOutMm: Math.PI * odMm,
    wrapOdMm: odMm,
    startLine,
    cut: [{ kind: 'polyline', points, closed: false }],
    squareLine: { kind: 'segment', from: [0, 0], to: [Math.PI * odMm, 0] },
    stationLines,
    marks: [],
    labels: [{ text: 'HEEL', at: [0, -10], heightMm: 4 }],
    stationColumns: [],
    stations: [],
  };
}

/** A hole whose stations k and 8 − k share a girth (x = R asin(r sin phi / R), as on a tee). */
function hole(): HoleTemplate {
  const R = 161.925;
  const r = 76.2;
  const at = (phi: number) => [R * Math.asin((r * Math.sin(phi)) / R), r * Math.cos(phi)] as const;
  return {
    id: 'header-hole',
    kind: 'hole',
    title: 'Hole',
    notes: [],
    wrapOdMm: 2 * R,
    cut: [{ kind: 'polyline', points: Array.from({ length: 64 }, (_, i) => at((2 * Math.PI * i) / 64)), closed: true }],
    stationLines: Array.from({ length: 16 }, (_, k) => {
      const p = at((2 * Math.PI * k) / 16);
      return { n: k + 1, angleDeg: 22.5 * k, from: [p[0], 0], to: p };
    }),
    marks: [],
    labels: [],
    stationColumns: [],
    stations: [],
  };
}

const texts = (items: ReturnType<typeof planSheet>['items'], role: SheetText['role']) =>
  items.filter((i): i is SheetText => i.kind === 'text' && i.role === role);

/** An item's box as it is drawn: a text turned 90° about its pivot has its box turned with it. */
function turned(i: Exclude<ReturnType<typeof planSheet>['items'][number], { kind: 'path' }>): Box {
  if (i.kind !== 'text' || i.rotateDeg === 0) return i.box;
  const [px, py] = i.pivot;
  // (x, y) -> (px - (y - py), py + (x - px)) turns counter-clockwise by 90°.
  return { minX: px - (i.box.maxY - py), maxX: px - (i.box.minY - py), minY: py + (i.box.minX - px), maxY: py + (i.box.maxX - px) };
}

function inside(b: Box, page: { left: number; top: number; widthMm: number; heightMm: number }): boolean {
  const eps = 1e-9;
  return b.minX >= page.left - eps && b.maxX <= page.left + page.widthMm + eps && b.maxY <= page.top + eps && b.minY >= page.top - page.heightMm - eps;
}

describe('planSheet', () => {
  test('every text box and rectangle lies on the page, inside the margin (invariant)', () => {
    for (const t of [wrap(), hole()]) {
      const plan = planSheet(t, { marginMm: 10 });
      const inner = { left: plan.page.left + 10, top: plan.page.top - 10, widthMm: plan.page.widthMm - 20, heightMm: plan.page.heightMm - 20 };
      for (const i of plan.items) if (i.kind !== 'path') expect(inside(turned(i), inner), `${t.id} ${i.role}`).toBe(true);
    }
  });

  test('one station number per station on a wrap, just past the square-line end (below y = 0)', () => {
    const plan = planSheet(wrap());
    const numbers = texts(plan.items, 'station-number');
    expect(numbers.map((n) => n.lines[0])).toEqual(Array.from({ length: 16 }, (_, i) => String(i + 1)));
    for (const n of numbers) expect(n.box.maxY).toBeLessThan(0);
  });

  test('a tee hole numbers every station on its own, past the hole edge: no "2/8" that reads as a fraction', () => {
    const plan = planSheet(hole());
    const numbers = texts(plan.items, 'station-number');
    expect(numbers.map((n) => n.lines[0])).toEqual(Array.from({ length: 16 }, (_, i) => String(i + 1)));
    // Each number lies past its line's hole-edge end: farther from the girth line (y = 0) than the edge.
    for (const n of numbers) {
      const line = hole().stationLines[n.stations![0]! - 1]!;
      const y = (n.box.minY + n.box.maxY) / 2;
      if (Math.abs(line.to[1]) > 1) expect(Math.sign(y)).toBe(Math.sign(line.to[1]));
      expect(Math.abs(y)).toBeGreaterThan(Math.abs(line.to[1]));
    }
    expect(numbers[0]!.capHeightMm).toBeGreaterThanOrEqual(3);
  });

  test('numbers of close stations step out in rows instead of overlapping (NPS 1/2, 64 stations)', () => {
    const plan = planSheet(wrap(21.336, 30, 64));
    const numbers = texts(plan.items, 'station-number');
    expect(numbers).toHaveLength(64);
    expect(new Set(numbers.map((n) => n.at[1].toFixed(6))).size).toBeGreaterThan(1);
  });

  test('the placement line says what each kind goes on: a miter wrap from the throat line, a hole on its OD', () => {
    const line = (t: WrapTemplate | HoleTemplate) => texts(planSheet(t).items, 'title-placement').map((x) => x.lines[0]).join(' ');
    expect(line(wrap(323.85, 22.5, 16, 'throat'))).toContain('edge x = 0 on the throat line (station 1)');
    expect(line(hole())).toBe('Lay on the 323.85 mm OD of the pipe it is marked on.');
  });

  test('textScale scales the title block, not the drawing', () => {
    const a = planSheet(wrap());
    const b = planSheet(wrap(), { textScale: 2 });
    expect(texts(b.items, 'title-title')[0]!.fontMm).toBeCloseTo(2 * texts(a.items, 'title-title')[0]!.fontMm, 12);
    expect(texts(b.items, 'station-number')[0]!.fontMm).toBe(texts(a.items, 'station-number')[0]!.fontMm);
  });

  test('stationNumbers: false plans none; a wrap without its start line is refused', () => {
    expect(texts(planSheet(wrap(), { stationNumbers: false }).items, 'station-number')).toEqual([]);
    const { startLine: _s, ...rest } = wrap();
    const e = girthErrorOf(() => planSheet(rest as WrapTemplate));
    expect(e.code).toBe('EMPTY_INPUT');
    expect(e.field).toBe('template.startLine');
  });
});

describe('planSheet paper: false', () => {
  // Invariant: leaving the paper layer out removes exactly its items and moves nothing else.
  test('is the full plan without its paper items, for wraps and holes', () => {
    for (const [template, extra] of [
      [wrap(), {}],
      [wrap(60.325, 45, 12, 'toe'), { job: 'J-3307', piece: 'SP-21', textScale: 1.5 }],
      [hole(), { sheetUnits: 'in' as const }],
    ] as const) {
      const full = planSheet(template, extra);
      const lean = planSheet(template, { ...extra, paper: false });
      expect(full.items.some((i) => i.layer === 'paper')).toBe(true);
      expect(lean).toEqual({ ...full, items: full.items.filter((i) => i.layer !== 'paper') });
    }
  });

  test('refuses a flag that is not true or false, naming paper', () => {
    const e = girthErrorOf(() => planSheet(wrap(), { paper: 'no' as unknown as boolean }));
    expect(e.code).toBe('BAD_OPTION');
    expect(e.field).toBe('paper');
  });
});

describe('planSheet: the sides of the cut and the piece in large print', () => {
  const sideWords = (plan: ReturnType<typeof planSheet>) => texts(plan.items, 'side').map((t) => t.lines.join(' '));
  test('a wrap says WASTE between the square line and the cut, PIPE BODY past the cut', () => {
    const plan = planSheet(wrap());
    expect(sideWords(plan)).toEqual(['WASTE', 'PIPE BODY']);
    const [waste, body] = texts(plan.items, 'side');
    // Plane cut-back: ordinate (D/2) tan(c) (1 - cos phi) (REFERENCES.md): the cut's height at the word's x.
    const r = 168.275 / 2;
    const cutAt = (x: number) => r * Math.tan(30 * DEG) * (1 - Math.cos(x / r));
    const mid = (b: Box): [number, number] => [(b.minX + b.maxX) / 2, (b.minY + b.maxY) / 2];
    expect(waste!.box.minY).toBeGreaterThan(0);
    expect(waste!.box.maxY).toBeLessThan(cutAt(mid(waste!.box)[0]));
    expect(body!.box.minY).toBeGreaterThan(cutAt(mid(body!.box)[0]));
  });

  test('a hole says WASTE inside the hole; the piece and title stand in large print over the drawing', () => {
    const plan = planSheet(hole(), { piece: 'SP-07' });
    expect(sideWords(plan)[0]).toBe('WASTE');
    const [piece] = texts(plan.items, 'piece-mark');
    expect(piece!.lines.join(' ')).toBe('SP-07 - Hole');
    expect(piece!.capHeightMm).toBeGreaterThanOrEqual(5 - 1e-9);
    expect(piece!.box.minY).toBeGreaterThan(Math.max(...hole().stationLines.map((s) => s.to[1])));
  });
});
