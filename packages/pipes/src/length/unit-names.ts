/**
 * The spellings of length units Girth reads: abbreviations, singular and plural
 * words (metre and meter), and the foot and inch marks.
 */
import type { WrittenLengthUnit } from './units.js';

const UNIT_SPELLINGS: Readonly<Record<string, WrittenLengthUnit>> = {
  mm: 'mm',
  millimeter: 'mm',
  millimeters: 'mm',
  millimetre: 'mm',
  millimetres: 'mm',
  cm: 'cm',
  centimeter: 'cm',
  centimeters: 'cm',
  centimetre: 'cm',
  centimetres: 'cm',
  m: 'm',
  meter: 'm',
  meters: 'm',
  metre: 'm',
  metres: 'm',
  in: 'in',
  'in.': 'in',
  inch: 'in',
  inches: 'in',
  '"': 'in',
  "''": 'in',
  ft: 'ft',
  'ft.': 'ft',
  foot: 'ft',
  feet: 'ft',
  "'": 'ft',
};

/** The unit marks a fitter may type, for error messages and help text. */
export const ACCEPTED_UNIT_NAMES: readonly string[] = ['mm', 'cm', 'm', 'in (or ")', 'ft (or \')'];

/**
 * The unit a spelling stands for (lower case, as written), or `undefined`.
 * @example readUnitName('inches') // 'in'
 */
export function readUnitName(word: string): WrittenLengthUnit | undefined {
  return Object.prototype.hasOwnProperty.call(UNIT_SPELLINGS, word) ? UNIT_SPELLINGS[word] : undefined;
}

/**
 * The accepted spelling nearest to a mistyped one (at most two edits away), to
 * suggest in an error, or `undefined`.
 * @example suggestUnitName('inn') // 'in'
 */
export function suggestUnitName(word: string): string | undefined {
  let best: string | undefined;
  let bestDistance = 3;
  for (const name of Object.keys(UNIT_SPELLINGS)) {
    if (!/^[a-z]/.test(name)) continue;
    const d = editDistance(word, name);
    if (d < bestDistance) {
      best = name;
      bestDistance = d;
    }
  }
  return best;
}

/** Levenshtein distance between two short words. */
function editDistance(a: string, b: string): number {
  let prev = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const row = [i];
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      row.push(Math.min((prev[j] ?? 0) + 1, (row[j - 1] ?? 0) + 1, (prev[j - 1] ?? 0) + cost));
    }
    prev = row;
  }
  return prev[b.length] ?? Math.max(a.length, b.length);
}
