/**
 * Rendering an SVG for tests with @resvg/resvg-js, with DejaVu Sans loaded from
 * Debian's fonts-dejavu-core (on this machine kind's image), so text measures
 * the same everywhere.
 */
import { existsSync } from 'node:fs';
import { Resvg, type ResvgRenderOptions } from '@resvg/resvg-js';
import { stringify, type INode } from 'svgson';
import { parseSvg } from './parse.js';

/** The fonts tests render with. */
export const TEST_FONT_FILES = [
  '/usr/share/fonts/truetype/dejavu/DejaVuSans.ttf',
  '/usr/share/fonts/truetype/dejavu/DejaVuSans-Bold.ttf',
] as const;

function fontOptions(): ResvgRenderOptions['font'] {
  const missing = TEST_FONT_FILES.filter((f) => !existsSync(f));
  if (missing.length > 0) {
    throw new Error(`test fonts missing (${missing.join(', ')}): install Debian's fonts-dejavu-core`);
  }
  return { loadSystemFonts: false, fontFiles: [...TEST_FONT_FILES], defaultFontFamily: 'DejaVu Sans', sansSerifFamily: 'DejaVu Sans' };
}

/** A resvg instance for the SVG, at `dpi`, on white. */
export function resvgOf(svg: string, dpi = 96): Resvg {
  return new Resvg(svg, { dpi, background: 'white', font: fontOptions() });
}

/**
 * Parses the SVG with resvg's strict XML reader (no fonts loaded, so it is quick).
 * @throws Error when the document is not well-formed XML or not an SVG.
 */
export function strictParse(svg: string): void {
  new Resvg(svg, { font: { loadSystemFonts: false } });
}

/** A rendered picture: size in pixels and RGBA bytes. */
export interface Picture {
  readonly width: number;
  readonly height: number;
  readonly pixels: Buffer;
}

/** Renders the SVG at `dpi` on white. */
export function renderSvg(svg: string, dpi: number): Picture {
  const img = resvgOf(svg, dpi).render();
  return { width: img.width, height: img.height, pixels: img.pixels };
}

/** True when the pixel at (x, y) is dark (its red, green and blue all below 128). */
export function isDark(p: Picture, x: number, y: number): boolean {
  const i = (y * p.width + x) * 4;
  return (p.pixels[i] as number) < 128 && (p.pixels[i + 1] as number) < 128 && (p.pixels[i + 2] as number) < 128;
}

/** The longest run of dark pixels along any row, in pixels. */
export function longestDarkRow(p: Picture): number {
  let best = 0;
  for (let y = 0; y < p.height; y++) {
    let run = 0;
    for (let x = 0; x < p.width; x++) {
      run = isDark(p, x, y) ? run + 1 : 0;
      if (run > best) best = run;
    }
  }
  return best;
}

/** The SVG with only the top-level groups whose ids are given (and title, desc, metadata). */
export function keepGroups(svg: string, ids: readonly string[]): string {
  const root = parseSvg(svg);
  const kept: INode = {
    ...root,
    children: root.children.filter((c) => c.name !== 'g' || ids.includes(c.attributes.id ?? '')),
  };
  return stringify(kept);
}
