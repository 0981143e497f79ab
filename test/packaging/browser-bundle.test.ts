/**
 * The library packages run in a browser: bundled for the browser by Vite (the
 * page's bundler, pinned in LIBRARIES.md), they need no Node built-in, and the
 * bundle lays out a lateral and draws it. The detector is checked on a module
 * that does import one, so a pass means something.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { bundleForBrowser } from './browser-bundle.js';

const here = dirname(fileURLToPath(import.meta.url));
const testRoot = join(here, '..');
const scratch = mkdtempSync(join(tmpdir(), 'girth-browser-'));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

describe('browser bundle of the library packages', () => {
  it('the detector reports a Node built-in (self-check on a module importing node:path)', async () => {
    const entry = join(scratch, 'uses-node.js');
    writeFileSync(entry, "import { join } from 'node:path';\nexport const p = join('a', 'b');\n");
    const bundle = await bundleForBrowser(entry, testRoot, ['source']);
    expect(bundle.nodeBuiltins.join('\n')).toContain('node:path');
  });

  it('needs no Node built-in, and runs: a 45° NPS 8 on NPS 12 lateral to SVG, DXF, PDF and the contract', async () => {
    const bundle = await bundleForBrowser(join(here, 'browser-entry.ts'), testRoot, ['source']);
    expect(bundle.nodeBuiltins).toEqual([]);
    const file = join(scratch, 'girth-browser.mjs');
    writeFileSync(file, bundle.code);
    const girth = (await import(pathToFileURL(file).href)) as typeof import('./browser-entry.js');
    const { resolvePipe } = girth.pipes;
    const lateral = girth.unroll.layoutBranch(
      { header: resolvePipe('NPS 12 STD'), branch: resolvePipe('NPS 8 STD'), angleDeg: 45, fit: 'set-on' },
      { stations: 16 },
    );
    const [branchCut, headerHole] = lateral.templates;
    const svg = girth.svg.templateToSvg(branchCut!, { sheetUnits: 'in' });
    const dxf = girth.dxf.templateToDxf(headerHole!, { units: 'in' });
    const json = girth.table.toResultJson(lateral, { units: 'in' });
    expect(svg.startsWith('<?xml')).toBe(true);
    expect(dxf).toContain('EOF');
    const pdf = await girth.pdf.planToPdf(girth.sheet.planSheet(branchCut!, { sheetUnits: 'in' }), { paper: 'a4' });
    expect(new TextDecoder().decode(pdf.subarray(0, 5))).toBe('%PDF-');
    // The NPS 8 branch's stretch-out is its OD times pi: 8.625 in (ASME B36.10M) x pi = 27.096 in.
    expect(json.templates[0]!.stretchOut).toBeCloseTo(8.625 * Math.PI, 3);
  });
});
