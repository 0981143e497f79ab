import { describe, expect, test } from 'vitest';
import { templateToSvg } from './template-to-svg.js';
import { STROKE_MM } from '@girth/sheet';
import { coneSector, DEMO_JOB, DEMO_PIECE, planeCutWrap, teeHole } from './test-support/fixtures.js';
import { byId, elements, parseSvg, sheetSize, textOf } from './test-support/parse.js';
import { pathBounds, readPath, type ReadPath } from './test-support/path-geometry.js';
import { expectClose } from './test-support/expect-close.js';
import type { INode } from 'svgson';
import { CAUTION, type StationLine } from '@girth/unroll';

const IN = 25.4;
const DEG = Math.PI / 180;

function paths(group: INode): ReadPath[] {
  return elements(group, 'path').map((p) => readPath(p.attributes.d ?? ''));
}

function boundsOf(group: INode) {
  const all = paths(group).map(pathBounds);
  return {
    minX: Math.min(...all.map((b) => b.minX)),
    maxX: Math.max(...all.map((b) => b.maxX)),
    minY: Math.min(...all.map((b) => b.minY)),
    maxY: Math.max(...all.map((b) => b.maxY)),
  };
}

describe('templateToSvg: true physical size', () => {
  // NPS 6 OD 6.625 in (ASME B36.10M, recalled; REFERENCES.md), a 30° plane cut.
  const od = 6.625 * IN;
  const wrap = planeCutWrap(od, 30);

  test('width and height in mm agree with the viewBox (1 user unit = 1 mm)', () => {
    const s = sheetSize(parseSvg(templateToSvg(wrap)));
    expect(s.unit).toBe('mm');
    expect(s.viewBox).toEqual([0, 0, s.width, s.height]);
  });

  test('width and height in inches agree with the viewBox (1 user unit = 1 in)', () => {
    const mm = sheetSize(parseSvg(templateToSvg(wrap)));
    const inch = sheetSize(parseSvg(templateToSvg(wrap, { sheetUnits: 'in' })));
    expect(inch.unit).toBe('in');
    expect(inch.viewBox).toEqual([0, 0, inch.width, inch.height]);
    // Same drawing, so the same paper up to the calibration bar (4 in = 101.6 mm vs 100 mm)
    // and the wording of lengths in the title block: within a few mm.
    expectClose(inch.width * IN, mm.width, 5, 'sheet width in vs mm');
  });

  test('the cut line spans exactly the stretch-out pi x OD (mm sheet)', () => {
    const cut = byId(parseSvg(templateToSvg(wrap)), 'cut');
    const b = boundsOf(cut);
    // Stretch-out = pi x OD (DESIGN.md; common practice), within 0.01 mm.
    expectClose(b.maxX - b.minX, Math.PI * od, 0.01, 'cut horizontal extent');
    // Deepest ordinate of a plane cut at phi = 180°: (D/2) tan(c) (1 - cos 180°) = D tan(c)
    // (REFERENCES.md, "Miter": ordinate of a plane cut).
    expectClose(b.maxY - b.minY, od * Math.tan(30 * DEG), 0.01, 'cut vertical extent');
  });

  test('the cut line spans the stretch-out on an inch sheet too', () => {
    const cut = byId(parseSvg(templateToSvg(wrap, { sheetUnits: 'in' })), 'cut');
    const b = boundsOf(cut);
    expectClose((b.maxX - b.minX) * IN, Math.PI * od, 0.01, 'cut horizontal extent, in -> mm');
  });

  test('y is flipped: the toe (largest ordinate) is highest on the paper, the square line below it', () => {
    const root = parseSvg(templateToSvg(wrap));
    const cut = paths(byId(root, 'cut'))[0] as ReadPath;
    const ys = cut.points.map((p) => p[1]);
    const top = Math.min(...ys);
    const iTop = ys.indexOf(top);
    // The toe is at phi = 180°, half way along the cut (common practice: heel at station 1).
    expect(iTop).toBe(Math.round((cut.points.length - 1) / 2));
    const sq = paths(byId(root, 'square-line'))[0] as ReadPath;
    expectClose(sq.points[0]?.[1] ?? NaN, Math.max(...ys), 1e-9, 'square line on the heel ordinate');
  });
});

describe('templateToSvg: groups and what every sheet carries', () => {
  const wrap = planeCutWrap(168.275, 30);
  const root = parseSvg(templateToSvg(wrap, { job: DEMO_JOB, piece: DEMO_PIECE }));

  test('every group is there with its stable id and class', () => {
    for (const id of ['cut', 'square-line', 'stations', 'labels', 'marks', 'title-block', 'calibration', 'overlap']) {
      expect(byId(root, id).attributes.class).toBe(id);
    }
  });

  test('the cut line is the heaviest line, marks are lighter', () => {
    const w = (id: string) => Number(byId(root, id).attributes['stroke-width']);
    expect(w('cut')).toBe(STROKE_MM.cut);
    expect(w('cut')).toBeGreaterThan(w('square-line'));
    expect(w('square-line')).toBeGreaterThan(w('marks'));
  });

  test('the title block carries job, piece, title, notes, placement and the caution once', () => {
    const text = textOf(byId(root, 'title-block'));
    expect(text).toContain(`Job: ${DEMO_JOB}`);
    expect(text).toContain(`Piece: ${DEMO_PIECE}`);
    expect(text).toContain(wrap.title);
    for (const n of wrap.notes) expect(text).toContain(n);
    expect(text).toContain('Wrap on the 168.275 mm OD: edge x = 0 on the heel line');
    // Project rule: printed templates carry the caution; one line of it, not one per note.
    expect(text.split(CAUTION)).toHaveLength(2);
    expect(elements(root, 'text').map(textOf).join('\n').split('CAUTION')).toHaveLength(2);
  });

  test('title, desc and metadata describe the sheet', () => {
    expect(textOf(elements(root, 'title')[0] as INode)).toBe(`${DEMO_JOB} — ${DEMO_PIECE} — ${wrap.title}`);
    expect(textOf(elements(root, 'desc')[0] as INode).split(CAUTION)).toHaveLength(2);
    const meta = elements(root, 'girth:sheet')[0] as INode;
    expect(meta.attributes).toMatchObject({
      job: DEMO_JOB,
      piece: DEMO_PIECE,
      'template-id': 'plane-cut',
      'template-kind': 'wrap',
      'sheet-units': 'mm',
      'overlap-mm': '25',
    });
    expectClose(Number(meta.attributes['stretch-out-mm']), Math.PI * 168.275, 0.001, 'metadata stretch-out');
  });

  test('a station number for every station line, and the template labels', () => {
    const stationTexts = elements(byId(root, 'stations'), 'text');
    const numbers = stationTexts.filter((t) => t.attributes['data-station'] !== undefined).map(textOf);
    expect(numbers).toEqual(wrap.stationLines.map((s) => String(s.n)));
    // The quarter lines not already labelled by the template are named beside their numbers.
    expect(stationTexts.filter((t) => t.attributes['data-station'] === undefined).map(textOf)).toEqual(['SIDE', 'SIDE']);
    expect(elements(byId(root, 'labels'), 'text').map(textOf)).toEqual(['HEEL', 'TOE']);
  });

  test('station lines starting at the same point each keep their own number (no "2/8" that reads as a fraction)', () => {
    const [a, b, c] = wrap.stationLines as [StationLine, StationLine, StationLine];
    const t = { ...wrap, stationLines: [{ ...a, n: 8 }, { ...b, n: 2, from: a.from }, c] };
    const texts = elements(byId(parseSvg(templateToSvg(t)), 'stations'), 'text').filter((x) => x.attributes['data-station'] !== undefined);
    expect(texts.map(textOf)).toEqual(['8', '2', String(c.n)]);
    expect(texts.map((x) => x.attributes['data-station'])).toEqual(['8', '2', String(c.n)]);
  });

  test('without job and piece the sheet leaves blanks to write on', () => {
    const text = textOf(byId(parseSvg(templateToSvg(wrap)), 'title-block'));
    expect(text).toMatch(/Job: _{8,} · Piece: _{8,}/);
  });
});

describe('templateToSvg: the overlap (glue tab) of a wrap', () => {
  const od = 114.3; // NPS 4 OD 4.500 in (ASME B36.10M, recalled)
  const wrap = planeCutWrap(od, 22.5);

  function tab(svg: string): { x: number; w: number; words: string } {
    const g = byId(parseSvg(svg), 'overlap');
    const rect = elements(g, 'rect')[0] as INode;
    return { x: Number(rect.attributes.x), w: Number(rect.attributes.width), words: textOf(g) };
  }

  test('runs the default 25 mm past the stretch-out, starting where the girth closes', () => {
    const svg = templateToSvg(wrap);
    const cut = boundsOf(byId(parseSvg(svg), 'cut'));
    const t = tab(svg);
    expectClose(t.w, 25, 1e-9, 'tab width');
    expectClose(t.x, cut.maxX, 0.002, 'tab starts at x = stretch-out');
    expect(t.words).toBe('overlap — align station 1 here');
  });

  test('takes overlapMm, in inches on an inch sheet', () => {
    const t = tab(templateToSvg(wrap, { overlapMm: 50.8, sheetUnits: 'in' }));
    expectClose(t.w, 2, 1e-9, 'tab width, in');
  });

  test('the words stay on the sheet when the tab is narrow', () => {
    const t = tab(templateToSvg(wrap, { overlapMm: 3 }));
    expectClose(t.w, 3, 1e-9, 'tab width');
    expect(t.words).toBe('overlap — align station 1 here');
  });

  test('overlapMm 0 draws no tab', () => {
    const g = byId(parseSvg(templateToSvg(wrap, { overlapMm: 0 })), 'overlap');
    expect(g.children).toEqual([]);
  });

  test('hole templates and flat patterns have no tab', () => {
    for (const t of [teeHole(161.925, 57.15), coneSector(203.2, 127, 101.6)]) {
      const root = parseSvg(templateToSvg(t, { overlapMm: 40 }));
      expect(byId(root, 'overlap').children).toEqual([]);
      expect(elements(root, 'girth:sheet')[0]?.attributes['overlap-mm']).toBeUndefined();
    }
  });
});

describe('templateToSvg: arcs and closed contours', () => {
  test('a cone pattern keeps its published radii and sweep as true arcs', () => {
    // Worked example (REFERENCES.md; "Drawing Nets", ceemrr.com Geometry2/DrawingsNets6):
    // an 8 in to 5 in cone 4 in long has pattern radii 11.39 and 7.12 in and a 126.4° sweep.
    const root = parseSvg(templateToSvg(coneSector(8 * IN, 5 * IN, 4 * IN), { sheetUnits: 'in' }));
    const arcPaths = paths(byId(root, 'cut')).filter((p) => p.arcs.length > 0);
    expect(arcPaths).toHaveLength(2);
    const radii = arcPaths.map((p) => p.arcs[0]?.r ?? NaN).sort((a, b) => a - b);
    expectClose(radii[0] as number, 7.12, 0.005, 'inner radius, in (published to 0.01 in)');
    expectClose(radii[1] as number, 11.39, 0.005, 'outer radius, in (published to 0.01 in)');
    for (const p of arcPaths) {
      const sweep = p.arcs.reduce((sum, a) => sum + Math.abs(a.sweepDeg), 0);
      expectClose(sweep, 126.4, 0.05, 'sweep, degrees (published to 0.1°)');
    }
    // Every piece of both arcs has the same centre: a true annular sector.
    const all = arcPaths.flatMap((p) => p.arcs);
    for (const a of all) expectClose(Math.hypot(a.cx - all[0]!.cx, a.cy - all[0]!.cy), 0, 1e-4, 'common centre, in');
  });

  test('an arc near 180° keeps its centre after rounding (written in pieces of at most 90°)', () => {
    // Invariant: the centre read back from the written endpoints and radius (SVG 1.1 F.6.5).
    for (const sweep of [179.5, 179.99, 180, 180.2, 270]) {
      const t = { ...teeHole(100, 20), marks: [], labels: [], cut: [{ kind: 'arc' as const, center: [0, 0] as const, radiusMm: 650, startDeg: 13, endDeg: 13 + sweep }] };
      const root = parseSvg(templateToSvg(t, { marginMm: 0 }));
      const arcs = paths(byId(root, 'cut')).flatMap((p) => p.arcs);
      for (const a of arcs) expect(Math.abs(a.sweepDeg)).toBeLessThanOrEqual(90.001); // 90° plus rounding
      for (const a of arcs) expectClose(Math.hypot(a.cx - arcs[0]!.cx, a.cy - arcs[0]!.cy), 0, 0.005, `centre drift, sweep ${sweep}°`);
      expectClose(arcs.reduce((s, a) => s + Math.abs(a.sweepDeg), 0), sweep, 0.001, 'total sweep');
    }
  });

  test('a full circle is drawn whole', () => {
    const t = { ...teeHole(100, 20), cut: [{ kind: 'arc' as const, center: [0, 0] as const, radiusMm: 30, startDeg: 0, endDeg: 360 }] };
    const b = boundsOf(byId(parseSvg(templateToSvg(t)), 'cut'));
    expectClose(b.maxX - b.minX, 60, 0.002, 'circle width');
    expectClose(b.maxY - b.minY, 60, 0.002, 'circle height');
  });

  test('a tee hole is one closed contour as wide as the branch along the header', () => {
    // MathWorld, "Cylinder-Cylinder Intersection": for a branch of radius r square on a header
    // of radius R the hole spans 2r along the header and 2 R asin(r/R) around it.
    const R = 323.85 / 2; // NPS 12 OD 12.750 in (ASME B36.10M, recalled)
    const r = 114.3 / 2; // NPS 4 OD 4.500 in
    const root = parseSvg(templateToSvg(teeHole(R, r, 720)));
    const [contour] = paths(byId(root, 'cut'));
    expect(contour?.closedSubpaths).toBe(1);
    const b = boundsOf(byId(root, 'cut'));
    expectClose(b.maxY - b.minY, 2 * r, 0.01, 'axial extent');
    expectClose(b.maxX - b.minX, 2 * R * Math.asin(r / R), 0.01, 'girth extent');
  });
});

describe('templateToSvg: numbers', () => {
  test('every number has at most 3 decimals on a mm sheet and 5 on an inch sheet, and none is NaN', () => {
    for (const [units, places] of [['mm', 3], ['in', 5]] as const) {
      const svg = templateToSvg(planeCutWrap(219.075, 45), { sheetUnits: units });
      expect(svg).not.toMatch(/NaN|Infinity/);
      const decimals = [...svg.replace(/^<\?xml[^>]*>/, '').matchAll(/\d+\.(\d+)/g)].map((m) => (m[1] as string).length);
      expect(Math.max(...decimals)).toBeLessThanOrEqual(places);
    }
  });
});
