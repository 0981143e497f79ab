/**
 * Placing a piece of text at the first of its candidate spots that keeps clear
 * of every registered obstacle, then registering it so later text keeps clear
 * of it in turn.
 */
import type { Point2 } from '@girth/unroll';
import { centredText, type CentredText } from '../internal/text-box.js';
import { growBox } from '../internal/box.js';
import { addBox, isFree, type Obstacles } from './obstacles.js';

/** Clear space kept between text and a line or other text, mm (beyond the text's own box). */
export const TEXT_CLEARANCE_MM = 0.6;

/**
 * Places text centred on the first free candidate (tried in order) and registers
 * its box. When every candidate is taken: `undefined` (nothing registered), or
 * with `force` the last candidate all the same.
 *
 * @param candidates - centres to try, template mm, most wanted first.
 * @example placeText(o, ['HEEL'], 6.85, true, [[0, 12], [0, 20]])?.baseline
 */
export function placeText(
  o: Obstacles,
  lines: readonly string[],
  fontMm: number,
  bold: boolean,
  candidates: Iterable<Point2>,
  force = false,
): CentredText | undefined {
  let last: Point2 | undefined;
  for (const c of candidates) {
    last = c;
    const t = centredText(lines, c, fontMm, bold);
    const kept = growBox(t.box, TEXT_CLEARANCE_MM);
    if (isFree(o, kept)) {
      addBox(o, t.box);
      return t;
    }
  }
  if (!force || last === undefined) return undefined;
  const t = centredText(lines, last, fontMm, bold);
  addBox(o, t.box);
  return t;
}

/**
 * Centres stepping away from `anchor` along the unit direction `u`: the first
 * `gapMm + halfAlongMm` out, then every `stepMm`, at most `count` of them.
 *
 * @example [...stepsAlong([0, 0], [0, -1], 1.5, 2, 5, 3)] // [[0, -3.5], [0, -8.5], [0, -13.5]]
 */
export function* stepsAlong(anchor: Point2, u: Point2, gapMm: number, halfAlongMm: number, stepMm: number, count: number): Generator<Point2> {
  for (let k = 0; k < count; k++) {
    const d = gapMm + halfAlongMm + k * stepMm;
    yield [anchor[0] + u[0] * d, anchor[1] + u[1] * d];
  }
}

/**
 * Centres around `at`: `at` itself, then rings every `stepMm` out to `maxMm`,
 * each ring tried from straight below, round through 16 directions (so the
 * nearest free spot wins).
 *
 * @example [...ringsAround([0, 0], 2, 2)].length // 17
 */
export function* ringsAround(at: Point2, stepMm: number, maxMm: number): Generator<Point2> {
  yield at;
  for (let r = stepMm; r <= maxMm + 1e-9; r += stepMm) {
    for (let k = 0; k < 16; k++) {
      const a = -Math.PI / 2 + (k % 2 === 0 ? 1 : -1) * Math.ceil(k / 2) * (Math.PI / 8);
      yield [at[0] + r * Math.cos(a), at[1] + r * Math.sin(a)];
    }
  }
}
