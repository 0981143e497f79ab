/**
 * Golden-file harness: compares a text with a file in `src/__golden__/` after
 * normalising what may change without meaning (DXF handles, float noise).
 * Regenerate the files with `UPDATE_GOLDEN=1 pnpm exec vitest run` and review
 * the diff before committing.
 */
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { expect } from 'vitest';

const GOLDEN_DIR = join(dirname(fileURLToPath(import.meta.url)), '..', '__golden__');

/** Group codes whose values are handles or pointers to handles (5, 105, 320-369, 390-399, 480-481, 1005). */
function isHandleCode(code: number): boolean {
  return code === 5 || code === 105 || (code >= 320 && code <= 369) || (code >= 390 && code <= 399) || code === 480 || code === 481 || code === 1005;
}

/** Group codes holding floating-point values (10-59, 110-149, 210-239, 460-469, 1010-1059). */
function isFloatCode(code: number): boolean {
  return (code >= 10 && code <= 59) || (code >= 110 && code <= 149) || (code >= 210 && code <= 239) || (code >= 460 && code <= 469) || (code >= 1010 && code <= 1059);
}

/**
 * A DXF text with handles replaced by `<h>`, `$HANDSEED` blanked, floats
 * rounded to `decimals` places (default 4: 0.1 µm in mm), LF line ends and
 * group codes unpadded.
 */
export function normaliseDxf(text: string, decimals = 4): string {
  const lines = text.split(/\r\n|\n/);
  const out: string[] = [];
  for (let i = 0; i + 1 < lines.length; i += 2) {
    const code = Number.parseInt(lines[i]!.trim(), 10);
    let value = lines[i + 1]!;
    if (isHandleCode(code)) value = '<h>'; // includes $HANDSEED's value (group 5)
    else if (isFloatCode(code)) {
      const v = Number.parseFloat(value);
      const r = Number(v.toFixed(decimals));
      value = String(Object.is(r, -0) ? 0 : r);
    }
    out.push(String(code), value);
  }
  return out.join('\n') + '\n';
}

/**
 * Expects `text` (after `normalise`) to equal the golden file `name`. With
 * UPDATE_GOLDEN=1 in the environment it writes the file instead; a missing
 * file is a failure otherwise (golden files are made on purpose, never silently).
 */
export function expectGolden(name: string, text: string, normalise: (t: string) => string = (t) => t): void {
  const path = join(GOLDEN_DIR, name);
  const actual = normalise(text);
  if (process.env['UPDATE_GOLDEN'] === '1') {
    mkdirSync(GOLDEN_DIR, { recursive: true });
    writeFileSync(path, actual, 'utf8');
    return;
  }
  if (!existsSync(path)) throw new Error(`golden file ${name} is missing: run UPDATE_GOLDEN=1 pnpm exec vitest run, review and commit it`);
  expect(actual, `golden ${name} differs (UPDATE_GOLDEN=1 regenerates it; review the diff)`).toBe(readFileSync(path, 'utf8'));
}
