/**
 * Legibility of the planned sheets, checked on the plan's own geometry: for
 * every template kind and a range of station counts and pipe sizes, no text on
 * the drawing (station numbers, labels) has its box crossing a cut line, the
 * square line or another text's box, no number names two stations (a "3/7"
 * reads as a fraction), and every such text is at least 3 mm high at full size.
 * The 3 mm floor is common practice for shop drawings read at arm's length
 * (recalled: ISO 3098 and ASME Y14.2 both start lettering at about 3 mm).
 */
import { describe, expect, test } from 'vitest';
import { layoutBranch, layoutConcentricCone, layoutEccentricCone, layoutMiter, layoutPlaneCut, type PathPart, type Point2, type Template } from '@girth/unroll';
import { planSheet } from './plan-sheet.js';
import { boxesMeet, segmentMeetsBox } from './plan/obstacles.js';
import type { Box, SheetPlan, SheetText } from './types.js';
import { MIN_CAP_MM } from './style.js';

const IN = 25.4;
// ASME B36.10M (REFERENCES.md, recalled): OD and STD wall, inches.
const pipe = (nps: string, odIn: number, wallIn: number) => ({ odMm: odIn * IN, wallMm: wallIn * IN, label: `NPS ${nps} STD` });
const NPS_HALF = pipe('1/2', 0.84, 0.109);
const NPS2 = pipe('2', 2.375, 0.154);
const NPS6 = pipe('6', 6.625, 0.28);
const NPS12 = pipe('12', 12.75, 0.375);
const NPS24 = pipe('24', 24, 0.375);

/** Straight pieces of a path part (arcs in chords of at most 1°: the test only needs to find crossings). */
function segmentsOf(part: PathPart): [Point2, Point2][] {
  switch (part.kind) {
    case 'segment':
      return [[part.from, part.to]];
    case 'polyline': {
      const out: [Point2, Point2][] = [];
      for (let i = 1; i < part.points.length; i++) out.push([part.points[i - 1]!, part.points[i]!]);
      if (part.closed) out.push([part.points[part.points.length - 1]!, part.points[0]!]);
      return out;
    }
    case 'arc': {
      const sweep = (((part.endDeg - part.startDeg) % 360) + 360) % 360 || 360;
      const n = Math.ceil(sweep);
      const at = (k: number): Point2 => {
        const a = ((part.startDeg + (sweep * k) / n) * Math.PI) / 180;
        return [part.center[0] + part.radiusMm * Math.cos(a), part.center[1] + part.radiusMm * Math.sin(a)];
      };
      return Array.from({ length: n }, (_, k) => [at(k), at(k + 1)] as [Point2, Point2]);
    }
  }
}

/** Text on the drawing (not the title block): station numbers and labels. */
const drawingText = (plan: SheetPlan): SheetText[] =>
  plan.items.filter((i): i is SheetText => i.kind === 'text' && (i.role === 'station-number' || i.role === 'line-name' || i.role === 'label' || i.role === 'side' || i.role === 'piece-mark'));

/** Every way the plan fails to read: a list of sentences, empty when legible. */
function problems(plan: SheetPlan): string[] {
  const out: string[] = [];
  const lines = plan.items.flatMap((i) => (i.kind === 'path' && (i.role === 'cut' || i.role === 'square-line') ? segmentsOf(i.part).map((s) => ({ s, role: i.role })) : []));
  const texts = drawingText(plan);
  for (const t of texts) {
    const name = `${t.role} "${t.lines.join(' ')}"`;
    if (t.capHeightMm < MIN_CAP_MM - 1e-9) out.push(`${name} is ${t.capHeightMm.toFixed(2)} mm high`);
    if (t.role === 'station-number' && (t.stations?.length !== 1 || t.lines.some((l) => l.includes('/')))) out.push(`${name} names more than one station`);
    const hit = lines.find(({ s: [a, b] }) => segmentMeetsBox(a[0], a[1], b[0], b[1], t.box));
    if (hit) out.push(`${name} crosses the ${hit.role}`);
  }
  // Sorted by left edge: each box is compared only with those starting before it ends (no pair missed).
  const sorted = [...texts].sort((a, b) => a.box.minX - b.box.minX);
  for (let i = 0; i < sorted.length; i++) {
    const a = sorted[i]!;
    for (let j = i + 1; j < sorted.length && sorted[j]!.box.minX <= a.box.maxX; j++) {
      const b = sorted[j]!;
      if (boxesMeet(a.box as Box, b.box as Box)) out.push(`"${a.lines.join(' ')}" and "${b.lines.join(' ')}" overlap`);
    }
  }
  return out;
}

const STATION_COUNTS = [4, 8, 12, 16, 24, 32, 48, 64] as const;

function templatesFor(stations: number): [string, Template][] {
  const named = (what: string, ts: readonly Template[]) => ts.map((t): [string, Template] => [`${what} ${t.id}`, t]);
  return [
    ...named('tee 6 on 12', layoutBranch({ header: NPS12, branch: NPS6 }, { stations }).templates),
    ...named('lateral 45° 6 on 12', layoutBranch({ header: NPS12, branch: NPS6, angleDeg: 45 }, { stations }).templates),
    ...named('equal tee 12 on 12', layoutBranch({ header: NPS12, branch: NPS12, contact: { branch: 'outside', header: 'outside' } }, { stations }).templates),
    ...named('offset tee 2 on 6', layoutBranch({ header: NPS6, branch: NPS2, offsetMm: 30 }, { stations }).templates),
    ...named('tee 1/2 on 24', layoutBranch({ header: NPS24, branch: NPS_HALF }, { stations }).templates),
    ...named('plane cut 1/2 at 60°', layoutPlaneCut({ pipe: NPS_HALF, angleDeg: 60 }, { stations }).templates),
    ...named('plane cut 12 at 30°', layoutPlaneCut({ pipe: NPS12, angleDeg: 30 }, { stations }).templates),
    ...named('miter 90° 3 welds NPS 12', layoutMiter({ pipe: NPS12, bendDeg: 90, welds: 3, radiusMm: 18 * IN }, { stations }).templates),
    ...named('miter 90° 3 welds NPS 2', layoutMiter({ pipe: NPS2, bendDeg: 90, welds: 3, radiusMm: 3 * IN }, { stations }).templates),
    ...named('concentric cone 12 x 8', layoutConcentricCone({ largeDiameterMm: 12.75 * IN, smallDiameterMm: 8.625 * IN, lengthMm: 7 * IN, thicknessMm: 9.5 }, { stations }).templates),
    ...named('eccentric cone 6 x 4', layoutEccentricCone({ largeDiameterMm: 6.625 * IN, smallDiameterMm: 4.5 * IN, lengthMm: 5 * IN, thicknessMm: 6 }, { stations }).templates),
  ];
}

describe('sheet legibility (geometric check on the plan)', () => {
  for (const stations of STATION_COUNTS) {
    test(`${stations} stations: every kind reads (no text over a cut or square line or other text, 3 mm or more, one station per number)`, () => {
      const kinds = new Set<string>();
      for (const [name, t] of templatesFor(stations)) {
        kinds.add(t.kind);
        for (const units of ['mm', 'in'] as const) {
          const plan = planSheet(t, { sheetUnits: units, job: 'J-5120', piece: 'SP-07' });
          expect(problems(plan), `${name}, ${units}`).toEqual([]);
          expect(drawingText(plan).filter((x) => x.role === 'station-number')).toHaveLength(t.stationLines.length);
        }
      }
      expect([...kinds].sort()).toEqual(['flat', 'hole', 'wrap']);
    });
  }

  test('the check finds a label laid over the cut (it can fail)', () => {
    const [t] = layoutPlaneCut({ pipe: NPS6, angleDeg: 45 }, { stations: 8 }).templates;
    const plan = planSheet(t!);
    const cut = plan.items.find((i) => i.kind === 'path' && i.role === 'cut');
    if (cut?.kind !== 'path' || cut.part.kind !== 'polyline') throw new Error('no cut polyline');
    const p = cut.part.points[Math.floor(cut.part.points.length / 3)]!;
    const label = drawingText(plan).find((x) => x.role === 'label')!;
    const moved: SheetText = { ...label, box: { minX: p[0] - 5, maxX: p[0] + 5, minY: p[1] - 2, maxY: p[1] + 2 } };
    const bad = { ...plan, items: [...plan.items, moved] };
    expect(problems(bad).some((s) => s.includes('crosses the cut'))).toBe(true);
  });
});
