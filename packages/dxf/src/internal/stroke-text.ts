/**
 * One line of text as single strokes on the MARK layer, for a table that
 * etches or scribes its text (see `stroke-font.ts`).
 */
import { STROKE_ADVANCE_UNITS, STROKE_CAP_UNITS, strokeGlyph } from './stroke-font.js';
import type { SheetEntity, SheetVertex } from './sheet.js';

/** DXF control codes of `dxfSafeText` back to the signs the font draws. */
const CODES: ReadonlyArray<readonly [string, string]> = [
  ['%%%', '%'],
  ['%%d', '°'],
  ['%%c', 'Ø'],
  ['%%p', '±'],
  ['^ ', '^'],
];

/** The characters of a `dxfSafeText` line, control codes read back as their signs. */
export function strokeChars(safe: string): string[] {
  const out: string[] = [];
  for (let i = 0; i < safe.length; ) {
    const code = CODES.find(([c]) => safe.startsWith(c, i));
    if (code !== undefined) {
      out.push(code[1]);
      i += code[0].length;
    } else {
      out.push(safe[i]!);
      i += 1;
    }
  }
  return out;
}

/**
 * Open polylines on `layer` drawing `safe` (a `dxfSafeText` line) in the
 * stroke font: cap height `height`, baseline through `at`, starting there
 * (`left`) or centred on it (`center`). A character the font lacks is drawn
 * as `?`.
 *
 * @example strokeText('45%%d', [0, 0], 3, 'left', 'mark').length
 */
export function strokeText(safe: string, at: readonly [number, number], height: number, align: 'left' | 'center', layer: SheetEntity['layer']): SheetEntity[] {
  const chars = strokeChars(safe);
  const unit = height / STROKE_CAP_UNITS;
  const widthUnits = chars.length * STROKE_ADVANCE_UNITS - (STROKE_ADVANCE_UNITS - 4);
  const x0 = align === 'center' ? at[0] - (widthUnits * unit) / 2 : at[0];
  const out: SheetEntity[] = [];
  chars.forEach((ch, i) => {
    if (ch === ' ') return;
    const glyph = strokeGlyph(ch) ?? strokeGlyph('?')!;
    const left = x0 + i * STROKE_ADVANCE_UNITS * unit;
    for (const stroke of glyph) {
      const vertices: SheetVertex[] = stroke.map(([gx, gy]) => [left + gx * unit, at[1] + gy * unit, 0]);
      out.push({ kind: 'polyline', layer, vertices, closed: false });
    }
  });
  return out;
}
