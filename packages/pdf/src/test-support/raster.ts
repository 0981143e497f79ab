/**
 * Pages of a PDF rendered by pdftoppm (Debian poppler-utils) as grey images,
 * for checks that look at what a printer would print.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/** A grey image: 0 black, 255 white, row by row. */
export interface Grey {
  readonly width: number;
  readonly height: number;
  readonly data: Uint8Array;
}

/** Reads a binary PGM (P5, 8 bit). */
export function readPgm(bytes: Uint8Array): Grey {
  let pos = 0;
  const token = (): string => {
    while (/\s/.test(String.fromCharCode(bytes[pos]!))) pos++;
    if (bytes[pos] === 35) {
      while (bytes[pos] !== 10) pos++;
      return token();
    }
    let s = '';
    while (!/\s/.test(String.fromCharCode(bytes[pos]!))) s += String.fromCharCode(bytes[pos++]!);
    return s;
  };
  if (token() !== 'P5') throw new Error('not a binary PGM');
  const width = Number(token());
  const height = Number(token());
  if (Number(token()) !== 255) throw new Error('not an 8-bit PGM');
  pos++;
  return { width, height, data: bytes.subarray(pos, pos + width * height) };
}

/** Crop of each page to render, pixels at the dpi asked for. */
export interface Crop {
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

/**
 * Every page of `pdf` rendered grey at `dpi` (optionally only `crop` of each
 * page), in page order.
 */
export function renderPages(pdf: Uint8Array, dpi: number, crop?: Crop): Grey[] {
  const dir = mkdtempSync(join(tmpdir(), 'girth-pdf-render-'));
  try {
    const file = join(dir, 'in.pdf');
    writeFileSync(file, pdf);
    const cropArgs = crop ? ['-x', String(crop.x), '-y', String(crop.y), '-W', String(crop.width), '-H', String(crop.height)] : [];
    execFileSync('pdftoppm', ['-r', String(dpi), '-gray', ...cropArgs, file, join(dir, 'page')]);
    return readdirSync(dir)
      .filter((f) => f.startsWith('page') && f.endsWith('.pgm'))
      .sort((a, b) => Number(/(\d+)\.pgm$/.exec(a)![1]) - Number(/(\d+)\.pgm$/.exec(b)![1]))
      .map((f) => readPgm(readFileSync(join(dir, f))));
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Text of page `page` (1-based) by pdftotext (Debian poppler-utils), layout kept. */
export function pageText(pdf: Uint8Array, page: number): string {
  const dir = mkdtempSync(join(tmpdir(), 'girth-pdf-text-'));
  try {
    const file = join(dir, 'in.pdf');
    writeFileSync(file, pdf);
    return execFileSync('pdftotext', ['-layout', '-f', String(page), '-l', String(page), file, '-'], { encoding: 'utf8' });
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Text of every page by one pdftotext run (pages end in a form feed), layout kept. */
export function pageTexts(pdf: Uint8Array): string[] {
  const dir = mkdtempSync(join(tmpdir(), 'girth-pdf-text-'));
  try {
    const file = join(dir, 'in.pdf');
    writeFileSync(file, pdf);
    const text = execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8', maxBuffer: 256 * 1024 * 1024 });
    return text.split('\f').slice(0, -1);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Runs `qpdf --check` (Debian qpdf); returns its output, throws when it fails. */
export function qpdfCheck(pdf: Uint8Array): string {
  const dir = mkdtempSync(join(tmpdir(), 'girth-pdf-qpdf-'));
  try {
    const file = join(dir, 'in.pdf');
    writeFileSync(file, pdf);
    return execFileSync('qpdf', ['--check', file], { encoding: 'utf8' });
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/**
 * Centre of the dark run that starts at or after `from` stepping by `step`
 * along `at(i)` (darkness-weighted mean of the run's indices), or undefined.
 */
export function runCentre(at: (i: number) => number, from: number, to: number, step: 1 | -1, threshold = 128): number | undefined {
  let i = from;
  while (step > 0 ? i <= to : i >= to) {
    if (at(i) < threshold) break;
    i += step;
  }
  if (step > 0 ? i > to : i < to) return undefined;
  // Include the anti-aliased fringe on both sides of the run (paler than the
  // 0.9 grey of an overlap strip is left out, so a strip is not taken for a fringe).
  const fringe = 215;
  let a = i - step;
  while (at(a) < fringe && (step > 0 ? a > from : a < from)) a -= step;
  let b = i;
  while (at(b + step) < fringe) b += step;
  const lo = Math.min(a, b);
  const hi = Math.max(a, b);
  let sum = 0;
  let weight = 0;
  for (let k = lo; k <= hi; k++) {
    const w = 255 - at(k);
    sum += w * k;
    weight += w;
  }
  return weight > 0 ? sum / weight : undefined;
}
