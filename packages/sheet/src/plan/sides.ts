/**
 * Which side of the cut is thrown away and which is kept, written on the
 * drawing as a hand template would: WASTE on the off-cut, and the kept part
 * named (PIPE BODY on a wrap, HEADER BODY around a hole, PART inside a flat
 * pattern), each in the roomiest free spot of its side; and the piece and
 * pipe in large print over the drawing, on the body side of a wrap.
 */
import type { Point2, PathPart, Template } from '@girth/unroll';
import type { Box } from '../types.js';
import { CAP_HEIGHT_EM, LINE_EM } from '../style.js';
import type { CentredText } from '../internal/text-box.js';
import { wrapToWidth } from '../internal/wrap-width.js';
import { textLines } from '../internal/text-lines.js';
import type { Obstacles } from './obstacles.js';
import { placeText, stepsAlong } from './place-text.js';

/** Cap height of the side words, mm. */
export const SIDE_CAP_MM = 4;
/** Cap height of the piece and pipe in large print, mm. */
export const PIECE_CAP_MM = 5;
/** Least width the large print may take before it is broken into lines, mm. */
const PIECE_MIN_WIDTH_MM = 150;

/** y of an open polyline at `x` (points ascending in x), or undefined outside it. */
function yAt(part: PathPart | undefined, x: number): number | undefined {
  if (part?.kind !== 'polyline') return undefined;
  const p = part.points;
  let lo = 0;
  let hi = p.length - 1;
  if (hi < 1 || x < (p[0] as Point2)[0] || x > (p[hi] as Point2)[0]) return undefined;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((p[mid] as Point2)[0] <= x) lo = mid;
    else hi = mid;
  }
  const a = p[lo] as Point2;
  const b = p[hi] as Point2;
  return b[0] === a[0] ? a[1] : a[1] + ((b[1] - a[1]) * (x - a[0])) / (b[0] - a[0]);
}

interface Spot {
  readonly at: Point2;
  /** Room around it, mm: roomier spots are tried first. */
  readonly room: number;
}

const byRoom = (spots: Spot[]): Point2[] => spots.sort((a, b) => b.room - a.room).map((s) => s.at);

/** Spots for the two side words: [waste, kept]. */
function sideSpots(template: Template, geometry: Box): [Point2[], Point2[]] {
  const waste: Spot[] = [];
  const kept: Spot[] = [];
  if (template.kind === 'wrap') {
    // Between the square line (y = 0) and the near cut is off-cut; past it the pipe body, up to a far cut if any.
    for (const s of template.stationLines) {
      const x = s.from[0];
      const near = yAt(template.cut[0], x);
      if (near === undefined) continue;
      const far = yAt(template.cut[1], x) ?? geometry.maxY;
      waste.push({ at: [x, near / 2], room: near });
      kept.push({ at: [x, (near + far) / 2], room: far - near });
    }
  } else {
    // The middles of the station lines lie inside a hole (waste) or inside a flat pattern (the part).
    const inner = template.stationLines.map((s) => ({
      at: [(s.from[0] + s.to[0]) / 2, (s.from[1] + s.to[1]) / 2] as Point2,
      room: Math.hypot(s.to[0] - s.from[0], s.to[1] - s.from[1]),
    }));
    // The drawing's corners lie outside both.
    const corners: Point2[] = [
      [geometry.minX, geometry.minY],
      [geometry.maxX, geometry.minY],
      [geometry.minX, geometry.maxY],
      [geometry.maxX, geometry.maxY],
    ];
    const outer = corners.map((at) => ({ at, room: 0 }));
    if (template.kind === 'hole') {
      waste.push(...inner);
      kept.push(...outer);
    } else {
      kept.push(...inner);
      waste.push(...outer);
    }
  }
  return [byRoom(waste), byRoom(kept)];
}

/** The words for the kept side of each kind of template. */
const KEPT_WORDS: Readonly<Record<Template['kind'], string>> = { wrap: 'PIPE BODY', hole: 'HEADER BODY', flat: 'PART' };

/** Side words and large print, placed. */
export interface SideTexts {
  readonly sides: readonly CentredText[];
  readonly piece: CentredText | undefined;
}

/**
 * Places WASTE and the kept side's name (each only where it fits clear of the
 * cut and other text), then the piece and what it is in large print over the
 * drawing: `piece` (when given) and the template's title, broken to the
 * drawing's width (150 mm least).
 *
 * @example planSides(template, geometryBox, obstacles, 'SP-07').sides.map((t) => t.lines[0]) // ['WASTE', 'PIPE BODY']
 */
export function planSides(template: Template, geometry: Box, obstacles: Obstacles, piece: string | undefined): SideTexts {
  const [wasteAt, keptAt] = sideSpots(template, geometry);
  const font = SIDE_CAP_MM / CAP_HEIGHT_EM;
  const sides: CentredText[] = [];
  const waste = placeText(obstacles, ['WASTE'], font, true, wasteAt);
  if (waste) sides.push(waste);
  const kept = placeText(obstacles, [KEPT_WORDS[template.kind]], font, true, keptAt);
  if (kept) sides.push(kept);

  const pieceFont = PIECE_CAP_MM / CAP_HEIGHT_EM;
  const head = [piece === undefined ? '' : textLines(piece).join(' ').trim(), textLines(template.title).join(' ')].filter((s) => s.length > 0).join(' - ');
  const widthMm = Math.max(geometry.maxX - geometry.minX, PIECE_MIN_WIDTH_MM);
  const lines = wrapToWidth(head, widthMm, pieceFont, true);
  const blockMm = CAP_HEIGHT_EM * pieceFont + (lines.length - 1) * LINE_EM * pieceFont;
  const anchor: Point2 = [(geometry.minX + geometry.maxX) / 2, geometry.maxY];
  const placed = lines.length === 0 ? undefined : placeText(obstacles, lines, pieceFont, true, stepsAlong(anchor, [0, 1], 4, blockMm / 2, 2, 2000), true);
  return { sides, piece: placed };
}
