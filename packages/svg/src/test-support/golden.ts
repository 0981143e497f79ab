/**
 * Golden-file checks for SVG output: a reusable harness for any package's tests.
 *
 * `expectGolden(dir, name, svg)` normalises the SVG (float noise, line breaks) and compares it
 * byte for byte with `<dir>/<name>.svg`. With `UPDATE_GOLDEN=1` in the environment it
 * (re)writes the file instead, atomically, so goldens change only on purpose.
 */
import { existsSync, readFileSync, renameSync, writeFileSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';

/**
 * Decimal places kept by default: 2 on a sheet in mm (0.01 mm), 4 on a sheet in inches
 * (0.0001 in = 0.00254 mm): one place fewer than the exporter writes.
 */
export function defaultDecimals(svg: string): number {
  return /<svg\b[^>]*\bwidth="[0-9.]+in"/.test(svg) ? 4 : 2;
}

/**
 * The SVG in a form fit to compare: every decimal number after the XML declaration
 * rounded to `decimals` places (trailing zeros and `-0` dropped), which removes
 * last-digit float noise between machines, and a line break between adjacent tags so
 * a difference shows on its own line.
 *
 * @example normaliseSvgForGolden('<svg><path d="M1.2345 -0.001"/></svg>') // '<svg>\n<path d="M1.23 0"/>\n</svg>'
 */
export function normaliseSvgForGolden(svg: string, decimals = defaultDecimals(svg)): string {
  const decl = /^<\?xml[^>]*\?>/.exec(svg)?.[0] ?? '';
  const body = svg
    .slice(decl.length)
    .replace(/-?\d+\.\d+/g, (tok) => {
      const r = Number(Number(tok).toFixed(decimals));
      return r === 0 ? '0' : String(r);
    })
    .replace(/></g, '>\n<');
  return decl + body;
}

function firstDifference(expected: string, actual: string): string {
  const e = expected.split('\n');
  const a = actual.split('\n');
  for (let i = 0; i < Math.max(e.length, a.length); i++) {
    const el = e[i] ?? '<missing>';
    const al = a[i] ?? '<missing>';
    if (el !== al) {
      let c = 0;
      while (c < el.length && el[c] === al[c]) c++;
      const from = Math.max(0, c - 60);
      return `line ${i + 1}, column ${c + 1}:\n  golden: …${el.slice(from, c + 80)}\n  actual: …${al.slice(from, c + 80)}`;
    }
  }
  return 'no difference';
}

/** Options of {@link expectGolden}. */
export interface GoldenOptions {
  /** Decimal places kept by the normalisation (default: see {@link defaultDecimals}). */
  readonly decimals?: number;
  /** Write the golden instead of comparing (default: `UPDATE_GOLDEN=1` in the environment). */
  readonly update?: boolean;
}

/**
 * Compares an SVG with its golden file `<dir>/<name>.svg` after normalising numbers.
 *
 * @throws Error when the golden is missing or differs (naming the first differing line and
 *   how to regenerate it on purpose: `UPDATE_GOLDEN=1`).
 */
export function expectGolden(dir: string, name: string, svg: string, options: GoldenOptions = {}): void {
  const file = join(dir, `${name}.svg`);
  const actual = normaliseSvgForGolden(svg, options.decimals ?? defaultDecimals(svg));
  const update = options.update ?? process.env.UPDATE_GOLDEN === '1';
  if (update) {
    mkdirSync(dir, { recursive: true });
    const tmp = `${file}.tmp-${process.pid}`;
    writeFileSync(tmp, actual);
    renameSync(tmp, file);
    return;
  }
  if (!existsSync(file)) {
    throw new Error(`golden ${file} is missing: run the tests with UPDATE_GOLDEN=1 to create it, then review it`);
  }
  const expected = readFileSync(file, 'utf8');
  if (expected !== actual) {
    throw new Error(
      `SVG differs from golden ${file} at ${firstDifference(expected, actual)}\n` +
        'If the change is intended, regenerate with UPDATE_GOLDEN=1 and review the diff.',
    );
  }
}
